/**
 * `pnpm bench` (the HTTP part): the API under load from this process
 * (autocannon), the servers in processes of their own, figures taken in
 * turns so that a busy machine moves both sides of a ratio alike. Prints
 * ratios against their aims; nothing here is asserted.
 *
 *   1. POST /api/screen (the README's circular plate, signed in, 10
 *      connections) against a bare Express JSON echo of the same body.
 *   2. The component list (500 components) and a revision list (a component
 *      with 99 501 revisions): p95 through the API against the same page read
 *      by raw SQL on a pg pool of the same concurrency.
 *   3. /api/screen p99 while sheets of ever new revisions are downloaded in a
 *      loop, against p99 without.
 *   4. /api/screen with HOOPLINE_WORKERS=2 against 1.
 *
 * BENCH_SECONDS sets each turn's length (5 s); BENCH_ONLY=screen,lists,sheets,workers
 * picks parts. Results also go to .data/bench/http-bench.json.
 */
import autocannon from 'autocannon';
import { spawn, type ChildProcess } from 'node:child_process';
import { mkdirSync, mkdtempSync, readFileSync, readdirSync, writeFileSync } from 'node:fs';
import { createServer } from 'node:net';
import os from 'node:os';
import path from 'node:path';
import { performance } from 'node:perf_hooks';
import pg from 'pg';
import { BENCH_JWT_SECRET, CIRCULAR_PLATE, benchDatabase, type BenchData } from './bench-database';

const apiRoot = path.resolve(import.meta.dirname, '..');
const repoRoot = path.resolve(apiRoot, '../..');
const SECONDS = Number(process.env['BENCH_SECONDS'] ?? 5);
const ONLY = new Set(
  (process.env['BENCH_ONLY'] ?? 'screen,lists,sheets,workers').split(',').map((s) => s.trim()),
);
const BODY = JSON.stringify(CIRCULAR_PLATE);
const log = (line: string) => console.log(`[bench] ${line}`);

interface Load {
  readonly rps: number;
  /** CPU time of the server's processes per answered request, µs (steadier than req/s on a shared machine). */
  readonly cpuUs: number;
  readonly p50: number;
  readonly p95: number;
  readonly p99: number;
  readonly requests: number;
  readonly bad: number;
}

const percentile = (sorted: readonly number[], p: number) =>
  sorted.length === 0 ? NaN : sorted[Math.min(sorted.length - 1, Math.floor(p * sorted.length))]!;
const median = (values: readonly number[]) =>
  percentile(
    [...values].sort((a, b) => a - b),
    0.5,
  );

/** utime + stime of a process and its children (cluster workers), seconds; Linux /proc. */
function processCpu(pid: number | undefined): number {
  if (pid === undefined) return 0;
  const ticks = 100; // USER_HZ
  const stat = (p: string) => {
    try {
      const text = readFileSync(`/proc/${p}/stat`, 'utf8');
      const fields = text.slice(text.lastIndexOf(')') + 2).split(' ');
      return { ppid: Number(fields[1]), cpu: (Number(fields[11]) + Number(fields[12])) / ticks };
    } catch {
      return undefined;
    }
  };
  let total = stat(String(pid))?.cpu ?? 0;
  for (const entry of readdirSync('/proc')) {
    if (!/^\d+$/.test(entry)) continue;
    const s = stat(entry);
    if (s?.ppid === pid) total += s.cpu;
  }
  return total;
}

function summarise(times: number[], seconds: number, bad: number, cpuSeconds = NaN): Load {
  times.sort((a, b) => a - b);
  return {
    rps: times.length / seconds,
    cpuUs: (cpuSeconds * 1e6) / times.length,
    p50: percentile(times, 0.5),
    p95: percentile(times, 0.95),
    p99: percentile(times, 0.99),
    requests: times.length,
    bad,
  };
}

