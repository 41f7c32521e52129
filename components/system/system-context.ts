'use client';

import { createContext, useContext } from 'react';
import type { SystemDocument } from '@/lib/validations/system';

export type UnitSystem = 'metric' | 'imperial';

export interface SystemEditorValue {
  doc: SystemDocument;
  /** Replace the document with fn(current). Never mutate `doc` in place. */
  update: (fn: (current: SystemDocument) => SystemDocument) => void;
  units: UnitSystem;
  setUnits: (u: UnitSystem) => void;
  readOnly: boolean;
}

export const SystemContext = createContext<SystemEditorValue | null>(null);

/** The System document behind every panel of the editor (and of the shared page, read-only). */
export function useSystem(): SystemEditorValue {
  const value = useContext(SystemContext);
  if (!value) throw new Error('useSystem must be used inside the System editor');
  return value;
}
