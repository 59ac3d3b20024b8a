import { z } from 'zod';
import type { Request, Response } from 'express';
import { defineRouter, actor } from './define';
import { idParam } from '../../shared/schemas/taproom';
import * as attachments from '../services/attachments';
import { recordAudit } from '../services/audit';

const batchParams = z.strictObject({ batchId: idParam });
const attachmentParams = z.strictObject({ attachmentId: idParam });
/** Multipart text fields arrive as strings. */
const uploadFields = z.strictObject({ tastingNoteId: idParam.optional() });

async function send(req: Request, res: Response, variant: 'file' | 'thumbnail') {
  const file = await attachments.downloadAttachment(actor(req), Number(req.params.attachmentId), variant);
  res.set({
    'Content-Type': file.contentType,
    'Content-Disposition': file.disposition,
    'Cache-Control': 'private, max-age=3600',
  });
  res.send(file.body);
}

export const batchAttachmentsRouter = defineRouter('/api/batches', [
  {
    method: 'get',
    path: '/:batchId/attachments',
    access: 'file.read',
    params: batchParams,
    handler: async (req, res) => {
      res.json(await attachments.listAttachments(actor(req), Number(req.params.batchId)));
    },
  },
  {
    method: 'post',
    path: '/:batchId/attachments',
    access: 'file.upload',
    params: batchParams,
    before: [attachments.receiveFile],
    body: uploadFields,
    handler: async (req, res) => {
      const body = req.body as z.infer<typeof uploadFields>;
      res
        .status(201)
        .json(await attachments.uploadAttachment(actor(req), Number(req.params.batchId), req.file, body.tastingNoteId));
    },
  },
]);

/** Files are served to the brewery's own people only; the taproom sees photos of announced beers. */
export const attachmentsRouter = defineRouter('/api/attachments', [
  {
    method: 'get',
    path: '/:attachmentId/file',
    access: 'file.readShown',
    params: attachmentParams,
    handler: (req, res) => send(req, res, 'file'),
  },
  {
    method: 'get',
    path: '/:attachmentId/thumbnail',
    access: 'file.readShown',
    params: attachmentParams,
    handler: (req, res) => send(req, res, 'thumbnail'),
  },
  {
    method: 'delete',
    path: '/:attachmentId',
    access: 'file.remove',
    params: attachmentParams,
    handler: async (req, res) => {
      await attachments.removeAttachment(actor(req), Number(req.params.attachmentId));
      await recordAudit(req, 'attachment.remove', { attachmentId: Number(req.params.attachmentId) });
      res.status(204).end();
    },
  },
]);
