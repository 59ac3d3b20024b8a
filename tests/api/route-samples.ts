// Real rows for the generated route tests (cross-brewery, bad input): how to get an id of each kind a path
// parameter names, and a body each write route accepts. A new parameter name or a new write route with an id
// fails the cross-brewery test until it is taught here, so no route can be left out.
import type { RouteEntry } from '../../server/routes/define';
import { randomUUID } from 'node:crypto';
import { Alert, Attachment, Release, User } from '../../server/models';
import { DEMO_EQUIPMENT, SEASONAL_CONTENT } from '../../server/seed/recipe-data';
import { GOOD_PASSWORD, type TestBrewery } from './helpers';
import { cellarPlanBody, plannedBatch, writeHeaders } from './batch-fixtures';
import { addTastingNote } from '../../server/services/tasting';
import { SHEET, TASTING_CONTENT } from './taproom-fixtures';

/** Parameters that are not brewery-owned ids (unguessable secrets sent in links); the cross-brewery rule does not apply. */
export const NOT_BREWERY_IDS = new Set(['token']);

type Maker = (b: TestBrewery) => Promise<number>;

/** Which kind of row a path parameter names: `:id` takes its kind from the segment before it. */
const ID_SEGMENTS: Record<string, string> = { batches: 'batchId' };
export function paramKind(path: string, param: string): string {
  if (param !== 'id') return param;
  const segment = path.split('/')[path.split('/').indexOf(':id') - 1] ?? '';
  const kind = ID_SEGMENTS[segment];
  if (!kind)
    throw new Error(
      `':id' after '/${segment}' names no known kind: add the segment to ID_SEGMENTS in tests/api/route-samples.ts`,
    );
  return kind;
}

async function ok<T>(res: Promise<{ status: number; body: T }>, status = 201): Promise<T> {
  const r = await res;
  if (r.status !== status) throw new Error(`sample setup answered ${r.status}: ${JSON.stringify(r.body)}`);
  return r.body;
}

/** One pilot kit and one recipe per brewery, shared by the recipe, version and equipment ids. */
const recipes = new WeakMap<TestBrewery, Promise<{ recipeId: number; versionId: number; equipmentId: number }>>();
function recipeOf(b: TestBrewery) {
  if (!recipes.has(b)) {
    recipes.set(
      b,
      (async () => {
        const equipment = await ok<{ id: number }>(
          b.as.head_brewer
            .post('/api/equipment')
            .send({ ...DEMO_EQUIPMENT.pilot, name: `Pilot ${randomUUID().slice(0, 6)}` }),
        );
        const recipe = await ok<{ id: number; versionId: number }>(
          b.as.head_brewer.post('/api/recipes').send({
            name: `Sample ${randomUUID().slice(0, 6)}`,
            style: 'Amber',
            description: '',
            status: 'draft',
            changeNote: 'First',
            equipmentProfileId: equipment.id,
            content: SEASONAL_CONTENT,
          }),
        );
        return { recipeId: recipe.id, versionId: recipe.versionId, equipmentId: equipment.id };
      })(),
    );
  }
  return recipes.get(b)!;
}