async function load(options: {
  url: string;
  /** The server's pid, for its CPU time. */
  pid?: number | undefined;
  method?: 'GET' | 'POST';
  headers?: Record<string, string>;
  body?: string;
  connections: number;
  seconds?: number;
}): Promise<Load> {
  const seconds = options.seconds ?? SECONDS;
  const times: number[] = [];
  let bad = 0;
  const cpuBefore = processCpu(options.pid);
  const result = await new Promise<autocannon.Result>((resolve, reject) => {
    const instance = autocannon(
      {
        url: options.url,
        method: options.method ?? 'GET',
        headers: options.headers ?? {},
        ...(options.body === undefined ? {} : { body: options.body }),
        connections: options.connections,
        duration: seconds,
      },
      (error, done) => (error ? reject(error as Error) : resolve(done)),
    );
    instance.on('response', (_client, status, _bytes, responseTime) => {
      times.push(responseTime);
      if (status < 200 || status >= 300) bad += 1;
    });
  });
  const cpu = processCpu(options.pid) - cpuBefore;
  return summarise(times, seconds, bad + result.errors + result.timeouts, options.pid ? cpu : NaN);
}

async function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const s = createServer();
    s.once('error', reject);
    s.listen(0, '127.0.0.1', () => {
      const address = s.address();
      s.close(() => resolve(typeof address === 'object' && address ? address.port : 0));
    });
  });
}

interface Server {
  readonly base: string;
  readonly child: ChildProcess;
  stop(): Promise<void>;
}

async function startServer(
  script: string,
  environment: Record<string, string>,
  name: string,
): Promise<Server> {
  const port = await freePort();
  // No mail server: the outbox keeps what the bench writes (nothing, normally).
  const { HOOPLINE_SMTP_HOST: _smtp, ...inherited } = process.env;
  const child = spawn(process.execPath, ['--import', 'tsx', script], {
    cwd: apiRoot,
    env: { ...inherited, ...environment, HOOPLINE_PORT: String(port) },
    // The API logs a line per request at info, as the start command does; it
    // goes nowhere here, but it is written.
    stdio: ['ignore', 'ignore', 'inherit'],
  });
  const base = `http://127.0.0.1:${port}`;
  const deadline = Date.now() + 30_000;
  for (;;) {
    if (child.exitCode !== null) throw new Error(`${name} exited with ${child.exitCode}`);
    try {
      const res = await fetch(`${base}/api/health`);
      if (res.ok) break;
    } catch {
      // not listening yet
    }
    if (Date.now() > deadline) throw new Error(`${name} did not start in 30 s`);
    await new Promise((r) => setTimeout(r, 100));
  }
  return {
    base,
    child,
    stop: () =>
      new Promise<void>((resolve) => {
        if (child.exitCode !== null) {
          resolve();
          return;
        }
        child.once('exit', () => resolve());
        child.kill('SIGTERM');
      }),
  };
}

function apiEnvironment(data: BenchData, workers: number): Record<string, string> {
  return {
    NODE_ENV: 'production',
    DATABASE_URL: data.url,
    HOOPLINE_JWT_SECRET: BENCH_JWT_SECRET,
    HOOPLINE_WORKERS: String(workers),
    HOOPLINE_UPLOAD_DIR: mkdtempSync(path.join(os.tmpdir(), 'hoopline-bench-uploads-')),
  };
}

async function signIn(base: string, data: BenchData): Promise<Record<string, string>> {
  const res = await fetch(`${base}/api/auth/sign-in`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email: data.email, password: data.password }),
  });
  if (!res.ok) throw new Error(`sign-in failed: ${res.status} ${await res.text()}`);
  const jar = new Map<string, string>();
  for (const line of res.headers.getSetCookie()) {
    const [pair] = line.split(';');
    const at = pair!.indexOf('=');
    jar.set(pair!.slice(0, at), pair!.slice(at + 1));
  }
  const cookie = ['hl_access', 'hl_csrf'].map((n) => `${n}=${jar.get(n) ?? ''}`).join('; ');
  return {
    cookie,
    'x-csrf-token': decodeURIComponent(jar.get('hl_csrf') ?? ''),
    'content-type': 'application/json',
  };
}

