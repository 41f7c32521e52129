import { AUTH_DOCS } from './auth';
import { BLEND_DOCS } from './compute-blend';
import { EQ_DESIGN_DOCS } from './compute-eq-design';
import { PROCESSOR_FILTERS_DOCS } from './compute-processor-filters';
import { ROOM_DOCS } from './compute-room';
import { SEAT_BALANCE_DOCS } from './compute-seat-balance';
import { LESSON_DOCS } from './lessons';
import { LIBRARY_DOCS } from './library';
import { MEASURED_DOCS } from './measured';
import type { ApiRouteDoc } from './types';

export type { ApiField, ApiRouteDoc } from './types';

/** Every documented route, in the order the API page shows them. */
export const API_DOCS: ApiRouteDoc[] = [...BLEND_DOCS, ...ROOM_DOCS, ...SEAT_BALANCE_DOCS, ...PROCESSOR_FILTERS_DOCS, ...EQ_DESIGN_DOCS, ...LIBRARY_DOCS, ...MEASURED_DOCS, ...LESSON_DOCS, ...AUTH_DOCS];
