import { db } from '@/lib/db';
import { errorResponse, json } from '@/lib/http';
import { unavailable } from '@/lib/errors';

export const dynamic = 'force-dynamic';

export async function GET() {
  try {
    await db().query('SELECT 1');
    return json({ ok: true, database: 'up' });
  } catch {
    return errorResponse(unavailable());
  }
}
