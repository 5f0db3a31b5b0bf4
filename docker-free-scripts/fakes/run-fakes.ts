// Runs the S3 fake and the SMTP catcher as one long-lived process for `npm start`.
import { join } from 'node:path';
import { startS3Fake } from './s3Fake';
import { startSmtpCatcher } from './smtpCatcher';

function port(name: string): number {
  const value = Number(process.env[name]);
  if (!Number.isInteger(value) || value <= 0) throw new Error(`${name} must be a port number`);
  return value;
}

async function main() {
  const dir = process.env.FAKES_DIR ?? '.data/fakes';
  const s3 = await startS3Fake({ port: port('S3_PORT'), directory: join(dir, 's3'), bucket: process.env.S3_BUCKET ?? 'spanrelay-files' });
  const mail = await startSmtpCatcher({ smtpPort: port('SMTP_PORT'), httpPort: port('MAIL_CATCHER_PORT'), directory: join(dir, 'mail') });
  console.log(`fakes ready: s3 ${s3.endpoint}, smtp 127.0.0.1:${mail.smtpPort}, caught mail ${mail.httpUrl}/messages`);
  const stop = async () => {
    await Promise.allSettled([s3.close(), mail.close()]);
    process.exit(0);
  };
  process.on('SIGTERM', stop);
  process.on('SIGINT', stop);
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
