import { existsSync } from 'node:fs';
import { join } from 'node:path';
import express, { Router } from 'express';
import { renderPage } from './html';

const INDEX = 'index.html';

/** Paths the single-page app never answers: the server's own routes. */
const SERVER_PREFIXES = ['/api', '/auth', '/fake-oauth', '/dev', '/fonts', '/collab'];

function isServerPath(path: string): boolean {
  return SERVER_PREFIXES.some((prefix) => path === prefix || path.startsWith(`${prefix}/`));
}

const NOT_BUILT = renderPage(
  'Sheaf: web app not built',
  `<h1>The web app has not been built yet</h1>
   <p class="lead">The server is running and its API answers under <code>/api</code>, but there is no built
   web app to serve.</p>
   <p>Build it, then reload this page:</p>
   <pre>npm run build --workspace @sheaf/web</pre>
   <p>(<code>npm start</code> at the top of the project builds it for you.)</p>`,
);

/**
 * Serves the built web app (packages/web/dist) with a fallback to index.html for client-side
 * routes, and the shared font files at /fonts/. Without a build, pages answer 503 saying how to
 * build it. Checked per request, so building while the server runs works.
 */
export function webAppRouter(webDist: string, fontsDir: string): Router {
  const router = Router();
  router.use('/fonts', express.static(fontsDir, { immutable: true, maxAge: '30d', index: false }), (req, res) => {
    res.status(404).type('text/plain').send(`no font file ${req.path}`);
  });

  const assets = express.static(webDist, {
    index: false,
    setHeaders: (res, path) => {
      if (path.includes(`${join('/', 'assets')}/`)) res.setHeader('Cache-Control', 'public, max-age=31536000, immutable');
    },
  });
  const indexFile = join(webDist, INDEX);

  router.use((req, res, next) => {
    if (isServerPath(req.path)) {
      next();
      return;
    }
    if (!existsSync(indexFile)) {
      if (req.method === 'GET' || req.method === 'HEAD') res.status(503).type('html').set('Retry-After', '30').send(NOT_BUILT);
      else next();
      return;
    }
    assets(req, res, () => {
      if (req.method !== 'GET' && req.method !== 'HEAD') {
        next();
        return;
      }
      // A missing file (an old asset name, a typo) is a 404, not the app's page.
      if (/\.[a-z0-9]+$/i.test(req.path)) {
        res.status(404).type('text/plain').send(`not found: ${req.path}`);
        return;
      }
      res.setHeader('Cache-Control', 'no-cache');
      // `root` keeps the dot-file rule to the path inside the build: the project may itself sit
      // under a folder whose name starts with a dot (~/.local/src/sheaf, say).
      res.sendFile(INDEX, { root: webDist }, (error?: Error & { status?: number; statusCode?: number }) => {
        if (error === undefined) return;
        if (res.headersSent) {
          next(error);
          return;
        }
        // Removed between the check above and the read (a rebuild in progress): not found.
        if ((error.status ?? error.statusCode) === 404) res.status(404).type('text/plain').send(`not found: ${req.path}`);
        else next(error);
      });
    });
  });
  return router;
}
