import { createUserWithWorkspace } from '@/lib/data/users';
import { BODY_LIMIT_BYTES, json, parseJson, route } from '@/lib/http';
import { signUpSchema } from '@/lib/validations/auth';

export const POST = route(async (request) => {
  const input = await parseJson(request, signUpSchema, BODY_LIMIT_BYTES.form);
  const user = await createUserWithWorkspace(input);
  return json({ id: user.id, email: user.email, name: user.name }, 201);
});
