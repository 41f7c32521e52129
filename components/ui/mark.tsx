import { chartColors } from '@/components/charts/theme';

/** Seamline's mark: a rising and a falling curve that cross (our own drawing). */
export function Mark({ size = 28, title = 'Seamline' }: { size?: number; title?: string }) {
  return (
    <svg width={size} height={size} viewBox="0 0 32 32" {...(title ? { role: 'img', 'aria-label': title } : { 'aria-hidden': true })}>
      {title ? <title>{title}</title> : null}
      <rect x="0.5" y="0.5" width="31" height="31" rx="7" fill={chartColors.surface} stroke={chartColors.frame} />
      <path d="M4 25 C 12 25, 14 8, 28 7" fill="none" stroke={chartColors.mains} strokeWidth="3" strokeLinecap="round" />
      <path d="M4 7 C 18 8, 20 25, 28 25" fill="none" stroke={chartColors.sub} strokeWidth="3" strokeLinecap="round" />
    </svg>
  );
}

export function Wordmark({ size = 28 }: { size?: number }) {
  return (
    <span className="inline-flex items-center gap-2 font-semibold tracking-tight text-ink" style={{ fontSize: size * 0.72 }}>
      <Mark size={size} title="" />
      Seamline
    </span>
  );
}
