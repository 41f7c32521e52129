/** "2026-12-01 14:05 UTC": the same on server and browser (no locale or time-zone drift between them). */
export function formatWhen(iso: string): string {
  return `${iso.slice(0, 10)} ${iso.slice(11, 16)} UTC`;
}

/** Days left before a deleted System can no longer be restored. */
export function daysLeft(deletedAtIso: string, windowDays = 30, nowMs = Date.now()): number {
  return Math.max(0, Math.ceil(windowDays - (nowMs - Date.parse(deletedAtIso)) / 86_400_000));
}
