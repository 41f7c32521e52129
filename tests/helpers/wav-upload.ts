// Shared by the WAV upload tests (tests/api/measurements-wav.test.ts, tests/api/hostile-wav.test.ts): a fresh caller
// whose measurements can be counted apart from everyone else's on a shared database, and the multipart form.
import { createUserWithWorkspace } from '@/lib/data/users';
import { testDb } from './db';
import { signedInClient, uniqueEmail, type Client } from './http';

const PASSWORD = 'wav-upload-test-password';

/** A new user with a personal workspace, signed in. */
export async function freshCaller(label: string): Promise<{ client: Client; userId: string }> {
  await testDb();
  const email = uniqueEmail(label);
  const user = await createUserWithWorkspace({ email, name: `${label} (invented)`, password: PASSWORD });
  return { client: await signedInClient(email, PASSWORD), userId: user.id };
}

/** How many measurements this user has uploaded (only theirs, so others' tests on the same database do not count). */
export async function measurementCount(userId: string): Promise<number> {
  const db = await testDb();
  const rows = (await db.query('SELECT count(*)::int AS n FROM measurements WHERE created_by_id = :userId', { replacements: { userId }, type: 'SELECT' })) as { n: number }[];
  return rows[0]!.n;
}

/** multipart/form-data with the bytes in `file` (declared as `type`) and the text fields. */
export function uploadForm(bytes: Uint8Array, fields: Record<string, string> = {}, fileName = 'impulse.wav', type = 'audio/wav'): FormData {
  const form = new FormData();
  form.set('file', new Blob([bytes as BlobPart], { type }), fileName);
  for (const [k, v] of Object.entries(fields)) form.set(k, v);
  return form;
}
