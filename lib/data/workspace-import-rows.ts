import { randomUUID } from 'node:crypto';
import type { CreationAttributes, Transaction } from 'sequelize';
import type { SystemDocument } from '@/lib/validations/system';
import type { LessonPart, MeasurementPart, ProfilePart, SystemPart } from '@/lib/validations/workspace-transfer';
import { Lesson, LessonStep, Measurement, SpeakerProfileRow, System, SystemRevision } from '@/models';

/**
 * Writes the validated parts of a transfer file into one workspace inside the caller's transaction: every row a fresh
 * id, keys mapped to those ids, names, revision numbers and their order, notes and the times in the file kept, people
 * credited by e-mail when they are members of the workspace (else null: "a former member").
 */

export interface ImportTarget {
  workspaceId: string;
  /** The importer: owner and last editor of a System whose authors are not members here (those columns are required). */
  callerId: string;
  /** Members of the target workspace by e-mail. */
  people: Map<string, string>;
  /** Names already in the workspace (System and Lesson names, profiles as "kind:name"); a clash gets " (imported)". */
  taken: { systems: Set<string>; profiles: Set<string>; lessons: Set<string> };
}

export interface ImportParts {
  profiles: ProfilePart[];
  systems: SystemPart[];
  measurements: MeasurementPart[];
  lessons: LessonPart[];
}

export interface ImportWritten {
  created: { profiles: number; systems: number; revisions: number; measurements: number; lessons: number; steps: number };
  systems: { id: string; name: string }[];
  lessons: { id: string; title: string }[];
  renamed: { kind: 'system' | 'profile' | 'lesson'; from: string; to: string }[];
}

const SUFFIX = ' (imported)';

/** Rows in statements of at most `maxWeight` (points or rows), so no single INSERT grows without bound. */
async function insertInChunks<R>(rows: R[], weight: (row: R) => number, maxWeight: number, insert: (chunk: R[]) => Promise<unknown>): Promise<void> {
  let chunk: R[] = [];
  let load = 0;
  for (const row of rows) {
    if (chunk.length && load + weight(row) > maxWeight) {
      await insert(chunk);
      chunk = [];
      load = 0;
    }
    chunk.push(row);
    load += weight(row);
  }
  if (chunk.length) await insert(chunk);
}

/** The name kept, or with " (imported)" (cut to fit `max`) when the workspace already has it. */
function freeName(name: string, taken: Set<string>, max: number, tag: (n: string) => string = (n) => n): string {
  if (!taken.has(tag(name))) return name;
  for (let n = 1; ; n++) {
    const suffix = n === 1 ? SUFFIX : ` (imported ${n})`;
    const candidate = `${name.slice(0, max - suffix.length).trimEnd()}${suffix}`;
    if (!taken.has(tag(candidate))) return candidate;
  }
}

/** A file document as the app stores it: each profile named in libraryKeys gets the new id of that Library profile. */
function withLibraryIds(document: SystemDocument, libraryKeys: Record<string, string>, profileIds: Map<string, string>): SystemDocument {
  if (!Object.keys(libraryKeys).length) return document;
  return { ...document, profiles: document.profiles.map((p) => (libraryKeys[p.id] ? { ...p, libraryId: profileIds.get(libraryKeys[p.id] as string) as string } : p)) };
}

