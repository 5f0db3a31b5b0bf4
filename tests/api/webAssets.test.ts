// The exported web app as the server sends it (server/http/gzippedAssets.ts): text files gzip-
// compressed for a browser that accepts it, plain for one that does not, with validators that
// answer 304, compressed afresh when the export changes, and nothing outside the export.
// Raw HTTP (node:http), as supertest and fetch would undo the compression before we look.
import { mkdirSync, mkdtempSync, readFileSync, rmSync, utimesSync, writeFileSync } from 'node:fs';
import { createServer, request as httpRequest, type IncomingHttpHeaders, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { gunzipSync } from 'node:zlib';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildTestApp, type TestApp } from '../support/apiHarness';

type Answer = { status: number; headers: IncomingHttpHeaders; body: Buffer };

describe('the exported web app on the wire', () => {
  let t: TestApp;
  let server: Server;
  let port: number;
  const dir = mkdtempSync(join(tmpdir(), 'spanrelay-web-'));
  const dist = join(dir, 'dist');
  const bundlePath = join(dist, '_expo/static/js/web/entry-0123.js');
  // Text that repeats like a real bundle does, so it compresses the way one would.
  const bundle = Buffer.from(Array.from({ length: 4000 }, (_, i) => `function girder${i}(span){return span*${i % 17}+${i};}\n`).join(''));
  const png = Buffer.from('89504e470d0a1a0a0000000d49484452', 'hex');

  function get(path: string, headers: Record<string, string> = {}, method = 'GET'): Promise<Answer> {
    return new Promise((done, fail) => {
      const req = httpRequest({ host: '127.0.0.1', port, path, method, headers }, (res) => {
        const chunks: Buffer[] = [];
        res.on('data', (c: Buffer) => chunks.push(c));
        res.on('end', () => done({ status: res.statusCode ?? 0, headers: res.headers, body: Buffer.concat(chunks) }));
      });
      req.on('error', fail);
      req.end();
    });
  }

  beforeAll(async () => {
    mkdirSync(join(dist, '_expo/static/js/web'), { recursive: true });
    mkdirSync(join(dist, 'assets'), { recursive: true });
    mkdirSync(join(dist, '.hidden'), { recursive: true });
    writeFileSync(join(dist, 'index.html'), '<!doctype html><title>Spanrelay</title><script src="/_expo/static/js/web/entry-0123.js" defer></script>');
    writeFileSync(bundlePath, bundle);
    writeFileSync(join(dist, 'assets/icon.png'), png);
    writeFileSync(join(dist, '.hidden/secret.js'), 'the hidden file');
    writeFileSync(join(dir, 'outside.js'), 'the file outside the export');
    t = buildTestApp({ WEB_DIST: dist });
    server = createServer(t.app);
    await new Promise<void>((ready) => server.listen(0, '127.0.0.1', ready));
    port = (server.address() as AddressInfo).port;
  });
  afterAll(async () => {
    await new Promise((closed) => server.close(closed));
    await t.close();
    rmSync(dir, { recursive: true, force: true });
  });

  it('sends the bundle gzip-compressed to a browser that accepts it, the same bytes once inflated', async () => {
    const res = await get('/_expo/static/js/web/entry-0123.js', { 'accept-encoding': 'gzip, deflate' });
    expect(res.status).toBe(200);
    expect(res.headers['content-encoding']).toBe('gzip');
    expect(res.headers['content-type']).toMatch(/^(application|text)\/javascript/);
    expect(res.headers['cache-control']).toBe('public, max-age=3600');
    expect(res.headers.vary).toMatch(/Accept-Encoding/i);
    expect(Number(res.headers['content-length'])).toBe(res.body.length);
    expect(res.body.length).toBeLessThan(bundle.length / 4);
    expect(gunzipSync(res.body).equals(bundle)).toBe(true);
  });

  it('sends the plain file to a client that does not accept gzip, still marked as varying', async () => {
    const res = await get('/_expo/static/js/web/entry-0123.js', { 'accept-encoding': 'identity' });
    expect(res.status).toBe(200);
    expect(res.headers['content-encoding']).toBeUndefined();
    expect(res.headers.vary).toMatch(/Accept-Encoding/i);
    expect(res.body.equals(bundle)).toBe(true);
  });

  it('answers 304 to a browser holding the current copy, and HEAD with the headers alone', async () => {
    const first = await get('/_expo/static/js/web/entry-0123.js', { 'accept-encoding': 'gzip' });
    const again = await get('/_expo/static/js/web/entry-0123.js', { 'accept-encoding': 'gzip', 'if-none-match': first.headers.etag! });
    expect(again.status).toBe(304);
    expect(again.body.length).toBe(0);
    const head = await get('/_expo/static/js/web/entry-0123.js', { 'accept-encoding': 'gzip' }, 'HEAD');
    expect(head.status).toBe(200);
    expect(head.headers['content-length']).toBe(first.headers['content-length']);
    expect(head.body.length).toBe(0);
  });

  it('compresses a file again when the export replaces it', async () => {
    const before = await get('/_expo/static/js/web/entry-0123.js', { 'accept-encoding': 'gzip' });
    const changed = Buffer.concat([bundle, Buffer.from('function pier(){return 2;}\n')]);
    writeFileSync(bundlePath, changed);
    utimesSync(bundlePath, new Date(), new Date(Date.now() + 5000));
    try {
      const after = await get('/_expo/static/js/web/entry-0123.js', { 'accept-encoding': 'gzip' });
      expect(gunzipSync(after.body).equals(changed)).toBe(true);
      expect(after.headers.etag).not.toBe(before.headers.etag);
    } finally {
      writeFileSync(bundlePath, bundle);
    }
  });

  it('leaves images as they are', async () => {
    const res = await get('/assets/icon.png', { 'accept-encoding': 'gzip' });
    expect(res.status).toBe(200);
    expect(res.headers['content-encoding']).toBeUndefined();
    expect(res.body.equals(png)).toBe(true);
  });

  it('sends nothing from outside the export or from hidden folders, compressed or not', async () => {
    for (const path of ['/..%2foutside.js', '/%2e%2e/outside.js', '/.hidden/secret.js', '/%2ehidden/secret.js']) {
      for (const encoding of ['gzip', 'identity']) {
        const res = await get(path, { 'accept-encoding': encoding });
        const text = res.headers['content-encoding'] === 'gzip' ? gunzipSync(res.body).toString() : res.body.toString();
        expect(text, `${path} ${encoding}`).not.toMatch(/the file outside|the hidden file/);
      }
    }
  });

  it('still answers every client-side route with the app page', async () => {
    const res = await get('/requests/some-id', { 'accept-encoding': 'gzip' });
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/text\/html/);
    expect(readFileSync(join(dist, 'index.html')).equals(res.body)).toBe(true);
  });
});
