import { col, fn, Op, where, type WhereOptions } from 'sequelize';
import { callerWorkspaces, requireMembership, type Caller } from '@/lib/access';
import { db } from '@/lib/db';
import { notFound } from '@/lib/errors';
import type { ParsedMeasurement } from '@/lib/measurements/parse-measurement';
import type { MeasurementListQuery, MeasurementUploadFields } from '@/lib/validations/measurement';
import { Measurement, System, User, Workspace, type MeasurementData } from '@/models';
import type { ImpulseWindowRecord, MeasurementSourceFormat } from '@/models/measurement';
import { assertUuid } from './ids';
import { personalWorkspaceId } from './systems';

/** A measurement without its points (list rows, upload answers). */
export interface AppMeasurementSummary {
  id: string;
  workspaceId: string;
  workspaceName: string;
  systemId: string | null;
  name: string;
  seat: string | null;
  role: string | null;
  pointCount: number;
  startHz: number;
  stopHz: number;
  hasPhase: boolean;
  /** Tells runs of the same seat and source apart ("treble +2"); null when not labelled. */
  runLabel: string | null;
  /** 'text' (a delimited file or inline points) or 'wav' (an impulse response transformed through its window). */
  sourceFormat: MeasurementSourceFormat;
  /** An impulse response's sample rate, Hz; null for text. */
  sampleRateHz: number | null;
  /** An impulse response's peak, ms from the file's first sample; null for text. */
  arrivalMs: number | null;
  /** The window an impulse response was read through; null for text. */
  impulseWindow: ImpulseWindowRecord | null;
  createdByName: string | null;
  createdAt: string;
}

/** What a new measurement stores: the points (a parsed text file, or an impulse response's complex response on a log grid) and, for an impulse, where it came from. */
export interface NewMeasurementPoints extends Pick<ParsedMeasurement, 'pointCount' | 'startHz' | 'stopHz' | 'hasPhase' | 'frequencyHz' | 'magnitudeDb' | 'phaseDeg'> {
  sourceFormat?: MeasurementSourceFormat;
  sampleRateHz?: number;
  arrivalMs?: number;
  impulseWindow?: ImpulseWindowRecord;
}

/** The editable labels of a measurement (PATCH /api/v1/measurements/{id}); null clears seat, role or runLabel. */
export interface MeasurementLabels {
  name?: string;
  seat?: string | null;
  role?: string | null;
  runLabel?: string | null;
}

/**
 * POST /api/v1/measurements's answer: the stored summary and how the file was read — a text file's leading lines of
 * text skipped and first data line, or an impulse response's file and window (`impulse`, see lib/measurements/impulse-measurement).
 */
export interface AppUploadAnswer extends AppMeasurementSummary {
  skippedLines?: number;
  firstDataLine?: number;
  impulse?: Record<string, unknown>;
}

/** A measurement with every point exactly as uploaded. */
export interface AppMeasurement extends AppMeasurementSummary, MeasurementData {}

type Row = Measurement & { workspace?: Workspace; createdBy?: User | null };

const include = [
  { model: Workspace, as: 'workspace', attributes: ['id', 'name'] },
  { model: User, as: 'createdBy', attributes: ['id', 'name'] },
];

function toSummary(r: Row): AppMeasurementSummary {
  return {
    id: r.id,
    workspaceId: r.workspaceId,
    workspaceName: r.workspace?.name ?? '',
    systemId: r.systemId,
    name: r.name,
    seat: r.seat,
    role: r.role,
    pointCount: r.pointCount,
    startHz: r.startHz,
    stopHz: r.stopHz,
    hasPhase: r.hasPhase,
    runLabel: r.runLabel ?? null,
    sourceFormat: r.sourceFormat ?? 'text',
    sampleRateHz: r.sampleRateHz ?? null,
    arrivalMs: r.arrivalMs ?? null,
    impulseWindow: r.impulseWindow ?? null,
    createdByName: r.createdBy?.name ?? null,
    createdAt: r.createdAt.toISOString(),
  };
}

function toApp(r: Row): AppMeasurement {
  const d = r.data;
  return { ...toSummary(r), frequencyHz: d.frequencyHz, magnitudeDb: d.magnitudeDb, phaseDeg: d.phaseDeg ?? null };
}

