/** The answer of POST /api/v1/layout, assembled from dsp/layout (angles, checks, toe-in, channel settings). */
import {
  channelSettings,
  checkSpeakerAngles,
  includedAngleDeg,
  layoutTemplate,
  nominalSpeakerPosition,
  speakerAngles,
  toeInDeg,
  type AngleRangeDeg,
  type LayoutChannel,
  type PointM,
} from '@/dsp';
import type { LayoutRequest } from '@/lib/validations/compute-room';
import { fixed } from './room-format';

export type LayoutStatus = 'pass' | 'warn' | 'unlisted';

export interface LayoutSpeakerOut {
  channel: string;
  name: string;
  azimuthDeg: number;
  elevationDeg: number;
  /** Distance to the MLP the processor is given, m (0.01 m; the override when there is one). */
  distanceM: number;
  /** "measured" when distanceOverrideM was given, else from the positions. */
  distanceSource: 'measured' | 'geometry';
  /** Geometric distance, m (0.001 m), also when distanceM comes from an override. */
  geometricDistanceM: number;
  status: LayoutStatus;
  recommended: { azimuthDeg: AngleRangeDeg; elevationDeg: AngleRangeDeg; side: string; source: string } | null;
  azimuthOffDeg: number;
  elevationOffDeg: number;
  wrongSide: boolean;
  message: string;
  facingDeg: number;
  toeInDeg: number;
  rotationDeg: number;
  tiltDeg: number;
  /** Distance alignment to the farthest speaker or sub plus the mains delay, the shared delay taken out, ms (0.01 ms). */
  delayMs: number;
  /** Level match by distance among the speakers plus the channel's offset (trimDb of the request), dB (0.1 dB). */
  trimDb: number;
}

export interface LayoutSubOut {
  name: string;
  /** m (0.01 m). */
  distanceM: number;
  distanceSource: 'measured' | 'geometry';
  /** Distance alignment to the farthest speaker or sub plus the sub's own delay, the shared delay taken out, ms (0.01 ms). */
  delayMs: number;
  /** The sub's gain, dB (0.1 dB). */
  gainDb: number;
}

export interface LayoutAnswer {
  template: { id: string; subwooferCount: number; channels: { label: string; name: string; side: string; azimuthDeg: AngleRangeDeg; elevationDeg: AngleRangeDeg; source: string }[] };
  speakers: LayoutSpeakerOut[];
  subs: LayoutSubOut[];
  frontPair: { includedAngleDeg: number; recommended: AngleRangeDeg; status: 'pass' | 'warn' } | null;
  missingChannels: string[];
  farthest: { name: string; distanceM: number };
  nominalPositions: { channel: string; xM: number; yM: number; zM: number; distanceM: number; clamped: boolean }[] | null;
  notes: string[];
}

const p = (v: { xM: number; yM: number; zM: number }): PointM => ({ x: v.xM, y: v.yM, z: v.zM });

/**
 * Default heading before toe-in: square to the wall the channel belongs on (front channels face into the room, 0°;
 * side channels face across, ±90°; back channels face forward, 180°); channels outside the template: the nearest wall.
 */
export function channelFacingDeg(channel: LayoutChannel | undefined, speaker: { xM: number; yM: number }, room: { lengthM: number; widthM: number } | undefined): number {
  if (!channel) return wallFacingDeg(speaker, room);
  const az = channel.azimuthDeg.nominal;
  if (az <= 45) return 0;
  if (az >= 135) return 180;
  return channel.side === 'right' ? -90 : 90;
}

/** Heading of a cabinet square to its nearest wall, facing into the room (0 = from the front wall, 90 = from the left wall). */
export function wallFacingDeg(speaker: { xM: number; yM: number }, room: { lengthM: number; widthM: number } | undefined): number {
  if (!room) return 0;
  const gaps: [number, number][] = [
    [speaker.yM, 0],
    [speaker.xM, 90],
    [room.widthM - speaker.xM, -90],
    [room.lengthM - speaker.yM, 180],
  ];
  gaps.sort((a, b) => a[0] - b[0]);
  return gaps[0]![1];
}

