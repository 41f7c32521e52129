import { Op } from 'sequelize';
import type { z } from 'zod';
import { stepFieldsSchema } from '@/lib/validations/lesson';
import { profileFieldsSchema } from '@/lib/validations/profile';
import { systemDocumentSchema, type SystemDocument } from '@/lib/validations/system';
import type { LessonPart, MeasurementPart, ProfilePart, SystemPart } from '@/lib/validations/workspace-transfer';
import { Lesson, LessonStep, Measurement, SpeakerProfileRow, System, SystemRevision, User } from '@/models';

/**
 * Stored rows → the parts of a transfer file (lib/validations/workspace-transfer.ts). Rows get file-local keys in a
 * stable order (oldest first, then by name), people are written by e-mail, and every cross-reference (a measurement's
 * System, a document's Library profile) by key. No access check here: the callers in workspace-export.ts check first.
 */

type Emails = Map<string, string>;

/** The e-mail of each account id given (ids of deleted accounts are simply absent). */
export async function emailsOf(ids: (string | null | undefined)[]): Promise<Emails> {
  const wanted = [...new Set(ids.filter((id): id is string => typeof id === 'string'))];
  if (!wanted.length) return new Map();
  const users = await User.findAll({ where: { id: { [Op.in]: wanted } }, attributes: ['id', 'email'] });
  return new Map(users.map((u) => [u.id, u.email]));
}

const iso = (d: Date) => d.toISOString();
const emailOf = (emails: Emails, id: string | null) => (id ? (emails.get(id) ?? null) : null);

/** Oldest first, then by name, then by id: the order keys are given in. */
export function byAge<T extends { createdAt: Date; id: string }>(rows: T[], name: (row: T) => string): T[] {
  return [...rows].sort((a, b) => a.createdAt.getTime() - b.createdAt.getTime() || name(a).localeCompare(name(b)) || (a.id < b.id ? -1 : a.id > b.id ? 1 : 0));
}

/** Keys `<prefix>-1`, `<prefix>-2`… by the rows' order. */
export function keysFor(rows: { id: string }[], prefix: string): Map<string, string> {
  return new Map(rows.map((r, i) => [r.id, `${prefix}-${i + 1}`]));
}

/**
 * A stored document as a file writes it: read as the app reads it (defaults filled), its profiles' `libraryId` moved
 * into `libraryKeys` as the key of that Library profile when the file holds it (dropped otherwise: it names nothing the
 * file carries). A document the app can no longer read is written as stored, so an import refuses it by its path.
 */
export function fileDocument(raw: unknown, profileKeys: Map<string, string>): { document: SystemDocument; libraryKeys: Record<string, string> } {
  const parsed = systemDocumentSchema.safeParse(raw);
  const document = (parsed.success ? parsed.data : raw) as SystemDocument;
  const libraryKeys: Record<string, string> = {};
  if (!document || !Array.isArray(document.profiles)) return { document, libraryKeys };
  const profiles = document.profiles.map((p) => {
    if (!p || typeof p !== 'object' || p.libraryId === undefined) return p;
    const { libraryId, ...rest } = p;
    const profileKey = profileKeys.get(libraryId);
    if (profileKey) libraryKeys[rest.id] = profileKey;
    return rest;
  });
  return { document: { ...document, profiles }, libraryKeys };
}

/** The Library profile ids the documents were copied from (to carry those profiles with one System). */
export function libraryIdsIn(documents: unknown[]): Set<string> {
  const ids = new Set<string>();
  for (const d of documents) {
    const profiles = (d as { profiles?: unknown } | null)?.profiles;
    if (!Array.isArray(profiles)) continue;
    for (const p of profiles) if (p && typeof (p as { libraryId?: unknown }).libraryId === 'string') ids.add((p as { libraryId: string }).libraryId);
  }
  return ids;
}

export function profileParts(rows: SpeakerProfileRow[], keys: Map<string, string>, emails: Emails): ProfilePart[] {
  return rows.map((r) => {
    const raw = { ...(r.document as object), name: r.name, kind: r.kind };
    const parsed = profileFieldsSchema.safeParse(raw);
    return {
      ...((parsed.success ? parsed.data : raw) as ProfilePart),
      key: keys.get(r.id) as string,
      createdAt: iso(r.createdAt),
      updatedAt: iso(r.updatedAt),
      createdByEmail: emailOf(emails, r.createdById),
    };
  });
}

export function systemParts(systems: System[], revisions: SystemRevision[], keys: Map<string, string>, profileKeys: Map<string, string>, emails: Emails): SystemPart[] {
  const bySystem = new Map<string, SystemRevision[]>();
  for (const r of revisions) bySystem.set(r.systemId, [...(bySystem.get(r.systemId) ?? []), r]);
  return systems.map((s) => ({
    key: keys.get(s.id) as string,
    name: s.name,
    revisions: (bySystem.get(s.id) ?? [])
      .sort((a, b) => a.revision - b.revision)
      .map((r) => ({ revision: r.revision, name: r.name, note: r.note ?? null, createdAt: iso(r.createdAt), authorEmail: emailOf(emails, r.authorId), ...fileDocument(r.document, profileKeys) })),
  }));
}

export function measurementParts(rows: Measurement[], keys: Map<string, string>, systemKeys: Map<string, string>, emails: Emails): MeasurementPart[] {
  return rows.map((m) => ({
    key: keys.get(m.id) as string,
    systemKey: m.systemId ? (systemKeys.get(m.systemId) ?? null) : null,
    name: m.name,
    seat: m.seat,
    role: m.role,
    runLabel: m.runLabel ?? null,
    sourceFormat: m.sourceFormat ?? 'text',
    sampleRateHz: m.sampleRateHz ?? null,
    arrivalMs: m.arrivalMs ?? null,
    impulseWindow: m.impulseWindow ?? null,
    createdAt: iso(m.createdAt),
    createdByEmail: emailOf(emails, m.createdById),
    points: { frequencyHz: m.data.frequencyHz, magnitudeDb: m.data.magnitudeDb, phaseDeg: m.data.phaseDeg ?? null },
  }));
}

/** A stored Step as a file writes it: its fields read as the app reads them (lessons.ts `toStep`), its document as above. */
function stepPart(s: LessonStep, profileKeys: Map<string, string>): LessonPart['steps'][number] {
  const raw = { title: s.title, points: s.points, panel: s.panel, traces: s.traces, sweep: s.sweep };
  const parsed = stepFieldsSchema.safeParse(raw);
  return { ...((parsed.success ? parsed.data : raw) as z.output<typeof stepFieldsSchema>), ...fileDocument(s.document, profileKeys) };
}

export function lessonParts(lessons: Lesson[], steps: LessonStep[], keys: Map<string, string>, profileKeys: Map<string, string>, emails: Emails): LessonPart[] {
  const byLesson = new Map<string, LessonStep[]>();
  for (const s of steps) byLesson.set(s.lessonId, [...(byLesson.get(s.lessonId) ?? []), s]);
  return lessons.map((l) => ({
    key: keys.get(l.id) as string,
    title: l.title,
    description: l.description,
    createdAt: iso(l.createdAt),
    updatedAt: iso(l.updatedAt),
    ownerEmail: emailOf(emails, l.ownerId),
    steps: (byLesson.get(l.id) ?? []).sort((a, b) => a.position - b.position).map((s) => stepPart(s, profileKeys)),
  }));
}
