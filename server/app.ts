import fs from 'node:fs';
import path from 'node:path';
import express from 'express';
import { pinoHttp } from 'pino-http';
import { checkConfig, config } from './config.ts';
import { getSequelize } from './db.ts';
import { logger } from './logger.ts';
import { loadUser } from './middlewares/authenticate.ts';
import { errorHandler } from './middlewares/error-handler.ts';
import { guardJsonBody } from './middlewares/json-guard.ts';
import { fixedHeaders } from './middlewares/fixed-headers.ts';
import { installFrontDoor } from './front-door.ts';
import { sameOrigin } from './middlewares/same-origin.ts';
import { securityHeaders } from './middlewares/security-headers.ts';
import { admitSignInRequest, refuseBusySignInEarly } from './middlewares/sign-in-admission.ts';
import { initModels } from './models/index.ts';
import { healthRouter } from './routes/health.ts';
import { apiRouter } from './routes/index.ts';
import { answerFeedNotModified, kioskFeed, kioskFeedNotModified } from './routes/kiosk-feed.ts';
import { exploreRouter } from './routes/explore.ts';
import { kioskPage } from './routes/kiosk-page.ts';
import { mediaFilesRouter } from './routes/media-files.ts';
import { sessionMiddleware } from './session.ts';
import { wireServer } from './wiring.ts';

/** Options for building the app; tests pass their own database URL. */
export interface AppOptions {
  databaseUrl?: string;
  /** Serve the built client from dist/ (off in API tests). */
  serveClient?: boolean;
  /** Cookies get `Secure` and HSTS is sent when the app is reached over HTTPS. */
  https?: boolean;
}

/** Builds the Express app without listening, so tests can drive it directly. */
export function createApp(options: AppOptions = {}) {
  checkConfig();
  const databaseUrl = options.databaseUrl ?? config.databaseUrl;
  if (!databaseUrl) throw new Error('createApp needs a database URL');
  initModels(getSequelize());
  wireServer();
  const https = options.https ?? config.publicUrl?.startsWith('https:') ?? false;

  const app = express();
  app.disable('x-powered-by');
  // Only the configured proxies may name the client's address, protocol and host (TRUST_PROXY,
  // loopback by default): anyone else on the network could rotate X-Forwarded-For past the
  // per-address limits, or name another host to the same-origin check.
  app.set('trust proxy', trustProxySetting(config.trustProxy));
  const security = securityHeaders(https);
  const fixedSecurity = fixedHeaders(security);
  // The revalidated feed and the refused sign-in, answered before Express's per-request set-up.
  installFrontDoor(app, [answerFeedNotModified, refuseBusySignInEarly(fixedSecurity)]);
  // Polled by every screen every 30 s: mounted ahead of the request log, body parser, sessions and
  // user loading, none of which it needs (its own errors still reach the error handler and the log),
  // with the security headers recorded once rather than rebuilt per request. A revalidation it can
  // answer from memory is a 304 before even those (a 304 carries none: the 200 it stands for did).
  app.get('/api/kiosk/feed', kioskFeedNotModified, fixedSecurity, ...kioskFeed);
  // A sign-in takes its place in the hashing queue here, and a burst beyond what the hashing threads
  // can take in time is refused here, before any of the work below (the refusals are not in the
  // request log; the admitted ones are).
  app.post('/api/auth/sign-in', fixedSecurity, admitSignInRequest);
  // The same record for every other answer: helmet would rebuild the same dozen headers per request.
  app.use(fixedSecurity);
  app.use(pinoHttp({ logger, autoLogging: { ignore: (req) => req.url === '/api/health' } }));

  const sessions = sessionMiddleware(databaseUrl, https);
  app.locals.sessionPool = sessions.pool;

  const api = express.Router();
  api.use(express.json({ limit: '6mb' }));
  api.use(guardJsonBody);
  api.use(sameOrigin);
  api.use(sessions.middleware);
  api.use(loadUser);
  api.use(noStoreWhenSignedIn);
  api.use(apiRouter());
  app.use('/api', api);

  app.use('/media', mediaFilesRouter);
  // The public site (pages that show their working, the sitemap, embeddable fragments): no session.
  app.use(exploreRouter);
  if (options.serveClient) serveClient(app);
  app.use(errorHandler);
  return app;
}

/**
 * The whole of a worker's HTTP face (STARPROOF_ROLE=worker): `/api/health` for the load balancer
 * or the process supervisor, nothing else. Its session pool is a stand-in so shutdown reads the same.
 */
export function createWorkerApp() {
  initModels(getSequelize());
  wireServer();
  const app = express();
  app.disable('x-powered-by');
  app.locals.sessionPool = { end: async () => undefined, totalCount: 0, idleCount: 0, waitingCount: 0 };
  app.use('/api/health', healthRouter);
  app.use((_req, res) => {
    res.status(404).json({ error: { code: 'not_found', message: 'This process runs background jobs only.' } });
  });
  return app;
}

/** Express's `trust proxy` from the setting: a hop count, true/false, or a list of addresses and subnets. */
export function trustProxySetting(value: string): boolean | number | string {
  const v = value.trim();
  if (v === 'true') return true;
  if (v === 'false' || v === '') return false;
  if (/^\d+$/.test(v)) return Number(v);
  return v;
}

/** Answers to a signed-in person (and every sign-in answer) are never stored by a browser or proxy. */
const noStoreWhenSignedIn: express.RequestHandler = (req, res, next) => {
  if (req.user || req.path.startsWith('/auth/')) res.set('Cache-Control', 'no-store');
  next();
};

/** The built client: hashed assets cached for a year, HTML never cached, SPA fallback. */
function serveClient(app: express.Express) {
  const dist = config.distDir;
  const indexHtml = path.join(dist, 'index.html');
  if (!fs.existsSync(indexHtml)) throw new Error('The client is not built: run `npm run build` first.');
  app.use('/assets', express.static(path.join(dist, 'assets'), { immutable: true, maxAge: '365d', fallthrough: false }));
  app.use(express.static(dist, { index: false, maxAge: '1h' }));
  app.get('/kiosk', kioskPage(dist));
  app.get('/{*splat}', (_req, res) => {
    res.set('Cache-Control', 'no-cache');
    // `dotfiles: 'allow'`: the build folder may itself sit under a dot folder (e.g. .data/dist-…).
    res.sendFile(indexHtml, { dotfiles: 'allow' });
  });
}
