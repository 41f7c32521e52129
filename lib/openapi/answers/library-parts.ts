import { z } from 'zod';

/**
 * Pieces shared by the answer schemas of the Library side (Systems, shares, profiles, measurements, Lessons,
 * workspaces, accounts), and the compile-time check that ties each answer schema to the type its handler returns.
 */

/** True when A and B are the same type (each assignable to the other); `const _x: Same<…> = true` fails to compile otherwise. */
export type Same<A, B> = [A] extends [B] ? ([B] extends [A] ? true : false) : false;

/** A moment as the API writes it: ISO 8601 in UTC with milliseconds ("2026-12-01T12:00:00.000Z"). */
export const isoTime = (description: string) => z.iso.datetime().meta({ description });

/** A row id (a UUID the database made). */
export const rowId = (description: string) => z.uuid().meta({ description });

/** The caller's role in a workspace. */
export const callerRole = (description = 'The caller’s role in its workspace: owner, editor or viewer.') => z.enum(['owner', 'editor', 'viewer']).meta({ description });

/** `{ items }`: a list answer. */
export const itemsOf = <S extends z.ZodType>(item: S, description: string) => z.strictObject({ items: z.array(item).meta({ description }) });

/** `{ id, deleted: true }`: what a DELETE of a stored row answers. */
export const deletedAnswerSchema = z
  .strictObject({
    id: z.uuid().meta({ description: 'What was deleted (the id from the path).' }),
    deleted: z.literal(true).meta({ description: 'Always true.' }),
  })
  .meta({ description: 'Deleted.' });

/** `{ ok: true }`: done, nothing more to say. */
export const okAnswerSchema = z.strictObject({ ok: z.literal(true).meta({ description: 'Always true.' }) }).meta({ description: 'Done.' });
