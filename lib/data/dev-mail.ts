import { db } from '@/lib/db';
import { DevMessage } from '@/models';

export interface AppDevMessage {
  id: string;
  from: string;
  to: string;
  subject: string;
  text: string;
  links: string[];
  receivedAt: string;
}

export async function listDevMessages(limit = 50): Promise<AppDevMessage[]> {
  db();
  const rows = await DevMessage.findAll({ order: [['createdAt', 'DESC']], limit });
  return rows.map((m) => ({
    id: m.id,
    from: m.mailFrom,
    to: m.mailTo,
    subject: m.subject,
    text: m.text,
    links: m.text.match(/https?:\/\/[^\s<>"]+/g) ?? [],
    receivedAt: m.createdAt.toISOString(),
  }));
}
