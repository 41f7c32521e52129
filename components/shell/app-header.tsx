import Link from 'next/link';
import { getCaller } from '@/lib/auth';
import { Wordmark } from '@/components/ui/mark';
import { SignOutButton } from './sign-out-button';

const NAV = [
  { href: '/library', label: 'Library' },
  { href: '/team', label: 'Team' },
  { href: '/lessons', label: 'Lessons' },
];

/** The signed-in shell's header; anonymous visitors get the editor and a sign-in link. */
export async function AppHeader() {
  const caller = await getCaller();
  return (
    <header className="no-print border-b border-line bg-white">
      <div className="mx-auto flex max-w-[1800px] flex-wrap items-center gap-x-4 gap-y-2 px-4 py-2.5">
        <Link href={caller ? '/library' : '/'} aria-label="Seamline home" className="mr-2">
          <Wordmark size={26} />
        </Link>
        <nav aria-label="Main" className="flex flex-wrap items-center gap-1 text-sm">
          {caller
            ? NAV.map((n) => (
                <Link key={n.href} href={n.href} className="rounded-md px-2.5 py-1.5 text-ink hover:bg-wash">
                  {n.label}
                </Link>
              ))
            : null}
          <Link href="/systems/new" className="rounded-md bg-mains px-2.5 py-1.5 font-medium text-white hover:bg-mains-dark">
            New System
          </Link>
          <Link href="/docs/api" className="rounded-md px-2.5 py-1.5 text-ink hover:bg-wash">
            API
          </Link>
          {caller?.siteRole === 'admin' ? (
            <Link href="/admin/users" className="rounded-md px-2.5 py-1.5 text-ink hover:bg-wash">
              Users
            </Link>
          ) : null}
        </nav>
        <div className="ml-auto flex items-center gap-2 text-sm">
          {caller ? (
            <>
              <span className="hidden text-ink-faint sm:inline" data-testid="signed-in-as">
                {caller.name}
              </span>
              <Link href="/account" className="rounded-md px-2 py-1 text-ink hover:bg-wash">
                Account
              </Link>
              <SignOutButton />
            </>
          ) : (
            <>
              <Link href="/sign-in" className="rounded-md px-2 py-1 hover:bg-wash">
                Sign in
              </Link>
              <Link href="/sign-up" className="rounded-md border border-line px-2 py-1 hover:bg-wash">
                Create account
              </Link>
            </>
          )}
        </div>
      </div>
    </header>
  );
}
