// Foundation: the role matrix, generated from routeTable so every route added later is covered without editing this file.
import { randomBytes } from 'node:crypto';
import request from 'supertest';
import type { Express } from 'express';
import { beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../server/app';
import { SESSION_COOKIE } from '../../server/middlewares/session';
import { routeTable, type RouteEntry } from '../../server/routes/define';
import { ROLES, type Role } from '../../shared/schemas/roles';
import { GOOD_PASSWORD, cookiePair, createTestBrewery, type TestBrewery } from './helpers';

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

function expectation(route: RouteEntry, caller: Caller): 401 | 403 | 'allowed' {
  if (route.access === 'public') return 'allowed';
  if (caller === 'signed-out') return 401;
  if (route.access === 'signed-in' || route.access.includes(caller)) return 'allowed';
  return 403;
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
  // The matrix below checks that every route enforces the rule it declares; this pins what the
  // foundation's rules are, so loosening one (say, opening the team list to every role) fails here.
  it('declares the foundation routes with their intended access', () => {
    const declared = routeTable.map((r) => ({ route: `${r.method.toUpperCase()} ${r.path}`, access: r.access }));
    expect(declared).toEqual(
      expect.arrayContaining([
        { route: 'POST /api/auth/sign-in', access: 'public' },
        { route: 'POST /api/auth/sign-up', access: 'public' },
        { route: 'POST /api/auth/sign-out', access: 'public' },
        { route: 'GET /api/auth/me', access: 'signed-in' },
        { route: 'POST /api/auth/password', access: 'signed-in' },
        { route: 'POST /api/auth/reset-request', access: 'public' },
        { route: 'GET /api/auth/reset/:token', access: 'public' },
        { route: 'POST /api/auth/reset/:token', access: 'public' },
        { route: 'GET /api/auth/invites/:token', access: 'public' },
        { route: 'POST /api/auth/invites/:token', access: 'public' },
        { route: 'GET /api/team', access: ['head_brewer'] },
        { route: 'POST /api/team/invites', access: ['head_brewer'] },
        { route: 'PATCH /api/team/:userId', access: ['head_brewer'] },
        { route: 'GET /api/brewery', access: 'signed-in' },
        { route: 'PATCH /api/brewery', access: ['head_brewer'] },
      ]),
    );
  });
});

describe.each(routeTable.map((route) => [`${route.method.toUpperCase()} ${route.path}`, route] as const))(
  'role matrix: %s',
  (_name, route) => {
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
  },
);