async function sqlLoad(
  url: string,
  sql: string,
  parameters: unknown[],
  connections: number,
): Promise<Load> {
  const pool = new pg.Pool({ connectionString: url, max: connections });
  const times: number[] = [];
  const end = performance.now() + SECONDS * 1000;
  await Promise.all(
    Array.from({ length: connections }, async () => {
      while (performance.now() < end) {
        const t = performance.now();
        await pool.query(sql, parameters);
        times.push(performance.now() - t);
      }
    }),
  );
  await pool.end();
  return summarise(times, SECONDS, 0);
}

const fmt = (n: number, digits = 1) => (Number.isFinite(n) ? n.toFixed(digits) : '–');
const results: Record<string, unknown> = {};
const lines: string[] = [];
function report(line: string) {
  lines.push(line);
  log(line);
}

const screenRequest = (server: Server, headers: Record<string, string>) => ({
  url: `${server.base}/api/screen`,
  pid: server.child.pid,
  method: 'POST' as const,
  headers,
  body: BODY,
  connections: 10,
});

async function partScreen(data: BenchData) {
  const api = await startServer('src/main.ts', apiEnvironment(data, 1), 'API');
  const bare = await startServer('bench/bare-json-server.ts', {}, 'bare Express');
  try {
    const headers = await signIn(api.base, data);
    const probe = await fetch(`${api.base}/api/screen`, { method: 'POST', headers, body: BODY });
    if (!probe.ok) throw new Error(`/api/screen answered ${probe.status}`);
    const bareRequest = {
      url: `${bare.base}/echo`,
      pid: bare.child.pid,
      method: 'POST' as const,
      headers: { 'content-type': 'application/json' },
      body: BODY,
      connections: 10,
    };
    await load({ ...bareRequest, seconds: 2 });
    await load({ ...screenRequest(api, headers), seconds: 2 });
    const turns: { bare: Load; api: Load }[] = [];
    for (let i = 0; i < 3; i += 1) {
      turns.push({ bare: await load(bareRequest), api: await load(screenRequest(api, headers)) });
    }
    const apiRps = median(turns.map((t) => t.api.rps));
    const bareRps = median(turns.map((t) => t.bare.rps));
    const apiCpu = median(turns.map((t) => t.api.cpuUs));
    const bareCpu = median(turns.map((t) => t.bare.cpuUs));
    results['screen'] = { turns, apiRps, bareRps, ratio: apiRps / bareRps, apiCpu, bareCpu };
    for (const [i, t] of turns.entries()) {
      report(
        `screen turn ${i + 1}: API ${fmt(t.api.rps, 0)} req/s (p50 ${fmt(t.api.p50)} ms, p99 ${fmt(t.api.p99)} ms, ${fmt(t.api.cpuUs, 0)} µs CPU per request, ${t.api.bad} not 2xx); ` +
          `bare echo ${fmt(t.bare.rps, 0)} req/s (p50 ${fmt(t.bare.p50)} ms, p99 ${fmt(t.bare.p99)} ms, ${fmt(t.bare.cpuUs, 0)} µs CPU)`,
      );
    }
    report(
      `1. /api/screen ÷ bare Express JSON echo: ${fmt(apiRps, 0)} ÷ ${fmt(bareRps, 0)} req/s = ${fmt(apiRps / bareRps, 2)} (aim ≥ 0.8); ` +
        `server CPU per request ${fmt(bareCpu, 0)} ÷ ${fmt(apiCpu, 0)} µs = ${fmt(bareCpu / apiCpu, 2)}`,
    );
  } finally {
    await api.stop();
    await bare.stop();
  }
}

