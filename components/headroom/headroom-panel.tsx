'use client';

// Placeholder until the headroom panel lands (issue 4); replaced by the panel itself.
export function HeadroomPanel() {
  return <p className="text-sm text-ink-soft">The headroom panel is being built.</p>;
}
