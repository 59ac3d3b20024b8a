import type { Response } from 'express';
import { defineRouter } from './define';
import { attachmentRoutes, batchAttachmentRoutes } from '../../shared/contract/attachments';
import * as attachments from '../services/attachments';
import { recordAudit } from '../services/audit';

async function send(
  user: Express.User,
  attachmentId: number,
  res: Response<Uint8Array>,
  variant: 'file' | 'thumbnail',
) {
  const file = await attachments.downloadAttachment(user, attachmentId, variant);
  res.set({
    'Content-Type': file.contentType,
    'Content-Disposition': file.disposition,
    'Cache-Control': 'private, max-age=3600',
  });
  res.send(file.body);
}

export const batchAttachmentsRouter = defineRouter('/api/batches', batchAttachmentRoutes, {
  list: {
    access: 'file.read',
    handler: async ({ user, params, res }) => {
      res.json(await attachments.listAttachments(user, params.batchId));
    },
  },
  upload: {
    access: 'file.upload',
    before: [attachments.receiveFile],
    handler: async ({ user, params, body, req, res }) => {
      res.status(201).json(await attachments.uploadAttachment(user, params.batchId, req.file, body.tastingNoteId));
    },
  },
});

/** Files are served to the brewery's own people only; the taproom sees photos of announced beers. */
export const attachmentsRouter = defineRouter('/api/attachments', attachmentRoutes, {
  file: {
    access: 'file.readShown',
    handler: ({ user, params, res }) => send(user, params.attachmentId, res, 'file'),
  },
  thumbnail: {
    access: 'file.readShown',
    handler: ({ user, params, res }) => send(user, params.attachmentId, res, 'thumbnail'),
  },
  remove: {
    access: 'file.remove',
    handler: async ({ user, params, req, res }) => {
      await attachments.removeAttachment(user, params.attachmentId);
      await recordAudit(req, 'attachment.remove', { attachmentId: params.attachmentId });
      res.status(204).end();
    },
  },
});
