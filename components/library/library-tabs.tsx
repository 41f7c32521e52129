import Link from 'next/link';

const TABS = [
  { view: 'systems', label: 'Systems', href: '/library' },
  { view: 'deleted', label: 'Recently deleted', href: '/library?view=deleted' },
  { view: 'profiles', label: 'Speaker profiles', href: '/library?view=profiles' },
] as const;

export function LibraryTabs({ view }: { view: (typeof TABS)[number]['view'] }) {
  return (
    <nav aria-label="Library sections" className="flex gap-1 overflow-x-auto border-b border-line">
      {TABS.map((t) => (
        <Link
          key={t.view}
          href={t.href}
          aria-current={t.view === view ? 'page' : undefined}
          className={`-mb-px whitespace-nowrap border-b-2 px-3 py-2 text-sm ${t.view === view ? 'border-mains font-semibold text-ink' : 'border-transparent text-ink-soft hover:text-ink'}`}
        >
          {t.label}
        </Link>
      ))}
    </nav>
  );
}
