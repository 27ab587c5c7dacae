import 'reflect-metadata';
import cors from 'cors';
import express, { type Express } from 'express';
import helmet from 'helmet';
import pino, { type Logger } from 'pino';
import type { DataSource } from 'typeorm';
import type { Config } from './config';
import { requireAccess, type RouteDef } from './auth/access';
import { authRoutes } from './auth/router';
import { AuthService } from './auth/service';
import { apiNotFound, errorMiddleware } from './errors/middleware';
import { libraryRoutes } from './library/router';
import { adminRoutes } from './admin/router';
import { reviewRoutes } from './review/router';
import { ReviewService } from './review/service';
import { submissionRoutes } from './submissions/router';
import { SubmissionService } from './submissions/service';
import { syncRoutes } from './sync/router';
import type { Mailer } from './mail/mailer';
import { webRouter } from './web/static';

/** Reported by /api/health; bump with the API shapes. */
export const SERVER_VERSION = '0.1.0';

export interface AppDeps {
  dataSource: DataSource;
  config: Config;
  mailer: Mailer;
  logger?: Logger;
}

export interface TesseraApp extends Express {
  locals: Express['locals'] & { routes: RouteDef[]; services: { auth: AuthService; submissions: SubmissionService; review: ReviewService } };
}

/** Builds the Express app on an initialized data source. Listening is server/index.ts's job. */
export function createApp(deps: AppDeps): TesseraApp {
  const { dataSource: ds, config, mailer } = deps;
  const logger = deps.logger ?? pino({ level: config.logLevel });
  const auth = new AuthService(ds, config, mailer);
  const submissions = new SubmissionService(ds, config, mailer, logger);
  const review = new ReviewService(ds, config, mailer, logger);
  const routes: RouteDef[] = [
    ...adminRoutes(ds, SERVER_VERSION),
    ...authRoutes(auth, config, ds),
    ...libraryRoutes(ds),
    ...submissionRoutes(submissions, config),
    ...reviewRoutes(review),
    ...syncRoutes(ds, submissions),
  ];

  const app = express() as TesseraApp;
  app.disable('x-powered-by');
  // Only 127.0.0.1 by default; a reverse proxy in front would need this changed deliberately.
  app.set('trust proxy', false);
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          defaultSrc: ["'self'"],
          // The web export's wasm (expo-sqlite) needs wasm-unsafe-eval; its worker may start from a blob.
          scriptSrc: ["'self'", "'wasm-unsafe-eval'", "'unsafe-inline'"],
          workerSrc: ["'self'", 'blob:'],
          styleSrc: ["'self'", "'unsafe-inline'"],
          imgSrc: ["'self'", 'data:', 'blob:'],
          fontSrc: ["'self'", 'data:'],
          connectSrc: ["'self'"],
          objectSrc: ["'none'"],
          frameAncestors: ["'self'"],
          upgradeInsecureRequests: null,
        },
      },
      // Plain http on 127.0.0.1: HSTS would pin browsers to https for the host.
      strictTransportSecurity: false,
    }),
  );
  app.use('/api', cors({ origin: config.appOrigins, credentials: false, maxAge: 600 }));
  app.use('/api', express.json({ limit: '1mb' }));
  // API answers carry tokens and personal data: never kept by browsers or proxies (sync pages
  // relax this to revalidation with their ETag).
  app.use('/api', (_req, res, next) => {
    res.setHeader('Cache-Control', 'no-store');
    next();
  });

  for (const r of routes) app[r.method](r.path, requireAccess(r.access, ds, config.jwtSecret), ...r.handlers);
  app.use('/api', apiNotFound);
  app.use(webRouter(config.webDir));
  app.use(errorMiddleware(logger));

  app.locals.routes = routes;
  app.locals.services = { auth, submissions, review };
  return app;
}
