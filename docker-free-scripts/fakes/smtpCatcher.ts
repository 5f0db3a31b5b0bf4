// An SMTP server that accepts every message and keeps it as a JSON file, plus a small HTTP
// listing of what it caught. Messages survive a restart because they are kept on disk.
import { SMTPServer } from 'smtp-server';
import { simpleParser, type AddressObject } from 'mailparser';
import { createServer, type Server } from 'node:http';
import { mkdirSync, readdirSync, readFileSync, writeFileSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import { randomUUID } from 'node:crypto';

// messageId is the sender's Message-ID header, by which a repeat of one message is recognised.
export type CaughtMail = { id: string; messageId: string; from: string; to: string[]; subject: string; text: string; sentAt: string };

export type SmtpCatcher = { smtpPort: number; httpUrl: string; close: () => Promise<void> };

function addresses(field: AddressObject | AddressObject[] | undefined): string[] {
  const list = Array.isArray(field) ? field : field ? [field] : [];
  return list.flatMap((a) => a.value.map((v) => v.address ?? '')).filter(Boolean);
}

export function readCaught(directory: string): CaughtMail[] {
  mkdirSync(directory, { recursive: true });
  return readdirSync(directory)
    .filter((f) => f.endsWith('.json'))
    .map((f) => JSON.parse(readFileSync(join(directory, f), 'utf8')) as CaughtMail)
    .sort((a, b) => a.sentAt.localeCompare(b.sentAt));
}

export async function startSmtpCatcher(opts: { smtpPort: number; httpPort: number; directory: string }): Promise<SmtpCatcher> {
  mkdirSync(opts.directory, { recursive: true });
  let counter = 0;
  const smtp = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    logger: false,
    // Stopping drops open connections within half a second, as a mail server that goes down would,
    // instead of letting a sender's pooled connection deliver for another 30 s.
    closeTimeout: 500,
    onData(stream, session, callback) {
      simpleParser(stream)
        .then((parsed) => {
          const envelopeTo = session.envelope.rcptTo.map((r) => r.address);
          const mail: CaughtMail = {
            id: randomUUID(),
            messageId: parsed.messageId ?? '',
            from: addresses(parsed.from)[0] ?? (session.envelope.mailFrom || { address: '' }).address,
            to: envelopeTo.length ? envelopeTo : addresses(parsed.to),
            subject: parsed.subject ?? '',
            text: parsed.text ?? '',
            sentAt: new Date().toISOString(),
          };
          // A counter in the name keeps the order of messages caught within one millisecond.
          const name = `${mail.sentAt.replace(/[:.]/g, '-')}-${String(counter++).padStart(6, '0')}.json`;
          writeFileSync(join(opts.directory, name), JSON.stringify(mail));
          callback();
        })
        .catch((err: Error) => callback(err));
    },
  });
  await new Promise<void>((resolve, reject) => {
    smtp.once('error', reject);
    smtp.listen(opts.smtpPort, '127.0.0.1', () => resolve());
  });

  const http: Server = createServer((req, res) => {
    if (req.url === '/messages' && req.method === 'GET') {
      res.writeHead(200, { 'content-type': 'application/json' });
      res.end(JSON.stringify(readCaught(opts.directory)));
    } else if (req.url === '/messages' && req.method === 'DELETE') {
      rmSync(opts.directory, { recursive: true, force: true });
      mkdirSync(opts.directory, { recursive: true });
      res.writeHead(204).end();
    } else {
      res.writeHead(404).end();
    }
  });
  await new Promise<void>((resolve, reject) => {
    http.once('error', reject);
    http.listen(opts.httpPort, '127.0.0.1', () => resolve());
  });

  return {
    smtpPort: opts.smtpPort,
    httpUrl: `http://127.0.0.1:${opts.httpPort}`,
    close: async () => {
      await new Promise<void>((r) => smtp.close(() => r()));
      await new Promise<void>((r) => http.close(() => r()));
    },
  };
}
