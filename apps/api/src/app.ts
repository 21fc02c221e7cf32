import cookieParser from 'cookie-parser';
import express, { type Express } from 'express';
import helmet from 'helmet';
import { existsSync } from 'node:fs';
import path from 'node:path';
import type { Logger } from 'pino';
import type { DataSource } from 'typeorm';
import type { Config } from './config/config';
import { signInRequired } from './auth/authenticate';
import { csrfProtection } from './auth/csrf';
import type { Notifier } from './mail/notifier';
import { createStorage } from './storage/create-storage';
import type { BlobStorage } from './storage/storage';
import type { SheetRenderer } from './sheets/sheet-renderer';
import type { SessionCache } from './auth/session-cache';
import { createServices } from './wiring';
import { apiNotFound, errorMiddleware } from './http/error-middleware';
import { requestLog } from './http/request-log';
import { authRoutes } from './routes/auth.routes';
import { componentsRoutes } from './routes/components.routes';
import { healthRoutes } from './routes/health.routes';
import { meRoutes } from './routes/me.routes';
import { attachmentsRoutes } from './routes/attachments.routes';
import { auditRoutes } from './routes/audit.routes';
import { issuedRoutes } from './routes/issued.routes';
import { projectsRoutes } from './routes/projects.routes';
import { revisionsRoutes } from './routes/revisions.routes';
import type { RouteDeps } from './routes/route-deps';
import { screenRoutes } from './routes/screen.routes';
import { sheetsRoutes } from './routes/sheets.routes';
import { usersRoutes } from './routes/users.routes';
import { verifyRoutes } from './routes/verify.routes';

export interface AppDependencies {
  readonly config: Config;
  readonly dataSource: DataSource;
  readonly logger: Logger;
  /** Who is told about what; by default mails written to the outbox. */
  readonly notifier?: Notifier;
  /** Where uploads live; by default the configured driver. */
  readonly storage?: BlobStorage;
  /** Renders sheets off the event loop; by default a pool of HOOPLINE_SHEET_THREADS threads. */
  readonly sheetRenderer?: SheetRenderer;
  /** Keeps session checks in memory, invalidated by the database; without it every request reads them. */
  readonly sessionCache?: SessionCache;
}

/** Builds the Express app; no listening, no side effects beyond the object. */
export function createApp({
  config,
  dataSource,
  logger,
  notifier,
  storage,
  sheetRenderer,
  sessionCache,
}: AppDependencies): Express {
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
          fontSrc: ["'self'"],
          connectSrc: ["'self'"],
          objectSrc: ["'none'"],
          frameAncestors: ["'none'"],
          upgradeInsecureRequests: null,
        },
      },
    }),
  );
  app.use(requestLog(logger));
  app.use(express.json({ limit: '1mb' }));
  app.use(cookieParser());

  const services = createServices(
    dataSource,
    config,
    storage ?? createStorage(config.storage),
    notifier,
    sheetRenderer,
  );
  const deps: RouteDeps = {
    config,
    services,
    dataSource,
    signedIn: signInRequired(dataSource, services.tokens, sessionCache),
  };
  const api = express.Router();
  api.use(csrfProtection);
  api.use(healthRoutes(dataSource));
  api.use(authRoutes(deps));
  api.use(meRoutes(deps));
  api.use(usersRoutes(deps));
  api.use(projectsRoutes(deps));
  api.use(componentsRoutes(deps));
  api.use(revisionsRoutes(deps));
  api.use(attachmentsRoutes(deps));
  api.use(sheetsRoutes(deps));
  api.use(issuedRoutes(deps));
  api.use(auditRoutes(deps));
  api.use(screenRoutes(deps));
  api.use(verifyRoutes(deps));
  api.use(apiNotFound);
  app.use('/api', api);

  if (config.webDist && existsSync(config.webDist)) {
    const dist = path.resolve(config.webDist);
    app.use(express.static(dist, { index: false, maxAge: '1h' }));
    // The web app routes in the browser: every other GET gets its shell.
    app.get(/^(?!\/api\/).*/, (_req, res) => {
      res.sendFile(path.join(dist, 'index.html'));
    });
  }

  app.use(errorMiddleware);
  return app;
}
