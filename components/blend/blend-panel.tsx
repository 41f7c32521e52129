'use client';

// Placeholder until the blend panel lands (issue 4); replaced by the panel itself.
export function BlendPanel() {
  return <p className="text-sm text-ink-soft">The blend panel is being built.</p>;
}
