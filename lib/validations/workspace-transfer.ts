import { z } from 'zod';
import { MAX_ABS_MAGNITUDE_DB, MAX_ABS_PHASE_DEG, MIN_MEASUREMENT_POINTS } from '@/lib/measurements/parse-measurement';
import { emailSchema } from './auth';
import { num, uuidField } from './common';
import { lessonCreateSchema, lessonTitleSchema, stepFieldsSchema } from './lesson';
import { REVISION_NOTE_MAX } from './library';
import { measurementRoleSchema, measurementUploadFieldsSchema, runLabelSchema } from './measurement';
import { profileFieldsSchema } from './profile';
import { idSchema, systemDocumentSchema, systemNameSchema } from './system';
import { workspaceNameSchema, workspaceRoleSchema } from './workspace';

/**
 * Seamline's own transfer files: a whole workspace (`seamline-workspace`) or one System with its history
 * (`seamline-system`), version 1. Every part is checked with the schema the app uses for that entity (the System
 * document, a Speaker profile, a Lesson and its Steps, a measurement's labels); rows point at each other through
 * file-local keys (`system-1`, `profile-2`), never through database ids, so an import can give everything fresh ids.
 * A refusal names the part and the field, e.g. `systems.899.revisions.0.document.room.lengthM`.
 */
export const TRANSFER_VERSION = 1;
export const WORKSPACE_FILE_FORMAT = 'seamline-workspace';
export const SYSTEM_FILE_FORMAT = 'seamline-system';
/** Largest import file, bytes: a larger body is refused (413) before anything of it is parsed. */
export const IMPORT_LIMIT_BYTES = 50 * 1024 * 1024;

/** Most points of one stored measurement: more than any file the upload's 2 MB limit lets through. */
const MAX_STORED_POINTS = 500_000;

const key = (what: string) => idSchema.meta({ description: `The ${what}’s key within this file (1–40 letters, digits, - or _), unique among the file’s ${what}s; other parts name it.` });
const when = (description: string) => z.iso.datetime({ error: 'must be a time in ISO 8601, UTC (2026-12-01T12:00:00.000Z)' }).meta({ description });
const personEmail = (description: string) => emailSchema.nullable().meta({ description });

/**
 * Which Library Speaker profile each profile of a document was copied from: { in-document profile id: file profile
 * key }. In the app that is the profile's `libraryId`; a file names the profile by its key instead.
 */
const libraryKeysSchema = z
  .record(idSchema, idSchema)
  .default({})
  .meta({ description: 'Which of the file’s Speaker profiles each profile of the document was copied from: { "<profile id in the document>": "<profile key in this file>" }. Default {}.' });

/** A document of the file: a System document (without libraryId, which a file writes as libraryKeys beside it). */
function refineLibraryKeys(part: { document: { profiles: { id: string; libraryId?: string | undefined }[] }; libraryKeys: Record<string, string> }, ctx: z.RefinementCtx) {
  const ids = new Set(part.document.profiles.map((p) => p.id));
  part.document.profiles.forEach((p, i) => {
    if (p.libraryId !== undefined) ctx.addIssue({ code: 'custom', path: ['document', 'profiles', i, 'libraryId'], message: 'a file names Library profiles in libraryKeys, not by libraryId' });
  });
  for (const id of Object.keys(part.libraryKeys)) {
    if (!ids.has(id)) ctx.addIssue({ code: 'custom', path: ['libraryKeys', id], message: `the document has no profile "${id}"` });
  }
}

const profilePartSchema = profileFieldsSchema
  .extend({
    key: key('profile'),
    createdAt: when('When it was made (kept by an import).'),
    updatedAt: when('When it last changed (kept by an import).'),
    createdByEmail: personEmail('Who made it, by e-mail (null: not known). An import credits them when they are a member of the workspace it goes to.'),
  })
  .meta({ description: 'A Library Speaker profile with its key.' });

