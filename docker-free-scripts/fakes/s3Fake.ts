// A file-backed S3 stand-in for development and tests; the server reaches it only over the S3 protocol.
import S3rver from 's3rver';
import { mkdirSync } from 'node:fs';

export type S3Fake = { endpoint: string; close: () => Promise<void> };

export async function startS3Fake(opts: { port: number; directory: string; bucket: string }): Promise<S3Fake> {
  mkdirSync(opts.directory, { recursive: true });
  const server = new S3rver({
    address: '127.0.0.1',
    port: opts.port,
    directory: opts.directory,
    silent: true,
    configureBuckets: [{ name: opts.bucket, configs: [] }],
  });
  await server.run();
  return { endpoint: `http://127.0.0.1:${opts.port}`, close: () => server.close() };
}
