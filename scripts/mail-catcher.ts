/**
 * The local stand-in for a mail relay: an SMTP server on loopback (smtp-server) that keeps every
 * message in PostgreSQL (`dev_messages`), where the Dev mailbox page shows them. Development and
 * tests only; the app sends through nodemailer exactly as it would to a real relay.
 */
import './lib/load-env';
import { simpleParser } from 'mailparser';
import { SMTPServer } from 'smtp-server';
import { createSequelize } from '../lib/db';
import { config } from '../lib/config';
import { DevMessage } from '../models';

export function startMailCatcher(smtpUrl = config.smtpUrl, databaseUrl = config.databaseUrl): Promise<SMTPServer> {
  const url = new URL(smtpUrl);
  const host = url.hostname;
  const port = Number(url.port || 25);
  if (!['127.0.0.1', 'localhost', '::1'].includes(host)) throw new Error(`the mail catcher only listens on loopback, not ${host}`);
  createSequelize(databaseUrl);
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    size: 2 * 1024 * 1024,
    banner: 'Seamline local mail catcher',
    onData(stream, session, callback) {
      simpleParser(stream)
        .then(async (mail) => {
          const to = session.envelope.rcptTo.map((r) => r.address).join(', ');
          await DevMessage.create({
            mailFrom: session.envelope.mailFrom ? session.envelope.mailFrom.address : '',
            mailTo: to.slice(0, 2000),
            subject: (mail.subject ?? '(no subject)').slice(0, 500),
            text: mail.text ?? '',
          });
          callback();
        })
        .catch((e: unknown) => callback(e instanceof Error ? e : new Error(String(e))));
    },
  });
  return new Promise((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, host, () => resolve(server));
  });
}

if (require.main === module) {
  startMailCatcher().then(
    () => console.log(`• mail catcher listening on ${config.smtpUrl}`),
    (e) => {
      console.error(`mail catcher: ${e instanceof Error ? e.message : e}`);
      process.exit(1);
    },
  );
}
