import cookieParser from 'cookie-parser';
import express, { type Express } from 'express';
import helmet from 'helmet';
import { pinoHttp } from 'pino-http';
import { requireCsrf } from './auth/csrf.ts';
import { loadSession } from './auth/require-user.ts';
import { type AppDeps, type AppOptions, resolveDeps } from './deps.ts';
import { errorHandler, sendError } from './core/errors.ts';
import { redactUrl } from './http/redact-url.ts';
import { allRoutes } from './http/all-routes.ts';
import { buildApiRouter, type RouteDef } from './http/registry.ts';
import { mountStaticClient } from './static-client.ts';

/** Largest JSON body the API reads; bigger ones get 413 payload_too_large. */
export const JSON_BODY_LIMIT = '1mb';

/**
 * Strict CSP for the built client: everything from our own origin, workers also from blob:
 * (comlink/Vite), images from data:/blob: (chart snapshots), no inline script or style.
 */
const contentSecurityPolicy = {
  useDefaults: false,
  directives: {
    defaultSrc: ["'self'"],
    scriptSrc: ["'self'"],
    styleSrc: ["'self'"],
    fontSrc: ["'self'"],
    imgSrc: ["'self'", 'data:', 'blob:'],
    workerSrc: ["'self'", 'blob:'],
    connectSrc: ["'self'"],
    objectSrc: ["'none'"],
    baseUri: ["'self'"],
    formAction: ["'self'"],
    frameAncestors: ["'none'"],
  },
};

export interface App {
  app: Express;
  deps: AppDeps;
  /** The routes mounted under /api, as declared (for the route × role test). */
  routes: RouteDef[];
}

/** Builds the Express app without listening, so tests can drive it with supertest. */
export function createApp(options: AppOptions): App {
  const deps = resolveDeps(options);
  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', deps.trustProxy);

  app.use(
    helmet({
      contentSecurityPolicy,
      // Plain http on loopback is the default deployment; HTTPS belongs to the proxy in front.
      strictTransportSecurity: false,
    }),
  );
  app.use(
    pinoHttp({
      logger: deps.logger,
      autoLogging: { ignore: (req) => !req.url?.startsWith('/api') },
      // One short line per API request; headers (cookies!) stay out of the log.
      serializers: {
        req: (req: { method: string; url: string }) => ({ method: req.method, url: redactUrl(req.url) }),
        res: (res: { statusCode: number }) => ({ status: res.statusCode }),
      },
    }),
  );
  app.use(cookieParser());
  app.use('/api', express.json({ limit: JSON_BODY_LIMIT }));
  app.use('/api', loadSession(deps));
  app.use('/api', requireCsrf(deps));

  const routes = allRoutes(deps);
  app.use(buildApiRouter(routes, deps));
  app.use('/api', (req, res) => sendError(res, 'not_found', `No API route ${req.method} ${req.originalUrl}.`));

  if (deps.client.kind === 'static') mountStaticClient(app, deps.client.distDir);

  app.use(errorHandler(deps.logger));
  return { app, deps, routes };
}
