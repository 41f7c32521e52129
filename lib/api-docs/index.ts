import { AUTH_DOCS } from './auth';
import { BLEND_DOCS } from './compute-blend';
import { ROOM_DOCS } from './compute-room';
import { SEAT_BALANCE_DOCS } from './compute-seat-balance';
import { LESSON_DOCS } from './lessons';
import { LIBRARY_DOCS } from './library';
import { MEASURED_DOCS } from './measured';
import type { ApiRouteDoc } from './types';

export type { ApiField, ApiRouteDoc } from './types';

/** Every documented route, in the order the API page shows them. */
export const API_DOCS: ApiRouteDoc[] = [...BLEND_DOCS, ...ROOM_DOCS, ...SEAT_BALANCE_DOCS, ...LIBRARY_DOCS, ...MEASURED_DOCS, ...LESSON_DOCS, ...AUTH_DOCS];
