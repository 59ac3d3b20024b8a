// The role matrix, generated from routeTable so every route is called as every role and signed out. The expected
// answer comes from the reviewed tables (each route's action below, each action's roles in tests/policy-pinned.ts),
// never from the route's own declaration, so a loosened rule or a route moved to a looser action fails here.
import { randomBytes } from 'node:crypto';
import request from 'supertest';
import type { Express } from 'express';
import { beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../server/app';
import { SESSION_COOKIE } from '../../server/middlewares/session';
import { routeTable, type RouteEntry } from '../../server/routes/define';
import { ROLES, type Role } from '../../shared/schemas/roles';
import { GOOD_PASSWORD, cookiePair, createTestBrewery, type TestBrewery } from './helpers';
import { pinnedAllows } from '../policy-pinned';

type Caller = Role | 'signed-out';
const CALLERS: Caller[] = [...ROLES, 'signed-out'];

/** Ids that stand for a path parameter: a real row of the caller's own brewery where one exists. */
function sampleParams(t: TestBrewery): Record<string, string> {
  return {
    userId: String(t.users.assistant_brewer.id),
    // Well formed but unknown: the route's access rule is what is under test, not the link.
    token: randomBytes(32).toString('base64url'),
  };
}
// A parameter with no sample gets an id that exists nowhere: authorisation runs before any lookup,
// so 401/403 are still decided; an allowed caller then gets 404, which the matrix accepts.
const UNKNOWN_ID = '2147483000';

function concretePath(route: RouteEntry, params: Record<string, string>): string {
  if (/[*{}]/.test(route.path))
    throw new Error(`The matrix cannot fill ${route.path}: teach concretePath() its syntax`);
  return route.path.replace(/:(\w+)/g, (_, name: string) => params[name] ?? UNKNOWN_ID);
}

/**
 * The action each route performs, as reviewed. A route that names another action (a looser one, say) or a
 * new route not listed here fails below until this list is changed on purpose.
 */
const ROUTE_ACTIONS: Record<string, string> = {
  'POST /api/auth/sign-in': 'account.signIn',
  'POST /api/auth/sign-up': 'account.signUp',
  'POST /api/auth/sign-out': 'account.signOut',
  'GET /api/auth/me': 'account.read',
  'POST /api/auth/password': 'account.changePassword',
  'POST /api/auth/reset-request': 'account.resetPassword',
  'GET /api/auth/reset/:token': 'account.resetPassword',
  'POST /api/auth/reset/:token': 'account.resetPassword',
  'GET /api/auth/invites/:token': 'account.acceptInvite',
  'POST /api/auth/invites/:token': 'account.acceptInvite',
  'GET /api/team': 'team.manage',
  'POST /api/team/invites': 'team.manage',
  'PATCH /api/team/:userId': 'team.manage',
  'GET /api/brewery': 'brewery.read',
  'PATCH /api/brewery': 'brewery.edit',
  'GET /api/recipes': 'recipe.read',
  'POST /api/recipes': 'recipe.edit',
  'GET /api/recipes/:recipeId': 'recipe.read',
  'PATCH /api/recipes/:recipeId': 'recipe.edit',
  'POST /api/recipes/:recipeId/versions': 'recipe.edit',
  'GET /api/recipes/:recipeId/compare': 'recipe.read',
  'GET /api/recipes/:recipeId/versions/:versionId': 'recipe.read',
  'PATCH /api/recipes/:recipeId/versions/:versionId': 'recipe.edit',
  'GET /api/recipes/:recipeId/versions/:versionId/scale': 'recipe.read',
  'POST /api/recipes/:recipeId/versions/:versionId/scaled': 'recipe.edit',
  'GET /api/equipment': 'equipment.read',
  'POST /api/equipment': 'equipment.edit',
  'PUT /api/equipment/:equipmentId': 'equipment.edit',
  'DELETE /api/equipment/:equipmentId': 'equipment.edit',
  'GET /api/ingredients': 'ingredient.read',
  'POST /api/ingredients': 'ingredient.edit',
  'PUT /api/ingredients/:ingredientId': 'ingredient.edit',
  'DELETE /api/ingredients/:ingredientId': 'ingredient.edit',
  'GET /api/batches': 'batch.read',
  'POST /api/batches': 'batch.plan',
  'GET /api/batches/plan-preview': 'batch.plan',
  'GET /api/batches/:id': 'batch.read',
  'POST /api/batches/:id/status': 'batch.changeStatus',
  'PUT /api/batches/:id/vessel': 'batch.moveToVessel',
  'GET /api/batches/:id/log': 'batch.read',
  'POST /api/batches/:id/log': 'batch.logEntry',
  'PATCH /api/batches/:id/log/:entryId': 'batch.logEntry',
  'PUT /api/batches/:id/log/:entryId': 'batch.logEntry',
  'DELETE /api/batches/:id/log/:entryId': 'batch.logEntry',
  'GET /api/batches/:id/log/verify': 'batch.read',
  'POST /api/batches/:id/sign-off': 'batch.signOff',
  'GET /api/vessels': 'vessel.read',
  'POST /api/vessels': 'vessel.edit',
  'PUT /api/vessels/:vesselId': 'vessel.edit',
  'POST /api/vessels/:vesselId/clean': 'vessel.clean',
  'DELETE /api/vessels/:vesselId': 'vessel.edit',
  'GET /api/cellar/board': 'cellar.read',
  'GET /api/cellar/carbonation': 'cellar.read',
  'GET /api/cellar/batches/:batchId': 'cellar.read',
  'PUT /api/cellar/batches/:batchId/plan': 'cellar.plan',
  'POST /api/cellar/batches/:batchId/readings': 'cellar.logReading',
  'POST /api/cellar/batches/:batchId/readings/preview': 'cellar.logReading',
  'POST /api/cellar/batches/:batchId/readings/import': 'cellar.logReading',
  'POST /api/cellar/batches/:batchId/actions': 'cellar.logAction',
  'POST /api/cellar/batches/:batchId/packaging': 'cellar.logPackaging',
  'GET /api/cellar/alerts': 'cellar.alerts',
  'POST /api/cellar/alerts/:alertId/read': 'cellar.alerts',
  'GET /api/batches/:batchId/tasting-notes': 'tasting.read',
  'POST /api/batches/:batchId/tasting-notes': 'tasting.write',
  'PATCH /api/batches/:batchId/tasting-notes/:noteId': 'tasting.write',
  'PUT /api/batches/:batchId/tasting-notes/:noteId': 'tasting.write',
  'DELETE /api/batches/:batchId/tasting-notes/:noteId': 'tasting.write',
  'GET /api/batches/:batchId/attachments': 'file.read',
  'POST /api/batches/:batchId/attachments': 'file.upload',
  'GET /api/attachments/:attachmentId/file': 'file.readShown',
  'GET /api/attachments/:attachmentId/thumbnail': 'file.readShown',
  'DELETE /api/attachments/:attachmentId': 'file.remove',
  'GET /api/taproom/beers': 'taproom.read',
  'GET /api/taproom/beers/:beerId': 'taproom.read',
  'GET /api/taproom/releases': 'release.read',
  'GET /api/batches/:batchId/release': 'release.read',
  'PUT /api/batches/:batchId/release': 'release.manage',
  'POST /api/batches/:batchId/release/publish': 'release.manage',
  'POST /api/batches/:batchId/release/off-tap': 'release.manage',
  'POST /api/batches/:batchId/release/back-on-tap': 'release.manage',
  'GET /api/reports/production': 'report.production.read',
  'GET /api/reports/production/csv': 'report.production.read',
  'GET /api/reports/history': 'report.history.read',
};

const routeKey = (route: RouteEntry) => `${route.method.toUpperCase()} ${route.path}`;

/** What the caller must get, from the reviewed tables rather than from the route's own declaration. */
function expectation(route: RouteEntry, caller: Caller): 401 | 403 | 'allowed' {
  if (pinnedAllows(ROUTE_ACTIONS[routeKey(route)]!, caller)) return 'allowed';
  return caller === 'signed-out' ? 401 : 403;
}

let t: TestBrewery;
let params: Record<string, string>;
/** One app per caller: the empty sign-in and reset bodies (400s) count against a limiter, and each app has its own. */
const apps = {} as Record<Caller, Express>;
const cookies = {} as Partial<Record<Caller, string>>;

async function signInCookie(caller: Role): Promise<string> {
  const res = await request(apps[caller])
    .post('/api/auth/sign-in')
    .set('x-kettlewright', '1')
    .send({ email: t.users[caller].email, password: GOOD_PASSWORD });
  if (res.status !== 200) throw new Error(`sign-in as ${caller} answered ${res.status}`);
  const line = (res.headers['set-cookie'] as unknown as string[]).find((c) => c.startsWith(`${SESSION_COOKIE}=`));
  if (!line) throw new Error(`sign-in as ${caller} set no session cookie`);
  return cookiePair(line);
}

/** A live session for the caller: routes such as sign-out end it, so it is renewed when needed. */
async function cookieFor(caller: Caller): Promise<string | undefined> {
  if (caller === 'signed-out') return undefined;
  const current = cookies[caller];
  if (current && (await request(apps[caller]).get('/api/auth/me').set('Cookie', current)).status === 200)
    return current;
  cookies[caller] = await signInCookie(caller);
  return cookies[caller];
}

beforeAll(async () => {
  t = await createTestBrewery();
  params = sampleParams(t);
  for (const caller of CALLERS) apps[caller] = createApp();
});

describe('routeTable', () => {
  it('names the reviewed policy action on every route, and every reviewed route exists', () => {
    const declared = Object.fromEntries(routeTable.map((r) => [routeKey(r), r.access]));
    expect(declared).toEqual(ROUTE_ACTIONS);
  });
});

describe.each(routeTable.map((route) => [routeKey(route), route] as const))('role matrix: %s', (_name, route) => {
  it.each(CALLERS.map((caller) => [caller, expectation(route, caller)] as const))(
    'as %s → %s',
    async (caller, expected) => {
      const cookie = await cookieFor(caller);
      const req = request(apps[caller])[route.method](concretePath(route, params)).set('x-kettlewright', '1');
      if (cookie) req.set('Cookie', cookie);
      const res = route.hasBody ? await req.send({}) : await req;

      if (expected === 'allowed') {
        expect(res.status, JSON.stringify(res.body)).not.toBe(401);
        expect(res.status, JSON.stringify(res.body)).not.toBe(403);
        // An empty body is refused by validation (400): fine, as long as it is not an access refusal or a crash.
        expect(res.status, JSON.stringify(res.body)).toBeLessThan(500);
      } else {
        expect(res.status).toBe(expected);
        expect(res.body.error.code).toBe(expected === 401 ? 'unauthenticated' : 'forbidden');
      }
    },
  );
});
