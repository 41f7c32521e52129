import type { ApiOperation } from '../types';
import { ACCOUNT_OPERATIONS } from './account';
import { AUTH_OPERATIONS } from './auth';
import { BLEND_OPERATIONS } from './compute-blend';
import { EQ_DESIGN_OPERATIONS } from './compute-eq-design';
import { PROCESSOR_FILTERS_OPERATIONS } from './compute-processor-filters';
import { ROOM_OPERATIONS } from './compute-room';
import { SEAT_BALANCE_OPERATIONS } from './compute-seat-balance';
import { LESSONS_OPERATIONS } from './lessons';
import { LIBRARY_OPERATIONS } from './library';
import { MEASURED_OPERATIONS } from './measured';
import { MEASUREMENTS_OPERATIONS } from './measurements';
import { PROFILES_OPERATIONS } from './profiles';
import { SHARES_OPERATIONS } from './shares';
import { TOKENS_OPERATIONS } from './tokens';
import { TRANSFER_OPERATIONS } from './transfer';
import { WORKSPACES_OPERATIONS } from './workspaces';

/** Every operation of the public API, in the order the API page shows them. */
export const API_OPERATIONS: ApiOperation[] = [
  ...BLEND_OPERATIONS,
  ...ROOM_OPERATIONS,
  ...SEAT_BALANCE_OPERATIONS,
  ...PROCESSOR_FILTERS_OPERATIONS,
  ...EQ_DESIGN_OPERATIONS,
  ...MEASURED_OPERATIONS,
  ...LIBRARY_OPERATIONS,
  ...SHARES_OPERATIONS,
  ...PROFILES_OPERATIONS,
  ...MEASUREMENTS_OPERATIONS,
  ...LESSONS_OPERATIONS,
  ...WORKSPACES_OPERATIONS,
  ...TRANSFER_OPERATIONS,
  ...TOKENS_OPERATIONS,
  ...ACCOUNT_OPERATIONS,
  ...AUTH_OPERATIONS,
];
