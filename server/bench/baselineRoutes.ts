// The benchmark's yardstick, mounted only when SPANRELAY_BENCH=1 (docker-free-scripts/bench): one
// request read by its primary key behind the same sign-in as every other route, so each route's
// throughput can be read as a share of the cheapest signed-in read this server can answer.
import { Router } from 'express';
import { eq } from 'drizzle-orm';
import { z } from 'zod';
import type { Database } from '../../db/client';
import { changeRequests } from '../../db/schema';
import { HttpError } from '../http/errors';

const id = z.uuid();

export function benchBaselineRoutes(db: Database): Router {
  const router = Router();
  router.get('/api/bench/baseline/:id', async (req, res) => {
    const parsed = id.safeParse(req.params.id);
    if (!parsed.success) throw new HttpError(404, 'request_not_found', 'No request has that id.');
    const [row] = await db
      .select({ id: changeRequests.id, number: changeRequests.number, state: changeRequests.state, version: changeRequests.version })
      .from(changeRequests)
      .where(eq(changeRequests.id, parsed.data));
    if (!row) throw new HttpError(404, 'request_not_found', 'No request has that id.');
    res.json(row);
  });
  return router;
}
