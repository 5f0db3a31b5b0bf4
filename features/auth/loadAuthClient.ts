// better-auth's client comes with its fetch wrapper, session stores and error tables, about 70 KB
// of script that only signing in or out and the password screens' buttons use. It is fetched the
// first time one of them is pressed, not with the first screen; later presses reuse it. If it
// cannot be fetched (no connection), the press fails with the caller's own message.
import { ApiError } from '../api/http';

export async function loadAuthClient(failed: string) {
  try {
    return (await import('./authClient')).authClient;
  } catch {
    throw new ApiError(0, 'network', failed);
  }
}
