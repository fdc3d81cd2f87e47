import fs from 'node:fs';
import path from 'node:path';
import express, { Router, type Request, type Response } from 'express';
import { listPrecompressed, pickEncoding, PRECOMPRESSED, type Encoding } from './precompressed';

/** Angular's output names: `main-ABCD1234.js`, `chunk-….js`, `styles-….css`, fonts `roboto-…-ABCD1234.woff2`. */
const HASHED = /-[A-Z0-9]{8,}\.[a-z0-9]+$/;
const IMMUTABLE = 'public, max-age=31536000, immutable';

/**
 * Serves the built Angular app. Files built with `.br` / `.gz` siblings (scripts/build.mjs writes
 * them after ng build) go out in the encoding the client accepts, with `Vary: Accept-Encoding`.
 * Hashed files are cached for a year; index.html never is, and every other GET outside /api falls
 * back to it so client routes survive a reload.
 */
export function webAppRouter(distDir: string): Router {
  const router = Router();
  const index = path.join(distDir, 'index.html');
  const variants = listPrecompressed(distDir); // read once: a new build comes with a restart
  const serve = express.static(distDir, {
    index: false,
    setHeaders(res, file) {
      const encoding = res.locals.encoding as Encoding | undefined;
      const original = encoding ? file.slice(0, -PRECOMPRESSED[encoding].length) : file;
      if (encoding) {
        res.setHeader('Content-Encoding', encoding);
        res.type(path.extname(original)); // the original's type, not "application/x-brotli"
      }
      if (HASHED.test(path.basename(original))) res.setHeader('Cache-Control', IMMUTABLE);
    },
  });

  /** Points the request at the best encoded sibling of `relative` (a path inside distDir), when one exists. */
  const negotiate = (req: Request, res: Response, relative: string): string => {
    const offered = variants.get(relative);
    if (!offered) return relative;
    res.vary('Accept-Encoding');
    const encoding = pickEncoding(req.headers['accept-encoding'], offered);
    if (!encoding) return relative;
    res.locals.encoding = encoding;
    return relative + PRECOMPRESSED[encoding];
  };

  router.use((req, res, next) => {
    if (req.method !== 'GET' && req.method !== 'HEAD') return next();
    let relative: string;
    try {
      relative = decodeURIComponent(req.path).replace(/^\/+/, '');
    } catch {
      return next();
    }
    const chosen = negotiate(req, res, relative);
    if (chosen === relative) return serve(req, res, next);
    const original = req.url;
    req.url = '/' + chosen.split('/').map(encodeURIComponent).join('/') + (original.includes('?') ? original.slice(original.indexOf('?')) : '');
    serve(req, res, (error?: unknown) => {
      req.url = original;
      delete res.locals.encoding;
      next(error);
    });
  });
  router.get('/{*splat}', (req, res, next) => {
    if (req.path.startsWith('/api/') || req.path === '/api') return next();
    if (!fs.existsSync(index)) {
      res.status(503).type('text').send('The web app is not built yet. Run `npm run build` (or `npm start`, which builds it).');
      return;
    }
    res.setHeader('Cache-Control', 'no-cache');
    const chosen = negotiate(req, res, 'index.html');
    const encoding = res.locals.encoding as Encoding | undefined;
    if (encoding) res.setHeader('Content-Encoding', encoding).type('html');
    res.sendFile(chosen, { root: distDir }); // root: a dist folder under a dot folder (.tmp/web-…) is still served
  });
  return router;
}
