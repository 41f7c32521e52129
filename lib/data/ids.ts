import { notFound } from '@/lib/errors';
import { isUuid } from '@/lib/validations/common';

/**
 * Every stored row's id is a UUID, so a path parameter of any other shape cannot name one: it is not found (404,
 * `what` names it) before any query. The one id check of the data layer and the handlers.
 */
export function assertUuid(id: string, what = 'That'): void {
  if (!isUuid(id)) throw notFound(what);
}
