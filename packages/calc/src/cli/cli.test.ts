import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { parse } from 'csv-parse/browser/esm/sync';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { METHODS, screen, sweepThickness } from '../index';
import { runCli } from './run';

const BIN = fileURLToPath(new URL('../../bin/hoopline-calc.js', import.meta.url));
const ROOT = fileURLToPath(new URL('../../../..', import.meta.url));

let dir: string;
const examples = METHODS.flatMap((m) => m.examples.map((e) => e.input as unknown));
const plate = METHODS.find((m) => m.kind === 'circular-plate')!.examples[0]!.input;

function cli(
  args: string[],
  options: { input?: string; cwd?: string; env?: Record<string, string> } = {},
) {
  const env: Record<string, string | undefined> = { ...process.env, ...options.env };
  if (!options.env?.npm_lifecycle_event) delete env.npm_lifecycle_event;
  const result = spawnSync(process.execPath, [BIN, ...args], {
    cwd: options.cwd ?? dir,
    input: options.input ?? '',
    encoding: 'utf8',
    env,
  });
  return { code: result.status, stdout: result.stdout, stderr: result.stderr };
}

/** The same CLI in this process (no spawn): for the many small cases. */
function inProcess(args: string[], input: string | null = '') {
  let stdout = '';
  let stderr = '';
  const code = runCli(args, {
    stdout: (t) => (stdout += t),
    stderr: (t) => (stderr += t),
    readFile: (path) => readFileSync(path, 'utf8'),
    readStdin: () => input,
    cwd: dir,
    env: {},
  });
  return { code, stdout, stderr };
}

function expectOneLineError(stderr: string, pattern: RegExp): void {
  const lines = stderr.trimEnd().split('\n');
  expect(lines).toHaveLength(1);
  expect(lines[0]).toMatch(/^hoopline-calc: /);
  expect(lines[0]).toMatch(pattern);
  expect(stderr).not.toMatch(/\n\s+at /); // no stack trace
}

beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'hoopline-cli-'));
  writeFileSync(join(dir, 'case.json'), JSON.stringify(plate));
  writeFileSync(join(dir, 'all.json'), JSON.stringify(examples));
  writeFileSync(
    join(dir, 'bad.json'),
    JSON.stringify([
      plate,
      { ...(plate as object), loadCases: [{ name: 'x', internal: '2 bar' }] },
    ]),
  );
  const table =
    'kind,name,diameter,thickness,edge,material,loadCases.0.name,loadCases.0.internal\r\n' +
    'circular-plate,Door,500 mm,12 mm,clamped,stainless-304,Vacuum,full vacuum\r\n' +
    'circular-plate,"Port, small",100 mm,10 mm,simply-supported,cast-acrylic,Vacuum,0 torr\r\n';
  writeFileSync(join(dir, 'batch.csv'), table);
  writeFileSync(join(dir, 'batch.txt'), table);
  writeFileSync(join(dir, 'bad-row.csv'), table.replace('500 mm', '500 parsecs'));
});

afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe('hoopline-calc', { timeout: 30_000 }, () => {
  it('prints the report of one JSON case, as screen() gives it', () => {
    const { code, stdout, stderr } = cli(['case.json']);
    expect(stderr).toBe('');
    expect(code).toBe(0);
    expect(JSON.parse(stdout)).toEqual(JSON.parse(JSON.stringify(screen(plate))));
    expect(stdout).toBe(`${JSON.stringify(screen(plate), null, 2)}\n`);
  });

  it('prints a list of reports for a list of cases, and reads stdin', () => {
    const fromFile = cli(['all.json']);
    expect(fromFile.code).toBe(0);
    expect(JSON.parse(fromFile.stdout)).toHaveLength(examples.length);
    const fromStdin = cli([], { input: JSON.stringify(examples) });
    expect(fromStdin.code).toBe(0);
    expect(fromStdin.stdout).toBe(fromFile.stdout);
    expect(inProcess(['-'], JSON.stringify(plate)).stdout).toBe(inProcess(['case.json']).stdout);
  });

  it('prints the checks as CSV with --csv', () => {
    const { code, stdout } = cli(['all.json', '--csv']);
    expect(code).toBe(0);
    const rows = parse(stdout, { columns: true }) as Record<string, string>[];
    const checks = examples.flatMap((e) => screen(e).cases.flatMap((c) => c.checks));
    expect(rows).toHaveLength(checks.length);
    expect(rows.map((r) => r.check)).toEqual(checks.map((c) => c.id));
  });

  it('reads a CSV table (by extension or --input-format csv)', () => {
    const byExtension = cli(['batch.csv']);
    expect(byExtension.code).toBe(0);
    const reports = JSON.parse(byExtension.stdout) as { kind: string }[];
    expect(reports).toHaveLength(2);
    expect(inProcess(['--input-format', 'csv', 'batch.txt']).stdout).toBe(byExtension.stdout);
    const table = cli(['--input-format=csv', '--csv', 'batch.txt']);
    expect(table.stdout.split('\r\n')[2]).toMatch(/^"Port, small",Vacuum,stress,/);
  });

  it('names the row of a bad CSV row', () => {
    const { code, stdout, stderr } = cli(['bad-row.csv']);
    expect(code).toBe(1);
    expect(stdout).toBe('');
    expectOneLineError(stderr, /^hoopline-calc: row 2: diameter: unknown unit "parsecs"$/);
  });

  it('prints a sweep with --sweep', () => {
    const { code, stdout } = cli(['--sweep', '4 mm,20 mm,5', 'case.json']);
    expect(code).toBe(0);
    expect(JSON.parse(stdout)).toEqual(
      JSON.parse(JSON.stringify(sweepThickness(plate, { from: '4 mm', to: '20 mm', points: 5 }))),
    );
    const bare = JSON.parse(inProcess(['case.json', '--sweep']).stdout) as { points: unknown[] };
    expect(bare.points).toHaveLength(50);
    const three = JSON.parse(inProcess(['--sweep=,,3', 'case.json']).stdout) as {
      points: unknown[];
    };
    expect(three.points).toHaveLength(3);
  });

  it('prints help listing every kind', () => {
    const { code, stdout } = cli(['--help']);
    expect(code).toBe(0);
    for (const m of METHODS) expect(stdout).toContain(m.kind);
  });

  it('fails with one line naming the field on bad input, printing no report', () => {
    const bad = cli([], { input: JSON.stringify({ ...(plate as object), thickness: '-3 mm' }) });
    expect(bad.code).toBe(1);
    expect(bad.stdout).toBe('');
    expectOneLineError(bad.stderr, /^hoopline-calc: thickness: must be greater than zero$/);

    const list = cli(['bad.json']);
    expect(list.code).toBe(1);
    expect(list.stdout).toBe('');
    expectOneLineError(
      list.stderr,
      /^hoopline-calc: case 2: loadCases\.0\.internal: "2 bar" is ambiguous/,
    );

    expectOneLineError(cli([], { input: '{"kind": ' }).stderr, /not valid JSON/);
    expectOneLineError(cli(['missing.json']).stderr, /cannot read missing\.json: no such file/);
    expectOneLineError(
      cli(['--sweep', ',,1', 'case.json']).stderr,
      /sweep\.points: must be between 2 and 500/,
    );
  });

  it('exits 2 on bad usage', () => {
    const unknown = cli(['--bogus']);
    expect(unknown.code).toBe(2);
    expectOneLineError(unknown.stderr, /unknown option --bogus/);
    expect(inProcess(['--csv', '--sweep', 'case.json']).code).toBe(2);
    expect(inProcess(['--input-format', 'xml', 'case.json']).code).toBe(2);
    expect(inProcess(['a.json', 'b.json']).code).toBe(2);
    expect(inProcess(['--sweep', '1,2,3,4', 'case.json']).code).toBe(2);
    expect(inProcess([], null).stderr).toMatch(/no input/);
  });

  it('resolves a path from where `pnpm calc` was typed', () => {
    const { code, stdout } = cli(['case.json'], {
      cwd: ROOT,
      env: { npm_lifecycle_event: 'calc', INIT_CWD: dir },
    });
    expect(code).toBe(0);
    expect(JSON.parse(stdout)).toHaveProperty('kind', 'circular-plate');
  });
});
