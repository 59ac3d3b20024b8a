// Bad input, generated: property-based requests against every write route in routeTable, as every role and signed out.
// Wrong types, huge strings, deep nesting, unknown fields, unicode (including lone surrogates), negative and
// non-finite numbers. Nothing may answer 5xx; a refused request (4xx) leaves every table as it was.
// Short form in `npm test`; long form by hand: KW_BAD_INPUT_RUNS=20000 npx vitest run --project api tests/api/bad-input.test.ts
import fc from 'fast-check';
import { z } from 'zod';
import { QueryTypes } from 'sequelize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { sequelize } from '../../server/config/database';
import { routeTable, type RouteEntry } from '../../server/routes/define';
import { ROLES } from '../../shared/schemas/roles';
import { API_ERRORS, isApiErrorCode, type ApiErrorCode } from '../../shared/schemas/errors';
import { agent, createTestBrewery, type Agent, type TestBrewery } from './helpers';
import { ID_MAKERS, VALID_BODIES, VALID_QUERIES, fillPath, idSource, pathParams, routeKey } from './route-samples';

const TOTAL_RUNS = Number(process.env.KW_BAD_INPUT_RUNS ?? 400);
/** Audit records a refusal is meant to leave behind (who tried what); anything else is a write. */
const REFUSAL_AUDIT_ACTIONS = new Set(['request.denied', 'sign-in.failure']);
/** Sessions are touched by every signed-in request (rolling expiry), so only their number is compared. */
const COUNT_ONLY_TABLES = new Set(['sessions', 'audit_events']);

// Routes that take no input at all (no body, params or query schema) have nothing a client could get wrong.
const writeRoutes = routeTable.filter(
  (r) => r.method !== 'get' && (r.schemas.body || r.schemas.params || r.schemas.query),
);

// ------------------------------------------------------------------ values

/** A JSON token written as-is into the body text: numbers JSON.stringify cannot produce. */
class Raw {
  constructor(readonly text: string) {}
  [fc.toStringMethod](): string {
    return `Raw(${this.text.slice(0, 20)})`;
  }
}

function toJsonText(value: unknown): string {
  const raws: string[] = [];
  const text = JSON.stringify(value, (_k, v: unknown) => {
    if (v instanceof Raw) {
      raws.push(v.text);
      return `\u0001RAW${raws.length - 1}\u0001`;
    }
    return v;
  });
  return (text ?? 'null').replace(/"\\u0001RAW(\d+)\\u0001"/g, (_, i: string) => raws[Number(i)]!);
}

/** Deep nesting, written straight as JSON text (building it as objects would overflow the printers' recursion). */
class Deep extends Raw {
  constructor(
    readonly depth: number,
    readonly asArray: boolean,
  ) {
    super(asArray ? `${'['.repeat(depth)}1${']'.repeat(depth)}` : `${'{"a":'.repeat(depth)}1${'}'.repeat(depth)}`);
  }
  [fc.toStringMethod](): string {
    return `Deep(${this.depth}, ${this.asArray ? 'arrays' : 'objects'})`;
  }
}

const hugeString = fc.constantFrom('x'.repeat(100_000), '🍺'.repeat(20_000), 'é'.repeat(300), 'y'.repeat(1_100_000));
const trickyString = fc.constantFrom(
  '',
  ' ',
  '\u0000',
  '\uD800',
  'a\uDFFFb',
  '\u202Eevil',
  'ﷺ',
  'Z͑ͫ̓ͪ̂ͫ̽͏̴̙̤̞͉͚̯̞̠͍',
  '1e400',
  'NaN',
  'Infinity',
  '-1',
  '0x10',
  '2026-13-45',
  '2026-02-30T25:61:00Z',
  "'; DROP TABLE batches; --",
  '<script>alert(1)</script>',
  '../../etc/passwd',
  '__proto__',
  'null',
  'true',
  '{}',
  '[]',
);
const number = fc.oneof(
  fc.integer(),
  fc.double({ noNaN: true, noDefaultInfinity: true }),
  fc.constantFrom(-1, -0, 0, 0.5, 1e308, -1e308, 2 ** 53 + 1, 2147483648, -2147483649, 5e-324),
  fc.constantFrom(new Raw('1e400'), new Raw('-1e400'), new Raw('1e-400'), new Raw('NaN')),
);
const deep = fc.tuple(fc.integer({ min: 30, max: 3000 }), fc.boolean()).map(([d, arr]) => new Deep(d, arr));
const nasty: fc.Arbitrary<unknown> = fc.oneof(
  fc.string({ unit: 'binary', maxLength: 40 }),
  fc.string({ unit: 'grapheme', maxLength: 20 }),
  trickyString,
  hugeString,
  number,
  fc.boolean(),
  fc.constant(null),
  deep,
  fc.array(fc.oneof(fc.string({ maxLength: 5 }), fc.integer()), { maxLength: 5 }),
  fc.dictionary(fc.string({ maxLength: 8 }), fc.oneof(fc.string({ maxLength: 8 }), fc.integer()), { maxKeys: 4 }),
);
const unknownKey = fc.oneof(
  fc.constantFrom('__proto__', 'constructor', 'prototype', 'id', 'breweryId', 'authorId', 'receivedAt', 'role', 'hash'),
  fc.string({ unit: 'binary', minLength: 1, maxLength: 12 }),
);

