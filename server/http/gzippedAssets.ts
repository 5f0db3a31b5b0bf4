// The exported web app's text files (the JavaScript bundle, fonts, styles) sent gzip-compressed to
// browsers that accept it: the bundle goes from about 2.3 MB to under 600 KB on the wire, and the
// first screen waits for it. Each file is compressed once per process, on its first request, off
// the event loop (zlib's thread pool), and kept in memory while its size and time are unchanged.
// Anything else (images, a client without gzip, a path outside the export) falls through to
// express.static.
import type { RequestHandler } from 'express';
import { createHash } from 'node:crypto';
import { readFile, stat } from 'node:fs/promises';
import { extname, resolve, sep } from 'node:path';
import { promisify } from 'node:util';
import { constants, gzip } from 'node:zlib';

const gzipAsync = promisify(gzip);

// Formats that shrink well; PNG, JPEG and WOFF2 are compressed already.
const compressible = new Set(['.js', '.mjs', '.css', '.json', '.map', '.svg', '.ttf', '.otf', '.txt', '.wasm']);
// A file larger than this is left to express.static rather than held in memory.
const maxFileBytes = 32 * 1024 * 1024;

type Compressed = { size: number; mtimeMs: number; body: Promise<{ gz: Buffer; etag: string }> };

export function gzippedAssets(dist: string, maxAgeSeconds: number): RequestHandler {
  const root = resolve(dist);
  const cache = new Map<string, Compressed>();

  const compressedOf = (path: string, size: number, mtimeMs: number) => {
    const known = cache.get(path);
    if (known && known.size === size && known.mtimeMs === mtimeMs) return known.body;
    const body = readFile(path)
      .then((raw) => gzipAsync(raw, { level: constants.Z_BEST_COMPRESSION }))
      .then((gz) => ({ gz, etag: `"gz-${createHash('sha256').update(gz).digest('base64url').slice(0, 27)}"` }));
    // A failed read is not kept: the next request tries again.
    body.catch(() => {
      if (cache.get(path)?.body === body) cache.delete(path);
    });
    cache.set(path, { size, mtimeMs, body });
    return body;
  };

  return async (req, res, next) => {
    try {
      if (req.method !== 'GET' && req.method !== 'HEAD') return next();
      const ext = extname(req.path).toLowerCase();
      if (!compressible.has(ext)) return next();
      // Caches must keep the compressed and the plain answer apart.
      res.vary('Accept-Encoding');
      if (!req.acceptsEncodings('gzip')) return next();
      let relative: string;
      try {
        relative = decodeURIComponent(req.path);
      } catch {
        return next();
      }
      // As express.static: nothing outside the export, no dotfiles.
      if (relative.includes('\0') || relative.split('/').some((part) => part.startsWith('.'))) return next();
      const path = resolve(root, `.${relative}`);
      if (!path.startsWith(root + sep)) return next();
      const info = await stat(path).catch(() => null);
      if (!info?.isFile() || info.size > maxFileBytes) return next();

      const { gz, etag } = await compressedOf(path, info.size, info.mtimeMs);
      res.type(ext);
      res.setHeader('Content-Encoding', 'gzip');
      res.setHeader('Cache-Control', `public, max-age=${maxAgeSeconds}`);
      res.setHeader('Last-Modified', info.mtime.toUTCString());
      res.setHeader('ETag', etag);
      if (req.fresh) return void res.status(304).end();
      res.setHeader('Content-Length', gz.length);
      if (req.method === 'HEAD') return void res.end();
      res.end(gz);
    } catch (err) {
      next(err);
    }
  };
}
