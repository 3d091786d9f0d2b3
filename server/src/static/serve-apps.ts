import compression from 'compression';
import express, { Router } from 'express';
import { existsSync } from 'node:fs';
import path from 'node:path';
import zlib from 'node:zlib';

/** Hashed assets (the builder names them `chunk-7BDNFNOT.js`) never change under their name; everything else is revalidated. */
const cacheControl = (file: string) => (/-[0-9A-Z]{8}\.(js|css|woff2?)$/.test(file) ? 'public, max-age=31536000, immutable' : 'no-cache');

/** `/api`, `/api/…` belong to `/api`; `/apiary` does not. */
const belongsTo = (requestPath: string, prefix: string) => requestPath === prefix || requestPath.startsWith(`${prefix}/`);

/**
 * The built apps: admin at /admin/, designer at /. Unknown paths inside an app answer its
 * index.html so client-side routes survive a reload. Hashed assets are cached for a year. Text
 * files go out brotli- or gzip-compressed to browsers that accept it.
 */
export function serveApps(distDir: string): Router {
  const router = Router();
  // brotli when the browser accepts it, else gzip (plain-HTTP Chromium offers only gzip); text only.
  router.use(compression({ brotli: { params: { [zlib.constants.BROTLI_PARAM_QUALITY]: 5 } } }));
  const mount = (prefix: string, folder: string, name: string) => {
    const root = path.join(distDir, folder, 'browser');
    const index = path.join(root, 'index.html');
    router.use(
      prefix,
      express.static(root, {
        index: false,
        setHeaders: (res, file) => {
          res.setHeader('Cache-Control', cacheControl(file));
        },
      }),
    );
    // `{/*splat}` also matches the bare prefix: Express 5's `/*splat` needs one segment, so `/` answered 404.
    router.get(prefix === '/' ? '{/*splat}' : `${prefix}{/*splat}`, (req, res, next) => {
      if (prefix === '/' && (belongsTo(req.path, '/api') || belongsTo(req.path, '/admin'))) return next();
      if (!existsSync(index)) {
        res
          .status(503)
          .type('text/plain')
          .send(`The ${name} app has not been built yet. Run "npm start" (it builds the apps) or "npm run build".`);
        return;
      }
      res.setHeader('Cache-Control', 'no-cache');
      res.sendFile(index);
    });
  };
  mount('/admin', 'admin', 'admin');
  mount('/', 'designer', 'designer');
  return router;
}