/** Top-level and nested field names a schema declares (through unions too), to aim wrong values at real fields. */
function fieldNames(schema: z.ZodType | undefined): string[] {
  if (!schema) return [];
  let json: unknown;
  try {
    json = z.toJSONSchema(schema, { unrepresentable: 'any', io: 'input' });
  } catch {
    return [];
  }
  const names = new Set<string>();
  const walk = (node: unknown, depth: number) => {
    if (!node || typeof node !== 'object' || depth > 3) return;
    const n = node as Record<string, unknown>;
    if (n.properties && typeof n.properties === 'object' && depth === 0)
      for (const k of Object.keys(n.properties)) names.add(k);
    for (const key of ['anyOf', 'oneOf', 'allOf'])
      if (Array.isArray(n[key])) for (const s of n[key] as unknown[]) walk(s, depth);
  };
  walk(json, 0);
  return [...names];
}

/** Replaces one value somewhere inside a valid body (paths chosen by the generator). */
function mutateAt(body: unknown, choice: number, replacement: unknown): unknown {
  const paths: (string | number)[][] = [];
  const walk = (v: unknown, path: (string | number)[]) => {
    paths.push(path);
    if (Array.isArray(v)) v.forEach((x, i) => walk(x, [...path, i]));
    else if (v && typeof v === 'object') for (const [k, x] of Object.entries(v)) walk(x, [...path, k]);
  };
  walk(body, []);
  const path = paths[choice % paths.length]!;
  if (path.length === 0) return replacement;
  const copy = structuredClone(body) as Record<string | number, unknown>;
  let target = copy;
  for (const p of path.slice(0, -1)) target = target[p] as Record<string | number, unknown>;
  target[path[path.length - 1]!] = replacement;
  return copy;
}

function bodyArbitrary(route: RouteEntry, validBody: unknown): fc.Arbitrary<unknown> {
  const names = fieldNames(route.schemas.body);
  const shapes: fc.Arbitrary<unknown>[] = [
    nasty, // the whole body is the wrong thing: a string, a number, a deep array...
    fc.record({ extra: unknownKey, value: nasty }).map(({ extra, value }) => ({ [extra]: value })),
  ];
  if (names.length) {
    const field = fc.constantFrom(...names);
    shapes.push(
      fc
        .array(fc.tuple(field, nasty), { minLength: 1, maxLength: names.length })
        .map((pairs) => Object.fromEntries(pairs)),
      fc.tuple(fc.array(fc.tuple(field, nasty), { maxLength: 3 }), unknownKey, nasty).map(([pairs, k, v]) => ({
        ...Object.fromEntries(pairs),
        [k]: v,
      })),
    );
  }
  if (validBody !== undefined) {
    shapes.push(
      fc.tuple(fc.nat(), nasty).map(([at, value]) => mutateAt(validBody, at, value)),
      fc.tuple(unknownKey, nasty).map(([k, v]) => ({ ...(validBody as object), [k]: v })),
    );
  }
  return fc.oneof(...shapes);
}

const junkParam = fc.oneof(
  fc.constantFrom('0', '-1', '1.5', '1e400', 'abc', '9'.repeat(40), '2147483648', ' ', 'null', '%zz', '..', '€'),
  fc.string({ unit: 'binary', minLength: 1, maxLength: 20 }).map(encodeURIComponent),
);

// ------------------------------------------------------------------ the database's state

let tables: string[] = [];

interface DbState {
  counts: Record<string, number>;
  checksums: Record<string, number>;
  lastAuditId: number;
}

