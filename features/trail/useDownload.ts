// Saves a file the API makes (the trail CSV, the decision record) under the name the server gives.
// On the web it is fetched first, so a refusal shows in place instead of as a downloaded error page.
import { useState } from 'react';
import { Linking, Platform } from 'react-native';
import { ApiError } from '../api/http';

async function errorOf(response: Response): Promise<ApiError> {
  const body = (await response.json().catch(() => null)) as { error?: { code?: string; message?: string } } | null;
  return new ApiError(response.status, body?.error?.code ?? 'http_error', body?.error?.message ?? `The server answered ${response.status}.`);
}

function fileNameOf(response: Response, fallback: string): string {
  const m = /filename="([^"]+)"/.exec(response.headers.get('content-disposition') ?? '');
  return m?.[1] ?? fallback;
}

async function saveOnWeb(url: string, fallbackName: string) {
  let response: Response;
  try {
    response = await fetch(url, { credentials: 'include' });
  } catch {
    throw new ApiError(0, 'offline', 'Spanrelay cannot be reached. Check the connection and try again.');
  }
  if (!response.ok) throw await errorOf(response);
  const objectUrl = URL.createObjectURL(await response.blob());
  const link = document.createElement('a');
  link.href = objectUrl;
  link.download = fileNameOf(response, fallbackName);
  document.body.appendChild(link);
  link.click();
  link.remove();
  // The click has handed the blob to the browser; let it go once the save has started.
  setTimeout(() => URL.revokeObjectURL(objectUrl), 10_000);
}

export function useDownload() {
  const [busy, setBusy] = useState<string | null>(null);
  const [error, setError] = useState<{ url: string; message: string } | null>(null);
  const start = async (url: string, fallbackName: string) => {
    setBusy(url);
    setError(null);
    try {
      if (Platform.OS === 'web') await saveOnWeb(url, fallbackName);
      else await Linking.openURL(url);
    } catch (err) {
      setError({ url, message: err instanceof Error ? err.message : 'The file could not be saved.' });
    } finally {
      setBusy(null);
    }
  };
  return { start, busy, error };
}
