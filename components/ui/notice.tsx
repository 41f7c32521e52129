import type { ReactNode } from 'react';

const tone = {
  info: 'border-tint-edge-info bg-tint-info text-ink',
  warn: 'border-tint-edge-warn bg-tint-warn text-tint-ink-warn',
  error: 'border-tint-edge-fail bg-tint-fail text-tint-ink-fail',
  ok: 'border-tint-edge-ok bg-tint-ok text-tint-ink-ok',
};

export function Notice({ kind = 'info', children, title }: { kind?: keyof typeof tone; children: ReactNode; title?: string }) {
  return (
    <div role={kind === 'error' ? 'alert' : 'status'} className={`rounded-md border px-3 py-2 text-sm ${tone[kind]}`}>
      {title ? <p className="font-semibold">{title}</p> : null}
      {children}
    </div>
  );
}
