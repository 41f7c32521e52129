import { z } from 'zod';
import type { AppError, errorBody } from '@/lib/errors';

/**
 * The API's one error answer (`lib/errors.ts` `errorBody`), shared by every error status of every operation. The fields
 * after `issues` are the extras some errors carry (`AppError.extra`).
 */
export const errorBodySchema = z
  .strictObject({
    error: z.strictObject({
      code: z.string().meta({
        description:
          "What went wrong, for programs: 'invalid' (400), 'unauthorized' (401), 'forbidden' (403), 'not_found' (404), 'conflict' (409), 'too_large' (413), 'unsupported_media_type' (415), 'rate_limited' (429), 'unavailable' (503), 'internal' (500, a bug).",
      }),
      message: z.string().meta({ description: 'One sentence for people; for a 400 it starts with the first field path.' }),
      issues: z
        .array(
          z.strictObject({
            path: z.string().meta({ description: "The field, dotted with array indices (e.g. 'paths.1.filter.order'); '(body)' for the body as a whole, '(query)' for the query string as a whole; a query parameter by its name (e.g. 'fields')." }),
            message: z.string().meta({ description: 'What is wrong with it and what it must be.' }),
          }),
        )
        .optional()
        .meta({ description: 'Every problem found (400 only), in the order found.' }),
      retryAfterS: z.number().optional().meta({ description: 'Seconds to wait before trying again (429; also sent as the Retry-After header).', 'x-unit': 's' }),
      currentRevision: z.number().int().nullable().optional().meta({ description: 'The revision stored now (409 on a stale save): reload it, or save your edits as a copy.' }),
      totalIssues: z.number().int().optional().meta({ description: 'How many problems a refused upload had in all (issues lists the first ones).' }),
    }),
  })
  .meta({ id: 'ErrorBody', description: 'The one error shape of every route.' });

type Same<A, B> = [A] extends [B] ? ([B] extends [A] ? true : false) : false;
/** errorBody spreads AppError.extra (any keys); the schema names the extras the app sends, so it is one way round only. */
type Documented = z.output<typeof errorBodySchema>;
const _errorBodyFits: Same<Documented['error'] extends ReturnType<typeof errorBody>['error'] ? true : false, true> = true;
const _errorCodeIsText: Same<Documented['error']['code'], AppError['code']> = true;
void _errorBodyFits;
void _errorCodeIsText;