const batchOf = async (b: TestBrewery) =>
  (await plannedBatch({ id: b.users.head_brewer.id, breweryId: b.brewery.id })).id;

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
  recipeId: async (b) => (await recipeOf(b)).recipeId,
  versionId: async (b) => (await recipeOf(b)).versionId,
  equipmentId: async (b) => (await recipeOf(b)).equipmentId,
  ingredientId: async (b) => (await ok<{ id: number }>(b.as.head_brewer.post('/api/ingredients').send(INGREDIENT))).id,
  batchId: batchOf,
  entryId: async (b) => {
    const batchId = await batchOf(b);
    return (
      await ok<{ id: number }>(b.as.assistant_brewer.post(`/api/batches/${batchId}/log`).set(writeHeaders()).send(NOTE))
    ).id;
  },
  vesselId: async (b) =>
    (
      await ok<{ id: number }>(
        b.as.head_brewer.post('/api/vessels').send({ ...VESSEL, name: `Tank ${randomUUID().slice(0, 6)}` }),
      )
    ).id,
  alertId: async (b) => {
    const alert = await Alert.create({
      breweryId: b.brewery.id,
      batchId: await batchOf(b),
      kind: 'stalled',
      message: 'Gravity has not moved in three readings',
      emailedAt: null,
      readAt: null,
    });
    return alert.id;
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

const INGREDIENT = { kind: 'hop', name: 'Harbour Gold', alphaAcidPct: 9.5, notes: '' };
const NOTE = { kind: 'note', text: 'Sample note' };
const VESSEL = {
  name: 'Tank',
  type: 'fermenter',
  capacity: 1200,
  capacityUnit: 'l',
  ratedPressure: 200,
  pressureUnit: 'kpa',
};

/** A body each write route with a path id accepts (validated by its own schema in the tests). */
export const VALID_BODIES: Record<string, (ids: Record<string, number>) => unknown> = {
  'PATCH /api/team/:userId': () => ({ role: 'assistant_brewer' }),
  'PATCH /api/recipes/:recipeId': () => ({ description: 'Sample' }),
  'POST /api/recipes/:recipeId/versions/:versionId/scaled': () => ({ changeNote: 'Scaled sample', batchVolumeL: 100 }),
  'PUT /api/ingredients/:ingredientId': () => INGREDIENT,
  'POST /api/batches/:id/status': () => ({ status: 'brewing' }),
  'POST /api/batches/:id/log': () => NOTE,
  'PUT /api/vessels/:vesselId': () => VESSEL,
  'PUT /api/equipment/:equipmentId': () => DEMO_EQUIPMENT.pilot,
  'POST /api/recipes/:recipeId/versions': () => ({
    changeNote: 'Sample',
    equipmentProfileId: 1,
    content: SEASONAL_CONTENT,
  }),
  'PATCH /api/recipes/:recipeId/versions/:versionId': () => ({
    changeNote: 'Sample',
    equipmentProfileId: 1,
    content: SEASONAL_CONTENT,
  }),
  'PUT /api/batches/:id/vessel': () => ({ vesselId: 1 }),
  'POST /api/batches/:id/sign-off': () => ({ password: GOOD_PASSWORD }),
  'PUT /api/cellar/batches/:batchId/plan': () => cellarPlanBody(),
  'POST /api/cellar/batches/:batchId/readings': () => ({
    kind: 'reading',
    method: 'hydrometer',
    gravity: 1.05,
    gravityUnit: 'sg',
    temp: 19,
    tempUnit: 'c',
  }),
  'POST /api/cellar/batches/:batchId/actions': () => ({ kind: 'action', action: 'cold_crash', temp: 1, tempUnit: 'c' }),
  'POST /api/cellar/batches/:batchId/packaging': () => ({
    kind: 'packaging',
    lines: [{ kind: 'can', sizeMl: 473, count: 1 }],
  }),
  'POST /api/batches/:batchId/tasting-notes': () => ({ idempotencyKey: randomUUID(), content: TASTING_CONTENT }),
  'PUT /api/batches/:batchId/release': () => SHEET,
  'POST /api/batches/:batchId/release/publish': () => ({ confirmedOg: 1.05, confirmedFg: 1.01 }),
};

/** A query string each GET route with a required query accepts. */
export const VALID_QUERIES: Record<string, string> = {
  'GET /api/recipes/:recipeId/compare': 'a=1&b=2',
};

export const routeKey = (route: RouteEntry) => `${route.method.toUpperCase()} ${route.path}`;
export const pathParams = (path: string) => [...path.matchAll(/:(\w+)/g)].map((m) => m[1]!);

/** Ids for every parameter of a route inside one brewery, made once per brewery and parameter name. */
export function idSource(b: TestBrewery) {
  const cache = new Map<string, Promise<number>>();
  return async (param: string): Promise<number> => {
    const make = ID_MAKERS[param];
    if (!make)
      throw new Error(`No way to make an id for ':${param}': add it to ID_MAKERS in tests/api/route-samples.ts`);
    if (!cache.has(param)) cache.set(param, make(b));
    return cache.get(param)!;
  };
}

export function fillPath(path: string, values: Record<string, string | number>): string {
  return path.replace(/:(\w+)/g, (_, name: string) => encodeURIComponent(String(values[name])));
}