const revisionPartSchema = z
  .strictObject({
    revision: z.number().int().min(1).max(1_000_000).meta({ description: 'The revision number (1 is the first save); kept by an import. Revisions are listed oldest first, numbers increasing.' }),
    name: systemNameSchema,
    note: z.string().trim().max(REVISION_NOTE_MAX).nullable().meta({ description: `The revision’s note, at most ${REVISION_NOTE_MAX} characters; null: none.` }),
    createdAt: when('When it was saved (kept by an import).'),
    authorEmail: personEmail('Who saved it, by e-mail (null: not known). An import credits them when they are a member of the workspace it goes to; otherwise the revision shows "a former member".'),
    document: systemDocumentSchema,
    libraryKeys: libraryKeysSchema,
  })
  .superRefine(refineLibraryKeys)
  .meta({ description: 'One saved revision of a System: its document, name, note, time and author.' });

const systemPartSchema = z
  .strictObject({
    key: key('System'),
    name: systemNameSchema.meta({ description: 'The System’s name, 1–200 characters. An import keeps it (adding " (imported)" when the workspace already has a System of that name).' }),
    revisions: z.array(revisionPartSchema).min(1, 'a System has at least one revision').max(20_000).meta({ description: 'Every revision, oldest first; the last is the current one.' }),
  })
  .superRefine((s, ctx) => {
    for (let i = 1; i < s.revisions.length; i++) {
      if ((s.revisions[i]?.revision ?? 0) <= (s.revisions[i - 1]?.revision ?? 0)) ctx.addIssue({ code: 'custom', path: ['revisions', i, 'revision'], message: 'revision numbers must increase, oldest first' });
    }
  })
  .meta({ description: 'A System with its whole history.' });

const pointsMeta = (description: string, unit: string) => ({ description, 'x-unit': unit });

/** A stored measurement's points, with the limits of an uploaded file (lib/measurements/parse-measurement). */
const measurementPointsSchema = z
  .strictObject({
    frequencyHz: z
      .array(z.number().positive('must be above 0 Hz'))
      .min(MIN_MEASUREMENT_POINTS, `must hold at least ${MIN_MEASUREMENT_POINTS} points`)
      .max(MAX_STORED_POINTS)
      .meta(pointsMeta(`The frequencies, strictly increasing, ${MIN_MEASUREMENT_POINTS}–${MAX_STORED_POINTS} points.`, 'Hz')),
    magnitudeDb: z.array(num(-MAX_ABS_MAGNITUDE_DB, MAX_ABS_MAGNITUDE_DB, 'dB')).meta(pointsMeta(`The level at each frequency, |magnitude| ≤ ${MAX_ABS_MAGNITUDE_DB} dB.`, 'dB')),
    phaseDeg: z.array(num(-MAX_ABS_PHASE_DEG, MAX_ABS_PHASE_DEG, '°')).nullable().meta(pointsMeta(`The phase at each frequency, |phase| ≤ ${MAX_ABS_PHASE_DEG}°; null when not measured.`, '°')),
  })
  .superRefine((p, ctx) => {
    if (p.magnitudeDb.length !== p.frequencyHz.length) ctx.addIssue({ code: 'custom', path: ['magnitudeDb'], message: `must hold as many values as frequencyHz (${p.frequencyHz.length})` });
    if (p.phaseDeg && p.phaseDeg.length !== p.frequencyHz.length) ctx.addIssue({ code: 'custom', path: ['phaseDeg'], message: `must hold as many values as frequencyHz (${p.frequencyHz.length})` });
    const i = p.frequencyHz.findIndex((hz, k) => k > 0 && hz <= (p.frequencyHz[k - 1] as number));
    if (i > 0) ctx.addIssue({ code: 'custom', path: ['frequencyHz', i], message: 'frequencies must strictly increase' });
  })
  .meta({ description: 'The measured points exactly as stored.' });

const ms = (min: number, max: number, description: string) => num(min, max, 'ms').meta({ description, 'x-unit': 'ms' });
const impulseWindowSchema = z
  .strictObject({
    startMs: ms(0, 10_000, 'Where the window starts, ms from the file’s first sample.'),
    lengthMs: ms(0, 10_000, 'The window’s length, ms.'),
    fadeInMs: ms(0, 10_000, 'Its half-Hann fade-in, ms.'),
    fadeOutMs: ms(0, 10_000, 'Its half-Hann fade-out, ms.'),
  })
  .meta({ description: 'The window an impulse response was read through.' });

