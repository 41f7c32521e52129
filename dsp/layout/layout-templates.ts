/** Which side of the listener a channel belongs to (azimuth positive to the left). */
export type ChannelSide = 'left' | 'right' | 'centre';

/** A range of angles, degrees; for azimuth, magnitudes |azimuth| on the channel's side. */
export interface AngleRangeDeg {
  readonly nominal: number;
  readonly min: number;
  readonly max: number;
}

/** One loudspeaker of a layout template with its recommended direction from the MLP. */
export interface LayoutChannel {
  /** L, C, R, SL, SR, SBL, SBR, FWL, FWR, TFL, TFR, TML, TMR, TRL, TRR. */
  readonly label: string;
  readonly name: string;
  readonly side: ChannelSide;
  readonly azimuthDeg: AngleRangeDeg;
  readonly elevationDeg: AngleRangeDeg;
  /** Where the range comes from. */
  readonly source: string;
}

/** A named speaker layout (2.0 … 9.1.6). */
export interface LayoutTemplate {
  readonly id: string;
  readonly channels: readonly LayoutChannel[];
  readonly subwooferCount: number;
}

const BS775 = 'published: ITU-R BS.775-3 (2012)';
const HOME = 'common practice (home theater)';
const BS2051 = 'published: ITU-R BS.2051-3 (2022), values from memory';

const ch = (label: string, name: string, side: ChannelSide, az: [number, number, number], el: [number, number, number], source: string): LayoutChannel => ({
  label,
  name,
  side,
  azimuthDeg: { nominal: az[0], min: az[1], max: az[2] },
  elevationDeg: { nominal: el[0], min: el[1], max: el[2] },
  source,
});

// Front pair: ITU-R BS.775-3 puts it at ±30°; home theaters commonly use ±22°–30° (common practice).
// Screen channels commonly sit up to 10° below ear height (under or behind a screen) and up to 10°
// above it (common practice, from memory).
const SCREEN_EL: [number, number, number] = [0, -10, 10];
const L = ch('L', 'Front left', 'left', [30, 22, 30], SCREEN_EL, `${BS775}; ±22°–30° and −10°…10° elevation ${HOME}`);
const R = ch('R', 'Front right', 'right', [30, 22, 30], SCREEN_EL, `${BS775}; ±22°–30° and −10°…10° elevation ${HOME}`);
const C = ch('C', 'Centre', 'centre', [0, 0, 0], SCREEN_EL, `${BS775}; −10°…10° elevation ${HOME}`);
const SL5 = ch('SL', 'Surround left', 'left', [110, 100, 120], [0, 0, 15], BS775);
const SR5 = ch('SR', 'Surround right', 'right', [110, 100, 120], [0, 0, 15], BS775);
// 7.x: side surrounds and back surrounds (BS.2051-3 system J ranges, from memory).
const SL7 = ch('SL', 'Side surround left', 'left', [90, 60, 110], [0, 0, 15], BS2051);
const SR7 = ch('SR', 'Side surround right', 'right', [90, 60, 110], [0, 0, 15], BS2051);
const SBL = ch('SBL', 'Back surround left', 'left', [135, 110, 150], [0, 0, 15], BS2051);
const SBR = ch('SBR', 'Back surround right', 'right', [135, 110, 150], [0, 0, 15], BS2051);
const FWL = ch('FWL', 'Front wide left', 'left', [60, 45, 70], [0, 0, 10], `${HOME}, from memory`);
const FWR = ch('FWR', 'Front wide right', 'right', [60, 45, 70], [0, 0, 10], `${HOME}, from memory`);
// Heights (BS.2051-3 upper layer: elevation 30°–55°, from memory).
const TFL = ch('TFL', 'Top front left', 'left', [45, 30, 45], [45, 30, 55], BS2051);
const TFR = ch('TFR', 'Top front right', 'right', [45, 30, 45], [45, 30, 55], BS2051);
const TRL = ch('TRL', 'Top rear left', 'left', [135, 110, 150], [45, 30, 55], BS2051);
const TRR = ch('TRR', 'Top rear right', 'right', [135, 110, 150], [45, 30, 55], BS2051);
const TML = ch('TML', 'Top middle left', 'left', [90, 70, 110], [65, 45, 90], `${HOME}, from memory`);
const TMR = ch('TMR', 'Top middle right', 'right', [90, 70, 110], [65, 45, 90], `${HOME}, from memory`);
// Two heights only (x.x.2): placed over the listener's front or middle (common practice, from memory).
const TML2 = ch('TML', 'Top middle left', 'left', [75, 30, 110], [55, 30, 90], `${HOME}, from memory`);
const TMR2 = ch('TMR', 'Top middle right', 'right', [75, 30, 110], [55, 30, 90], `${HOME}, from memory`);

const t = (id: string, subwooferCount: number, channels: LayoutChannel[]): LayoutTemplate => ({ id, subwooferCount, channels });

/**
 * Speaker layouts from 2.0 to 9.1.6 with each channel's recommended azimuth and elevation from the MLP
 * (ITU-R BS.775-3 for 5.1; ITU-R BS.2051-3 for larger layouts, from memory; front pair ±22°–30° common practice).
 * @example LAYOUT_TEMPLATES.find((t) => t.id === '5.1')?.channels.length // 5
 */
export const LAYOUT_TEMPLATES: readonly LayoutTemplate[] = [
  t('2.0', 0, [L, R]),
  t('2.1', 1, [L, R]),
  t('3.1', 1, [L, C, R]),
  t('5.1', 1, [L, C, R, SL5, SR5]),
  t('7.1', 1, [L, C, R, SL7, SR7, SBL, SBR]),
  t('5.1.2', 1, [L, C, R, SL5, SR5, TML2, TMR2]),
  t('5.1.4', 1, [L, C, R, SL5, SR5, TFL, TFR, TRL, TRR]),
  t('7.1.2', 1, [L, C, R, SL7, SR7, SBL, SBR, TML2, TMR2]),
  t('7.1.4', 1, [L, C, R, SL7, SR7, SBL, SBR, TFL, TFR, TRL, TRR]),
  t('9.1.6', 1, [L, C, R, FWL, FWR, SL7, SR7, SBL, SBR, TFL, TFR, TML, TMR, TRL, TRR]),
];

/**
 * The template with this id; RangeError when there is none.
 * @example layoutTemplate('7.1.4').channels.length // 11
 */
export function layoutTemplate(id: string): LayoutTemplate {
  const found = LAYOUT_TEMPLATES.find((x) => x.id === id);
  if (!found) throw new RangeError(`id must be one of ${LAYOUT_TEMPLATES.map((x) => x.id).join(', ')} (got ${String(id)})`);
  return found;
}
