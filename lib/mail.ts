import nodemailer, { type Transporter } from 'nodemailer';
import { config } from './config';

/**
 * Outgoing mail over SMTP with nodemailer. In development and tests SMTP_URL points at the local
 * catcher (scripts/mail-catcher.ts); in production at a real relay. Same client either way.
 */
const globalForMail = globalThis as unknown as { seamlineMail?: Transporter };

function transporter(): Transporter {
  if (!globalForMail.seamlineMail) {
    globalForMail.seamlineMail = nodemailer.createTransport(config.smtpUrl, { connectionTimeout: 5_000, greetingTimeout: 5_000, socketTimeout: 10_000 });
  }
  return globalForMail.seamlineMail;
}

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
}

export async function sendMail(message: OutgoingMail): Promise<void> {
  await transporter().sendMail({ from: config.mailFrom, ...message });
}
