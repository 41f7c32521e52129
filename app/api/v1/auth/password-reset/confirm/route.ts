import { confirmPasswordReset } from '@/lib/data/password-resets';
import { json, parseJson, route } from '@/lib/http';
import { resetConfirmSchema } from '@/lib/validations/auth';

export const POST = route(async (request) => {
  const { token, password } = await parseJson(request, resetConfirmSchema, 16 * 1024);
  await confirmPasswordReset(token, password);
  return json({ ok: true });
});
