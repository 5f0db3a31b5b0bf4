// HTTP for requests: parse and validate here, decide in the services.
import { Router } from 'express';
import multer from 'multer';
import { z } from 'zod';
import type { Database } from '../../db/client';
import { uploadLimits } from '../../shared/requests/filing';
import { requestFilterSchema, requestListQuerySchema } from '../../shared/requests/listQuery';
import { requestDraftSchema } from '../../shared/requests/requestBody';
import { workflowEventSchema } from '../../shared/workflow/events';
import { actorOf } from '../auth/requireActor';
import { HttpError, validationError } from '../http/errors';
import type { ObjectStore } from '../storage/objectStore';
import { addComment, applyEvent } from '../workflow/workflowService';
import { attachmentPreview, authorizeUpload, objectKeyFor, openAttachment, recordUploads, removeDraftAttachment, type ReceivedFile } from './attachmentService';
import { setUploadTarget, streamingUploadStorage } from '../storage/streamingUploadStorage';
import { createDraft, updateDraft } from './draftService';
import { countsFor, detailFor, engineersOfRecordFor, listFor, verifyFor } from './readService';

const idParam = z.uuid();

function parseId(value: unknown, what: string): string {
  const parsed = idParam.safeParse(value);
  if (!parsed.success) throw new HttpError(404, `${what}_not_found`, `No ${what} has that id.`);
  return parsed.data;
}

function parseBody<T>(schema: z.ZodType<T>, body: unknown, message: string): T {
  if (body === undefined || body === null || (typeof body === 'object' && Object.keys(body).length === 0)) {
    throw new HttpError(400, 'empty_body', 'The request body is empty.');
  }
  const parsed = schema.safeParse(body);
  if (!parsed.success) throw validationError(parsed.error, message);
  return parsed.data;
}

const uploadPurpose = z.enum(['revision', 'information_response', 'federal_concurrence', 'condition_evidence']);
const draftUpdate = z.object({ version: z.number().int().positive(), body: z.unknown() }).strict();
const commentBody = z.strictObject({ comment: z.string().trim().min(1, 'Write the comment.').max(8000) });

