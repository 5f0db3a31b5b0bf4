// A multer storage engine that streams each file straight to S3 while it arrives: the type is
// sniffed from the first bytes (415 if we do not take it), the SHA-256 and size are computed on
// the way, and the per-request total is enforced as the bytes pass (413). multer removes the
// objects already stored when a later file of the same upload fails.
import { createHash } from 'node:crypto';
import { Readable, Transform } from 'node:stream';
import type { Request } from 'express';
import type { StorageEngine } from 'multer';
import { fileTypeFromBuffer } from 'file-type';
import { HttpError } from '../http/errors';
import type { ObjectStore } from './objectStore';
import { acceptedFileTypes, acceptedTypesInWords, refusedByName } from './acceptedFileTypes';

export type UploadTarget = {
  keyFor: () => string;
  // Bytes the request already holds, and the most it may hold in all.
  usedBytes: number;
  maxTotalBytes: number;
};

export type StoredUpload = { key: string; size: number; sha256: string; detectedType: string };

const targets = new WeakMap<Request, UploadTarget>();
export const setUploadTarget = (req: Request, target: UploadTarget) => targets.set(req, target);

const sniffBytes = 4100;

// Reads the first bytes without losing them: they are put back for the upload to read again.
function readHead(stream: Readable): Promise<{ head: Buffer; body: Readable }> {
  return new Promise((resolve, reject) => {
    const chunks: Buffer[] = [];
    let length = 0;
    const done = (ended: boolean) => {
      stream.off('readable', onReadable);
      stream.off('end', onEnd);
      stream.off('error', onError);
      const head = Buffer.concat(chunks);
      if (ended) return resolve({ head, body: Readable.from(head.length ? [head] : []) });
      stream.unshift(head);
      resolve({ head, body: stream });
    };
    const onReadable = () => {
      let chunk: Buffer | null;
      while ((chunk = stream.read() as Buffer | null) !== null) {
        chunks.push(chunk);
        length += chunk.length;
        if (length >= sniffBytes) return done(false);
      }
    };
    const onEnd = () => done(true);
    const onError = (err: Error) => reject(err);
    stream.on('readable', onReadable);
    stream.on('end', onEnd);
    stream.on('error', onError);
  });
}

async function storeOne(store: ObjectStore, target: UploadTarget, file: Express.Multer.File): Promise<StoredUpload> {
  const { head, body } = await readHead(file.stream);
  if (head.length === 0) throw new HttpError(400, 'empty_file', `"${file.originalname}" is empty.`);
  if (refusedByName(file.originalname)) {
    body.resume();
    throw new HttpError(415, 'unsupported_type', `"${file.originalname}" is named like a program or a web page; rename it to what it is (for example .pdf) and send it again.`);
  }
  // A broken container (a ZIP whose entries lie) makes the sniffer throw: that is a file we do not take.
  const sniffed = await fileTypeFromBuffer(head).catch(() => undefined);
  if (!sniffed || !(sniffed.mime in acceptedFileTypes)) {
    body.resume();
    throw new HttpError(415, 'unsupported_type', `"${file.originalname}" is not a file Spanrelay accepts. Send ${acceptedTypesInWords}.`);
  }

  const hash = createHash('sha256');
  let size = 0;
  const meter = new Transform({
    transform(chunk: Buffer, _enc, next) {
      hash.update(chunk);
      size += chunk.length;
      target.usedBytes += chunk.length;
      if (target.usedBytes > target.maxTotalBytes) {
        next(new HttpError(413, 'request_total_too_large', `The files of one request may hold ${Math.round(target.maxTotalBytes / 1024 / 1024)} MB in all; "${file.originalname}" goes over.`));
        return;
      }
      next(null, chunk);
    },
  });
  const key = target.keyFor();
  const upload = store.startUpload(key, meter, sniffed.mime, { 'original-name': file.originalname });
  let refused: Error | null = null;
  const stop = (err: Error) => {
    refused ??= err;
    void upload.abort().catch(() => undefined);
  };
  // busboy says 'limit' when the file passes the per-file limit; multer then reports 413.
  file.stream.on('limit', () => stop(new HttpError(413, 'limit_file_size', 'A file is larger than the upload limit.')));
  // Our own refusals (the request total) stop the upload; other stream errors follow from a failed
  // upload and are reported as that failure below.
  meter.on('error', (err) => {
    if (err instanceof HttpError) stop(err);
  });
  body.pipe(meter);
  try {
    await upload.done();
  } catch (err) {
    // Let the rest of this file drain, so the other parts of the upload can still be read.
    body.unpipe(meter);
    body.resume();
    if (refused) throw refused;
    console.error('[spanrelay] object store refused an upload', err);
    throw new HttpError(503, 'storage_unavailable', 'File storage is not reachable right now; nothing was saved. Try again shortly.');
  }
  if (refused) {
    await store.remove(key).catch(() => undefined);
    throw refused;
  }
  return { key, size, sha256: hash.digest('hex'), detectedType: sniffed.mime };
}

export function streamingUploadStorage(store: ObjectStore): StorageEngine {
  return {
    _handleFile(req, file, cb) {
      const target = targets.get(req);
      if (!target) return cb(new Error('upload target was not set before multer ran'));
      storeOne(store, target, file).then(
        (stored) => cb(null, stored as unknown as Partial<Express.Multer.File>),
        (err: Error) => cb(err),
      );
    },
    _removeFile(_req, file, cb) {
      const key = (file as unknown as StoredUpload).key;
      if (!key) return cb(null);
      store.remove(key).then(
        () => cb(null),
        () => cb(null),
      );
    },
  };
}
