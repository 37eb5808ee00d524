// createApp(deps): the Express app — security headers, request log, JSON bodies, the API under /api, and the
// exported web app (with SPA fallback) from the same origin.
import { existsSync } from 'node:fs';
import { join, resolve } from 'node:path';
import express, { type Express } from 'express';
import helmet from 'helmet';
import { pinoHttp } from 'pino-http';
import type { AppDeps } from './app-deps';
import { AppError } from './http/errors';
import { errorMiddleware } from './http/error-middleware';
import { MODULES } from './modules';

export interface AppOptions {
  /** Folder of the exported web app (index.html + assets); omitted: only the API is served. */
  webDir?: string;
}

export function createApp(deps: AppDeps, opts: AppOptions = {}): Express {
  const app = express();
  app.disable('x-powered-by');
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          // Photos are shown from blob: URLs before they sync; fonts and icons ship as data: in places.
          'img-src': ["'self'", 'data:', 'blob:'],
          'font-src': ["'self'", 'data:'],
          'worker-src': ["'self'"],
          // blob: too: the web image picker hands over a blob: URL that the photo resize step reads with fetch().
          'connect-src': ["'self'", 'blob:'],
          // Off: a phone on the field's Wi-Fi opens http://<laptop-ip>:8080, and upgrading its requests to https breaks them.
          'upgrade-insecure-requests': null,
        },
      },
    }),
  );
  app.use(
    pinoHttp({
      logger: deps.logger,
      // Never log headers (bearer tokens) or bodies (passwords).
      serializers: {
        req: (req: { id: unknown; method: string; url: string }) => ({ id: req.id, method: req.method, url: req.url.split('?')[0] }),
        res: (res: { statusCode: number }) => ({ statusCode: res.statusCode }),
      },
      customLogLevel: (_req, res, err) => (err || res.statusCode >= 500 ? 'error' : 'info'),
    }),
  );
  app.use(express.json({ limit: deps.config.jsonLimit }));

  for (const m of MODULES) app.use(`/api${m.mount}`, m.router(deps));
  app.use('/api', (req, _res, next) => next(new AppError('not_found', 'not_found', `no API route ${req.method} ${req.baseUrl}${req.path}`)));

  if (opts.webDir && existsSync(join(opts.webDir, 'index.html'))) {
    const webDir = resolve(opts.webDir);
    const index = join(webDir, 'index.html');
    app.use(
      express.static(webDir, {
        index: false,
        setHeaders: (res, path) => {
          // index.html and the service worker must be re-checked on every load; hashed bundles may be cached.
          if (path.endsWith('.html') || path.endsWith('sw.js')) res.setHeader('Cache-Control', 'no-cache');
        },
      }),
    );
    // The app's routes (/events/…, /invite/<token>) are client-side: any other GET gets index.html.
    app.get('/{*splat}', (_req, res) => {
      res.setHeader('Cache-Control', 'no-cache');
      res.sendFile(index);
    });
  }
  app.use((req, _res, next) => next(new AppError('not_found', 'not_found', `nothing at ${req.path}`)));
  app.use(errorMiddleware(deps.logger));
  return app;
}
