import { readFileSync, readdirSync, statSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import {
  API_LAYERS,
  CALC_LAYERS,
  type ImportEdge,
  importEdges,
  layerViolations,
} from '../scripts/import-picture.js';

// The layer orders of apps/api/src and of the engine (packages/calc/src) are
// decisions of this project (DEVELOPERS.md, "Layers"); the tests hold the
// trees to them.
const SRC = path.dirname(fileURLToPath(import.meta.url));
const CALC_SRC = path.resolve(SRC, '../../../packages/calc/src');

function filesUnder(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const full = path.join(dir, name);
    if (statSync(full).isDirectory()) return filesUnder(full);
    return /\.ts$/.test(name) && !/\.(test|bench)\.ts$/.test(name) ? [full] : [];
  });
}

describe('the API layers', () => {
  it('no import points up or sideways in the layer order', () => {
    expect(layerViolations(importEdges(SRC), API_LAYERS)).toEqual([]);
  });

  it('the check catches an upward, a sideways and an unknown arrow', () => {
    const edge = (from: string, to: string): ImportEdge => ({
      from: `${from}/a.ts`,
      to: `${to}/b.ts`,
      fromGroup: from,
      toGroup: to,
      typeOnly: false,
    });
    const problems = layerViolations(
      [
        edge('domain', 'routes'),
        edge('mail', 'storage'),
        edge('nowhere', 'db'),
        edge('routes', 'domain'),
      ],
      API_LAYERS,
    );
    expect(problems).toHaveLength(3);
    expect(problems.join('\n')).toMatch(/domain \(layer \d+\) may not import routes/);
    expect(problems.join('\n')).toMatch(/mail \(layer \d+\) may not import storage/);
    expect(problems.join('\n')).toMatch(/nowhere is in no layer/);
  });

  it('routes and services reach the database only through repositories: typeorm is imported for types alone', () => {
    const offenders = ['domain', 'routes'].flatMap((folder) =>
      filesUnder(path.join(SRC, folder)).filter((file) =>
        /^import\s+(?!type\b)[^;]*from\s+'typeorm'/m.test(readFileSync(file, 'utf8')),
      ),
    );
    expect(offenders.map((f) => path.relative(SRC, f))).toEqual([]);
  });

  it('routes import neither repositories nor the database', () => {
    const edges = importEdges(SRC).filter(
      (e) => e.fromGroup === 'routes' && ['repositories', 'db'].includes(e.toGroup),
    );
    expect(edges).toEqual([]);
  });
});

describe('the engine layers', () => {
  it('no import in packages/calc/src points up or sideways: the core knows no method', () => {
    const edges = importEdges(CALC_SRC);
    // The tree is really there (a wrong path would pass with no edges).
    expect(edges.some((e) => e.fromGroup === 'methods' && e.toGroup === 'core')).toBe(true);
    expect(layerViolations(edges, CALC_LAYERS)).toEqual([]);
  });

  it('an import from the core into the methods is caught', () => {
    const problems = layerViolations(
      [
        {
          from: 'core/report.ts',
          to: 'methods/index.ts',
          fromGroup: 'core',
          toGroup: 'methods',
          typeOnly: true,
        },
      ],
      CALC_LAYERS,
    );
    expect(problems).toEqual([
      'core/report.ts → methods/index.ts: core (layer 7) may not import methods (layer 5)',
    ]);
  });
});
