'use client';

// Placeholder until the Measured panel lands (issue 6); replaced by the panel itself.
export function MeasuredPanel() {
  return <p className="text-sm text-ink-soft">The Measured panel is being built.</p>;
}
