// Starts the S3 fake and SMTP catcher for one suite and returns a stop function (vitest globalSetup).
import { rmSync } from 'node:fs';
import { join } from 'node:path';
import { startS3Fake } from '../../docker-free-scripts/fakes/s3Fake';
import { startSmtpCatcher } from '../../docker-free-scripts/fakes/smtpCatcher';
import { fakesDir, suitePorts, testBucket } from './testSettings';

export async function startSuiteFakes(suite: 'api' | 'e2e') {
  const ports = suitePorts(suite);
  const dir = fakesDir(suite);
  rmSync(dir, { recursive: true, force: true });
  const s3 = await startS3Fake({ port: ports.s3Port, directory: join(dir, 's3'), bucket: testBucket });
  const mail = await startSmtpCatcher({ smtpPort: ports.smtpPort, httpPort: ports.catcherPort, directory: join(dir, 'mail') });
  return async () => {
    await Promise.allSettled([s3.close(), mail.close()]);
  };
}
