import { z } from 'zod';
import { idParam } from '../schemas/taproom';
import { tastingNoteInputSchema, type TastingNote } from '../schemas/tasting';
import { route } from './route';

const batchParams = z.strictObject({ batchId: idParam });
const noteParams = z.strictObject({ batchId: idParam, noteId: idParam });

export const tastingRoutes = {
  list: route<TastingNote[]>()({ method: 'get', path: '/api/batches/:batchId/tasting-notes', params: batchParams }),
  /** 201 when written, 200 when the same note was already recorded. */
  add: route<TastingNote>()({
    method: 'post',
    path: '/api/batches/:batchId/tasting-notes',
    params: batchParams,
    body: tastingNoteInputSchema,
  }),
  // Notes are append-only: these three always refuse (405), after the usual 404 for another brewery's note.
  patchNote: route<never>()({
    method: 'patch',
    path: '/api/batches/:batchId/tasting-notes/:noteId',
    params: noteParams,
  }),
  putNote: route<never>()({ method: 'put', path: '/api/batches/:batchId/tasting-notes/:noteId', params: noteParams }),
  deleteNote: route<never>()({
    method: 'delete',
    path: '/api/batches/:batchId/tasting-notes/:noteId',
    params: noteParams,
  }),
};