async function dbState(): Promise<DbState> {
  const counts = await sequelize.query<{ t: string; n: number }>(
    tables.map((t) => `SELECT '${t}' AS t, COUNT(*) AS n FROM \`${t}\``).join(' UNION ALL '),
    { type: QueryTypes.SELECT },
  );
  const checksummed = tables.filter((t) => !COUNT_ONLY_TABLES.has(t));
  const sums = await sequelize.query<{ Table: string; Checksum: number }>(
    `CHECKSUM TABLE ${checksummed.map((t) => `\`${t}\``).join(', ')}`,
    { type: QueryTypes.SELECT },
  );
  const [audit] = await sequelize.query<{ id: number | null }>('SELECT MAX(id) AS id FROM audit_events', {
    type: QueryTypes.SELECT,
  });
  return {
    counts: Object.fromEntries(counts.map((r) => [r.t, Number(r.n)])),
    checksums: Object.fromEntries(sums.map((r) => [r.Table.split('.').pop()!, Number(r.Checksum)])),
    lastAuditId: Number(audit?.id ?? 0),
  };
}

// ------------------------------------------------------------------ the run

type Caller = (typeof ROLES)[number] | 'signed-out';
let t: TestBrewery;
let callers: Record<Caller, Agent>;
let ownId: (param: string) => Promise<number>;
const tally = { requests: 0, refused: 0, accepted: 0, failed: 0, byStatus: {} as Record<number, number> };

beforeAll(async () => {
  t = await createTestBrewery();
  callers = { ...t.as, 'signed-out': agent() };
  ownId = idSource(t);
  tables = (
    await sequelize.query<{ name: string }>(
      "SELECT TABLE_NAME AS name FROM information_schema.TABLES WHERE TABLE_SCHEMA = DATABASE() AND TABLE_NAME <> 'schema_migrations'",
      { type: QueryTypes.SELECT },
    )
  ).map((r) => r.name);
});

afterAll(() => {
  const statuses = Object.entries(tally.byStatus)
    .map(([s, n]) => `${s}×${n}`)
    .join(' ');
  console.log(
    `bad input: ${tally.requests} requests over ${writeRoutes.length} write routes — ${tally.refused} refused, ` +
      `${tally.accepted} accepted (valid by chance), ${tally.failed} answered 5xx [${statuses}]`,
  );
});

describe('bad input never answers 5xx and a refusal writes nothing', () => {
  it('has write routes to try', () => {
    expect(writeRoutes.length).toBeGreaterThan(5);
  });

  const perRoute = Math.max(6, Math.ceil(TOTAL_RUNS / Math.max(1, writeRoutes.length)));

  it.each(writeRoutes.map((r) => [routeKey(r), r] as const))(
    '%s',
    { timeout: 30_000 + perRoute * 400 },
    async (key, route) => {
      const params = pathParams(route.path);
      const own: Record<string, number> = {};
      for (const p of params) if (ID_MAKERS[p]) own[p] = await ownId(p);
      const validBody = VALID_BODIES[key]?.(own);

      const paramArb = fc.record(
        Object.fromEntries(
          params.map((p) => [p, own[p] !== undefined ? fc.oneof(fc.constant(String(own[p])), junkParam) : junkParam]),
        ),
      );
      const callerArb = fc.constantFrom<Caller>(...ROLES, 'signed-out');

      await fc.assert(
        fc.asyncProperty(callerArb, paramArb, bodyArbitrary(route, validBody), async (caller, paramValues, body) => {
          const text = toJsonText(body);
          let parsed: unknown;
          let parses = true;
          try {
            parsed = JSON.parse(text);
          } catch {
            parses = false;
          }
          const decodedParams = Object.fromEntries(Object.entries(paramValues).map(([k, v]) => [k, safeDecode(v)]));
          const inputValid =
            parses &&
            text.length < 1_000_000 &&
            (!route.schemas.params || route.schemas.params.safeParse(decodedParams).success) &&
            (!route.schemas.body || route.schemas.body.safeParse(parsed).success);

          const before = await dbState();
          const url = route.path.replace(/:(\w+)/g, (_, n: string) => paramValues[n]!);
          const res = await callers[caller][route.method](url).set('content-type', 'application/json').send(text);
          tally.requests += 1;
          tally.byStatus[res.status] = (tally.byStatus[res.status] ?? 0) + 1;

          const context = `${caller} ${route.method.toUpperCase()} ${url.slice(0, 120)} body ${text.slice(0, 200)} → ${res.status} ${JSON.stringify(res.body).slice(0, 300)}`;
          if (res.status >= 500) tally.failed += 1;
          expect(res.status, context).toBeLessThan(500);
          if (!inputValid) expect(res.status, `invalid input was accepted: ${context}`).toBeGreaterThanOrEqual(400);
          if (res.status >= 400) {
            tally.refused += 1;
            expect(res.body?.error?.message, `a refusal says why: ${context}`).toEqual(expect.any(String));
            const code = res.body?.error?.code as ApiErrorCode;
            expect(isApiErrorCode(code), `a refusal carries a code of the contract: ${context}`).toBe(true);
            expect(res.body.error.retryable, `and says whether a retry can pass: ${context}`).toBe(
              API_ERRORS[code].retryable,
            );
            const after = await dbState();
            const { audit_events: auditBefore, ...countsBefore } = before.counts;
            const { audit_events: auditAfter, ...countsAfter } = after.counts;
            expect(countsAfter, `a refused request changed row counts: ${context}`).toEqual(countsBefore);
            expect(after.checksums, `a refused request changed a table: ${context}`).toEqual(before.checksums);
            if (auditAfter !== auditBefore) {
              const added = await sequelize.query<{ action: string }>('SELECT action FROM audit_events WHERE id > ?', {
                replacements: [before.lastAuditId],
                type: QueryTypes.SELECT,
              });
              for (const { action } of added)
                expect(REFUSAL_AUDIT_ACTIONS.has(action), `audit '${action}' after ${context}`).toBe(true);
            }
          } else {
            tally.accepted += 1;
          }
        }),
        { numRuns: perRoute, endOnFailure: true },
      );
    },
  );
});

/** A lone surrogate as JSON text and as an address would carry it (its UTF-8-style escape, which is not UTF-8). */
const LONE = { json: '\\ud800', url: '%ED%A0%80' };
const BROKEN_TEXT = 'This text holds a character that is not valid: retype it';
/** Valid bodies of routes without a path id (the brewery's settings answered 500 after saving them). */
const MORE_BODIES: Record<string, unknown> = {
  'PATCH /api/brewery': { name: 'Harbour Works', unitSystem: 'us', timeZone: 'UTC' },
};

/** The body as JSON text with a lone surrogate at the end of every string (one added when it has none). */
function withLoneSurrogates(body: unknown): string {
  const mark = '\u0001';
  let text = JSON.stringify(body, (_k, v: unknown) => (typeof v === 'string' ? `${v}${mark}` : v));
  if (!text.includes('\\u0001')) text = JSON.stringify({ ...(body as object), name: mark });
  return text.replace(/\\u0001/g, LONE.json);
}

describe('a lone surrogate is refused on every route and changes nothing', () => {
  it('in a body, a query and a path', { timeout: 120_000 }, async () => {
    const caller = t.as.head_brewer;
    const samples = new Map<RouteEntry, { own: Record<string, string | number>; query: string; body: unknown }>();
    for (const route of routeTable) {
      const own: Record<string, string | number> = {};
      // A link's secret is no row of the brewery: any well-formed one will do.
      for (const p of pathParams(route.path)) own[p] = ID_MAKERS[p] ? await ownId(p) : 'sample-link-secret';
      const key = routeKey(route);
      samples.set(route, {
        own,
        query: VALID_QUERIES[key] ? `?${VALID_QUERIES[key]}` : '',
        body: VALID_BODIES[key]?.(own as Record<string, number>) ?? MORE_BODIES[key] ?? { name: 'Harbour' },
      });
    }
    const before = await dbState();
    for (const route of routeTable) {
      const { own, query, body } = samples.get(route)!;
      const url = fillPath(route.path, own);
      const send = (address: string, text: string) =>
        caller[route.method](address).set('content-type', 'application/json').send(text);
      const context = (where: string, res: { status: number; body: unknown }) =>
        `${where}: ${route.method.toUpperCase()} ${route.path} → ${res.status} ${JSON.stringify(res.body).slice(0, 200)}`;

      const inBody = await send(`${url}${query}`, withLoneSurrogates(body));
      expect(inBody.status, context('body', inBody)).toBe(400);
      expect(Object.values(inBody.body.error.fields ?? {}), context('body', inBody)).toEqual([BROKEN_TEXT]);

      const inQuery = await send(`${url}${query ? `${query}&` : '?'}q=${LONE.url}`, JSON.stringify(body));
      expect(inQuery.status, context('query', inQuery)).toBe(400);
      expect(inQuery.body.error.message, context('query', inQuery)).toBe('The address is not valid');

      // The first path id replaced (or, on a route without one, a segment added).
      const [first] = pathParams(route.path);
      const brokenPath = first
        ? route.path.replace(/:(\w+)/g, (_, name: string) => (name === first ? LONE.url : String(own[name])))
        : `${url}/${LONE.url}`;
      const inPath = await send(`${brokenPath}${query}`, JSON.stringify(body));
      expect(inPath.status, context('path', inPath)).toBe(400);
      expect(inPath.body.error.message, context('path', inPath)).toBe('The address is not valid');
    }
    const after = await dbState();
    expect(after.counts).toEqual(before.counts);
    expect(after.checksums).toEqual(before.checksums);
  });
});

function safeDecode(v: string): string {
  try {
    return decodeURIComponent(v);
  } catch {
    return v;
  }
}
