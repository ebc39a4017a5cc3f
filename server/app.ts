import compression from 'compression';
import connectPgSimple from 'connect-pg-simple';
import express, { type Express, type Router } from 'express';
import expressStaticGzip from 'express-static-gzip';
import session from 'express-session';
import helmet from 'helmet';
import { existsSync } from 'node:fs';
import path from 'node:path';
import type { AppConfig } from './config';
import type { DbHandle } from './db/client';
import { createAuthRepository } from './features/auth/auth.repository';
import { authRouter } from './features/auth/auth.router';
import { createAuthService } from './features/auth/auth.service';
import { healthRouter } from './features/health/health.router';
import { createInvitationsRepository } from './features/invitations/invitations.repository';
import { publicInvitationsRouter, studioInvitationsRouter } from './features/invitations/invitations.router';
import { createInvitationsService } from './features/invitations/invitations.service';
import { createStudioRepository } from './features/studio/studio.repository';
import { STUDIO_DATA_IMPORT_PATH, studioDataBodyParser } from './features/studio-data/studio-data-body';
import { studioRouter } from './features/studio/studio.router';
import { createStudioService } from './features/studio/studio.service';
import { createClientShell } from './lib/client-shell';
import { compressible } from './lib/compressible';
import type { Mailer } from './lib/mail';
import type { ObjectStorage } from './lib/storage';
import { loadAuth } from './middleware/auth';
import { csrfProtection } from './middleware/csrf';
import { errorHandler, notFoundHandler } from './middleware/error-handler';
import './middleware/session-types';

export type AppDeps = {
  config: AppConfig;
  db: DbHandle;
  storage: ObjectStorage;
  mailer: Mailer;
  // Feature routers that need more than the basics (queue, workers) are mounted by the caller.
  extraRouters?: (shared: SharedServices) => Router[];
  clientDir?: string;
};

export type SharedServices = { auth: ReturnType<typeof createAuthService> };

const PgStore = connectPgSimple(session);
const SESSION_COOKIE = 'motifold.sid';

export function createApp(deps: AppDeps): Express {
  const { config, db, storage, mailer } = deps;
  const app = express();
  // Secure cookies and https upgrades follow the public address, not NODE_ENV: a plain-http
  // local run must still be able to sign in.
  const httpsOnly = config.appUrl.startsWith('https:');
  app.disable('x-powered-by');
  app.set('trust proxy', config.NODE_ENV === 'production' ? 1 : false);

  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          defaultSrc: ["'self'"],
          imgSrc: ["'self'", 'data:', 'blob:'],
          // React sets style attributes (canvas sizes, swatches); no remote styles.
          styleSrc: ["'self'", "'unsafe-inline'"],
          fontSrc: ["'self'"],
          connectSrc: ["'self'"],
          workerSrc: ["'self'", 'blob:'],
          upgradeInsecureRequests: httpsOnly ? [] : null,
        },
      },
      crossOriginEmbedderPolicy: false,
    }),
  );

  app.use(compression({ filter: compressible }));

  // The studio data import takes a larger body than any other route.
  app.use(STUDIO_DATA_IMPORT_PATH, studioDataBodyParser);
  app.use('/api', express.json({ limit: config.JSON_LIMIT_BYTES }));
  app.use(
    '/api',
    session({
      name: SESSION_COOKIE,
      store: new PgStore({ pool: db.pool, tableName: 'session', createTableIfMissing: false, pruneSessionInterval: 15 * 60 }),
      secret: config.sessionSecret,
      resave: false,
      saveUninitialized: false,
      cookie: {
        httpOnly: true,
        sameSite: 'lax',
        secure: httpsOnly,
        maxAge: 30 * 24 * 3600 * 1000,
      },
    }),
  );

  const authRepo = createAuthRepository(db.db);
  const studioRepo = createStudioRepository(db.db);
  const auth = createAuthService({ repo: authRepo, mailer, config });
  const invitations = createInvitationsService({
    repo: createInvitationsRepository(db.db),
    studios: studioRepo,
    users: authRepo,
    mailer,
    config,
  });

  app.use('/api', csrfProtection, loadAuth(auth.loadContext));
  app.use(healthRouter({ db: db.db, storage, mailer }));
  app.use(authRouter(auth, config));
  app.use(studioRouter(createStudioService(studioRepo)));
  app.use(studioInvitationsRouter(invitations));
  app.use(publicInvitationsRouter(invitations, auth));
  for (const router of deps.extraRouters?.({ auth }) ?? []) app.use(router);
  app.use('/api', notFoundHandler);

  const clientDir = deps.clientDir ?? path.resolve('dist/client');
  if (existsSync(path.join(clientDir, 'index.html'))) {
    const assetsDir = path.join(clientDir, 'assets') + path.sep;
    app.use(
      // The build writes brotli and gzip copies beside scripts and styles (vite.config.ts): sent
      // as they are, so no request pays for compressing them.
      expressStaticGzip(clientDir, {
        index: false,
        enableBrotli: true,
        orderPreference: ['br', 'gz'],
        serveStatic: {
          maxAge: '1h',
          // Vite names every file under assets/ by its content's hash: a new build is a new name.
          setHeaders: (res, file) => {
            if (file.startsWith(assetsDir)) res.setHeader('Cache-Control', 'public, max-age=31536000, immutable');
          },
        },
      }),
    );
    // Client-side routes all answer with the app shell.
    app.get(/^(?!\/api\/).*/, createClientShell(clientDir, { sessionCookie: SESSION_COOKIE }));
  }
  app.use(errorHandler);
  return app;
}
