'use client';

import type { ReactNode } from 'react';
import { Button } from './button';
import { Modal } from './modal';

/** "Delete this …?": what deleting does (`children`), then "Keep it" (closes) and "Delete". */
export function ConfirmDelete({ open, title, onKeep, onDelete, busy, children }: { open: boolean; title: string; onKeep: () => void; onDelete: () => void; busy?: boolean; children: ReactNode }) {
  return (
    <Modal open={open} onClose={onKeep} title={title}>
      <p className="text-sm">{children}</p>
      <div className="flex justify-end gap-2">
        <Button variant="secondary" onClick={onKeep}>
          Keep it
        </Button>
        <Button variant="danger" disabled={busy} onClick={onDelete}>
          Delete
        </Button>
      </div>
    </Modal>
  );
}
