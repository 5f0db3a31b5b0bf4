// Outgoing mail through nodemailer; in development and tests the SMTP server is the local catcher.
import nodemailer from 'nodemailer';
import type { ServerEnv } from '../env';

// messageId is derived from the message's idempotency key, so a receiver can spot a repeat.
export type OutgoingMail = { to: string; subject: string; text: string; messageId?: string };

export type Mailer = { send(mail: OutgoingMail): Promise<void>; isUp(): Promise<boolean>; close(): void };

export function createMailer(env: ServerEnv): Mailer {
  const transport = nodemailer.createTransport({
    host: env.SMTP_HOST,
    port: env.SMTP_PORT,
    secure: false,
    // One connection reused for a burst of notifications instead of one per message.
    pool: true,
    maxConnections: 2,
    ignoreTLS: env.NODE_ENV !== 'production',
    connectionTimeout: 3000,
    greetingTimeout: 3000,
  });
  return {
    async send(mail) {
      await transport.sendMail({ from: env.MAIL_FROM, to: mail.to, subject: mail.subject, text: mail.text, messageId: mail.messageId });
    },
    async isUp() {
      try {
        return await transport.verify();
      } catch {
        return false;
      }
    },
    close: () => transport.close(),
  };
}
