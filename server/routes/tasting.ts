import { z } from 'zod';
import { defineRouter, actor } from './define';
import type { Request } from 'express';
import { idParam } from '../../shared/schemas/taproom';
import { tastingNoteInputSchema } from '../../shared/schemas/tasting';
import * as tasting from '../services/tasting';

const batchParams = z.strictObject({ batchId: idParam });
const noteParams = z.strictObject({ batchId: idParam, noteId: idParam });
/** Notes are append-only: a change or delete answers 405, after the usual 404 for another brewery's note. */
const appendOnly = (req: Request) =>
  tasting.refuseNoteChange(actor(req), Number(req.params.batchId), Number(req.params.noteId));

export const tastingRouter = defineRouter('/api/batches', [
  {
    method: 'get',
    path: '/:batchId/tasting-notes',
    access: 'tasting.read',
    params: batchParams,
    handler: async (req, res) => {
      res.json(await tasting.listTastingNotes(actor(req), Number(req.params.batchId)));
    },
  },
  {
    method: 'post',
    path: '/:batchId/tasting-notes',
    access: 'tasting.write',
    params: batchParams,
    body: tastingNoteInputSchema,
    handler: async (req, res) => {
      const { note, created } = await tasting.addTastingNote(actor(req), Number(req.params.batchId), req.body);
      res.status(created ? 201 : 200).json(note);
    },
  },
  {
    method: 'patch',
    path: '/:batchId/tasting-notes/:noteId',
    access: 'tasting.write',
    params: noteParams,
    handler: appendOnly,
  },
  {
    method: 'put',
    path: '/:batchId/tasting-notes/:noteId',
    access: 'tasting.write',
    params: noteParams,
    handler: appendOnly,
  },
  {
    method: 'delete',
    path: '/:batchId/tasting-notes/:noteId',
    access: 'tasting.write',
    params: noteParams,
    handler: appendOnly,
  },
]);
