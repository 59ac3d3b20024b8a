// Real rows for the generated route tests (cross-brewery, bad input): how to get an id of each kind a path
// parameter names, and a body each write route accepts. A new parameter name or a new write route with an id
// fails the cross-brewery test until it is taught here, so no route can be left out.
import type { RouteEntry } from '../../server/routes/define';
import { randomUUID } from 'node:crypto';
import { Attachment, Release, User } from '../../server/models';
import type { TestBrewery } from './helpers';
import { plannedBatch } from './batch-fixtures';
import { addTastingNote } from '../../server/services/tasting';
import { SHEET, TASTING_CONTENT } from './taproom-fixtures';

/** Parameters that are not brewery-owned ids (unguessable secrets sent in links); the cross-brewery rule does not apply. */
export const NOT_BREWERY_IDS = new Set(['token']);

type Maker = (b: TestBrewery) => Promise<number>;

/** How to get a real row of the kind a path parameter names, inside the given brewery. */
export const ID_MAKERS: Record<string, Maker> = {
  // A teammate of its own, so a request that succeeds does not change the role agents the tests sign in with.
  userId: async (b) => {
    const user = await User.create({
      breweryId: b.brewery.id,
      email: `extra.${b.brewery.id}.${Date.now()}.${Math.random().toString(36).slice(2, 8)}@test.example`,
      displayName: 'Extra teammate',
      role: 'assistant_brewer',
      passwordHash: b.users.assistant_brewer.passwordHash,
      disabledAt: null,
    });
    return user.id;
  },
  // Taproom: a fermenting batch with a signed tasting note, a photo row and a beer on tap.
  noteId: async (b) => {
    const batch = await plannedBatch({ id: b.users.head_brewer.id, breweryId: b.brewery.id });
    await batch.update({ status: 'fermenting' });
    const u = b.users.head_brewer;
    const { note } = await addTastingNote(
      { id: u.id, breweryId: b.brewery.id, role: u.role, email: u.email, displayName: u.displayName },
      batch.id,
      { idempotencyKey: randomUUID(), content: TASTING_CONTENT },
    );
    return note.id;
  },
  attachmentId: async (b) => {
    const batch = await plannedBatch({ id: b.users.head_brewer.id, breweryId: b.brewery.id });
    const row = await Attachment.create({
      breweryId: b.brewery.id,
      batchId: batch.id,
      tastingNoteId: null,
      kind: 'photo',
      contentType: 'image/jpeg',
      byteSize: 1,
      storageKey: `samples/${randomUUID()}.jpg`,
      thumbnailKey: null,
      displayName: 'sample.jpg',
      uploadedById: b.users.head_brewer.id,
    });
    return row.id;
  },
  beerId: async (b) => {
    const batch = await plannedBatch({ id: b.users.head_brewer.id, breweryId: b.brewery.id });
    const { comingSoon: _, ...sheet } = SHEET;
    const release = await Release.create({
      ...sheet,
      breweryId: b.brewery.id,
      batchId: batch.id,
      state: 'coming_soon',
      og: null,
      fg: null,
      abvPct: null,
      abvMethod: null,
      ibu: null,
      srm: null,
      releasedAt: null,
      releasedById: null,
    });
    return release.id;
  },
};

/** A body each write route with a path id accepts (validated by its own schema in the tests). */
export const VALID_BODIES: Record<string, (ids: Record<string, number>) => unknown> = {
  'PATCH /api/team/:userId': () => ({ role: 'assistant_brewer' }),
  'POST /api/batches/:batchId/tasting-notes': () => ({ idempotencyKey: randomUUID(), content: TASTING_CONTENT }),
  'PUT /api/batches/:batchId/release': () => SHEET,
  'POST /api/batches/:batchId/release/publish': () => ({ confirmedOg: 1.05, confirmedFg: 1.01 }),
};

export const routeKey = (route: RouteEntry) => `${route.method.toUpperCase()} ${route.path}`;
export const pathParams = (path: string) => [...path.matchAll(/:(\w+)/g)].map((m) => m[1]!);

/** Ids for every parameter of a route inside one brewery, made once per brewery and parameter name. */
export function idSource(b: TestBrewery) {
  const cache = new Map<string, Promise<number>>();
  return async (param: string): Promise<number> => {
    const make = ID_MAKERS[param];
    if (!make) throw new Error(`No way to make an id for ':${param}': add it to ID_MAKERS in tests/api/route-samples.ts`);
    if (!cache.has(param)) cache.set(param, make(b));
    return cache.get(param)!;
  };
}

export function fillPath(path: string, values: Record<string, string | number>): string {
  return path.replace(/:(\w+)/g, (_, name: string) => encodeURIComponent(String(values[name])));
}