export function requestRoutes(deps: { db: Database; store: ObjectStore; publicUrl: string; maxFileBytes?: number; maxRequestBytes?: number }): Router {
  const { db, store } = deps;
  const router = Router();
  const upload = multer({
    storage: streamingUploadStorage(store),
    // Browsers send a file's name as raw UTF-8; read as Latin-1 (the default) "сечение" came back garbled.
    defParamCharset: 'utf8',
    limits: { fileSize: deps.maxFileBytes ?? uploadLimits.maxFileBytes, files: uploadLimits.maxFilesPerRequest, fields: 5, fieldSize: 1024 },
  });

  router.get('/api/requests', async (req, res) => {
    const query = requestListQuerySchema.safeParse(req.query);
    if (!query.success) throw validationError(query.error, 'The list filters are not valid.');
    res.json(await listFor(db, actorOf(req), query.data));
  });

  // Before /:id, which would take "counts" for an id.
  router.get('/api/requests/counts', async (req, res) => {
    const query = requestFilterSchema.safeParse(req.query);
    if (!query.success) throw validationError(query.error, 'The list filters are not valid.');
    res.json(await countsFor(db, actorOf(req), query.data));
  });

  router.post('/api/requests', async (req, res) => {
    const draft = parseBody(requestDraftSchema, req.body, 'The draft was not saved; some fields need attention.');
    const id = await createDraft(db, actorOf(req), draft);
    res.status(201).json(await detailFor(db, actorOf(req), id));
  });

  router.get('/api/requests/:id', async (req, res) => {
    res.json(await detailFor(db, actorOf(req), parseId(req.params.id, 'request')));
  });

  router.put('/api/requests/:id/draft', async (req, res) => {
    const id = parseId(req.params.id, 'request');
    const { version, body } = parseBody(draftUpdate, req.body, 'Send the version you saw and the draft body.');
    const draft = parseBody(requestDraftSchema, body, 'The draft was not saved; some fields need attention.');
    await updateDraft(db, actorOf(req), id, version, draft);
    res.json(await detailFor(db, actorOf(req), id));
  });

  router.post('/api/requests/:id/events', async (req, res) => {
    const id = parseId(req.params.id, 'request');
    const event = parseBody(workflowEventSchema, req.body, 'That move is not complete; see the fields named.');
    await applyEvent(deps, actorOf(req), id, event);
    res.json(await detailFor(db, actorOf(req), id));
  });

  router.post('/api/requests/:id/comments', async (req, res) => {
    const id = parseId(req.params.id, 'request');
    const { comment } = parseBody(commentBody, req.body, 'The comment was not saved.');
    await addComment(db, actorOf(req), id, comment);
    res.status(201).json(await detailFor(db, actorOf(req), id));
  });

  router.get('/api/requests/:id/trail/verify', async (req, res) => {
    res.json(await verifyFor(db, actorOf(req), parseId(req.params.id, 'request')));
  });

  // The engineers of record central office may route this request to.
  router.get('/api/requests/:id/engineers-of-record', async (req, res) => {
    res.json(await engineersOfRecordFor(db, actorOf(req), parseId(req.params.id, 'request')));
  });

  // Authorise first, so nothing is read from a caller who may not upload here; then stream.
  router.post(
    '/api/requests/:id/attachments',
    async (req, res, next) => {
      const id = parseId(req.params.id, 'request');
      const purpose = uploadPurpose.safeParse(req.query.purpose ?? 'revision');
      if (!purpose.success) throw new HttpError(400, 'invalid_input', 'Unknown kind of attachment.', { purpose: 'One of revision, information_response, federal_concurrence, condition_evidence.' });
      if (!req.is('multipart/form-data')) throw new HttpError(400, 'no_files', 'Send the files as multipart/form-data in the "files" field.');
      const target = await authorizeUpload(db, actorOf(req), id, purpose.data);
      res.locals.upload = { id, purpose: purpose.data, revision: target.revision };
      setUploadTarget(req, {
        keyFor: () => objectKeyFor(target.projectId, id, target.revision),
        usedBytes: target.usedBytes,
        maxTotalBytes: deps.maxRequestBytes ?? uploadLimits.maxRequestTotalBytes,
      });
      next();
    },
    upload.array('files', uploadLimits.maxFilesPerRequest),
    async (req, res) => {
      const { id, purpose, revision } = res.locals.upload as { id: string; purpose: z.infer<typeof uploadPurpose>; revision: number };
      const files = (req.files ?? []) as unknown as ReceivedFile[];
      const extraFields = Object.keys(req.body ?? {});
      if (extraFields.length) {
        await Promise.allSettled(files.map((f) => store.remove(f.key)));
        throw new HttpError(400, 'invalid_input', 'Only files are accepted here.', Object.fromEntries(extraFields.map((f) => [f, 'This field is not accepted here.'])));
      }
      res.status(201).json(await recordUploads(deps, actorOf(req), id, revision, purpose, files));
    },
  );

  router.delete('/api/requests/:id/attachments/:attachmentId', async (req, res) => {
    await removeDraftAttachment(deps, actorOf(req), parseId(req.params.id, 'request'), parseId(req.params.attachmentId, 'attachment'));
    res.status(204).end();
  });

  router.get('/api/attachments/:id/content', async (req, res) => {
    const { attachment, object } = await openAttachment(deps, actorOf(req), parseId(req.params.id, 'attachment'));
    res.setHeader('content-type', attachment.contentType);
    res.setHeader('content-length', String(attachment.sizeBytes));
    // ?download=1 saves the file under its own name; otherwise the browser shows it (a PDF, a photo).
    const disposition = req.query.download === '1' ? 'attachment' : 'inline';
    res.setHeader('content-disposition', `${disposition}; filename*=UTF-8''${encodeURIComponent(attachment.fileName)}`);
    res.setHeader('x-content-sha256', attachment.sha256);
    object.body.pipe(res);
  });

  router.get('/api/attachments/:id/preview', async (req, res) => {
    const preview = await attachmentPreview(deps, actorOf(req), parseId(req.params.id, 'attachment'));
    res.setHeader('content-type', 'image/jpeg');
    res.setHeader('cache-control', 'private, max-age=3600');
    res.send(preview);
  });

  return router;
}
