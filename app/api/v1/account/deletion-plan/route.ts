import { requireCaller } from '@/lib/auth';
import { accountDeletionPlan } from '@/lib/data/account-deletion-plan';
import { json, route } from '@/lib/http';

/** GET /api/v1/account/deletion-plan — what deleting the caller's account would do to each workspace (a browser session only). */
export const GET = route(async () => json(await accountDeletionPlan(await requireCaller())));
