import { existsSync } from 'node:fs';
import path from 'node:path';

import express, { type Express } from 'express';
import session from 'express-session';
import helmet from 'helmet';
import type { Sequelize } from 'sequelize';

import { apiTokenRoutes } from './components/api-tokens/routes.js';
import { loadTokenUser } from './components/api-tokens/bearer.js';
import { assessmentRoutes } from './components/assessments/routes.js';
import { auditRoutes } from './components/audit/routes.js';
import { authRoutes } from './components/auth/routes.js';
import { candidateRoutes } from './components/candidates/routes.js';
import { coverageRoutes } from './components/coverage/routes.js';
import { healthRoutes } from './components/health/routes.js';
import { productLineRoutes } from './components/product-lines/routes.js';
import { requirementSetRoutes } from './components/requirement-sets/routes.js';
import { revisionRoutes } from './components/revisions/routes.js';
import { outboxRoutes } from './components/mail/routes.js';
import { reportRoutes } from './components/reports/routes.js';
import { inviteRoutes, passwordRoutes } from './components/passwords/routes.js';
import { userRoutes } from './components/users/routes.js';
import type { Config } from './config.js';
import { csrfGuard, loadUser } from './lib/auth-middleware.js';
import { contentTypeGuard } from './lib/content-type-guard.js';
import { errorMiddleware, notFoundApi } from './lib/error-middleware.js';
import { middlewareChain } from './lib/middleware-chain.js';
import { LeanSessionStore } from './lib/session-store.js';
import './lib/request-context.js';

export const SESSION_COOKIE = 'polecourt.sid';

export interface BuiltApp {
  app: Express;
  close(): void;
}

/** Builds the Express app; server.ts puts it on a port. */
export function buildApp(config: Config, sequelize: Sequelize): BuiltApp {
  const app = express();
  app.disable('x-powered-by');
  if (config.TRUST_PROXY) app.set('trust proxy', 1);

  app.use(
    helmet({
      contentSecurityPolicy: {
        useDefaults: true,
        directives: {
          'default-src': ["'self'"],
          'script-src': ["'self'"],
          'style-src': ["'self'", "'unsafe-inline'"],
          'img-src': ["'self'", 'data:', 'blob:'],
          'font-src': ["'self'", 'data:'],
          'connect-src': ["'self'"],
          'object-src': ["'none'"],
          'frame-ancestors': ["'none'"],
          'upgrade-insecure-requests': config.COOKIE_SECURE ? [] : null,
        },
      },
      crossOriginEmbedderPolicy: false,
    }),
  );

  // Health answers without touching the session store, so it can say "down".
  app.use('/api/health', healthRoutes(sequelize));

  const store = new LeanSessionStore({
    db: sequelize,
    tableName: 'sessions',
    checkExpirationInterval: 15 * 60 * 1000,
    expiration: config.SESSION_MAX_AGE_HOURS * 3600 * 1000,
  });

  // One router layer for all six (lib/middleware-chain.ts says why).
  app.use(
    '/api',
    middlewareChain(
      contentTypeGuard,
      express.json({ limit: '1mb' }),
      session({
        name: SESSION_COOKIE,
        secret: config.SESSION_SECRET,
        store,
        resave: false,
        saveUninitialized: false,
        rolling: true,
        proxy: config.TRUST_PROXY,
        cookie: {
          httpOnly: true,
          sameSite: 'lax',
          secure: config.COOKIE_SECURE,
          maxAge: config.SESSION_MAX_AGE_HOURS * 3600 * 1000,
          path: '/',
        },
      }),
      loadTokenUser,
      loadUser,
      csrfGuard,
    ),
  );

  // The core workflow: each router names its full paths under /api. It comes
  // first, the most used routers first, since Express tries every layer in
  // order and each miss costs a path match and its garbage on every request.
  app.use('/api', revisionRoutes(), assessmentRoutes(), candidateRoutes(), productLineRoutes(), requirementSetRoutes(), coverageRoutes());
  app.use('/api', reportRoutes());
  app.use(
    '/api/auth',
    authRoutes(SESSION_COOKIE, {
      maxPerAccount: config.LOGIN_MAX_FAILURES,
      maxPerAddress: config.LOGIN_MAX_FAILURES_PER_ADDRESS,
      windowMs: config.LOGIN_WINDOW_MINUTES * 60 * 1000,
    }),
  );
  app.use('/api/tokens', apiTokenRoutes());
  app.use('/api/auth', passwordRoutes());
  app.use('/api/users', inviteRoutes());
  app.use('/api/users', userRoutes());
  app.use('/api/outbox', outboxRoutes());
  app.use('/api/audit-events', auditRoutes());
  app.all('/api/{*rest}', notFoundApi);

  const webDist = config.WEB_DIST ?? path.resolve(import.meta.dirname, '../../web/dist');
  if (existsSync(path.join(webDist, 'index.html'))) {
    app.use(express.static(webDist, { index: false, maxAge: '1h' }));
    // Client-side routes all load the one page.
    app.get('/{*rest}', (_req, res) => {
      res.setHeader('Cache-Control', 'no-cache');
      res.sendFile(path.join(webDist, 'index.html'));
    });
  }

  app.use(errorMiddleware);

  return {
    app,
    close: () => store.stopExpiringSessions(),
  };
}
