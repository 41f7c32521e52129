import type { ApiRouteDoc } from './types';

export const LIBRARY_DOCS: ApiRouteDoc[] = [];