// The raw SQL side: the same statement the API sends for the page and its
// total (components.service.ts, revisions.service.ts), run straight on a pg
// pool, without HTTP, the session check or the access check.
const summary = (r: string, a: string, p: string) =>
  `${r}.id as ${p}_id, ${r}.number as ${p}_number, ${r}.status as ${p}_status,
   ${r}.verdict as ${p}_verdict, ${r}.content_hash as ${p}_hash, ${r}.author_id as ${p}_author_id,
   ${a}.name as ${p}_author_name, ${r}.created_at as ${p}_created_at,
   ${r}.submitted_at as ${p}_submitted_at, ${r}.decided_at as ${p}_decided_at,
   ${r}.superseded_at as ${p}_superseded_at`;

const COMPONENT_PAGE_SQL = `
  with page as (
    select c.*, count(*) over () as total__ from components c where c.project_id = $1
     order by lower(c.name), c.id limit 25 offset 0)
  select page.id, page.project_id, page.name, page.kind, page.tag, page.version,
         page.created_at, page.updated_at, page.total__,
         ${summary('l', 'la', 'l')}, ${summary('i', 'ia', 'i')}
    from page
    left join revisions l on l.id = page.latest_revision_id left join users la on la.id = l.author_id
    left join revisions i on i.id = page.issued_revision_id left join users ia on ia.id = i.author_id
   order by lower(page.name), page.id`;

const REVISION_PAGE_SQL = `
  select ${summary('r', 'a', 'r')},
         (select max(t.number) from revisions t where t.component_id = $1) as total__
    from revisions r join users a on a.id = r.author_id
   where r.component_id = $1
   order by r.number desc limit 25 offset 0`;

async function partLists(data: BenchData) {
  const api = await startServer('src/main.ts', apiEnvironment(data, 1), 'API');
  try {
    const headers = await signIn(api.base, data);
    const cases = [
      {
        name: 'component list (500 components, page of 25)',
        url: `${api.base}/api/projects/${data.projectId}/components`,
        sql: COMPONENT_PAGE_SQL,
        parameters: [data.projectId],
      },
      {
        name: 'revision list (99 501 revisions, page of 25)',
        url: `${api.base}/api/components/${data.bulkComponentId}/revisions`,
        sql: REVISION_PAGE_SQL,
        parameters: [data.bulkComponentId],
      },
    ];
    const out: Record<string, unknown> = {};
    for (const c of cases) {
      const probe = await fetch(c.url, { headers });
      if (!probe.ok) throw new Error(`${c.url} answered ${probe.status}`);
      await load({ url: c.url, headers, connections: 4, seconds: 2 });
      const turns: { api: Load; sql: Load }[] = [];
      for (let i = 0; i < 2; i += 1) {
        turns.push({
          api: await load({ url: c.url, headers, connections: 4 }),
          sql: await sqlLoad(data.url, c.sql, c.parameters, 4),
        });
      }
      const apiP95 = median(turns.map((t) => t.api.p95));
      const sqlP95 = median(turns.map((t) => t.sql.p95));
      out[c.name] = { turns, apiP95, sqlP95, ratio: apiP95 / sqlP95 };
      report(
        `2. ${c.name}: p95 API ${fmt(apiP95)} ms (${fmt(median(turns.map((t) => t.api.rps)), 0)} req/s) ÷ raw SQL ${fmt(sqlP95)} ms = ${fmt(apiP95 / sqlP95, 2)} (aim ≤ 2, API p95 < 20 ms)`,
      );
    }
    results['lists'] = out;
  } finally {
    await api.stop();
  }
}

