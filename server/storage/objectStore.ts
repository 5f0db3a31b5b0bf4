// Files live in S3 (a local file-backed fake in development and tests) under keys of our own layout.
import {
  S3Client,
  PutObjectCommand,
  DeleteObjectCommand,
  GetObjectCommand,
  HeadBucketCommand,
} from '@aws-sdk/client-s3';
import { Upload } from '@aws-sdk/lib-storage';
import type { Readable } from 'node:stream';
import type { ServerEnv } from '../env';

export type StoredObject = { body: Readable; contentType: string; contentLength: number };

export type StreamingUpload = { done(): Promise<void>; abort(): Promise<void> };

export type ObjectStore = {
  // Multipart through lib-storage: parts go out as the stream arrives, nothing is held whole.
  startUpload(key: string, body: Readable, contentType: string, metadata: Record<string, string>): StreamingUpload;
  put(key: string, body: Buffer | Readable, contentType: string, metadata: Record<string, string>): Promise<void>;
  get(key: string): Promise<StoredObject>;
  remove(key: string): Promise<void>;
  isUp(): Promise<boolean>;
};

export function createObjectStore(env: ServerEnv): ObjectStore {
  const client = new S3Client({
    endpoint: env.S3_ENDPOINT,
    region: env.S3_REGION,
    forcePathStyle: true,
    credentials: { accessKeyId: env.S3_ACCESS_KEY_ID, secretAccessKey: env.S3_SECRET_ACCESS_KEY },
    // Without these the SDK frames streamed bodies as aws-chunked, which the fake stores verbatim.
    requestChecksumCalculation: 'WHEN_REQUIRED',
    responseChecksumValidation: 'WHEN_REQUIRED',
    maxAttempts: 2,
  });
  const Bucket = env.S3_BUCKET;

  // S3 metadata travels as HTTP headers, so non-ASCII names are percent-encoded.
  const headerSafe = (metadata: Record<string, string>) => Object.fromEntries(Object.entries(metadata).map(([k, v]) => [k, encodeURIComponent(v)]));

  return {
    startUpload(key, body, contentType, metadata) {
      const upload = new Upload({
        client,
        params: { Bucket, Key: key, Body: body, ContentType: contentType, Metadata: headerSafe(metadata) },
        partSize: 8 * 1024 * 1024,
        queueSize: 2,
      });
      return { done: async () => void (await upload.done()), abort: () => upload.abort() };
    },
    async put(key, body, contentType, metadata) {
      const Metadata = headerSafe(metadata);
      if (Buffer.isBuffer(body)) {
        await client.send(new PutObjectCommand({ Bucket, Key: key, Body: body, ContentType: contentType, Metadata }));
      } else {
        await new Upload({ client, params: { Bucket, Key: key, Body: body, ContentType: contentType, Metadata } }).done();
      }
    },
    async get(key) {
      const out = await client.send(new GetObjectCommand({ Bucket, Key: key }));
      return {
        body: out.Body as Readable,
        contentType: out.ContentType ?? 'application/octet-stream',
        contentLength: out.ContentLength ?? 0,
      };
    },
    async remove(key) {
      await client.send(new DeleteObjectCommand({ Bucket, Key: key }));
    },
    async isUp() {
      try {
        await client.send(new HeadBucketCommand({ Bucket }), { abortSignal: AbortSignal.timeout(2000) });
        return true;
      } catch {
        return false;
      }
    },
  };
}
