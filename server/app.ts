// createApp(): the Express application, without listen (tests use it with supertest). It builds the app and
// starts nothing: the process entry (server/index.ts) and the test set-ups start the change feed.
import fs from 'node:fs';
import path from 'node:path';
import { randomBytes } from 'node:crypto';
import express, { type Express, Router } from 'express';
import session from 'express-session';
import connectPgSimple from 'connect-pg-simple';
import helmet from 'helmet';
import passport from 'passport';
import pg from 'pg';
import onHeaders from 'on-headers';
import { configurePassport } from './modules/auth/passport';
import { signInLimiter } from './modules/auth/router';
import { csrfProtection } from './middleware/csrf';
import { CachedSessionStore } from './middleware/session-cache';
import { changeFeed } from './db/change-feed';
import { errorHandler, notFoundApi } from './middleware/errors';
import { routeTable, toHandlers } from './http/route-table';
import { allRoutes } from './http/routes';
import { env } from './config/env';

export interface AppOptions {
  databaseUrl: string;
  sessionSecret?: string;
  /** serve the built client from dist/ (production start) */
  serveClient?: boolean;
}

const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);

export function createApp(opts: AppOptions): Express {
  const e = env();
  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', 'loopback');
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          defaultSrc: ["'self'"],
          imgSrc: ["'self'", 'data:', 'blob:'],
          styleSrc: ["'self'", "'unsafe-inline'"],
          fontSrc: ["'self'", 'data:'],
          scriptSrc: ["'self'"],
          connectSrc: ["'self'"],
          objectSrc: ["'none'"],
          frameAncestors: ["'none'"],
          upgradeInsecureRequests: null,
        },
      },
      crossOriginEmbedderPolicy: false,
    }),
  );
  app.use('/api', express.json({ limit: '1mb' }));

  const PgStore = connectPgSimple(session);
  const sessionPool = new pg.Pool({ connectionString: opts.databaseUrl, max: 10, connectionTimeoutMillis: 10_000, keepAlive: true });
  sessionPool.on('error', () => undefined); // an idle client dropped by the server; the pool reconnects
  app.locals.sessionPool = sessionPool;
  // Per-process caches (sessions, signed-in users, panel pages) stay correct through the change feed; while
  // it is not started (or down) every read asks the database. The caller starts it (startChangeFeed).
  const feed = changeFeed();
  app.locals.changeFeed = feed;
  app.use('/api', (req, res, next) => {
    if (SAFE_METHODS.has(req.method)) return next();
    feed.localWrite();
    onHeaders(res, () => feed.localWrite());
    next();
  });
  app.use(
    session({
      name: 'pw.sid',
      secret: opts.sessionSecret ?? e.SESSION_SECRET ?? randomBytes(32).toString('hex'),
      store: new CachedSessionStore(
        new PgStore({
          pool: sessionPool,
          tableName: 'session',
          createTableIfMissing: false,
          disableTouch: true,
          pruneSessionInterval: e.NODE_ENV === 'test' ? false : 60 * 15,
        }),
        feed,
      ),
      resave: false,
      saveUninitialized: false,
      rolling: false,
      cookie: {
        httpOnly: true,
        sameSite: 'lax',
        secure: e.NODE_ENV === 'production' && e.APP_URL.startsWith('https'),
        maxAge: 12 * 60 * 60 * 1000,
      },
    }),
  );
  configurePassport();
  app.use(passport.session());
  app.use('/api', csrfProtection);

  const api = Router();
  routeTable.length = 0;
  for (const spec of allRoutes(signInLimiter())) {
    routeTable.push(spec);
    api[spec.method](spec.path, ...toHandlers(spec));
  }
  app.use(api);
  app.use('/api', notFoundApi);

  if (opts.serveClient) {
    const dist = path.resolve(import.meta.dirname, '..', 'dist');
    if (fs.existsSync(dist)) {
      app.use(express.static(dist, { index: false, maxAge: '1h' }));
      app.get('/{*splat}', (_req, res) => res.sendFile(path.join(dist, 'index.html')));
    }
  }
  app.use(errorHandler);
  return app;
}