async function partSheets(data: BenchData) {
  const api = await startServer('src/main.ts', apiEnvironment(data, 1), 'API');
  try {
    const headers = await signIn(api.base, data);
    let next = 0;
    const downloadOne = async () => {
      const id = data.revisionIds[next % data.revisionIds.length]!;
      next += 1;
      const t = performance.now();
      const res = await fetch(`${api.base}/api/revisions/${id}/sheet.pdf`, { headers });
      await res.arrayBuffer();
      if (!res.ok) throw new Error(`sheet download answered ${res.status}`);
      return performance.now() - t;
    };
    await downloadOne();
    await load({ ...screenRequest(api, headers), seconds: 2 });
    const turns: { alone: Load; withSheets: Load; sheets: number; sheetMedianMs: number }[] = [];
    for (let i = 0; i < 3; i += 1) {
      const alone = await load(screenRequest(api, headers));
      let stop = false;
      const sheetTimes: number[] = [];
      const loop = (async () => {
        while (!stop) sheetTimes.push(await downloadOne());
      })();
      const withSheets = await load(screenRequest(api, headers));
      stop = true;
      await loop;
      turns.push({
        alone,
        withSheets,
        sheets: sheetTimes.length,
        sheetMedianMs: median(sheetTimes),
      });
    }
    const alone = median(turns.map((t) => t.alone.p99));
    const busy = median(turns.map((t) => t.withSheets.p99));
    // The same revision again: what a second download of one sheet costs.
    const again: number[] = [];
    const first = data.revisionIds[0]!;
    for (let i = 0; i < 20; i += 1) {
      const t = performance.now();
      const res = await fetch(`${api.base}/api/revisions/${first}/sheet.pdf`, { headers });
      await res.arrayBuffer();
      again.push(performance.now() - t);
    }
    results['sheets'] = { turns, aloneP99: alone, busyP99: busy, ratio: busy / alone, again };
    for (const [i, t] of turns.entries()) {
      report(
        `sheets turn ${i + 1}: screen p99 alone ${fmt(t.alone.p99)} ms (${fmt(t.alone.rps, 0)} req/s), ` +
          `with sheet loop ${fmt(t.withSheets.p99)} ms (${fmt(t.withSheets.rps, 0)} req/s); ` +
          `${t.sheets} new sheets rendered, median ${fmt(t.sheetMedianMs, 0)} ms each`,
      );
    }
    report(
      `3. /api/screen p99 with sheets downloading ÷ without: ${fmt(busy)} ÷ ${fmt(alone)} ms = ${fmt(busy / alone, 2)} (aim ≤ 1.5); the same sheet again: median ${fmt(median(again))} ms`,
    );
  } finally {
    await api.stop();
  }
}

async function partWorkers(data: BenchData) {
  const turns: { workers: number; load: Load }[] = [];
  for (const workers of [1, 2, 1, 2]) {
    const api = await startServer('src/main.ts', apiEnvironment(data, workers), 'API');
    try {
      const headers = await signIn(api.base, data);
      await load({ ...screenRequest(api, headers), seconds: 2 });
      turns.push({ workers, load: await load(screenRequest(api, headers)) });
    } finally {
      await api.stop();
    }
  }
  const one = median(turns.filter((t) => t.workers === 1).map((t) => t.load.rps));
  const two = median(turns.filter((t) => t.workers === 2).map((t) => t.load.rps));
  results['workers'] = { turns, one, two, ratio: two / one, cores: os.availableParallelism() };
  report(
    `4. /api/screen with HOOPLINE_WORKERS=2 ÷ 1: ${fmt(two, 0)} ÷ ${fmt(one, 0)} req/s = ${fmt(two / one, 2)} (aim ≥ 1.7 on two cores; this machine has ${os.availableParallelism()}, and the load generator runs on them too)`,
  );
}

const data = await benchDatabase(log);
log(`database ${data.url.replace(/\/\/[^@]*@/, '//')}; ${SECONDS} s per turn`);
if (ONLY.has('screen')) await partScreen(data);
if (ONLY.has('lists')) await partLists(data);
if (ONLY.has('sheets')) await partSheets(data);
if (ONLY.has('workers')) await partWorkers(data);
mkdirSync(path.join(repoRoot, '.data/bench'), { recursive: true });
writeFileSync(
  path.join(repoRoot, '.data/bench/http-bench.json'),
  JSON.stringify({ at: new Date().toISOString(), seconds: SECONDS, results }, null, 2),
);
console.log('\nHTTP bench summary');
for (const line of lines.filter((l) => /^\d\./.test(l))) console.log(`  ${line}`);
