import type { ApiRouteDoc } from './types';

export const ROOM_DOCS: ApiRouteDoc[] = [];
