import { requireCaller } from '@/lib/auth';
import { deleteProfile, getProfile, updateProfile } from '@/lib/data/profiles';
import { BODY_LIMIT_BYTES, json, parseJson, route } from '@/lib/http';
import { profileUpdateSchema } from '@/lib/validations/profile';

type Ctx = { params: Promise<{ id: string }> };

export const GET = route<Ctx>(async (_request, { params }) => {
  const caller = await requireCaller();
  const { id } = await params;
  return json(await getProfile(caller, id));
});

/** Replaces the profile's fields (name, kind, roll-offs, sensitivity, power, impedance, notes). */
export const PUT = route<Ctx>(async (request, { params }) => {
  const caller = await requireCaller();
  const { id } = await params;
  const fields = await parseJson(request, profileUpdateSchema, BODY_LIMIT_BYTES.profile);
  return json(await updateProfile(caller, id, fields));
});

export const DELETE = route<Ctx>(async (_request, { params }) => {
  const caller = await requireCaller();
  const { id } = await params;
  await deleteProfile(caller, id);
  return json({ id, deleted: true });
});
