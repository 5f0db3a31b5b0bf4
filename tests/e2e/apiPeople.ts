// The demo people over plain HTTP, as a browser on the app's own origin would hold their sessions:
// for putting a request where a browser test starts, the way their own screens would.
import { demoEmail, demoPassword } from '../../server/demo/demoScenario';
import type { Role } from '../../shared/roles';
import { base } from './helpers';

export async function apiAs(role: Role) {
  const signIn = await fetch(`${base}/api/auth/sign-in/email`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', origin: base },
    body: JSON.stringify({ email: demoEmail(role), password: demoPassword }),
  });
  if (signIn.status !== 200) throw new Error(`sign-in as ${role} answered ${signIn.status}: ${await signIn.text()}`);
  const cookie = signIn.headers.getSetCookie().map((c) => c.split(';')[0]).join('; ');
  const call = async <T>(path: string, init: { method?: string; json?: unknown; body?: FormData } = {}): Promise<T> => {
    const res = await fetch(`${base}${path}`, {
      method: init.method ?? (init.json || init.body ? 'POST' : 'GET'),
      headers: { cookie, origin: base, ...(init.json ? { 'content-type': 'application/json' } : {}) },
      body: init.json ? JSON.stringify(init.json) : init.body,
    });
    const text = await res.text();
    if (!res.ok) throw new Error(`${role} ${path} answered ${res.status}: ${text}`);
    return JSON.parse(text) as T;
  };
  return call;
}

export type ApiPerson = Awaited<ReturnType<typeof apiAs>>;
