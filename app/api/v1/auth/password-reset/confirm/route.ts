import { confirmPasswordReset } from '@/lib/data/password-resets';
import { BODY_LIMIT_BYTES, json, parseJson, route } from '@/lib/http';
import { resetConfirmSchema } from '@/lib/validations/auth';

export const POST = route(async (request) => {
  const { token, password } = await parseJson(request, resetConfirmSchema, BODY_LIMIT_BYTES.form);
  await confirmPasswordReset(token, password);
  return json({ ok: true });
});
