import express from 'express';
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import { mkdirSync, mkdtempSync, rmSync, utimesSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import request from 'supertest';
import zlib from 'node:zlib';
import { serveApps } from './serve-apps';

/** One GET over a real socket, the body left exactly as sent (supertest would decode it). */
function rawGet(
  app: express.Express,
  url: string,
  headers: Record<string, string>,
): Promise<{ status: number; headers: http.IncomingHttpHeaders; body: Buffer }> {
  return new Promise((resolve, reject) => {
    const server = app.listen(0, '127.0.0.1', () => {
      const { port } = server.address() as AddressInfo;
      http
        .get({ host: '127.0.0.1', port, path: url, headers }, (res) => {
          const chunks: Buffer[] = [];
          res.on('data', (c: Buffer) => chunks.push(c));
          res.on('end', () => {
            server.close();
            resolve({ status: res.statusCode!, headers: res.headers, body: Buffer.concat(chunks) });
          });
        })
        .on('error', (err) => {
          server.close();
          reject(err);
        });
    });
  });
}

describe('serveApps: the built apps, compressed', () => {
  let dist: string;
  let app: express.Express;
  const chunk = `export const figures = [${Array.from({ length: 400 }, (_, i) => `"figure ${i}"`).join(',')}];\n`;
  const chunkFile = () => path.join(dist, 'designer', 'browser', 'chunk-ABCD1234.js');

  beforeEach(() => {
    dist = mkdtempSync(path.join(os.tmpdir(), 'tw-serve-apps-'));
    for (const folder of ['designer', 'admin']) mkdirSync(path.join(dist, folder, 'browser'), { recursive: true });
    writeFileSync(chunkFile(), chunk);
    writeFileSync(path.join(dist, 'designer', 'browser', 'index.html'), '<!doctype html><title>designer</title>');
    writeFileSync(path.join(dist, 'admin', 'browser', 'index.html'), '<!doctype html><title>admin</title>');
    writeFileSync(path.join(dist, 'designer', 'browser', 'tiny-ABCD1234.js'), 'export {};\n');
    writeFileSync(path.join(dist, 'designer', 'browser', '.hidden.json'), JSON.stringify({ secret: 'x'.repeat(2000) }));
    writeFileSync(path.join(dist, 'secret.txt'), 's'.repeat(4000));
    app = express();
    app.use(serveApps(dist));
  });
  afterEach(() => rmSync(dist, { recursive: true, force: true }));

  it('sends brotli to a browser that accepts it, and the bytes decompress to the file', async () => {
    const res = await rawGet(app, '/chunk-ABCD1234.js', { 'Accept-Encoding': 'gzip, deflate, br' });
    expect(res.status).toBe(200);
    expect(res.headers['content-encoding']).toBe('br');
    expect(res.headers['vary']).toMatch(/Accept-Encoding/);
    expect(res.headers['content-type']).toMatch(/javascript/);
    expect(res.headers['cache-control']).toBe('public, max-age=31536000, immutable');
    expect(res.body.length).toBeLessThan(chunk.length / 4);
    expect(zlib.brotliDecompressSync(res.body).toString()).toBe(chunk);
  });

  it('sends gzip when brotli is not offered (plain-HTTP Chromium), and plain bytes when nothing is', async () => {
    const gz = await rawGet(app, '/chunk-ABCD1234.js', { 'Accept-Encoding': 'gzip, deflate' });
    expect(gz.headers['content-encoding']).toBe('gzip');
    expect(zlib.gunzipSync(gz.body).toString()).toBe(chunk);

    const plain = await rawGet(app, '/chunk-ABCD1234.js', { 'Accept-Encoding': 'identity' });
    expect(plain.headers['content-encoding']).toBeUndefined();
    expect(plain.body.toString()).toBe(chunk);
    const refused = await rawGet(app, '/chunk-ABCD1234.js', { 'Accept-Encoding': 'br;q=0, gzip;q=0' });
    expect(refused.headers['content-encoding']).toBeUndefined();
    expect(refused.body.toString()).toBe(chunk);
  });

  it('answers 304 to a revalidation with the ETag it sent', async () => {
    const first = await request(app).get('/chunk-ABCD1234.js').set('Accept-Encoding', 'gzip').expect(200);
    const etag = first.headers['etag'];
    expect(etag).toBeTruthy();
    await request(app).get('/chunk-ABCD1234.js').set('Accept-Encoding', 'gzip').set('If-None-Match', etag).expect(304);
  });

  it('serves the new content when a file is rebuilt under the same name', async () => {
    await request(app).get('/chunk-ABCD1234.js').set('Accept-Encoding', 'gzip').expect(200);
    const rebuilt = chunk.replace(/figure/g, 'moment');
    writeFileSync(chunkFile(), rebuilt);
    utimesSync(chunkFile(), new Date(), new Date(Date.now() + 5000));
    const res = await request(app).get('/chunk-ABCD1234.js').set('Accept-Encoding', 'gzip').expect(200);
    expect(res.text).toBe(rebuilt);
  });

  it('leaves small files, dotfiles and paths outside the app folder alone', async () => {
    const index = await request(app).get('/projects').set('Accept-Encoding', 'gzip').expect(200);
    expect(index.headers['cache-control']).toBe('no-cache');
    const tiny = await request(app).get('/tiny-ABCD1234.js').set('Accept-Encoding', 'br, gzip').expect(200);
    expect(tiny.headers['content-encoding']).toBeUndefined();
    expect(tiny.text).toBe('export {};\n');
    // Dotfiles and escapes fall through to the app's index page, never the file.
    const hidden = await request(app).get('/.hidden.json').set('Accept-Encoding', 'gzip').expect(200);
    expect(hidden.text).not.toContain('secret');
    const escape = await request(app).get('/..%2fsecret.txt').set('Accept-Encoding', 'gzip');
    expect(escape.text).not.toContain('ssss');
  });

  it('answers the home address and every deep link with its app, and leaves the API alone', async () => {
    // The first address `npm start` prints is `/`; Express 5's `/*splat` alone needs a segment, so it answered 404.
    for (const url of ['/', '/projects', '/projects/p1/parts/x2/compare', '/signin?next=%2F', '/no-such-page']) {
      const res = await request(app).get(url).expect(200);
      expect({ url, text: res.text }).toEqual({ url, text: '<!doctype html><title>designer</title>' });
    }
    // `/admin` moves to `/admin/`, where the admin app's relative base resolves.
    expect((await request(app).get('/admin').expect(301)).headers['location']).toBe('/admin/');
    for (const url of ['/admin/', '/admin/members', '/admin/operator/workspaces']) {
      const res = await request(app).get(url).expect(200);
      expect({ url, text: res.text }).toEqual({ url, text: '<!doctype html><title>admin</title>' });
    }
    // Paths under /api are never answered with a page; a neighbour that only starts with the letters is.
    await request(app).get('/api/v1/nothing').expect(404);
    await request(app).get('/api').expect(404);
    expect((await request(app).get('/apiary').expect(200)).text).toContain('designer');
  });

  it('says how to build an app that has not been built', async () => {
    rmSync(path.join(dist, 'designer', 'browser', 'index.html'));
    const res = await request(app).get('/').expect(503);
    expect(res.text).toMatch(/has not been built yet/);
  });
});
