// Reads the ports and URLs the test command exported (docker-free-scripts/test-env.sh).
import { join } from 'node:path';
import { serverEnvSchema, type ServerEnv } from '../../server/env';

function required(name: string): string {
  const value = process.env[name];
  if (!value) throw new Error(`${name} is not set: run the tests with \`npm test\`, which starts what they need`);
  return value;
}

export const repoRoot = join(__dirname, '..', '..');
export const artifactsDir = () => process.env.TEST_ARTIFACTS ?? join(repoRoot, 'tests', '.artifacts');
// TEST_FAKES_DIR lets two test runs on one machine keep their fakes' files apart.
export const fakesDir = (suite: 'api' | 'e2e') => join(process.env.TEST_FAKES_DIR ?? join(repoRoot, '.data', 'fakes-test'), suite);

export function suitePorts(suite: 'api' | 'e2e') {
  const prefix = suite === 'api' ? 'TEST_API' : 'TEST_E2E';
  return {
    databaseUrl: required(`${prefix}_DATABASE_URL`),
    s3Port: Number(required(`${prefix}_S3_PORT`)),
    smtpPort: Number(required(`${prefix}_SMTP_PORT`)),
    catcherPort: Number(required(`${prefix}_CATCHER_PORT`)),
  };
}

export const testBucket = 'spanrelay-test-files';

export function testServerEnv(suite: 'api' | 'e2e', overrides: Partial<Record<keyof ServerEnv, string>> = {}): ServerEnv {
  const ports = suitePorts(suite);
  const publicUrl = suite === 'e2e' ? `http://127.0.0.1:${required('TEST_E2E_APP_PORT')}` : 'http://127.0.0.1:8081';
  return serverEnvSchema.parse({
    NODE_ENV: 'test',
    PORT: suite === 'e2e' ? required('TEST_E2E_APP_PORT') : '8081',
    PUBLIC_URL: publicUrl,
    DATABASE_URL: ports.databaseUrl,
    BETTER_AUTH_SECRET: 'spanrelay-test-secret-0123456789abcdef',
    S3_ENDPOINT: `http://127.0.0.1:${ports.s3Port}`,
    S3_BUCKET: testBucket,
    SMTP_HOST: '127.0.0.1',
    SMTP_PORT: String(ports.smtpPort),
    MAIL_CATCHER_URL: `http://127.0.0.1:${ports.catcherPort}`,
    ...overrides,
  });
}
