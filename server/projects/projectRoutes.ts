import { Router } from 'express';
import type { Database } from '../../db/client';
import { actorOf } from '../auth/requireActor';
import { projectsOfMember } from './projectRepository';

export function projectRoutes(db: Database): Router {
  const router = Router();
  router.get('/api/projects', async (req, res) => {
    res.json(await projectsOfMember(db, actorOf(req).id));
  });
  return router;
}
