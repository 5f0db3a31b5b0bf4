// One file, one request, so each file has its own progress and can be cancelled on its own.
// fetch cannot report upload progress; XMLHttpRequest can.
import type { AttachmentSummary } from '../../shared/requests/types';
import { ApiError } from '../api/http';

export type UploadProgress = { loaded: number; total: number };

export function uploadFile(
  url: string,
  file: { name: string; blob: Blob },
  onProgress: (p: UploadProgress) => void,
  signal: AbortSignal,
): Promise<AttachmentSummary> {
  return new Promise((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open('POST', url);
    xhr.withCredentials = true;
    xhr.upload.onprogress = (e) => onProgress({ loaded: e.loaded, total: e.lengthComputable ? e.total : file.blob.size });
    xhr.onload = () => {
      let body: unknown = null;
      try {
        body = JSON.parse(xhr.responseText);
      } catch {
        body = null;
      }
      if (xhr.status >= 200 && xhr.status < 300 && Array.isArray(body) && body[0]) return resolve(body[0] as AttachmentSummary);
      const e = (body as { error?: { code?: string; message?: string } } | null)?.error;
      reject(new ApiError(xhr.status, e?.code ?? 'upload_failed', e?.message ?? `The server answered ${xhr.status}.`));
    };
    xhr.onerror = () => reject(new ApiError(0, 'offline', 'The upload was cut off. Check the connection and try again.'));
    xhr.onabort = () => reject(new ApiError(0, 'cancelled', `The upload of "${file.name}" was cancelled.`));
    signal.addEventListener('abort', () => xhr.abort(), { once: true });
    const form = new FormData();
    form.append('files', file.blob, file.name);
    xhr.send(form);
  });
}
