import { z } from 'zod';
import { idParam, type AttachmentView } from '../schemas/taproom';
import { route } from './route';

const batchParams = z.strictObject({ batchId: idParam });
const attachmentParams = z.strictObject({ attachmentId: idParam });
/** Multipart text fields arrive as strings. */
const uploadFields = z.strictObject({ tastingNoteId: idParam.optional() });

export const batchAttachmentRoutes = {
  list: route<AttachmentView[]>()({ method: 'get', path: '/api/batches/:batchId/attachments', params: batchParams }),
  upload: route<AttachmentView>()({
    method: 'post',
    path: '/api/batches/:batchId/attachments',
    params: batchParams,
    body: uploadFields,
    multipart: true,
  }),
};

export const attachmentRoutes = {
  file: route<Uint8Array>()({ method: 'get', path: '/api/attachments/:attachmentId/file', params: attachmentParams }),
  thumbnail: route<Uint8Array>()({
    method: 'get',
    path: '/api/attachments/:attachmentId/thumbnail',
    params: attachmentParams,
  }),
  remove: route()({ method: 'delete', path: '/api/attachments/:attachmentId', params: attachmentParams }),
};
