// The benchmark (npm run bench; not part of npm test). On loopback, with autocannon (50 connections, 10 s each
// after a warm-up): a bare Express endpoint doing one primary-key SELECT through the same MariaDB (the ceiling),
// then Kettlewright's routes, each as a ratio of the ceiling measured just before it. Also: SQL statements per route (counted by
// Sequelize's logging hook), shared/brewing's scaling median, and the gzip size of the initial JavaScript.
// The database is its own instance (.data-bench/, port 3310) seeded by scripts/seed-large.ts.
import { randomUUID, randomBytes } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { cpus, totalmem } from 'node:os';
import path from 'node:path';
import { gzipSync } from 'node:zlib';
import { spawn } from 'node:child_process';
import { createInterface } from 'node:readline';
import autocannon from 'autocannon';
import { ROOT } from './lib/paths';
import { stopMariaDb } from './lib/mariadb-instance';
import { prepareInstance, startApi } from './fault-harness';

const BENCH_DATA = {
  dataDir: path.join(ROOT, '.data-bench'),
  port: Number(process.env.KW_BENCH_DB_PORT ?? 3310),
  database: 'kettlewright_bench',
};
const API_PORT = Number(process.env.KW_BENCH_API_PORT ?? 3191);
const CEILING_PORT = API_PORT + 1;
const DURATION_S = Number(process.env.KW_BENCH_SECONDS ?? 10);
const WARM_UP_S = 3;
const CONNECTIONS = 50;
/** A brewery's own staff at their screens at once: the list and reports are also measured at this load. */
const STAFF_CONNECTIONS = 5;

// ------------------------------------------------------------------ the ceiling, as its own process

async function serveCeiling(port: number, url: string) {
  const express = (await import('express')).default;
  const mariadb = await import('mariadb');
  const u = new URL(url);
  const pool = mariadb.createPool({
    host: u.hostname,
    port: Number(u.port),
    user: decodeURIComponent(u.username),
    password: decodeURIComponent(u.password),
    database: u.pathname.slice(1),
    connectionLimit: 10,
  });
  const app = express();
  app.get('/ceiling/:id', async (req, res) => {
    const rows = await pool.query<{ id: number; name: string }[]>('SELECT id, name FROM breweries WHERE id = ?', [
      Number(req.params.id),
    ]);
    res.json(rows[0] ?? null);
  });
  app.listen(port, '127.0.0.1', () => console.log('READY {}'));
}

if (process.argv[2] === '--ceiling') {
  await serveCeiling(Number(process.argv[3]), process.argv[4]!);
} else {
  await main();
}

// ------------------------------------------------------------------ measuring

type LargeSeedShape = import('./seed-large').LargeSeed;

interface Row {
  name: string;
  kind: 'ceiling' | 'read' | 'write' | 'report';
  rps: number;
  p50: number;
  p97_5: number;
  p99: number;
  non2xx: number;
  queries?: number;
  /** The ceiling's req/s and p99 measured just before this route. */
  ceilingRps: number;
  ceilingP99: number;
}

async function load(
  url: string,
  opts: { method?: 'GET' | 'POST'; headers?: Record<string, string>; body?: () => string; path: () => string },
  seconds: number,
  connections = CONNECTIONS,
) {
  const headers = { ...opts.headers };
  const result = await autocannon({
    url,
    connections,
    duration: seconds,
    requests: [
      {
        method: opts.method ?? 'GET',
        setupRequest: (req) => {
          const r = { ...req, path: opts.path(), headers: { ...headers } };
          if (opts.body) {
            r.body = opts.body();
            r.headers['content-type'] = 'application/json';
            r.headers['idempotency-key'] = randomUUID();
            r.headers['x-captured-at'] = new Date().toISOString();
            r.headers['x-device-id'] = 'bench-tablet';
          }
          return r;
        },
      },
    ],
  });
  return result;
}

