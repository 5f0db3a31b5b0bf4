// Every call to our API goes through here, so errors arrive in one shape the screens can show.
export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields: Record<string, string> = {},
  ) {
    super(message);
  }
}

type ErrorBody = { error?: { code?: string; message?: string; fields?: Record<string, string> } };

export async function apiFetch<T>(path: string, init: RequestInit = {}): Promise<T> {
  let response: Response;
  try {
    response = await fetch(path, { credentials: 'include', ...init });
  } catch {
    throw new ApiError(0, 'offline', 'Spanrelay cannot be reached. Check the connection and try again.');
  }
  const text = await response.text();
  let body: unknown = null;
  try {
    body = text ? JSON.parse(text) : null;
  } catch {
    body = null;
  }
  if (!response.ok) {
    const e = (body as ErrorBody | null)?.error;
    throw new ApiError(response.status, e?.code ?? 'http_error', e?.message ?? `The server answered ${response.status}.`, e?.fields);
  }
  return body as T;
}
