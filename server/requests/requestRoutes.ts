// HTTP for requests: parse and validate here, decide in the service.
import { Router } from 'express';
import multer from 'multer';
import { z } from 'zod';
import { requestFilingFields, uploadLimits } from '../../shared/requests/filing';
import { actorOf } from '../auth/requireActor';
import { HttpError, validationError } from '../http/errors';
import type { IncomingFile, RequestService } from './requestService';

const idParam = z.uuid();

function parseId(value: unknown, what: string): string {
  const parsed = idParam.safeParse(value);
  if (!parsed.success) throw new HttpError(404, `${what}_not_found`, `No ${what} has that id.`);
  return parsed.data;
}

export function requestRoutes(service: RequestService, opts: { maxFileBytes?: number } = {}): Router {
  const router = Router();
  const upload = multer({
    storage: multer.memoryStorage(),
    limits: {
      fileSize: opts.maxFileBytes ?? uploadLimits.maxFileBytes,
      files: uploadLimits.maxFilesPerRequest,
      fields: 20,
      fieldSize: 64 * 1024,
    },
  });

  router.post('/api/requests', upload.array('files', uploadLimits.maxFilesPerRequest), async (req, res) => {
    const actor = actorOf(req);
    const files = (req.files ?? []) as IncomingFile[];
    const body: Record<string, unknown> = { ...(req.body ?? {}) };
    if (Object.keys(body).length === 0 && files.length === 0) {
      throw new HttpError(400, 'empty_body', 'The request is empty: send a project, a title and a reason.');
    }
    const fields = requestFilingFields.safeParse(body);
    if (!fields.success) throw validationError(fields.error, 'The request was not filed; some fields need attention.');
    const filed = await service.fileRequest(actor, fields.data, files);
    res.status(201).json(filed);
  });

  router.get('/api/requests', async (req, res) => {
    const deskOnly = req.query.desk === 'mine';
    res.json(await service.listFor(actorOf(req), deskOnly));
  });

  router.get('/api/requests/:id', async (req, res) => {
    res.json(await service.readFor(actorOf(req), parseId(req.params.id, 'request')));
  });

  router.get('/api/attachments/:id/content', async (req, res) => {
    const { attachment, object } = await service.openAttachment(actorOf(req), parseId(req.params.id, 'attachment'));
    res.setHeader('content-type', attachment.contentType);
    res.setHeader('content-length', String(attachment.sizeBytes));
    res.setHeader('content-disposition', `inline; filename*=UTF-8''${encodeURIComponent(attachment.fileName)}`);
    res.setHeader('x-content-sha256', attachment.sha256);
    object.body.pipe(res);
  });

  return router;
}
