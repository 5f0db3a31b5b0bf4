// The first screen's script must not carry what only some screens use: better-auth's client (signing
// in and out, the password screens) and d3 with the check plots are loaded on demand
// (features/auth/loadAuthClient.ts, features/engineering/lazyCheckPlots.ts). A static import of
// either from anything a route reaches would put them back into the one bundle every visit loads.
// This follows the static imports from every route file, as the bundler does, and fails if it
// reaches them.
import { existsSync, readdirSync, readFileSync, statSync } from 'node:fs';
import { dirname, join, relative, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';

const root = resolve(__dirname, '../../..');

function filesUnder(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const path = join(dir, name);
    return statSync(path).isDirectory() ? filesUnder(path) : /\.tsx?$/.test(name) ? [path] : [];
  });
}

// Static imports and re-exports of values; `import type`, `export type` and `import()` are left out.
const staticFrom = /^\s*(?:import|export)\s+(?!type\b)(?:[^'";]*?\s+from\s+)?['"]([^'"]+)['"]/gm;

function resolveLocal(from: string, spec: string): string | null {
  const base = resolve(dirname(from), spec);
  for (const candidate of [base, `${base}.ts`, `${base}.tsx`, join(base, 'index.ts'), join(base, 'index.tsx')]) {
    if (existsSync(candidate) && statSync(candidate).isFile()) return candidate;
  }
  return null;
}

// Every package a route reaches through static imports, with one chain of files that reaches it.
function packagesReached(): Map<string, string[]> {
  const reached = new Map<string, string[]>();
  const seen = new Set<string>();
  const queue: { file: string; chain: string[] }[] = filesUnder(join(root, 'app')).map((file) => ({ file, chain: [relative(root, file)] }));
  while (queue.length) {
    const { file, chain } = queue.shift()!;
    if (seen.has(file)) continue;
    seen.add(file);
    for (const [, spec] of readFileSync(file, 'utf8').matchAll(staticFrom)) {
      if (spec!.startsWith('.')) {
        const next = resolveLocal(file, spec!);
        if (next) queue.push({ file: next, chain: [...chain, relative(root, next)] });
      } else {
        const pkg = spec!.startsWith('@') ? spec!.split('/').slice(0, 2).join('/') : spec!.split('/')[0]!;
        if (!reached.has(pkg)) reached.set(pkg, [...chain, spec!]);
      }
    }
  }
  return reached;
}

describe('what the first bundle carries', () => {
  const reached = packagesReached();

  it('follows the routes into the screens (the walk itself works)', () => {
    // Packages every screen uses: if these are not found, the walk is broken, not the bundle clean.
    expect([...reached.keys()]).toEqual(expect.arrayContaining(['expo-router', 'react-native', '@tanstack/react-query', 'zod']));
  });

  it('does not reach better-auth or d3 through a static import', () => {
    const offending = [...reached].filter(([pkg]) => pkg.startsWith('better-auth') || pkg.startsWith('d3-')).map(([, chain]) => chain.join(' -> '));
    expect(offending).toEqual([]);
  });
});
