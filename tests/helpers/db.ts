import type { Sequelize } from 'sequelize';
import { requireEnv } from './env';

let instance: Sequelize | null = null;

/** The app's own Sequelize instance, on the throw-away test database. */
export async function testDb(): Promise<Sequelize> {
  requireEnv('DATABASE_URL');
  if (!instance) {
    const { getSequelize } = await import('@/lib/db');
    instance = getSequelize();
  }
  return instance;
}

export async function latestMailTo(email: string, sinceMs: number, timeoutMs = 8000): Promise<{ subject: string; text: string; links: string[] }> {
  const db = await testDb();
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const rows = (await db.query('SELECT subject, text FROM dev_messages WHERE mail_to ILIKE :to AND created_at >= :since ORDER BY created_at DESC LIMIT 1', {
      replacements: { to: `%${email}%`, since: new Date(sinceMs - 1000) },
      type: 'SELECT',
    })) as { subject: string; text: string }[];
    const row = rows[0];
    if (row) return { ...row, links: row.text.match(/https?:\/\/[^\s<>"]+/g) ?? [] };
    if (Date.now() > deadline) throw new Error(`no mail to ${email} arrived in the catcher within ${timeoutMs} ms`);
    await new Promise((r) => setTimeout(r, 200));
  }
}