function describe(channel: LayoutChannel | undefined, check: ReturnType<typeof checkSpeakerAngles> | null, azimuthDeg: number, elevationDeg: number): string {
  if (!channel || !check) return 'not part of this template; not checked';
  if (check.status === 'pass') return 'within the recommended range';
  const parts: string[] = [];
  if (check.wrongSide) parts.push(`on the ${channel.side === 'left' ? 'right' : 'left'} side of the listener`);
  if (check.azimuthOffDeg > 0) {
    const mag = Math.abs(azimuthDeg);
    parts.push(channel.side === 'centre' ? `${check.azimuthOffDeg.toFixed(1)}° off centre` : `azimuth ${mag.toFixed(1)}° is ${mag < channel.azimuthDeg.min ? 'below' : 'above'} ${mag < channel.azimuthDeg.min ? channel.azimuthDeg.min : channel.azimuthDeg.max}°`);
  }
  if (check.elevationOffDeg > 0) parts.push(`elevation ${elevationDeg.toFixed(1).replace('-', '−')}° is outside ${channel.elevationDeg.min}°–${channel.elevationDeg.max}°`);
  return parts.join('; ');
}

/** Angles from the MLP with pass/warn, the front pair's included angle, toe-in, and the processor's delays and trims. */
export function computeLayout(input: LayoutRequest): LayoutAnswer {
  const template = layoutTemplate(input.template);
  const listenerM = p(input.listener);
  const byLabel = new Map(template.channels.map((c) => [c.label, c]));
  const angles = input.speakers.map((s) => speakerAngles({ listenerM, speakerM: p(s) }));
  const distances = input.speakers.map((s, i) => s.distanceOverrideM ?? angles[i]!.distanceM);
  const subDistances = input.subs.map((s) => s.distanceOverrideM ?? speakerAngles({ listenerM, speakerM: p(s) }).distanceM);
  // The one channel-settings definition (the Settings sheet's too): delays aligned to the farthest of everything the
  // processor feeds plus the mains delay / each sub's own delay; trims among the speakers only, plus each offset.
  const settings = channelSettings({
    temperatureC: input.temperatureC,
    mains: input.speakers.map((s, i) => ({ distanceM: distances[i]!, extraDelayMs: input.mainsDelayMs, trimDb: s.trimDb })),
    subs: input.subs.map((s, j) => ({ distanceM: subDistances[j]!, extraDelayMs: s.delayMs, gainDb: s.gainDb })),
  });
  const seatById = new Map(input.seats.map((s) => [s.id, s]));
  const speakers: LayoutSpeakerOut[] = input.speakers.map((s, i) => {
    const a = angles[i]!;
    const channel = byLabel.get(s.channel);
    const check = channel ? checkSpeakerAngles({ channel, azimuthDeg: a.azimuthDeg, elevationDeg: a.elevationDeg }) : null;
    const aim = s.aim;
    const aimM: PointM =
      aim.kind === 'seat' ? p(seatById.get(aim.seatId)!) : aim.kind === 'point' ? { x: aim.xM, y: aim.yM, z: listenerM.z } : listenerM;
    const facingDeg = s.facingDeg ?? channelFacingDeg(channel, s, input.room);
    const sameSpot = Math.hypot(aimM.x - s.xM, aimM.y - s.yM) === 0;
    const toe = sameSpot ? { toeInDeg: 0, rotationDeg: 0, tiltDeg: 0 } : toeInDeg({ speakerM: p(s), aimM, facingDeg });
    return {
      channel: s.channel,
      name: channel?.name ?? s.channel,
      azimuthDeg: fixed(a.azimuthDeg, 2),
      elevationDeg: fixed(a.elevationDeg, 2),
      distanceM: settings.mains[i]!.distanceM,
      distanceSource: s.distanceOverrideM != null ? 'measured' : 'geometry',
      geometricDistanceM: fixed(a.distanceM, 3),
      status: check ? check.status : 'unlisted',
      recommended: channel ? { azimuthDeg: channel.azimuthDeg, elevationDeg: channel.elevationDeg, side: channel.side, source: channel.source } : null,
      azimuthOffDeg: fixed(check?.azimuthOffDeg ?? 0, 2),
      elevationOffDeg: fixed(check?.elevationOffDeg ?? 0, 2),
      wrongSide: check?.wrongSide ?? false,
      message: describe(channel, check, a.azimuthDeg, a.elevationDeg),
      facingDeg,
      toeInDeg: fixed(toe.toeInDeg, 1),
      rotationDeg: fixed(toe.rotationDeg, 1),
      tiltDeg: fixed(toe.tiltDeg, 1),
      delayMs: settings.mains[i]!.delayMs,
      trimDb: settings.mains[i]!.trimDb,
    };
  });
  const subs: LayoutSubOut[] = input.subs.map((s, j) => ({
    name: s.name,
    distanceM: settings.subs[j]!.distanceM,
    distanceSource: s.distanceOverrideM != null ? 'measured' : 'geometry',
    delayMs: settings.subs[j]!.delayMs,
    gainDb: settings.subs[j]!.gainDb,
  }));
  const left = input.speakers.find((s) => s.channel === 'L');
  const right = input.speakers.find((s) => s.channel === 'R');
  let frontPair: LayoutAnswer['frontPair'] = null;
  const lr = byLabel.get('L');
  if (left && right && lr) {
    const angle = includedAngleDeg({ listenerM, aM: p(left), bM: p(right) });
    const recommended = { nominal: 2 * lr.azimuthDeg.nominal, min: 2 * lr.azimuthDeg.min, max: 2 * lr.azimuthDeg.max };
    frontPair = { includedAngleDeg: fixed(angle, 2), recommended, status: angle >= recommended.min - 1e-9 && angle <= recommended.max + 1e-9 ? 'pass' : 'warn' };
  }
  const present = new Set(input.speakers.map((s) => s.channel));
  const names = [...input.speakers.map((s) => s.channel), ...input.subs.map((s) => s.name)];
  const nominalPositions =
    input.radiusM === undefined
      ? null
      : template.channels.map((c) => {
          const side = c.side === 'right' ? -1 : 1;
          const n = nominalSpeakerPosition({ listenerM, azimuthDeg: side * c.azimuthDeg.nominal, elevationDeg: c.elevationDeg.nominal, radiusM: input.radiusM!, room: input.room });
          return { channel: c.label, xM: fixed(n.positionM.x, 3), yM: fixed(n.positionM.y, 3), zM: fixed(n.positionM.z, 3), distanceM: fixed(n.distanceM, 3), clamped: n.clamped };
        });
  return {
    template: { id: template.id, subwooferCount: template.subwooferCount, channels: template.channels.map((c) => ({ label: c.label, name: c.name, side: c.side, azimuthDeg: c.azimuthDeg, elevationDeg: c.elevationDeg, source: c.source })) },
    speakers,
    subs,
    frontPair,
    missingChannels: template.channels.filter((c) => !present.has(c.label)).map((c) => c.label),
    farthest: { name: names[settings.farthestIndex] ?? '', distanceM: [...settings.mains, ...settings.subs][settings.farthestIndex]?.distanceM ?? 0 },
    nominalPositions,
    notes: [
      'Azimuth: 0° straight ahead, positive to the listener’s left (ITU-R BS.2051 convention).',
      'Delays: distance alignment to the farthest speaker or sub, plus the mains delay (speakers) or the sub’s own delay (subs); the delay all of them share is taken out, so the smallest is 0 ms. Rounded once to 0.01 ms.',
      'Trims: level match by distance among the speakers (inverse-square law, free field) plus each channel’s offset, rounded to 0.1 dB; a measured level match supersedes them. Sub gains are the subs’ own. Distances: 0.01 m.',
      'Toe-in: the turn from square to the channel’s wall (front channels: the front wall; side: the side wall; back: the back wall; or facingDeg when given) to point at the aim.',
    ],
  };
}
