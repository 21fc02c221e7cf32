/**
 * Where the time of POST /api/screen goes: the API runs under `node
 * --cpu-prof` while autocannon loads it (10 connections, signed in, the
 * README's circular plate), then the profile's self time is summed by
 * package (or src/ folder) and by function, and the 25 largest are printed.
 * The .cpuprofile is kept in .data/bench/ (open it in Chrome's DevTools).
 *
 *   pnpm --filter @hoopline/api exec tsx bench/profile-screen.ts [seconds] [path]
 *
 * `path` defaults to /api/screen (POST); a GET path such as
 * /api/projects/<id>/components profiles that instead.
 */
import autocannon from 'autocannon';
import { spawn } from 'node:child_process';
import { mkdirSync, mkdtempSync, readFileSync, readdirSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import os from 'node:os';
import path from 'node:path';
import { BENCH_JWT_SECRET, CIRCULAR_PLATE, benchDatabase } from './bench-database';

const apiRoot = path.resolve(import.meta.dirname, '..');
const out = path.resolve(apiRoot, '../../.data/bench/profile');
const seconds = Number(process.argv[2] ?? 10);
const target = process.argv[3] ?? '/api/screen';

const data = await benchDatabase((l) => console.log(l));
const port = await new Promise<number>((resolve) => {
  const s = createServer().listen(0, '127.0.0.1', () => {
    const a = s.address();
    s.close(() => resolve(typeof a === 'object' && a ? a.port : 0));
  });
});
rmSync(out, { recursive: true, force: true });
mkdirSync(out, { recursive: true });
const { HOOPLINE_SMTP_HOST: _smtp, ...inherited } = process.env;
const child = spawn(
  process.execPath,
  ['--import', 'tsx', '--cpu-prof', '--cpu-prof-dir', out, 'src/main.ts'],
  {
    cwd: apiRoot,
    env: {
      ...inherited,
      NODE_ENV: 'production',
      DATABASE_URL: data.url,
      HOOPLINE_JWT_SECRET: BENCH_JWT_SECRET,
      HOOPLINE_PORT: String(port),
      // A folder of its own: the upload sweeper scans (and cleans) the whole upload folder.
      HOOPLINE_UPLOAD_DIR: mkdtempSync(path.join(os.tmpdir(), 'hoopline-profile-uploads-')),
    },
    stdio: ['ignore', 'ignore', 'inherit'],
  },
);
const base = `http://127.0.0.1:${port}`;
for (let i = 0; ; i += 1) {
  try {
    if ((await fetch(`${base}/api/health`)).ok) break;
  } catch {
    if (i > 300) throw new Error('the API did not start');
    await new Promise((r) => setTimeout(r, 100));
  }
}
const signIn = await fetch(`${base}/api/auth/sign-in`, {
  method: 'POST',
  headers: { 'content-type': 'application/json' },
  body: JSON.stringify({ email: data.email, password: data.password }),
});
const jar = Object.fromEntries(
  signIn.headers.getSetCookie().map((c) => {
    const pair = c.split(';')[0]!;
    return [pair.slice(0, pair.indexOf('=')), pair.slice(pair.indexOf('=') + 1)];
  }),
);
const headers = {
  cookie: `hl_access=${jar['hl_access']}; hl_csrf=${jar['hl_csrf']}`,
  'x-csrf-token': decodeURIComponent(jar['hl_csrf'] ?? ''),
  'content-type': 'application/json',
};
const post = target === '/api/screen';
const result = await autocannon({
  url: `${base}${target}`,
  method: post ? 'POST' : 'GET',
  headers,
  ...(post ? { body: JSON.stringify(CIRCULAR_PLATE) } : {}),
  connections: 10,
  duration: seconds,
});
console.log(
  `${target}: ${result.requests.average} req/s, p50 ${result.latency.p50} ms, p99 ${result.latency.p99} ms, non-2xx ${result.non2xx}`,
);
await new Promise<void>((resolve) => {
  child.once('exit', () => resolve());
  child.kill('SIGINT');
});

interface Node {
  id: number;
  callFrame: { functionName: string; url: string; lineNumber: number };
  children?: number[];
}
const file = readdirSync(out).find((f) => f.endsWith('.cpuprofile'));
if (!file) throw new Error('no profile written');
const profile = JSON.parse(readFileSync(path.join(out, file), 'utf8')) as {
  nodes: Node[];
  samples: number[];
  timeDeltas: number[];
};
const byId = new Map(profile.nodes.map((n) => [n.id, n]));
const self = new Map<number, number>();
profile.samples.forEach((id, i) =>
  self.set(id, (self.get(id) ?? 0) + (profile.timeDeltas[i] ?? 0)),
);
const total = [...self.values()].reduce((a, b) => a + b, 0);

function area(url: string): string {
  if (!url) return '(native / V8)';
  const m = /node_modules\/(?:\.pnpm\/[^/]+\/node_modules\/)?((?:@[^/]+\/)?[^/]+)/.exec(url);
  if (m) return m[1]!;
  if (url.startsWith('node:')) return url;
  const src = /apps\/api\/(src\/[^/]+(?:\/[^/]+)?)/.exec(url);
  if (src) return src[1]!;
  if (url.includes('packages/calc')) return '@hoopline/calc';
  return url.replace(/^file:\/\//, '');
}
const areas = new Map<string, number>();
const functions = new Map<string, number>();
for (const [id, time] of self) {
  const n = byId.get(id)!;
  const a = n.callFrame.functionName.startsWith('(')
    ? n.callFrame.functionName
    : area(n.callFrame.url);
  areas.set(a, (areas.get(a) ?? 0) + time);
  const f = `${n.callFrame.functionName || '(anonymous)'} ${area(n.callFrame.url)}:${n.callFrame.lineNumber + 1}`;
  functions.set(f, (functions.get(f) ?? 0) + time);
}
const top = (m: Map<string, number>) =>
  [...m.entries()]
    .sort((a, b) => b[1] - a[1])
    .slice(0, 25)
    .map(([k, v]) => `${((100 * v) / total).toFixed(1).padStart(5)} %  ${k}`)
    .join('\n');
console.log(`\nself time by area (${(total / 1e6).toFixed(1)} s sampled)\n${top(areas)}`);
console.log(`\nself time by function\n${top(functions)}`);
console.log(`\nprofile: ${path.join(out, file)}`);