const uploadFields = measurementUploadFieldsSchema.shape;

const measurementPartSchema = z
  .strictObject({
    key: key('measurement'),
    systemKey: idSchema.nullable().meta({ description: 'The key of the System it was measured for, in this file; null: none.' }),
    name: uploadFields.name.unwrap().meta({ description: 'Its name, 1–120 characters.' }),
    seat: uploadFields.seat.unwrap().nullable().meta({ description: 'Where it was measured, 1–60 characters; null: not said.' }),
    role: measurementRoleSchema.nullable().meta({ description: 'Which source it is ("mains", "sub", "L"…); null: not said.' }),
    runLabel: runLabelSchema.nullable().meta({ description: 'Its run’s label, 1–80 characters; null: none.' }),
    sourceFormat: z.enum(['text', 'wav']).meta({ description: 'text (a delimited file or points) or wav (an impulse response read through its window).' }),
    sampleRateHz: z.number().int().min(8000).max(192_000).nullable().meta({ description: 'An impulse response’s sample rate, 8000–192000 Hz; null for text.', 'x-unit': 'Hz' }),
    arrivalMs: num(0, 10_000, 'ms').nullable().meta({ description: 'An impulse response’s peak, ms from its first sample; null for text.', 'x-unit': 'ms' }),
    impulseWindow: impulseWindowSchema.nullable().meta({ description: 'The window an impulse response was read through; null for text.' }),
    createdAt: when('When it was uploaded (kept by an import).'),
    createdByEmail: personEmail('Who uploaded it, by e-mail (null: not known); credited when a member of the workspace it goes to.'),
    points: measurementPointsSchema,
  })
  .meta({ description: 'A stored measurement with its points. In a zip file the points may be an entry of their own, named by pointsFile instead.' });

const stepPartSchema = stepFieldsSchema
  .extend({ document: systemDocumentSchema, libraryKeys: libraryKeysSchema })
  .superRefine(refineLibraryKeys)
  .meta({ description: 'One Step of a Lesson: its fields and its System snapshot.' });

const lessonPartSchema = z
  .strictObject({
    key: key('Lesson'),
    title: lessonTitleSchema,
    description: lessonCreateSchema.shape.description,
    createdAt: when('When it was made (kept by an import).'),
    updatedAt: when('When it last changed (kept by an import).'),
    ownerEmail: personEmail('Who owns it, by e-mail (null: not known); kept when a member of the workspace it goes to.'),
    steps: z.array(stepPartSchema).max(200).meta({ description: 'Its Steps in order, at most 200.' }),
  })
  .meta({ description: 'A Lesson with its Steps.' });

const memberPartSchema = z
  .strictObject({ email: emailSchema.meta({ description: 'The member’s e-mail address.' }), role: workspaceRoleSchema.meta({ description: 'Their role: owner, editor or viewer.' }) })
  .meta({ description: 'A member of the exported workspace. An import never adds members: it lists them so an owner can invite them.' });

const head = <F extends string>(format: F, what: string) => ({
  format: z.literal(format, { error: `format must be "${format}"` }).meta({ description: `"${format}": ${what}.` }),
  version: z.literal(TRANSFER_VERSION, { error: `version must be ${TRANSFER_VERSION}: this Seamline reads version ${TRANSFER_VERSION} files` }).meta({ description: `The file format’s version: ${TRANSFER_VERSION}.` }),
  exportedAt: when('When the file was written.'),
});

