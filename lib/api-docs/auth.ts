import type { ApiRouteDoc } from './types';

export const AUTH_DOCS: ApiRouteDoc[] = [];
