'use client';

import { useEffect, useRef, type ReactNode } from 'react';

/** A modal on the native <dialog> (focus trapped by the browser, Esc closes). */
export function Modal({ open, onClose, title, children, wide = false }: { open: boolean; onClose: () => void; title: string; children: ReactNode; wide?: boolean }) {
  const ref = useRef<HTMLDialogElement>(null);
  useEffect(() => {
    const d = ref.current;
    if (!d) return;
    if (open && !d.open) d.showModal();
    if (!open && d.open) d.close();
  }, [open]);
  return (
    <dialog
      ref={ref}
      onClose={onClose}
      aria-labelledby="modal-title"
      className={`m-auto w-[calc(100%-2rem)] ${wide ? 'max-w-2xl' : 'max-w-md'} rounded-lg border border-line bg-white p-0 text-ink shadow-xl backdrop:bg-ink/40`}
    >
      {open ? (
        <div className="flex flex-col gap-4 p-5">
          <div className="flex items-start gap-3">
            <h2 id="modal-title" className="text-lg font-semibold">
              {title}
            </h2>
            <button type="button" onClick={onClose} className="ml-auto rounded-md px-2 py-1 text-sm text-ink-soft hover:bg-wash" aria-label="Close">
              ✕
            </button>
          </div>
          {children}
        </div>
      ) : null}
    </dialog>
  );
}
