// A generated demo file stored the way an upload is: the same upload rules (who, in which state),
// the same key layout in the object store, the bytes sniffed, hashed and recorded.
import { createHash } from 'node:crypto';
import { fileTypeFromBuffer } from 'file-type';
import type { Database } from '../../db/client';
import type { Actor } from '../../shared/requests/types';
import { authorizeUpload, objectKeyFor, recordUploads, type UploadPurpose } from '../requests/attachmentService';
import type { ObjectStore } from '../storage/objectStore';
import type { DemoFile } from './demoFiles';

export async function attachDemoFile(
  deps: { db: Database; store: ObjectStore },
  actor: Actor,
  requestId: string,
  purpose: UploadPurpose,
  file: DemoFile,
  at: Date,
): Promise<string> {
  const target = await authorizeUpload(deps.db, actor, requestId, purpose);
  const sniffed = await fileTypeFromBuffer(file.bytes);
  if (!sniffed || sniffed.mime !== file.contentType) throw new Error(`demo file ${file.fileName} sniffs as ${sniffed?.mime ?? 'nothing'}, not ${file.contentType}`);
  const key = objectKeyFor(target.projectId, requestId, target.revision);
  await deps.store.put(key, file.bytes, file.contentType, { 'original-name': file.fileName });
  const stored = {
    key,
    size: file.bytes.length,
    sha256: createHash('sha256').update(file.bytes).digest('hex'),
    detectedType: sniffed.mime,
    originalname: file.fileName,
  };
  const [summary] = await recordUploads(deps, actor, requestId, target.revision, purpose, [stored], { at });
  return summary!.id;
}
