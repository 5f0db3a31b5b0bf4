// GET /api/health: each part the product depends on, checked for real; 503 when any is down.
import { Router } from 'express';
import { sql } from 'drizzle-orm';
import type { Database } from '../../db/client';
import type { ObjectStore } from '../storage/objectStore';
import type { Mailer } from '../mail/mailer';

async function databaseIsUp(db: Database): Promise<boolean> {
  try {
    await db.execute(sql`select 1`);
    return true;
  } catch {
    return false;
  }
}

export function healthRoutes(deps: { db: Database; store: ObjectStore; mailer: Mailer }): Router {
  const router = Router();
  router.get('/api/health', async (_req, res) => {
    const [db, s3, smtp] = await Promise.all([databaseIsUp(deps.db), deps.store.isUp(), deps.mailer.isUp()]);
    const ok = db && s3 && smtp;
    const word = (up: boolean) => (up ? 'up' : 'down');
    res.status(ok ? 200 : 503).json({ ok, db: word(db), s3: word(s3), smtp: word(smtp) });
  });
  return router;
}
