// better-auth's client, pointed at our own origin (the server serves the app and the API together).
import { createAuthClient } from 'better-auth/react';

const origin = typeof window !== 'undefined' && window.location ? window.location.origin : 'http://127.0.0.1:8081';

export const authClient = createAuthClient({ baseURL: origin, basePath: '/api/auth' });
