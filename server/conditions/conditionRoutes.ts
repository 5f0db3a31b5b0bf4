// HTTP for the conditions list: validate the query here, decide in the service.
import { Router } from 'express';
import type { Database } from '../../db/client';
import { conditionListQuerySchema } from '../../shared/conditions/listQuery';
import { actorOf } from '../auth/requireActor';
import { validationError } from '../http/errors';
import { conditionsFor } from './conditionService';

export function conditionRoutes(db: Database): Router {
  const router = Router();
  router.get('/api/conditions', async (req, res) => {
    const query = conditionListQuerySchema.safeParse(req.query);
    if (!query.success) throw validationError(query.error, 'The conditions filters are not valid.');
    res.json(await conditionsFor(db, actorOf(req), query.data));
  });
  return router;
}
