// HTTP for the auditor's trail: search, and a request's trail and decision record as files.
import { Router, type Response } from 'express';
import { z } from 'zod';
import type { Database } from '../../db/client';
import { trailSearchQuerySchema } from '../../shared/trail/trailSearch';
import { actorOf } from '../auth/requireActor';
import { HttpError, validationError } from '../http/errors';
import { decisionRecordFor, searchFor, trailCsvFor } from './auditService';

const idParam = z.uuid();

function requestId(value: unknown): string {
  const parsed = idParam.safeParse(value);
  if (!parsed.success) throw new HttpError(404, 'request_not_found', 'No request has that id.');
  return parsed.data;
}

// A file to save, never to show in place; made fresh for each asking.
function sendFile(res: Response, contentType: string, fileName: string, body: string | Buffer) {
  res.setHeader('content-type', contentType);
  res.setHeader('content-disposition', `attachment; filename="${fileName}"`);
  res.setHeader('cache-control', 'no-store');
  res.send(body);
}

export function auditRoutes(db: Database): Router {
  const router = Router();

  router.get('/api/trail/search', async (req, res) => {
    const query = trailSearchQuerySchema.safeParse(req.query);
    if (!query.success) throw validationError(query.error, 'The search is not valid; see the fields named.');
    res.json(await searchFor(db, actorOf(req), query.data));
  });

  router.get('/api/requests/:id/trail.csv', async (req, res) => {
    const { fileName, csv } = await trailCsvFor(db, actorOf(req), requestId(req.params.id));
    sendFile(res, 'text/csv; charset=utf-8; header=present', fileName, csv);
  });

  router.get('/api/requests/:id/decision-record.pdf', async (req, res) => {
    const { fileName, pdf } = await decisionRecordFor(db, actorOf(req), requestId(req.params.id));
    sendFile(res, 'application/pdf', fileName, pdf);
  });

  return router;
}
