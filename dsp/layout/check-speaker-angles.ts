import { assertFinite } from '../internal/guards';
import type { LayoutChannel } from './layout-templates';

/** Options of {@link checkSpeakerAngles}. */
export interface CheckSpeakerAnglesOptions {
  readonly channel: LayoutChannel;
  readonly azimuthDeg: number;
  readonly elevationDeg: number;
}

/** Pass when inside the recommended ranges, warn otherwise; the offsets say by how much (0 inside). */
export interface SpeakerAngleCheck {
  readonly status: 'pass' | 'warn';
  readonly azimuthOffDeg: number;
  readonly elevationOffDeg: number;
  /** True when the speaker sits on the other side of the listener from its channel. */
  readonly wrongSide: boolean;
}

const offBy = (value: number, min: number, max: number): number => (value < min ? min - value : value > max ? value - max : 0);

/**
 * Checks a speaker's azimuth/elevation (from speakerAngles) against its channel's recommended range.
 * @example checkSpeakerAngles({ channel: layoutTemplate('5.1').channels[0], azimuthDeg: 28, elevationDeg: 0 }).status // 'pass'
 */
export function checkSpeakerAngles({ channel, azimuthDeg, elevationDeg }: CheckSpeakerAnglesOptions): SpeakerAngleCheck {
  assertFinite('azimuthDeg', azimuthDeg);
  assertFinite('elevationDeg', elevationDeg);
  const tolerance = 1e-9;
  const wrongSide =
    (channel.side === 'left' && azimuthDeg < -tolerance) || (channel.side === 'right' && azimuthDeg > tolerance);
  const magnitude = Math.abs(azimuthDeg);
  const azimuthOffDeg = channel.side === 'centre' ? magnitude : offBy(magnitude, channel.azimuthDeg.min, channel.azimuthDeg.max);
  const elevationOffDeg = offBy(elevationDeg, channel.elevationDeg.min, channel.elevationDeg.max);
  const pass = !wrongSide && azimuthOffDeg <= tolerance && elevationOffDeg <= tolerance;
  return { status: pass ? 'pass' : 'warn', azimuthOffDeg, elevationOffDeg, wrongSide };
}
