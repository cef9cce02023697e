/**
 * The Express app, built without listening so tests and the bench drive it
 * directly. Routes check the caller's role first (403), then whether the
 * pattern is visible to them (404).
 */
import { existsSync } from 'node:fs';
import type { ServerResponse } from 'node:http';
import { join, relative, sep } from 'node:path';
import express, { Router, type Express, type RequestHandler } from 'express';
import helmet from 'helmet';
import type { AppDeps } from './context.js';
import { allow, bearer } from './auth.js';
import { apiNotFound, errorHandler, notFound } from './errors.js';
import { cachedRenderer } from './render.js';
import { authRoutes } from './routes/auth.js';
import { checkRoutes } from './routes/check.js';
import { feedbackRoutes } from './routes/feedback.js';
import { patternRoutes } from './routes/patterns.js';
import { sharingRoutes } from './routes/sharing.js';
import { tokenRoutes } from './routes/tokens.js';
import { userRoutes } from './routes/users.js';
import { sharedRoutes, viewRoutes } from './routes/views.js';

function apiRouter(deps: AppDeps): Router {
  const api = Router();
  const render = cachedRenderer();
  const signedIn = bearer(deps.db.models);
  // Given a token, health checks it like any route (the sign-in path and the database behind it), so a
  // monitor that sends one sees sign-in trouble and health costs what every request costs; without one it answers anyway.
  const tokenIfGiven: RequestHandler = (req, res, next) =>
    req.headers.authorization === undefined ? next() : signedIn(req, res, next);
  api.get('/health', tokenIfGiven, (_req, res) => {
    res.json({ ok: true });
  });
  api.use('/auth', authRoutes(deps));
  api.use('/shared', sharedRoutes(deps, render));
  api.use(signedIn);
  api.use('/check', checkRoutes(deps));
  api.use('/patterns', patternRoutes(deps), viewRoutes(deps, render), sharingRoutes(deps), feedbackRoutes(deps));
  api.use('/tokens', tokenRoutes(deps));
  api.use('/users', allow('admin'), userRoutes(deps));
  api.get('/dev/outbox', allow('admin'), (_req, res) => {
    const items = deps.production ? null : deps.mailer.outbox();
    if (!items) throw notFound('There is no outbox: mail goes to a real host.');
    res.json({ items });
  });
  api.use(apiNotFound);
  return api;
}

/**
 * Vite names every file under assets/ after its content, so those may be kept
 * for good. index.html and the other unhashed files must be asked for again
 * each time (a cheap 304 while unchanged): a page kept from the last deploy
 * would point at assets that are gone.
 */
const cacheWebFile =
  (webDir: string) =>
  (res: ServerResponse, path: string): void => {
    const hashed = relative(webDir, path).startsWith(`assets${sep}`);
    res.setHeader('Cache-Control', hashed ? 'public, max-age=31536000, immutable' : 'no-cache');
  };

export function createApp(deps: AppDeps): Express {
  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', 'loopback');
  app.set('query parser', 'simple');
  app.use(
    helmet({
      contentSecurityPolicy: {
        useDefaults: false,
        directives: {
          defaultSrc: ["'self'"],
          scriptSrc: ["'self'"],
          // The chart view sets element styles from script; no inline <style> or style="" in markup is needed.
          styleSrc: ["'self'"],
          styleSrcAttr: ["'unsafe-inline'"],
          imgSrc: ["'self'", 'data:', 'blob:'],
          fontSrc: ["'self'", 'data:'],
          connectSrc: ["'self'"],
          objectSrc: ["'none'"],
          baseUri: ["'self'"],
          formAction: ["'self'"],
          frameAncestors: ["'none'"],
        },
      },
      crossOriginEmbedderPolicy: false,
    }),
  );
  app.use('/api', express.json({ limit: '2mb' }), apiRouter(deps));
  const { webDir } = deps;
  if (webDir && existsSync(join(webDir, 'index.html'))) {
    app.use(express.static(webDir, { index: 'index.html', setHeaders: cacheWebFile(webDir) }));
    // SPA fallback: any other GET that wants a page gets the app, which routes on the client.
    // A missing asset stays a 404 (a script tag accepts */*, and HTML in its place would hide the fault).
    app.use((req, res, next) => {
      if (req.method !== 'GET' || req.path.startsWith('/assets/') || !req.accepts('html')) return next();
      res.setHeader('Cache-Control', 'no-cache');
      res.sendFile(join(webDir, 'index.html'));
    });
  }
  app.use(errorHandler(deps.log ?? ((error) => console.error(error))));
  return app;
}