export async function writeParts(t: Transaction, target: ImportTarget, parts: ImportParts): Promise<ImportWritten> {
  const { workspaceId, callerId, people, taken } = target;
  const person = (email: string | null) => (email ? (people.get(email) ?? null) : null);
  const renamed: ImportWritten['renamed'] = [];
  const rename = (kind: ImportWritten['renamed'][number]['kind'], from: string, to: string) => {
    if (from !== to) renamed.push({ kind, from, to });
    return to;
  };

  const profileIds = new Map(parts.profiles.map((p) => [p.key, randomUUID()]));
  const profileRows = parts.profiles.map(({ key, createdAt, updatedAt, createdByEmail, name, kind, ...document }) => {
    const free = rename('profile', name, freeName(name, taken.profiles, 120, (n) => `${kind}:${n}`));
    taken.profiles.add(`${kind}:${free}`);
    return { id: profileIds.get(key) as string, workspaceId, createdById: person(createdByEmail), name: free, kind, document, createdAt: new Date(createdAt), updatedAt: new Date(updatedAt) };
  });
  await insertInChunks(profileRows, () => 1, 500, (chunk) => SpeakerProfileRow.bulkCreate(chunk, { transaction: t }));

  const systemIds = new Map(parts.systems.map((s) => [s.key, randomUUID()]));
  const systems: ImportWritten['systems'] = [];
  const revisionRows: CreationAttributes<SystemRevision>[] = [];
  const systemRows = parts.systems.map((s) => {
    const id = systemIds.get(s.key) as string;
    const revisions = s.revisions.map((r) => ({ ...r, document: withLibraryIds(r.document, r.libraryKeys, profileIds) }));
    for (const r of revisions) {
      revisionRows.push({ id: randomUUID(), systemId: id, revision: r.revision, name: r.name, document: r.document, authorId: person(r.authorEmail), note: r.note, createdAt: new Date(r.createdAt) });
    }
    const first = revisions[0] as (typeof revisions)[number];
    const last = revisions[revisions.length - 1] as (typeof revisions)[number];
    const name = rename('system', s.name, freeName(s.name, taken.systems, 200));
    taken.systems.add(name);
    systems.push({ id, name });
    return {
      id,
      workspaceId,
      ownerId: person(first.authorEmail) ?? callerId,
      lastEditorId: person(last.authorEmail) ?? callerId,
      name,
      document: last.document,
      revision: last.revision,
      tags: last.document.tags,
      deletedAt: null,
      createdAt: new Date(first.createdAt),
      updatedAt: new Date(last.createdAt),
    };
  });
  await insertInChunks(systemRows, () => 1, 200, (chunk) => System.bulkCreate(chunk, { transaction: t }));
  await insertInChunks(revisionRows, () => 1, 200, (chunk) => SystemRevision.bulkCreate(chunk, { transaction: t }));

  const measurementRows = parts.measurements.map((m) => ({
    id: randomUUID(),
    workspaceId,
    systemId: m.systemKey ? (systemIds.get(m.systemKey) ?? null) : null,
    createdById: person(m.createdByEmail),
    name: m.name,
    seat: m.seat,
    role: m.role,
    pointCount: m.points.frequencyHz.length,
    startHz: m.points.frequencyHz[0] as number,
    stopHz: m.points.frequencyHz[m.points.frequencyHz.length - 1] as number,
    hasPhase: m.points.phaseDeg !== null,
    data: m.points,
    runLabel: m.runLabel,
    sourceFormat: m.sourceFormat,
    sampleRateHz: m.sampleRateHz,
    arrivalMs: m.arrivalMs,
    impulseWindow: m.impulseWindow,
    createdAt: new Date(m.createdAt),
    updatedAt: new Date(m.createdAt),
  }));
  await insertInChunks(measurementRows, (m) => m.pointCount + 100, 200_000, (chunk) => Measurement.bulkCreate(chunk, { transaction: t }));

  const lessons: ImportWritten['lessons'] = [];
  const stepRows: CreationAttributes<LessonStep>[] = [];
  const lessonRows = parts.lessons.map((l) => {
    const id = randomUUID();
    const title = rename('lesson', l.title, freeName(l.title, taken.lessons, 200));
    taken.lessons.add(title);
    lessons.push({ id, title });
    l.steps.forEach(({ libraryKeys, document, ...fields }, i) => {
      stepRows.push({ id: randomUUID(), lessonId: id, position: i + 1, ...fields, document: withLibraryIds(document, libraryKeys, profileIds) });
    });
    const owner = person(l.ownerEmail);
    return { id, workspaceId, ownerId: owner, lastEditorId: owner, title, description: l.description, revision: 1, deletedAt: null, createdAt: new Date(l.createdAt), updatedAt: new Date(l.updatedAt) };
  });
  await insertInChunks(lessonRows, () => 1, 500, (chunk) => Lesson.bulkCreate(chunk, { transaction: t }));
  await insertInChunks(stepRows, () => 1, 200, (chunk) => LessonStep.bulkCreate(chunk, { transaction: t }));

  return {
    created: { profiles: profileRows.length, systems: systemRows.length, revisions: revisionRows.length, measurements: measurementRows.length, lessons: lessonRows.length, steps: stepRows.length },
    systems,
    lessons,
    renamed,
  };
}
