import { defineRouter, type HandlerContext } from './define';
import { tastingRoutes } from '../../shared/contract/tasting';
import * as tasting from '../services/tasting';

type NoteChange = HandlerContext<typeof tastingRoutes.patchNote>;
/** Notes are append-only: a change or delete answers 405, after the usual 404 for another brewery's note. */
const appendOnly = ({ user, params }: Pick<NoteChange, 'user' | 'params'>) =>
  tasting.refuseNoteChange(user, params.batchId, params.noteId);

export const tastingRouter = defineRouter('/api/batches', tastingRoutes, {
  list: {
    access: 'tasting.read',
    handler: async ({ user, params, res }) => {
      res.json(await tasting.listTastingNotes(user, params.batchId));
    },
  },
  add: {
    access: 'tasting.write',
    handler: async ({ user, params, body, res }) => {
      const { note, created } = await tasting.addTastingNote(user, params.batchId, body);
      res.status(created ? 201 : 200).json(note);
    },
  },
  patchNote: { access: 'tasting.write', handler: appendOnly },
  putNote: { access: 'tasting.write', handler: appendOnly },
  deleteNote: { access: 'tasting.write', handler: appendOnly },
});
