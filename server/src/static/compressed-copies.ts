import type { RequestHandler } from 'express';
import { readFile, stat } from 'node:fs/promises';
import path from 'node:path';
import { promisify } from 'node:util';
import zlib from 'node:zlib';

const brotli = promisify(zlib.brotliCompress);
const gzip = promisify(zlib.gzip);

/** Built text files worth compressing (fonts and images are compressed already). */
const COMPRESSIBLE = /\.(js|mjs|css|html|svg|json|txt|map)$/i;
/** Below this a compressed copy saves less than the headers cost. */
const MIN_BYTES = 1024;

type Encoding = 'br' | 'gzip';
type Copies = { br: Buffer; gzip: Buffer; size: number; mtimeMs: number };

const brotliOptions = (quality: number, size: number) => ({
  params: { [zlib.constants.BROTLI_PARAM_MODE]: zlib.constants.BROTLI_MODE_TEXT, [zlib.constants.BROTLI_PARAM_QUALITY]: quality, [zlib.constants.BROTLI_PARAM_SIZE_HINT]: size },
});

/**
 * Serves brotli or gzip copies of the built apps' text files to browsers that accept them
 * (`Accept-Encoding`), falling through to express.static otherwise. Copies are made on the first
 * request of each file version and kept in memory: that first request waits for a quick brotli
 * pass (tens of ms for the largest chunk); the densest brotli pass then runs in the background and
 * replaces it. Nothing is compressed at start-up, so a server that never serves the apps pays nothing.
 */
export function compressedCopies(root: string, cacheControl: (file: string) => string): RequestHandler {
  const copies = new Map<string, Promise<Copies>>();

  const make = async (file: string, size: number, mtimeMs: number): Promise<Copies> => {
    const bytes = await readFile(file);
    const [br, gz] = await Promise.all([brotli(bytes, brotliOptions(6, bytes.length)), gzip(bytes, { level: 9 })]);
    const quick: Copies = { br, gzip: gz, size, mtimeMs };
    // The densest pass, off the request's path; keep the quick copy if it fails.
    void brotli(bytes, brotliOptions(11, bytes.length)).then(async (best) => {
      const current = await copies.get(file)?.catch(() => null);
      if (current && current.size === size && current.mtimeMs === mtimeMs && best.length < current.br.length) copies.set(file, Promise.resolve({ ...current, br: best }));
    }, () => undefined);
    return quick;
  };

  return async (req, res, next) => {
    if ((req.method !== 'GET' && req.method !== 'HEAD') || !COMPRESSIBLE.test(req.path)) return next();
    // Our preference, not the header's order: brotli (denser) whenever it is acceptable at all.
    const encoding: Encoding | null = req.acceptsEncodings('br') === 'br' ? 'br' : req.acceptsEncodings('gzip') === 'gzip' ? 'gzip' : null;
    if (!encoding) return next();
    let relative: string;
    try { relative = decodeURIComponent(req.path); } catch { return next(); }
    const file = path.join(root, relative);
    // As express.static: nothing outside the folder, no dotfiles.
    if (!file.startsWith(root + path.sep) || relative.includes('\0') || relative.split('/').some((s) => s.startsWith('.'))) return next();
    const info = await stat(file).catch(() => null);
    if (!info?.isFile() || info.size < MIN_BYTES) return next();

    let entry = copies.get(file);
    let ready = entry ? await entry.catch(() => null) : null;
    if (!ready || ready.size !== info.size || ready.mtimeMs !== info.mtimeMs) {
      entry = make(file, info.size, info.mtimeMs);
      copies.set(file, entry);
      entry.catch(() => copies.delete(file));
      ready = await entry.catch(() => null);
      if (!ready) return next();
    }

    const body = ready[encoding];
    res.setHeader('Vary', 'Accept-Encoding');
    res.setHeader('Cache-Control', cacheControl(file));
    res.setHeader('ETag', `W/"${info.size.toString(16)}-${Math.floor(info.mtimeMs).toString(16)}-${encoding}"`);
    res.setHeader('Last-Modified', info.mtime.toUTCString());
    if (req.fresh) {
      res.status(304).end();
      return;
    }
    res.type(path.extname(file));
    res.setHeader('Content-Encoding', encoding);
    res.setHeader('Content-Length', String(body.length));
    if (req.method === 'HEAD') res.end();
    else res.end(body);
  };
}