async function findRow(id: string, withData: boolean): Promise<Row> {
  db();
  assertUuid(id, 'That measurement');
  const r = (await Measurement.findByPk(id, { include, ...(withData ? {} : { attributes: { exclude: ['data'] } }) })) as Row | null;
  if (!r) throw notFound('That measurement');
  return r;
}

/** Measurements of every workspace the caller belongs to (or of one, or of one System; of one seat, one role), newest first. */
export async function listMeasurements(caller: Caller, query: MeasurementListQuery): Promise<{ items: AppMeasurementSummary[] }> {
  const workspaces = await callerWorkspaces(caller);
  let ids = [...workspaces.keys()];
  if (query.workspaceId) ids = ids.filter((id) => id === query.workspaceId);
  if (!ids.length) return { items: [] };
  // seat and role: exact matches ignoring case (lower() on both sides).
  const sameText = (column: 'seat' | 'role', value: string) => where(fn('lower', col(`Measurement.${column}`)), Op.eq, fn('lower', value));
  const text = [...(query.seat ? [sameText('seat', query.seat)] : []), ...(query.role ? [sameText('role', query.role)] : [])];
  const filter: WhereOptions = {
    workspaceId: { [Op.in]: ids },
    ...(query.systemId ? { systemId: query.systemId } : {}),
    ...(text.length ? { [Op.and]: text } : {}),
  };
  const rows = (await Measurement.findAll({ where: filter, include, attributes: { exclude: ['data'] }, order: [['createdAt', 'DESC'], ['id', 'ASC']], limit: 500 })) as Row[];
  return { items: rows.map(toSummary) };
}

export async function getMeasurement(caller: Caller, id: string): Promise<AppMeasurement> {
  const r = await findRow(id, true);
  await requireMembership(caller, r.workspaceId, 'viewer', 'That measurement');
  return toApp(r);
}

/**
 * Where an upload goes: the System's workspace when a systemId is given (editor there), else the
 * named workspace, else the caller's personal one. Resolved before the file is read, so a refused
 * caller learns nothing from the file's checks.
 */
export async function uploadTarget(caller: Caller, fields: Pick<MeasurementUploadFields, 'systemId' | 'workspaceId'>): Promise<{ workspaceId: string; systemId: string | null }> {
  db();
  if (fields.systemId) {
    const system = await System.findByPk(fields.systemId, { attributes: ['id', 'workspaceId', 'deletedAt'] });
    if (!system || system.deletedAt) throw notFound('That System');
    await requireMembership(caller, system.workspaceId, 'editor', 'That System');
    return { workspaceId: system.workspaceId, systemId: system.id };
  }
  const workspaceId = fields.workspaceId ?? (await personalWorkspaceId(caller));
  await requireMembership(caller, workspaceId, 'editor', 'That workspace');
  return { workspaceId, systemId: null };
}

export async function createMeasurement(
  caller: Caller,
  target: { workspaceId: string; systemId: string | null },
  fields: { name: string; seat?: string; role?: string; runLabel?: string },
  parsed: NewMeasurementPoints,
): Promise<AppMeasurementSummary> {
  await requireMembership(caller, target.workspaceId, 'editor', 'That workspace');
  // One INSERT: a refused or failed upload leaves no row behind.
  const created = await Measurement.create({
    workspaceId: target.workspaceId,
    systemId: target.systemId,
    createdById: caller.id,
    name: fields.name,
    seat: fields.seat ?? null,
    role: fields.role ?? null,
    ...rowPoints(parsed),
    runLabel: fields.runLabel ?? null,
  });
  return toSummary(await findRow(created.id, false));
}

/** The stored columns of a measurement's points and provenance. */
function rowPoints(parsed: NewMeasurementPoints) {
  return {
    pointCount: parsed.pointCount,
    startHz: parsed.startHz,
    stopHz: parsed.stopHz,
    hasPhase: parsed.hasPhase,
    data: { frequencyHz: parsed.frequencyHz, magnitudeDb: parsed.magnitudeDb, phaseDeg: parsed.phaseDeg },
    sourceFormat: parsed.sourceFormat ?? 'text',
    sampleRateHz: parsed.sampleRateHz ?? null,
    arrivalMs: parsed.arrivalMs ?? null,
    impulseWindow: parsed.impulseWindow ?? null,
  };
}

