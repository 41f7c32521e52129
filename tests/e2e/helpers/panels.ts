/** The editor's panels and the element each one shows once its first answer is drawn (its ready signal). */
export const PANELS = [
  { name: 'Blend', ready: 'readout-sum-level' },
  { name: 'Timing', ready: 'timing-arrivals' },
  { name: 'Modes', ready: 'mode-table' },
  { name: 'Layout', ready: 'status-L' },
  { name: 'Headroom', ready: 'max-spl-L' },
  { name: 'Measured', ready: 'measured-panel' },
] as const;
