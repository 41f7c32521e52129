/**
 * Layout: the System's request (`layoutRequestFromDocument`), the compute behind POST /api/v1/layout (`computeLayout`:
 * angles, checks, toe-in and the channel settings, assembled from dsp/layout) and a layout template applied to the
 * document (`applyLayoutToDocument`).
 */
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
import { DEMO_PROFILES } from '@/lib/demo/profiles';
import type { LayoutRequest } from '@/lib/validations/compute-layout';
import type { LayoutName, Speaker, SystemDocument } from '@/lib/validations/system';
import { mlpSeat, toPointM } from './geometry';
import { roundTo } from './rounding';

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

/**
 * Body of POST /api/v1/layout for the System (null without speakers), with the mains delay, each speaker's trim offset
 * and each sub's delay and gain, so the answer's delays and trims are the System's channel settings
 * (`systemChannelSettings`, the same numbers as the Settings sheet).
 */
export function layoutRequestFromDocument(doc: SystemDocument): LayoutRequest | null {
  if (doc.speakers.length === 0) return null;
  const mlp = mlpSeat(doc);
  return {
    template: doc.layout,
    temperatureC: doc.room.temperatureC,
    mainsDelayMs: doc.bassManagement.mainsDelayMs,
    room: { lengthM: doc.room.lengthM, widthM: doc.room.widthM, heightM: doc.room.heightM },
    listener: { xM: mlp.xM, yM: mlp.yM, zM: mlp.zM },
    seats: doc.seats.map((s) => ({ id: s.id, name: s.name, xM: s.xM, yM: s.yM, zM: s.zM })),
    speakers: doc.speakers.map((s) => ({ channel: s.channel, xM: s.xM, yM: s.yM, zM: s.zM, aim: s.aim, distanceOverrideM: s.distanceOverrideM, trimDb: s.trimDb })),
    subs: doc.subs.map((s) => ({ name: s.name, xM: s.xM, yM: s.yM, zM: s.zM, distanceOverrideM: s.distanceOverrideM, delayMs: s.delayMs, gainDb: s.gainDb })),
  };
}

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
  const listenerM = toPointM(input.listener);
  const byLabel = new Map(template.channels.map((c) => [c.label, c]));
  const angles = input.speakers.map((s) => speakerAngles({ listenerM, speakerM: toPointM(s) }));
  const distances = input.speakers.map((s, i) => s.distanceOverrideM ?? angles[i]!.distanceM);
  const subDistances = input.subs.map((s) => s.distanceOverrideM ?? speakerAngles({ listenerM, speakerM: toPointM(s) }).distanceM);
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
      aim.kind === 'seat' ? toPointM(seatById.get(aim.seatId)!) : aim.kind === 'point' ? { x: aim.xM, y: aim.yM, z: listenerM.z } : listenerM;
    const facingDeg = s.facingDeg ?? channelFacingDeg(channel, s, input.room);
    const sameSpot = Math.hypot(aimM.x - s.xM, aimM.y - s.yM) === 0;
    const toe = sameSpot ? { toeInDeg: 0, rotationDeg: 0, tiltDeg: 0 } : toeInDeg({ speakerM: toPointM(s), aimM, facingDeg });
    return {
      channel: s.channel,
      name: channel?.name ?? s.channel,
      azimuthDeg: roundTo(a.azimuthDeg, 2),
      elevationDeg: roundTo(a.elevationDeg, 2),
      distanceM: settings.mains[i]!.distanceM,
      distanceSource: s.distanceOverrideM != null ? 'measured' : 'geometry',
      geometricDistanceM: roundTo(a.distanceM, 3),
      status: check ? check.status : 'unlisted',
      recommended: channel ? { azimuthDeg: channel.azimuthDeg, elevationDeg: channel.elevationDeg, side: channel.side, source: channel.source } : null,
      azimuthOffDeg: roundTo(check?.azimuthOffDeg ?? 0, 2),
      elevationOffDeg: roundTo(check?.elevationOffDeg ?? 0, 2),
      wrongSide: check?.wrongSide ?? false,
      message: describe(channel, check, a.azimuthDeg, a.elevationDeg),
      facingDeg,
      toeInDeg: roundTo(toe.toeInDeg, 1),
      rotationDeg: roundTo(toe.rotationDeg, 1),
      tiltDeg: roundTo(toe.tiltDeg, 1),
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
    const angle = includedAngleDeg({ listenerM, aM: toPointM(left), bM: toPointM(right) });
    const recommended = { nominal: 2 * lr.azimuthDeg.nominal, min: 2 * lr.azimuthDeg.min, max: 2 * lr.azimuthDeg.max };
    frontPair = { includedAngleDeg: roundTo(angle, 2), recommended, status: angle >= recommended.min - 1e-9 && angle <= recommended.max + 1e-9 ? 'pass' : 'warn' };
  }
  const present = new Set(input.speakers.map((s) => s.channel));
  const names = [...input.speakers.map((s) => s.channel), ...input.subs.map((s) => s.name)];
  const nominalPositions =
    input.radiusM === undefined
      ? null
      : template.channels.map((c) => {
          const side = c.side === 'right' ? -1 : 1;
          const n = nominalSpeakerPosition({ listenerM, azimuthDeg: side * c.azimuthDeg.nominal, elevationDeg: c.elevationDeg.nominal, radiusM: input.radiusM!, room: input.room });
          return { channel: c.label, xM: roundTo(n.positionM.x, 3), yM: roundTo(n.positionM.y, 3), zM: roundTo(n.positionM.z, 3), distanceM: roundTo(n.distanceM, 3), clamped: n.clamped };
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

export interface ApplyLayoutOptions {
  /** Distance from the MLP for speakers placed at the template's nominal angles, m. */
  radiusM: number;
  /** Keep the positions of channels already in the System (default true); otherwise move them to the nominal angles too. */
  keepExisting?: boolean;
}

/**
 * The document with `templateId` as its layout: channels the template lacks are removed, missing ones are added at the
 * template's nominal azimuth and elevation, `radiusM` from the MLP (pulled inside the walls), aimed at the MLP.
 * Subs and everything else are left as they are. Reports what changed.
 */
export function applyLayoutToDocument(doc: SystemDocument, templateId: LayoutName, { radiusM, keepExisting = true }: ApplyLayoutOptions): { doc: SystemDocument; added: string[]; removed: string[]; moved: string[] } {
  const template = layoutTemplate(templateId);
  const mlp = mlpSeat(doc);
  const labels = new Set(template.channels.map((c) => c.label));
  const removed = doc.speakers.filter((s) => !labels.has(s.channel)).map((s) => s.channel);
  const existing = new Map(doc.speakers.map((s) => [s.channel, s]));
  const model = doc.speakers[0];
  let profiles = doc.profiles;
  let profileId = model?.profileId ?? doc.profiles.find((p) => p.kind === 'main')?.id;
  if (!profileId) {
    const demo = DEMO_PROFILES.find((p) => p.kind === 'main')!;
    profiles = [...profiles, demo];
    profileId = demo.id;
  }
  const ids = new Set(doc.speakers.map((s) => s.id));
  const added: string[] = [];
  const moved: string[] = [];
  const speakers: Speaker[] = template.channels.map((c) => {
    const azimuthDeg = (c.side === 'right' ? -1 : 1) * c.azimuthDeg.nominal;
    const place = () => nominalSpeakerPosition({ listenerM: toPointM(mlp), azimuthDeg, elevationDeg: c.elevationDeg.nominal, radiusM, room: doc.room }).positionM;
    const have = existing.get(c.label as Speaker['channel']);
    if (have) {
      if (keepExisting) return have;
      const p = place();
      moved.push(c.label);
      return { ...have, xM: roundTo(p.x, 3), yM: roundTo(p.y, 3), zM: roundTo(p.z, 3), distanceOverrideM: null };
    }
    const p = place();
    let id = c.label.toLowerCase();
    while (ids.has(id)) id = `${id}-2`;
    ids.add(id);
    added.push(c.label);
    return {
      id,
      channel: c.label as Speaker['channel'],
      xM: roundTo(p.x, 3),
      yM: roundTo(p.y, 3),
      zM: roundTo(p.z, 3),
      aim: { kind: 'mlp' },
      profileId: profileId!,
      distanceOverrideM: null,
      trimDb: 0,
      amplifierPowerW: model?.amplifierPowerW ?? 100,
      voicing: {},
    };
  });
  return { doc: { ...doc, layout: templateId, speakers, profiles }, added, removed, moved };
}
