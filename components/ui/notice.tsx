import type { ReactNode } from 'react';

const tone = {
  info: 'border-[#B8D8D4] bg-[#EEF7F6] text-ink',
  warn: 'border-[#E8C9A5] bg-[#FBF3EA] text-[#6B3206]',
  error: 'border-[#E7B4B4] bg-[#FBEDED] text-[#7F1414]',
  ok: 'border-[#B9DCC3] bg-[#EEF8F1] text-[#14532D]',
};

export function Notice({ kind = 'info', children, title }: { kind?: keyof typeof tone; children: ReactNode; title?: string }) {
  return (
    <div role={kind === 'error' ? 'alert' : 'status'} className={`rounded-md border px-3 py-2 text-sm ${tone[kind]}`}>
      {title ? <p className="font-semibold">{title}</p> : null}
      {children}
    </div>
  );
}
