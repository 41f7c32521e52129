import { requestPasswordReset } from '@/lib/data/password-resets';
import { BODY_LIMIT_BYTES, json, parseJson, route } from '@/lib/http';
import { resetRequestSchema } from '@/lib/validations/auth';

/** Always 202: whether an account exists is not revealed. */
export const POST = route(async (request) => {
  const { email } = await parseJson(request, resetRequestSchema, BODY_LIMIT_BYTES.form);
  await requestPasswordReset(email);
  return json({ ok: true, message: 'If an account uses that address, a reset link is on its way.' }, 202);
});
