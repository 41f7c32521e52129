'use client';

// Placeholder until the modes panel lands (issue 4); replaced by the panel itself.
export function ModesPanel() {
  return <p className="text-sm text-ink-soft">The modes panel is being built.</p>;
}
