import type { ApiRouteDoc } from './types';

export const BLEND_DOCS: ApiRouteDoc[] = [];
