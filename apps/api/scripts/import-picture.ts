/**
 * The import picture of a source tree by top-level folder: which folder
 * imports which, and how many import statements make each arrow.
 *
 *   pnpm --filter @hoopline/api exec tsx scripts/import-picture.ts [ROOT] [--check]
 *
 * ROOT defaults to apps/api/src. A file directly under ROOT is its own group
 * (`main`, `app`, `wiring`). Test and bench files are left out: a test may
 * build the whole app to check one corner of it. `--check` prints the arrows
 * that break the tree's layer order (API_LAYERS for apps/api/src, CALC_LAYERS
 * for packages/calc/src) and exits 1 when there are any; src/layering.test.ts
 * runs the same checks.
 */
import { readFileSync, readdirSync, statSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import ts from 'typescript';

/** One import statement (or `export … from`, or `import()`) between two files of the tree. */
export interface ImportEdge {
  /** Both relative to the root, with forward slashes. */
  readonly from: string;
  readonly to: string;
  readonly fromGroup: string;
  readonly toGroup: string;
  /** `import type` / `export type`, or every named binding marked `type`. */
  readonly typeOnly: boolean;
}

const SOURCE = /\.(ts|tsx|mts|mjs|js)$/;
const TEST_OR_BENCH = /\.(test|bench)\.(ts|tsx)$/;

function listFiles(dir: string): string[] {
  const out: string[] = [];
  for (const name of readdirSync(dir).sort()) {
    if (name === 'node_modules') continue;
    const full = path.join(dir, name);
    if (statSync(full).isDirectory()) out.push(...listFiles(full));
    else if (SOURCE.test(name) && !name.endsWith('.d.ts')) out.push(full);
  }
  return out;
}

/** The group of a file: its top-level folder under the root, or its own name when it sits at the root. */
export function groupOf(relative: string): string {
  const [first, ...rest] = relative.split('/');
  if (rest.length > 0) return first!;
  return first!.replace(/\.(test\.)?(ts|tsx|mts|mjs|js)$/, '');
}

function resolveRelative(fromFile: string, specifier: string): string | null {
  const base = path.resolve(path.dirname(fromFile), specifier);
  const candidates = [
    base,
    ...['.ts', '.tsx', '.mts', '.mjs', '.js'].map((ext) => base + ext),
    ...['index.ts', 'index.tsx'].map((index) => path.join(base, index)),
  ];
  // `./x.js` written for a `./x.ts` file (ESM style).
  if (/\.js$/.test(base)) candidates.push(base.replace(/\.js$/, '.ts'));
  for (const candidate of candidates) {
    try {
      if (statSync(candidate).isFile()) return candidate;
    } catch {
      // not this one
    }
  }
  return null;
}

interface RawImport {
  readonly specifier: string;
  readonly typeOnly: boolean;
}

function importsOf(file: string): RawImport[] {
  const text = readFileSync(file, 'utf8');
  const kind = /\.(mjs|js)$/.test(file)
    ? ts.ScriptKind.JS
    : file.endsWith('.tsx')
      ? ts.ScriptKind.TSX
      : ts.ScriptKind.TS;
  const source = ts.createSourceFile(file, text, ts.ScriptTarget.Latest, false, kind);
  const found: RawImport[] = [];
  const visit = (node: ts.Node) => {
    if (ts.isImportDeclaration(node) && ts.isStringLiteral(node.moduleSpecifier)) {
      const clause = node.importClause;
      const named = clause?.namedBindings;
      const typeOnly =
        !!clause &&
        (clause.isTypeOnly ||
          (!clause.name &&
            !!named &&
            ts.isNamedImports(named) &&
            named.elements.length > 0 &&
            named.elements.every((e) => e.isTypeOnly)));
      found.push({ specifier: node.moduleSpecifier.text, typeOnly });
    } else if (
      ts.isExportDeclaration(node) &&
      node.moduleSpecifier &&
      ts.isStringLiteral(node.moduleSpecifier)
    ) {
      const clause = node.exportClause;
      const typeOnly =
        node.isTypeOnly ||
        (!!clause &&
          ts.isNamedExports(clause) &&
          clause.elements.length > 0 &&
          clause.elements.every((e) => e.isTypeOnly));
      found.push({ specifier: node.moduleSpecifier.text, typeOnly });
    } else if (
      ts.isCallExpression(node) &&
      node.expression.kind === ts.SyntaxKind.ImportKeyword &&
      node.arguments[0] &&
      ts.isStringLiteral(node.arguments[0])
    ) {
      found.push({ specifier: node.arguments[0].text, typeOnly: false });
    }
    ts.forEachChild(node, visit);
  };
  visit(source);
  return found;
}

/** Every import between two production files of the tree (tests and benches left out). */
export function importEdges(root: string): ImportEdge[] {
  const absoluteRoot = path.resolve(root);
  const rel = (file: string) => path.relative(absoluteRoot, file).split(path.sep).join('/');
  const edges: ImportEdge[] = [];
  for (const file of listFiles(absoluteRoot)) {
    if (TEST_OR_BENCH.test(file)) continue;
    for (const { specifier, typeOnly } of importsOf(file)) {
      if (!specifier.startsWith('.')) continue;
      const target = resolveRelative(file, specifier);
      if (!target || !target.startsWith(absoluteRoot + path.sep)) continue;
      const from = rel(file);
      const to = rel(target);
      edges.push({ from, to, fromGroup: groupOf(from), toGroup: groupOf(to), typeOnly });
    }
  }
  return edges;
}

/** Folder → folder with the number of imports making each arrow (imports inside one folder left out). */
export function picture(edges: readonly ImportEdge[]): Array<{
  from: string;
  to: string;
  count: number;
}> {
  const counts = new Map<string, number>();
  for (const e of edges) {
    if (e.fromGroup === e.toGroup) continue;
    const key = `${e.fromGroup}\u0000${e.toGroup}`;
    counts.set(key, (counts.get(key) ?? 0) + 1);
  }
  return [...counts]
    .map(([key, count]) => {
      const [from, to] = key.split('\u0000') as [string, string];
      return { from, to, count };
    })
    .sort((a, b) => a.from.localeCompare(b.from) || a.to.localeCompare(b.to));
}

/**
 * The layers of apps/api/src, top to bottom: a group may import only groups
 * of a lower layer (a higher number), never one above it nor a sibling in its
 * own layer. Groups in one layer know nothing of each other.
 */
export const API_LAYERS: readonly (readonly string[])[] = [
  ['main'],
  ['app', 'seed'],
  ['wiring'],
  ['routes'],
  ['auth'],
  ['domain'],
  ['repositories', 'mail', 'sheets', 'storage', 'uploads', 'credentials'],
  ['db'],
  ['policy'],
  ['config', 'http'],
];

/**
 * The layers of packages/calc/src, the engine, top to bottom: the command
 * line over the public index; the batch (CSV) and sweep runners over
 * screening; screening over the method list; the methods over materials and
 * sections; all of them over the core (reports, trails, fields, load cases),
 * which knows no method; units, physics and the version at the bottom.
 */
export const CALC_LAYERS: readonly (readonly string[])[] = [
  ['cli'],
  ['index'],
  ['batch', 'sweep'],
  ['screen'],
  ['methods'],
  ['materials', 'sections'],
  ['core'],
  ['physics', 'units', 'version'],
];

/** The layer order a tree is held to, by its path; undefined for a tree with none. */
export function layersFor(root: string): readonly (readonly string[])[] | undefined {
  const normal = path.resolve(root).split(path.sep).join('/');
  if (normal.endsWith('apps/api/src')) return API_LAYERS;
  if (normal.endsWith('packages/calc/src')) return CALC_LAYERS;
  return undefined;
}

/** Arrows that break the layer order: upwards, sideways, or from or to a group the order does not name. */
export function layerViolations(
  edges: readonly ImportEdge[],
  layers: readonly (readonly string[])[],
): string[] {
  const rank = new Map<string, number>();
  layers.forEach((groups, i) => groups.forEach((g) => rank.set(g, i)));
  const problems = new Set<string>();
  for (const e of edges) {
    if (e.fromGroup === e.toGroup) continue;
    const from = rank.get(e.fromGroup);
    const to = rank.get(e.toGroup);
    if (from === undefined || to === undefined) {
      problems.add(
        `${e.from} → ${e.to}: ${from === undefined ? e.fromGroup : e.toGroup} is in no layer`,
      );
    } else if (to <= from) {
      problems.add(
        `${e.from} → ${e.to}: ${e.fromGroup} (layer ${from + 1}) may not import ${e.toGroup} (layer ${to + 1})`,
      );
    }
  }
  return [...problems].sort();
}

/** Imports of a group into another that must be type-only (services reach the database through repositories). */
export function valueImports(
  edges: readonly ImportEdge[],
  fromGroup: string,
  toGroup: string,
): string[] {
  return edges
    .filter((e) => e.fromGroup === fromGroup && e.toGroup === toGroup && !e.typeOnly)
    .map((e) => `${e.from} → ${e.to}`)
    .sort();
}

function main() {
  const args = process.argv.slice(2);
  const check = args.includes('--check');
  const here = path.dirname(fileURLToPath(import.meta.url));
  const root = args.find((a) => !a.startsWith('--')) ?? path.join(here, '../src');
  const edges = importEdges(root);
  const files = new Map<string, number>();
  for (const file of listFiles(path.resolve(root))) {
    if (TEST_OR_BENCH.test(file)) continue;
    const g = groupOf(path.relative(path.resolve(root), file).split(path.sep).join('/'));
    files.set(g, (files.get(g) ?? 0) + 1);
  }
  console.log(`Import picture of ${path.relative(process.cwd(), path.resolve(root)) || '.'}`);
  console.log('(folder → folder: import statements; tests and benches left out)\n');
  const width = Math.max(...picture(edges).map((p) => p.from.length), 4);
  let last = '';
  for (const p of picture(edges)) {
    const head = p.from === last ? ''.padEnd(width) : p.from.padEnd(width);
    console.log(`  ${head} → ${p.to.padEnd(width)} ${String(p.count).padStart(3)}`);
    last = p.from;
  }
  const alone = [...files.keys()].filter(
    (g) => !edges.some((e) => e.fromGroup === g && e.toGroup !== g),
  );
  if (alone.length) console.log(`\n  importing no other folder: ${alone.sort().join(', ')}`);
  if (check) {
    const layers = layersFor(root);
    if (!layers) {
      console.error(
        `\nno layer order is set for ${root} (apps/api/src and packages/calc/src have one)`,
      );
      process.exitCode = 2;
      return;
    }
    const problems = layerViolations(edges, layers);
    console.log(
      problems.length
        ? `\n${problems.length} arrows against the layer order:\n  ${problems.join('\n  ')}`
        : '\nno arrow against the layer order',
    );
    if (problems.length) process.exitCode = 1;
  }
}

if (process.argv[1] && path.resolve(process.argv[1]) === fileURLToPath(import.meta.url)) main();
