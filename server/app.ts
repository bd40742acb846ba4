// Builds the Express app: better-auth under /api/auth, the JSON API under /api, and the exported web
// build with a fallback to index.html for client routes.
import { toNodeHandler } from 'better-auth/node';
import express, { type Express } from 'express';
import { existsSync } from 'node:fs';
import path from 'node:path';
import { CLIENT_IP_HEADER } from './auth';
import type { AppContext } from './context';
import { databaseReachable } from './db';
import { apiNotFound, errorHandler } from './http/errors';
import { featureRouters } from './routes';
import { version } from '../package.json';

export function createApp(ctx: AppContext): Express {
  const app = express();
  app.disable('x-powered-by');
  app.set('etag', false);

  // The rate limit counts per client address: set it from the socket, never from what the client sends.
  app.use((req, _res, next) => {
    req.headers[CLIENT_IP_HEADER] = req.socket.remoteAddress ?? 'unknown';
    next();
  });

  // better-auth reads the raw body, so it is mounted before the JSON parser (Express 5 needs a named wildcard).
  app.all('/api/auth/*splat', toNodeHandler(ctx.auth));

  app.use('/api', express.json({ limit: '256kb' }));
  app.use('/api', (_req, res, next) => {
    res.set('Cache-Control', 'no-store');
    next();
  });

  app.get('/api/health', (_req, res) => {
    const database = databaseReachable(ctx.db);
    res.status(database ? 200 : 503).json({ ok: database, version, database });
  });

  app.get('/api/me', ctx.requireRole(), (req, res) => {
    res.json({ user: req.user });
  });

  for (const make of featureRouters) app.use('/api', make(ctx));

  app.use('/api', apiNotFound);
  app.use('/api', errorHandler(ctx.log));

  const webDir = path.resolve(ctx.env.WEB_DIR);
  if (existsSync(path.join(webDir, 'index.html'))) {
    app.use(express.static(webDir, { index: 'index.html', maxAge: '1h' }));
    app.get('/{*splat}', (_req, res) => res.sendFile(path.join(webDir, 'index.html')));
  } else {
    app.get('/', (_req, res) => {
      res.status(503).type('text').send('The web build is missing: run `npm run web:export` first.');
    });
  }
  app.use(errorHandler(ctx.log));
  return app;
}
