export default function Loading() {
  return (
    <div role="status" aria-live="polite" className="flex items-center gap-3 p-6 text-sm text-ink-soft">
      <span className="h-3 w-3 animate-pulse rounded-full bg-mains" aria-hidden />
      Loading…
    </div>
  );
}
