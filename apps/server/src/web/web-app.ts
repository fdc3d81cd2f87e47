import fs from 'node:fs';
import path from 'node:path';
import express, { Router } from 'express';

/**
 * Serves the built Angular app. Hashed bundles are cached for a year; index.html never is, and
 * every other GET outside /api falls back to it so client routes survive a reload.
 */
export function webAppRouter(distDir: string): Router {
  const router = Router();
  const index = path.join(distDir, 'index.html');
  router.use(
    express.static(distDir, {
      index: false,
      setHeaders(res, file) {
        if (/\.[0-9a-z]{8,}\.(js|css|woff2?)$/i.test(path.basename(file)) || /-[A-Z0-9]{8,}\.(js|css)$/.test(file)) {
          res.setHeader('Cache-Control', 'public, max-age=31536000, immutable');
        }
      },
    }),
  );
  router.get('/{*splat}', (req, res, next) => {
    if (req.path.startsWith('/api/') || req.path === '/api') return next();
    if (!fs.existsSync(index)) {
      res.status(503).type('text').send('The web app is not built yet. Run `npm run build` (or `npm start`, which builds it).');
      return;
    }
    res.setHeader('Cache-Control', 'no-cache');
    res.sendFile(index, { dotfiles: 'allow' }); // the build may live under a dot folder (.tmp/web-…)
  });
  return router;
}
