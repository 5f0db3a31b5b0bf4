// Uploads a list of files one after another, keeping each file's progress and letting the user
// cancel any of them. Files already stored stay stored; a cancelled one is simply not sent.
import { useCallback, useRef, useState } from 'react';
import type { AttachmentSummary } from '../../shared/requests/types';
import { ApiError } from '../api/http';
import { uploadFile } from './uploadFile';

export type UploadItem = {
  key: string;
  name: string;
  size: number;
  sent: number;
  status: 'waiting' | 'sending' | 'stored' | 'cancelled' | 'failed';
  error?: string;
};

type FileToSend = { name: string; size: number; blob: Blob };

export function useFileUploads() {
  const [items, setItems] = useState<UploadItem[]>([]);
  const controllers = useRef(new Map<string, AbortController>());

  const patch = (key: string, change: Partial<UploadItem>) => setItems((all) => all.map((i) => (i.key === key ? { ...i, ...change } : i)));

  const cancel = useCallback((key: string) => {
    const c = controllers.current.get(key) ?? new AbortController();
    controllers.current.set(key, c);
    c.abort();
    setItems((all) => all.map((i) => (i.key === key && (i.status === 'waiting' || i.status === 'sending') ? { ...i, status: 'cancelled' } : i)));
  }, []);

  // Resolves with what was stored, file by file (null where cancelled); throws the first real
  // failure, after which the files not yet sent stay unsent.
  const sendAll = useCallback(async (url: string, files: FileToSend[]): Promise<(AttachmentSummary | null)[]> => {
    const batch = files.map((f, i) => ({ key: `${Date.now()}-${i}-${f.name}`, name: f.name, size: f.size, sent: 0, status: 'waiting' as const }));
    setItems(batch);
    controllers.current = new Map(batch.map((b) => [b.key, new AbortController()]));
    const stored: (AttachmentSummary | null)[] = files.map(() => null);
    for (const [i, item] of batch.entries()) {
      const controller = controllers.current.get(item.key)!;
      if (controller.signal.aborted) continue;
      patch(item.key, { status: 'sending' });
      try {
        stored[i] = await uploadFile(url, files[i]!, (p) => patch(item.key, { sent: p.loaded }), controller.signal);
        patch(item.key, { status: 'stored', sent: item.size });
      } catch (err) {
        if (err instanceof ApiError && err.code === 'cancelled') continue;
        patch(item.key, { status: 'failed', error: err instanceof Error ? err.message : String(err) });
        throw err;
      }
    }
    return stored;
  }, []);

  return { items, sendAll, cancel, reset: () => setItems([]) };
}
