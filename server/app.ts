// Builds the Express app from its parts; tests build it with their own parts and call it with supertest.
import express, { Router } from 'express';
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { toNodeHandler } from 'better-auth/node';
import type { Database } from '../db/client';
import { clientAddressHeader, type Auth } from './auth/auth';
import { auditRoutes } from './audit/auditRoutes';
import { benchBaselineRoutes } from './bench/baselineRoutes';
import { actorOf, requireActor } from './auth/requireActor';
import { adminRoutes } from './admin/adminRoutes';
import { invitationRoutes } from './admin/invitationRoutes';
import { conditionRoutes } from './conditions/conditionRoutes';
import { devMailRoutes } from './dev/devMailRoutes';
import { healthRoutes } from './health/healthRoutes';
import { errorHandler, HttpError } from './http/errors';
import { gzippedAssets } from './http/gzippedAssets';
import { refuseNulCharacters } from './http/nulCharacters';
import { sameOriginWrites, securityHeaders } from './http/security';
import type { Mailer } from './mail/mailer';
import { projectRoutes } from './projects/projectRoutes';
import { requestRoutes } from './requests/requestRoutes';
import type { ObjectStore } from './storage/objectStore';
import type { ServerEnv } from './env';

export type AppParts = {
  env: ServerEnv;
  db: Database;
  auth: Auth;
  store: ObjectStore;
  mailer: Mailer;
};

export function createApp(parts: AppParts) {
  const { env, db, auth, store, mailer } = parts;
  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', 'loopback');
  app.use(securityHeaders(env.NODE_ENV === 'production'));
  app.use('/api', sameOriginWrites(env.PUBLIC_URL));

  // better-auth reads its own body, so it is mounted before the JSON parser.
  app.all('/api/auth/*splat', (req, _res, next) => {
    req.headers[clientAddressHeader] = req.socket.remoteAddress ?? 'unknown';
    next();
  }, toNodeHandler(auth));
  app.use(express.json({ limit: '256kb' }));
  app.use('/api', refuseNulCharacters);

  app.use(healthRoutes({ db, store, mailer }));
  if (env.NODE_ENV !== 'production' && env.MAIL_CATCHER_URL) app.use(devMailRoutes(env.MAIL_CATCHER_URL));

  app.use(invitationRoutes(db));

  const signedIn = Router();
  signedIn.use('/api', requireActor(auth));
  signedIn.get('/api/me', (req, res) => {
    res.json(actorOf(req));
  });
  signedIn.use(projectRoutes(db));
  signedIn.use(adminRoutes({ db, mailer, publicUrl: env.PUBLIC_URL }));
  signedIn.use(auditRoutes(db));
  signedIn.use(conditionRoutes(db));
  if (process.env.SPANRELAY_BENCH === '1') signedIn.use(benchBaselineRoutes(db));
  signedIn.use(requestRoutes({ db, store, publicUrl: env.PUBLIC_URL, maxFileBytes: env.UPLOAD_MAX_FILE_BYTES, maxRequestBytes: env.UPLOAD_MAX_REQUEST_BYTES }));
  app.use(signedIn);

  app.use('/api', (_req, _res, next) => next(new HttpError(404, 'no_such_route', 'There is no such API route.')));

  // The exported web app: static files, and index.html for every client-side route.
  if (env.WEB_DIST && existsSync(join(env.WEB_DIST, 'index.html'))) {
    const dist = env.WEB_DIST;
    app.use(gzippedAssets(dist, 60 * 60));
    app.use(express.static(dist, { index: false, maxAge: '1h' }));
    app.get('/{*splat}', (_req, res) => {
      res.setHeader('cache-control', 'no-cache');
      res.sendFile(join(dist, 'index.html'));
    });
  }

  app.use(errorHandler);
  return app;
}
