/** The editor's panels and the element each one shows once its first answer is drawn (its ready signal). */
export const PANELS = [
  { name: 'Blend', ready: 'readout-sum-level' },
  { name: 'Timing', ready: 'timing-arrivals' },
  { name: 'Modes', ready: 'mode-table' },
  // Seat balance computes only when asked: ready once its Run button shows (seat-balance.spec.ts scans its answer).
  { name: 'Seat balance', ready: 'sb-run' },
  { name: 'Layout', ready: 'status-L' },
  { name: 'Headroom', ready: 'max-spl-L' },
  { name: 'Measured', ready: 'measured-panel' },
  { name: 'Processor filters', ready: 'pf-convention' },
] as const;
