'use client';

// Placeholder until the layout panel lands (issue 4); replaced by the panel itself.
export function LayoutPanel() {
  return <p className="text-sm text-ink-soft">The layout panel is being built.</p>;
}
