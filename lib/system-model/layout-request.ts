/** From the System document to the body of POST /api/v1/layout, and the layout template applied to the document. */
import { layoutTemplate, nominalSpeakerPosition } from '@/dsp';
import { DEMO_PROFILES } from '@/lib/demo/profiles';
import type { LayoutRequest } from '@/lib/validations/compute-room';
import type { LayoutName, Speaker, SystemDocument } from '@/lib/validations/system';
import { mlpSeat, toPointM } from './index';

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

export interface ApplyTemplateOptions {
  /** Distance from the MLP for speakers placed at the template's nominal angles, m. */
  radiusM: number;
  /** Keep the positions of channels already in the System (default true); otherwise move them to the nominal angles too. */
  keepExisting?: boolean;
}

const round = (v: number) => Math.round(v * 1000) / 1000;

/**
 * The document with `templateId` as its layout: channels the template lacks are removed, missing ones are added at the
 * template's nominal azimuth and elevation, `radiusM` from the MLP (pulled inside the walls), aimed at the MLP.
 * Subs are left as they are. Reports what changed.
 */
export function applyLayoutTemplate(doc: SystemDocument, templateId: LayoutName, { radiusM, keepExisting = true }: ApplyTemplateOptions): { doc: SystemDocument; added: string[]; removed: string[]; moved: string[] } {
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
      return { ...have, xM: round(p.x), yM: round(p.y), zM: round(p.z), distanceOverrideM: null };
    }
    const p = place();
    let id = c.label.toLowerCase();
    while (ids.has(id)) id = `${id}-2`;
    ids.add(id);
    added.push(c.label);
    return {
      id,
      channel: c.label as Speaker['channel'],
      xM: round(p.x),
      yM: round(p.y),
      zM: round(p.z),
      aim: { kind: 'mlp' },
      profileId: profileId!,
      distanceOverrideM: null,
      trimDb: 0,
      amplifierPowerW: model?.amplifierPowerW ?? 100,
    };
  });
  return { doc: { ...doc, layout: templateId, speakers, profiles }, added, removed, moved };
}
