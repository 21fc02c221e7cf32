// Fails when the sign-in page's first script grows past its budget, or when
// the engine (@hoopline/calc) is in it. Reads the Vite manifest of the last
// build (dist/.vite/manifest.json, build.manifest in vite.config.ts): the
// entry's chunks and the sign-in route's chunks, with all they import
// statically, gzipped as a browser would fetch them. Run after `vite build`
// (scripts/test.sh does).
//
//   node scripts/check-bundle.mjs            (pnpm --filter @hoopline/web check:bundle)
import { existsSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { gzipSync } from 'node:zlib';

const BUDGET_GZIP_BYTES = 150 * 1024;
const dist = path.resolve(import.meta.dirname, '../dist');
const manifestFile = path.join(dist, '.vite/manifest.json');
if (!existsSync(manifestFile)) {
  console.error(`check-bundle: ${manifestFile} is missing: run the web build first`);
  process.exit(1);
}
/** @type {Record<string, { file: string; isEntry?: boolean; imports?: string[]; dynamicImports?: string[] }>} */
const manifest = JSON.parse(readFileSync(manifestFile, 'utf8'));

/** The chunk of `key` and every chunk it imports statically (what loads with it). */
function closure(key, into = new Set()) {
  const chunk = manifest[key];
  if (!chunk) throw new Error(`check-bundle: ${key} is not in the manifest`);
  if (into.has(chunk.file)) return into;
  into.add(chunk.file);
  for (const next of chunk.imports ?? []) closure(next, into);
  return into;
}

/** The source files a chunk was built from, by its source map. */
function sourcesOf(file) {
  const map = path.join(dist, `${file}.map`);
  if (!existsSync(map)) return [];
  return JSON.parse(readFileSync(map, 'utf8')).sources ?? [];
}

// The engine's code: every @hoopline/calc module but the caution texts, which
// the sign-in card shows (the screening caution) and which compute nothing.
const isEngine = (source) =>
  source.includes('packages/calc/src/') && !source.endsWith('packages/calc/src/core/cautions.ts');
const gzipped = (file) => gzipSync(readFileSync(path.join(dist, file)), { level: 9 }).length;
const kB = (bytes) => `${(bytes / 1024).toFixed(1)} kB`;

const entry = Object.keys(manifest).find((k) => manifest[k].isEntry);
if (!entry) throw new Error('check-bundle: the manifest has no entry');
const signIn = closure('src/routes/sign-in.tsx', closure(entry));
const files = [...signIn].filter((f) => f.endsWith('.js'));
const total = files.reduce((sum, f) => sum + gzipped(f), 0);
const engineIn = files.filter((f) => sourcesOf(f).some(isEngine));
const workbench = [...closure('src/routes/component.tsx', closure(entry))];
const engineWithWorkbench = workbench.some((f) => sourcesOf(f).some(isEngine));

console.log(
  `sign-in page, first script: ${files.length} chunks, ${kB(total)} gzip (budget ${kB(BUDGET_GZIP_BYTES)})`,
);
for (const f of files.sort((a, b) => gzipped(b) - gzipped(a))) {
  console.log(`  ${kB(gzipped(f)).padStart(9)}  ${f}`);
}
console.log(
  `workbench route: the engine ${engineWithWorkbench ? 'loads with it' : 'is missing'}; sign-in page: ${engineIn.length ? 'has the engine' : 'no engine'}`,
);
const problems = [];
if (total > BUDGET_GZIP_BYTES) {
  problems.push(
    `the sign-in page's first script is ${kB(total)} gzip, over ${kB(BUDGET_GZIP_BYTES)}`,
  );
}
if (engineIn.length > 0) {
  problems.push(
    `the engine (@hoopline/calc) is in the sign-in page's script: ${engineIn.join(', ')}`,
  );
}
if (!engineWithWorkbench) problems.push('the workbench route does not load the engine');
if (problems.length > 0) {
  for (const p of problems) console.error(`check-bundle: ${p}`);
  process.exit(1);
}
