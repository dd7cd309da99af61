import express, { type RequestHandler } from 'express';
import helmet from 'helmet';
import { existsSync } from 'node:fs';
import path from 'node:path';
import { authRouter } from './routes/auth/auth.routes';
import { configurePassport } from './security/passport';
import type { AppContext } from './config/context';
import { AppError, notFound } from './lib/errors';
import { httpLogger } from './lib/http-logger';
import { announceWrites } from './middleware/announce-writes';
import { errorHandler } from './middleware/error-handler';
import { registerRoutes } from './routes';
import { paymentWebhookRouter } from './routes/payments/payments.routes';
import { rateLimitRouter } from './security/rate-limits';
import { noStore, requireSameOrigin } from './security/same-origin';
import { sessionMiddleware } from './security/session';

export interface AppOptions {
  /** A built client to serve (production and browser tests); in development Vite serves it instead. */
  clientDist?: string;
  /** Mounted before the SPA fallback, e.g. Vite's dev middleware. */
  clientMiddleware?: RequestHandler;
}

/** Writes must be JSON: a cross-site HTML form cannot send that without a CORS preflight we never grant. */
const requireJsonWrites: RequestHandler = (req, _res, next) => {
  const writes = req.method !== 'GET' && req.method !== 'HEAD' && req.method !== 'OPTIONS';
  const hasBody = Number(req.headers['content-length'] ?? 0) > 0 || req.headers['transfer-encoding'] !== undefined;
  if (writes && hasBody && !req.is('application/json')) {
    next(
      new AppError(415, 'unsupported_media_type', 'Send the request body as JSON (Content-Type: application/json).'),
    );
    return;
  }
  next();
};

export function createApp(ctx: AppContext, options: AppOptions = {}) {
  const { env, logger } = ctx;
  const app = express();
  const secure = env.APP_ORIGIN.startsWith('https://');
  if (secure) app.set('trust proxy', 1);
  app.disable('x-powered-by');
  // Answers from `res.send` are API answers marked no-store (static files keep their own validators): nothing ever
  // revalidates them, so hashing every body for an ETag would be work for nobody.
  app.set('etag', false);

  const s3Origin = env.S3_ENDPOINT ? new URL(env.S3_ENDPOINT).origin : 'https://*.amazonaws.com';
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          'img-src': ["'self'", 'data:', 'blob:', s3Origin],
          'connect-src': ["'self'", s3Origin, ...(options.clientMiddleware ? ['ws:'] : [])],
          // The design worker compiles the solver's WebAssembly (served from 'self'); this allows that and no JS eval.
          'script-src': ["'self'", "'wasm-unsafe-eval'", ...(options.clientMiddleware ? ["'unsafe-inline'"] : [])],
          'upgrade-insecure-requests': secure ? [] : null,
        },
      },
    }),
  );
  app.use(httpLogger(logger));
  // The payment provider's signed notices: the raw body, no session, and no browser origin to check.
  app.use(paymentWebhookRouter(ctx));
  app.use(requireSameOrigin(env.APP_ORIGIN));
  app.use('/api', noStore, requireJsonWrites, announceWrites(ctx.queueChanges));
  app.use(express.json({ limit: '1mb' }));

  app.use(sessionMiddleware(ctx, secure));
  const passport = configurePassport(ctx);
  app.use(passport.initialize());
  app.use(passport.session());
  app.use(rateLimitRouter(ctx));

  app.use(authRouter(passport));
  registerRoutes(app, ctx);
  app.use('/api', (_req, _res, next) => next(notFound('That API route')));

  if (options.clientMiddleware) app.use(options.clientMiddleware);
  if (options.clientDist && existsSync(options.clientDist)) {
    const dist = options.clientDist;
    // The service worker, the page and the manifest are read fresh each time, so a new build reaches phones at
    // once; the hashed assets they name may be kept for an hour.
    const fresh = new Set(['sw.js', 'index.html', 'manifest.webmanifest']);
    app.use(
      express.static(dist, {
        index: false,
        maxAge: '1h',
        setHeaders: (res, file) => {
          if (fresh.has(path.basename(file))) res.setHeader('Cache-Control', 'no-cache');
        },
      }),
    );
    app.get('/{*splat}', (_req, res) => res.sendFile(path.join(dist, 'index.html')));
  }
  app.use(errorHandler(logger));
  return app;
}
