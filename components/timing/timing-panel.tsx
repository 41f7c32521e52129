'use client';

// Placeholder until the timing panel lands (issue 4); replaced by the panel itself.
export function TimingPanel() {
  return <p className="text-sm text-ink-soft">The timing panel is being built.</p>;
}
