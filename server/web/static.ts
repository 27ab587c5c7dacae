import fs from 'node:fs';
import path from 'node:path';
import express, { type Router } from 'express';

const ASSET_EXT = /\.(js|mjs|css|map|wasm|png|jpe?g|gif|svg|ico|ttf|otf|woff2?|json|txt|webmanifest)$/i;

const MISSING_PAGE = `<!doctype html><html lang="en"><head><meta charset="utf-8"><title>Tessera</title></head>
<body style="font-family:sans-serif;max-width:40rem;margin:3rem auto;line-height:1.5">
<h1>Tessera server is running</h1>
<p>The web app has not been built yet. Run <code>npm run build:web</code> and reload this page.</p>
<p>The API answers under <code>/api</code>.</p></body></html>`;

/**
 * Serves the Expo web export: hashed assets cached, index.html never (so a new build shows at
 * once), `.wasm` as application/wasm (expo-sqlite's web worker refuses anything else), and every
 * other GET outside /api falls back to index.html for client-side routes.
 */
export function webRouter(webDir: string): Router {
  const router = express.Router();
  const dir = path.resolve(webDir);
  const index = path.join(dir, 'index.html');
  router.use(
    express.static(dir, {
      index: false,
      setHeaders: (res, file) => {
        if (file.endsWith('.wasm')) res.setHeader('Content-Type', 'application/wasm');
        if (file.endsWith('.html') || path.basename(file) === 'sw.js' || path.basename(file) === 'service-worker.js') res.setHeader('Cache-Control', 'no-cache');
      },
    }),
  );
  router.get(/^(?!\/api(\/|$)).*/, (req, res, next) => {
    if (!fs.existsSync(index)) {
      res.status(200).type('html').setHeader('Cache-Control', 'no-cache').send(MISSING_PAGE);
      return;
    }
    // A missing asset is a 404, not the app page (route paths may hold dots, e.g. entry ids).
    if (ASSET_EXT.test(req.path)) return next();
    res.setHeader('Cache-Control', 'no-cache');
    res.sendFile(index);
  });
  return router;
}