async function measure(
  name: string,
  kind: Row['kind'],
  url: string,
  opts: Parameters<typeof load>[1],
  connections = CONNECTIONS,
): Promise<Row> {
  await load(url, opts, WARM_UP_S, connections);
  const r = await load(url, opts, DURATION_S, connections);
  return {
    name,
    kind,
    rps: r.requests.average,
    p50: r.latency.p50,
    p97_5: r.latency.p97_5,
    p99: r.latency.p99,
    non2xx: r.non2xx + r.errors,
    ceilingRps: r.requests.average,
    ceilingP99: r.latency.p99,
  };
}

function initialJsGzipKb(): number {
  const dist = path.join(ROOT, 'dist');
  const html = readFileSync(path.join(dist, 'index.html'), 'utf8');
  const files = new Set<string>();
  for (const m of html.matchAll(/<script[^>]+type="module"[^>]+src="([^"]+)"/g)) files.add(m[1]!);
  for (const m of html.matchAll(/<link[^>]+rel="modulepreload"[^>]+href="([^"]+)"/g)) files.add(m[1]!);
  let bytes = 0;
  for (const f of files) bytes += gzipSync(readFileSync(path.join(dist, f.replace(/^\//, '')))).length;
  return bytes / 1024;
}

async function main() {
  console.log(`Preparing the bench instance (.data-bench/, port ${BENCH_DATA.port}) ...`);
  // KW_BENCH_RESEED=1 starts from an empty database; otherwise a seeded bench database is reused.
  const instance = await prepareInstance({ ...BENCH_DATA, fresh: process.env.KW_BENCH_RESEED === '1' });
  const secret = randomBytes(36).toString('base64url');
  const env = {
    NODE_ENV: 'production',
    LOG_LEVEL: 'warn',
    HOST: '127.0.0.1',
    PORT: String(API_PORT),
    DATABASE_URL: instance.appUrl,
    SESSION_SECRET: secret,
    SMTP_URL: 'smtp://127.0.0.1:9',
    PUBLIC_URL: `https://127.0.0.1:${API_PORT}`,
  };
  Object.assign(process.env, env);
  const { seedLarge, findLargeSeed, LARGE_PEOPLE, LARGE_PASSWORD } = await import('./seed-large');
  let seed = await findLargeSeed();
  if (seed) {
    console.log(`Reusing the seeded brewery (${seed.batchIds.length} batches); KW_BENCH_RESEED=1 seeds afresh.`);
  } else {
    console.log('Seeding ten years of a busy brewery (scripts/seed-large.ts) ...');
    seed = await seedLarge(instance.ownerUrl);
    console.log(`  ${JSON.stringify(seed.counts)} in ${seed.seconds.toFixed(1)} s`);
  }

  const ceiling = spawn(
    process.execPath,
    ['--import', 'tsx', path.join(ROOT, 'scripts/bench.ts'), '--ceiling', String(CEILING_PORT), instance.appUrl],
    { stdio: ['ignore', 'pipe', 'inherit'] },
  );
  let api: Awaited<ReturnType<typeof startApi>> | undefined;
  try {
    await new Promise<void>((resolve) =>
      createInterface({ input: ceiling.stdout }).on('line', (l) => l.startsWith('READY') && resolve()),
    );
    api = await startApi(env);
    await measureAll(api.url, seed, LARGE_PEOPLE.head_brewer.email, LARGE_PASSWORD);
  } finally {
    await api?.stop();
    ceiling.kill();
    await stopMariaDb(BENCH_DATA.dataDir);
  }
}

async function measureAll(apiUrl: string, seed: LargeSeedShape, email: string, password: string) {
  // Production cookies are Secure: the API trusts one proxy, so say the request came over HTTPS.
  const https = { 'x-forwarded-proto': 'https' };
  const signIn = await fetch(`${apiUrl}/api/auth/sign-in`, {
    method: 'POST',
    headers: { ...https, 'content-type': 'application/json', 'x-kettlewright': '1' },
    body: JSON.stringify({ email, password }),
  });
  if (signIn.status !== 200) throw new Error(`bench sign-in answered ${signIn.status}`);
  const cookie = signIn.headers.getSetCookie()[0]!.split(';')[0]!;
  const headers = { ...https, cookie, 'x-kettlewright': '1' };

  const oldBatch = seed.batchIds[Math.floor(seed.batchIds.length / 2)]!;
  const openBatches = seed.batchIds.slice(-8);
  const { recipeId, versionId } = seed.recipes[0]!;
  let n = 0;
  const routes: {
    name: string;
    kind: Row['kind'];
    method?: 'GET' | 'POST';
    path: () => string;
    body?: () => string;
  }[] = [
    { name: 'Ceiling: Express + 1 PK SELECT', kind: 'ceiling', path: () => `/ceiling/${seed.breweryId}` },
    // The floor every signed-in route stands on: session, user, one small answer.
    { name: 'GET /api/auth/me (sign-in floor)', kind: 'read', path: () => '/api/auth/me' },
    { name: 'GET /api/batches (list, page 1)', kind: 'read', path: () => '/api/batches' },
    { name: 'GET /api/batches/:id/log (134 entries)', kind: 'read', path: () => `/api/batches/${oldBatch}/log` },
    {
      name: 'GET /api/recipes/:id/versions/:v (computed)',
      kind: 'read',
      path: () => `/api/recipes/${recipeId}/versions/${versionId}`,
    },
    {
      name: 'POST /api/batches/:id/log (note, new key)',
      kind: 'write',
      method: 'POST',
      path: () => `/api/batches/${openBatches[n++ % openBatches.length]}/log`,
      body: () => JSON.stringify({ kind: 'note', text: 'Bench note: gravity steady, krausen falling' }),
    },
  ];
  routes.push(
    // The seeded history ends in October 2026: the month a brewer files next, and one five years back.
    {
      name: 'GET /api/reports/production?month=2026-10',
      kind: 'report',
      path: () => '/api/reports/production?month=2026-10',
    },
    {
      name: 'GET /api/reports/production?month=2021-06',
      kind: 'report',
      path: () => '/api/reports/production?month=2021-06',
    },
    {
      name: 'GET /api/reports/history?recipeId (60 of 500)',
      kind: 'report',
      path: () => `/api/reports/history?recipeId=${recipeId}`,
    },
  );

  // SQL statements per request, counted in this process through the same app and Sequelize logging hook.
  const { createApp } = await import('../server/app');
  const { queryCounter, sequelize } = await import('../server/config/database');
  const local = createApp().listen(0, '127.0.0.1');
  await new Promise((r) => local.once('listening', r));
  const localUrl = `http://127.0.0.1:${(local.address() as { port: number }).port}`;
  const queries: Record<string, number> = {};
  for (const r of routes.slice(1)) {
    await new Promise((res) => setTimeout(res, 50));
    queryCounter.count = 0;
    const res = await fetch(`${localUrl}${r.path()}`, {
      method: r.method ?? 'GET',
      headers: {
        ...headers,
        ...(r.body
          ? {
              'content-type': 'application/json',
              'idempotency-key': randomUUID(),
              'x-captured-at': new Date().toISOString(),
              'x-device-id': 'bench-count',
            }
          : {}),
      },
      body: r.body?.(),
    });
    await res.arrayBuffer();
    await new Promise((res2) => setTimeout(res2, 50));
    if (res.status >= 400) throw new Error(`${r.name} answered ${res.status}`);
    queries[r.name] = queryCounter.count;
  }
  local.close();

  // The machine's speed drifts over minutes (other virtual machines share its CPUs), so the ceiling is
  // measured again right before each route and each route is compared with its own neighbour.
  const rows: Row[] = [];
  const [ceilingRoute, ...appRoutes] = routes;
  for (const r of appRoutes) {
    process.stdout.write(`  measuring the ceiling, then ${r.name} ...\n`);
    const ceilingRow = await measure(ceilingRoute!.name, 'ceiling', `http://127.0.0.1:${CEILING_PORT}`, {
      headers,
      path: ceilingRoute!.path,
    });
    const row = await measure(r.name, r.kind, apiUrl, { method: r.method, headers, path: r.path, body: r.body });
    rows.push({ ...row, queries: queries[r.name], ceilingRps: ceilingRow.rps, ceilingP99: ceilingRow.p99 });
  }

  // The same list and reports with the brewery's own staff at once: the large data set without a queue of 50.
  const staffRows: Row[] = [];
  for (const r of appRoutes.filter((x) => x.kind === 'report' || x.name.startsWith('GET /api/batches (list'))) {
    process.stdout.write(`  measuring ${r.name} at ${STAFF_CONNECTIONS} connections ...\n`);
    staffRows.push(await measure(r.name, r.kind, apiUrl, { headers, path: r.path }, STAFF_CONNECTIONS));
  }

  const { benchScaling } = await import('./bench-brewing');
  const scaling = benchScaling();
  const jsKb = existsSync(path.join(ROOT, 'dist/index.html')) ? initialJsGzipKb() : NaN;

  const ratio = (r: Row) => r.rps / r.ceilingRps;
  const target = (r: Row) => {
    const checks: string[] = [];
    if (r.kind === 'read') checks.push(ratio(r) >= 0.4 ? 'ok ≥40%' : 'MISS <40%', r.p99 < 50 ? 'ok p99' : 'MISS p99');
    if (r.kind === 'write') checks.push(ratio(r) >= 0.25 ? 'ok ≥25%' : 'MISS <25%');
    if (r.kind === 'report') checks.push(r.p97_5 < 100 ? 'ok p97.5<100' : 'MISS p97.5');
    if (r.queries !== undefined) checks.push(r.queries <= 6 ? 'ok queries' : 'MISS queries');
    return checks.join(', ');
  };
  const lines = [
    `| Route | req/s | p50 ms | p97.5 ms | p99 ms | ceiling req/s (just before) | ceiling p99 ms | vs ceiling | SQL/req | non-2xx | targets |`,
    `|---|---:|---:|---:|---:|---:|---:|---:|---:|---:|---|`,
    ...rows.map(
      (r) =>
        `| ${r.name} | ${r.rps.toFixed(0)} | ${r.p50} | ${r.p97_5} | ${r.p99} | ${r.ceilingRps.toFixed(0)} | ${r.ceilingP99} | ${(100 * ratio(r)).toFixed(0)} % | ${r.queries ?? '–'} | ${r.non2xx} | ${target(r)} |`,
    ),
  ];
  const machine = `${cpus().length} CPU (${cpus()[0]?.model.trim()}), ${(totalmem() / 2 ** 30).toFixed(0)} GB RAM, Node ${process.version}, MariaDB 10.11 (own instance), ${CONNECTIONS} connections, ${DURATION_S} s per route after ${WARM_UP_S} s warm-up, the ceiling measured the same way just before each route`;
  console.log(`\n${machine}\n`);
  console.log(lines.join('\n'));
  console.log(
    `\nList and reports at ${STAFF_CONNECTIONS} connections (a brewery's staff at once), ${DURATION_S} s each after ${WARM_UP_S} s warm-up:\n`,
  );
  console.log(
    [
      '| Route | req/s | p50 ms | p97.5 ms | p99 ms | target |',
      '|---|---:|---:|---:|---:|---|',
      ...staffRows.map(
        (r) =>
          `| ${r.name} | ${r.rps.toFixed(0)} | ${r.p50} | ${r.p97_5} | ${r.p99} | ${r.p97_5 < 100 ? 'ok p97.5<100' : 'MISS p97.5'} |`,
      ),
    ].join('\n'),
  );
  console.log(
    `\nshared/brewing scaleRecipe pilot → 10 bbl: median ${scaling.medianUs.toFixed(1)} µs over ${scaling.iterations} runs (target < 100 µs)`,
  );
  console.log(
    `Initial JavaScript (entry + modulepreloads in dist/index.html): ${jsKb.toFixed(1)} KB gzip (target < 170 KB)`,
  );

  const { explainProductionReport } = await import('../server/services/reports');
  console.log(`\nEXPLAIN for the monthly production report's queries (brewery ${seed.breweryId}, 2026-10):`);
  for (const line of await explainProductionReport(seed.breweryId, '2026-10')) console.log(`  ${line}`);

  mkdirSync(path.join(ROOT, 'test-results'), { recursive: true });
  writeFileSync(
    path.join(ROOT, 'test-results/bench.json'),
    JSON.stringify({ machine, rows, staffRows, scaling, jsKb, seed: seed.counts }, null, 2),
  );

  await sequelize.close();
}