/** Keys unique within each list, and every key a part names present in the file. */
function refineKeys(file: { profiles: { key: string }[]; systems: z.infer<typeof systemPartSchema>[]; measurements: { key: string; systemKey: string | null }[]; lessons?: z.infer<typeof lessonPartSchema>[] }, ctx: z.RefinementCtx, systemsPath: (i: number) => (string | number)[]) {
  const unique = (items: { key: string }[], at: (i: number) => (string | number)[]) => {
    const seen = new Set<string>();
    items.forEach((item, i) => {
      if (seen.has(item.key)) ctx.addIssue({ code: 'custom', path: [...at(i), 'key'], message: `duplicate key "${item.key}"` });
      seen.add(item.key);
    });
    return seen;
  };
  const profiles = unique(file.profiles, (i) => ['profiles', i]);
  const systems = unique(file.systems, systemsPath);
  unique(file.measurements, (i) => ['measurements', i]);
  if (file.lessons) unique(file.lessons, (i) => ['lessons', i]);
  file.measurements.forEach((m, i) => {
    if (m.systemKey !== null && !systems.has(m.systemKey)) ctx.addIssue({ code: 'custom', path: ['measurements', i, 'systemKey'], message: `no System in this file has the key "${m.systemKey}"` });
  });
  const checkLinks = (links: Record<string, string>, at: (string | number)[]) => {
    for (const [id, profileKey] of Object.entries(links)) {
      if (!profiles.has(profileKey)) ctx.addIssue({ code: 'custom', path: [...at, 'libraryKeys', id], message: `no Speaker profile in this file has the key "${profileKey}"` });
    }
  };
  file.systems.forEach((s, i) => s.revisions.forEach((r, j) => checkLinks(r.libraryKeys, [...systemsPath(i), 'revisions', j])));
  file.lessons?.forEach((l, i) => l.steps.forEach((s, j) => checkLinks(s.libraryKeys, ['lessons', i, 'steps', j])));
}

const lists = {
  profiles: z.array(profilePartSchema).max(5000).meta({ description: 'The Library’s Speaker profiles.' }),
  measurements: z.array(measurementPartSchema).max(20_000).meta({ description: 'The measurements, each with its points.' }),
};

export const workspaceFileSchema = z
  .strictObject({
    ...head(WORKSPACE_FILE_FORMAT, 'a whole workspace'),
    workspace: z.strictObject({ name: workspaceNameSchema.meta({ description: 'The workspace’s name; a new workspace made by an import takes it.' }) }).meta({ description: 'The exported workspace.' }),
    members: z.array(memberPartSchema).max(10_000).meta({ description: 'Its members with their roles (never passwords or tokens). Not imported: listed so the owner can invite them.' }),
    ...lists,
    systems: z.array(systemPartSchema).max(5000).meta({ description: 'Its Systems, each with every revision (Recently deleted ones are not exported).' }),
    lessons: z.array(lessonPartSchema).max(2000).meta({ description: 'Its Lessons with their Steps.' }),
  })
  .superRefine((f, ctx) => refineKeys(f, ctx, (i) => ['systems', i]))
  .meta({ id: 'WorkspaceFile', description: 'A whole workspace as Seamline writes it (format seamline-workspace, version 1).' });

export const systemFileSchema = z
  .strictObject({
    ...head(SYSTEM_FILE_FORMAT, 'one System with its history'),
    system: systemPartSchema,
    ...lists,
  })
  .superRefine((f, ctx) => refineKeys({ ...f, systems: [f.system] }, ctx, () => ['system']))
  .meta({ id: 'SystemFile', description: 'One System with every revision, the Speaker profiles its documents were copied from and the measurements taken for it (format seamline-system, version 1).' });

export type WorkspaceFile = z.output<typeof workspaceFileSchema>;
export type SystemFile = z.output<typeof systemFileSchema>;
export type ProfilePart = z.output<typeof profilePartSchema>;
export type SystemPart = z.output<typeof systemPartSchema>;
export type MeasurementPart = z.output<typeof measurementPartSchema>;
export type LessonPart = z.output<typeof lessonPartSchema>;

/** `?workspaceId=` of POST /api/v1/workspaces/import: an existing empty workspace the caller owns, instead of a new one. */
export const workspaceImportQuerySchema = z.object({
  workspaceId: uuidField('workspaceId must be a workspace id')
    .optional()
    .meta({ description: 'Import into this existing workspace instead of a new one: the caller must own it and it must hold nothing yet (no Systems, Lessons, Speaker profiles or measurements, deleted ones included).' }),
});

/** A zip holds the file as one JSON entry and each measurement's points as an entry of their own (`pointsFile`). */
export const ZIP_MAIN_ENTRY = { [WORKSPACE_FILE_FORMAT]: 'workspace.json', [SYSTEM_FILE_FORMAT]: 'system.json' } as const;
export const pointsEntryName = (measurementKey: string) => `measurements/${measurementKey}.json`;