/** Renames or relabels a measurement (editor of its workspace); its points never change. */
export async function updateMeasurementLabels(caller: Caller, id: string, labels: MeasurementLabels): Promise<AppMeasurementSummary> {
  const r = await findRow(id, false);
  await requireMembership(caller, r.workspaceId, 'editor', 'That measurement');
  const changes: Partial<Pick<Measurement, 'name' | 'seat' | 'role' | 'runLabel'>> = {};
  if (labels.name !== undefined) changes.name = labels.name;
  if (labels.seat !== undefined) changes.seat = labels.seat;
  if (labels.role !== undefined) changes.role = labels.role;
  if (labels.runLabel !== undefined) changes.runLabel = labels.runLabel;
  if (Object.keys(changes).length > 0) await Measurement.update(changes, { where: { id } });
  return toSummary(await findRow(id, false));
}

export async function deleteMeasurement(caller: Caller, id: string): Promise<void> {
  const r = await findRow(id, false);
  await requireMembership(caller, r.workspaceId, 'editor', 'That measurement');
  await Measurement.destroy({ where: { id } });
}

/** A System's measurement as its share link shows it: the points, without who uploaded it or where it is kept. */
export type SharedMeasurement = Omit<AppMeasurement, 'workspaceId' | 'workspaceName' | 'createdByName'>;

/** Most measurements a share link shows, and most points of one (more is listed without its points). */
export const SHARED_MEASUREMENT_LIMITS = { count: 12, points: 20_000 } as const;

/**
 * The measurements uploaded for one System (its own, in its own workspace: never another System's), newest first, for
 * its share link. No access check: the caller (share-links.ts) has checked the token. `omitted` counts those beyond
 * the limit; a file of more points than the limit comes without them (`frequencyHz` empty).
 */
export async function systemMeasurementsUnchecked(systemId: string, workspaceId: string): Promise<{ items: SharedMeasurement[]; omitted: number }> {
  db();
  const where = { systemId, workspaceId };
  const total = await Measurement.count({ where });
  const rows = (await Measurement.findAll({ where, order: [['createdAt', 'DESC'], ['id', 'ASC']], limit: SHARED_MEASUREMENT_LIMITS.count })) as Row[];
  const items = rows.map((r): SharedMeasurement => {
    const tooDense = r.pointCount > SHARED_MEASUREMENT_LIMITS.points;
    const d = r.data;
    return {
      id: r.id,
      systemId: r.systemId,
      name: r.name,
      seat: r.seat,
      role: r.role,
      pointCount: r.pointCount,
      startHz: r.startHz,
      stopHz: r.stopHz,
      hasPhase: r.hasPhase,
      runLabel: r.runLabel ?? null,
      sourceFormat: r.sourceFormat ?? 'text',
      sampleRateHz: r.sampleRateHz ?? null,
      arrivalMs: r.arrivalMs ?? null,
      impulseWindow: r.impulseWindow ?? null,
      createdAt: r.createdAt.toISOString(),
      frequencyHz: tooDense ? [] : d.frequencyHz,
      magnitudeDb: tooDense ? [] : d.magnitudeDb,
      phaseDeg: tooDense ? null : (d.phaseDeg ?? null),
    };
  });
  return { items, omitted: Math.max(0, total - rows.length) };
}

/** For the demo seed: adds a measurement to a workspace unless one of that name is there. */
export async function ensureMeasurement(
  workspaceId: string,
  systemId: string | null,
  createdById: string | null,
  fields: { name: string; seat: string; role: string; runLabel?: string },
  parsed: NewMeasurementPoints,
): Promise<boolean> {
  db();
  if (await Measurement.findOne({ where: { workspaceId, name: fields.name }, attributes: ['id'] })) return false;
  await Measurement.create({ workspaceId, systemId, createdById, name: fields.name, seat: fields.seat, role: fields.role, runLabel: fields.runLabel ?? null, ...rowPoints(parsed) });
  return true;
}
