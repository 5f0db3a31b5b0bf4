// The real server process (`tsx server/index.ts`, as the start command runs it) on a port of its
// own, for tests that kill it; its own process group, so a kill reaches the node process npx starts.
import { spawn, type ChildProcess } from 'node:child_process';
import { setTimeout as sleep } from 'node:timers/promises';
import type { ServerEnv } from '../../server/env';
import { repoRoot } from './testSettings';

export type ServerProcess = { url: string; kill(signal: NodeJS.Signals): Promise<void>; output(): string };

export async function startServerProcess(env: ServerEnv, timeoutMs = 90_000): Promise<ServerProcess> {
  const url = env.PUBLIC_URL;
  let log = '';
  const child: ChildProcess = spawn('npx', ['tsx', 'server/index.ts'], {
    cwd: repoRoot,
    env: { ...process.env, ...Object.fromEntries(Object.entries(env).map(([k, v]) => [k, String(v)])) },
    stdio: ['ignore', 'pipe', 'pipe'],
    detached: true,
  });
  const keep = (chunk: Buffer) => {
    log = (log + chunk.toString()).slice(-20_000);
  };
  child.stdout?.on('data', keep);
  child.stderr?.on('data', keep);
  const exited = new Promise<void>((r) => child.once('exit', () => r()));
  const kill = async (signal: NodeJS.Signals) => {
    if (child.exitCode !== null || child.signalCode !== null || !child.pid) return;
    try {
      process.kill(-child.pid, signal);
    } catch {
      // already gone
    }
    await exited;
  };
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    try {
      const res = await fetch(`${url}/api/health`, { signal: AbortSignal.timeout(3000) });
      if (res.status === 200 || res.status === 503) break;
    } catch {
      // not listening yet
    }
    if (Date.now() > deadline || child.exitCode !== null) {
      await kill('SIGKILL');
      throw new Error(`the server did not come up at ${url}:\n${log}`);
    }
    await sleep(250);
  }
  return { url, kill, output: () => log };
}
