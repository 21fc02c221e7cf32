/**
 * The hoopline-calc command (bin/hoopline-calc.js runs main.ts, which wires
 * it to the process): screens the components of a JSON or CSV file (or stdin) and
 * prints the reports as JSON, their checks as CSV, or a thickness sweep.
 * Exit status: 0 screened (whatever the verdicts), 1 bad input, 2 bad usage,
 * 3 an engine error. Messages are one line and name the field.
 */
import { resolve } from 'node:path';
import {
  CalcInputError,
  ENGINE_VERSION,
  METHODS,
  checksToCsv,
  parseComponent,
  readCsvCases,
  screen,
  sweepThickness,
} from '../index';
import type { Report, SweepOptions } from '../index';

const EXIT_INPUT = 1;
const EXIT_USAGE = 2;
const EXIT_ENGINE = 3;

class UsageError extends Error {}

/** What the CLI touches of the outside world, so that tests can run it in-process too. */
export interface CliIo {
  readonly stdout: (text: string) => void;
  readonly stderr: (text: string) => void;
  /** Reads a file (absolute path) as UTF-8; throws a Node error with `code` when it cannot. */
  readonly readFile: (path: string) => string;
  /** Reads all of stdin, or returns null when stdin is a terminal. */
  readonly readStdin: () => string | null;
  readonly cwd: string;
  readonly env: Readonly<Record<string, string | undefined>>;
}

interface Options {
  readonly file: string | undefined;
  readonly format: 'json' | 'csv' | undefined;
  readonly csv: boolean;
  readonly sweep: SweepOptions | undefined;
  readonly help: boolean;
}

/** One case of the input, with the label its messages carry ("case 2", "row 3"). */
interface Case {
  readonly label: string | undefined;
  readonly input: unknown;
}

function helpText(): string {
  const example = METHODS.find((m) => m.examples.length > 0)?.examples[0];
  return [
    `hoopline-calc ${ENGINE_VERSION}: screening of vessel and chamber walls under a pressure difference.`,
    '',
    'Usage: hoopline-calc [options] [file]',
    '',
    '  file                  a JSON case, a JSON list of cases, or a CSV table; stdin when absent or "-"',
    '  --input-format F      json or csv (default: csv for a .csv file, otherwise json)',
    '  --csv                 print the checks of every case as CSV instead of the reports',
    '  --sweep [from,to,n]   sweep the thickness (e.g. --sweep "4 mm,20 mm,100"; parts may be empty)',
    '  -h, --help            this text',
    '',
    'Component kinds:',
    ...METHODS.map((m) => `  ${m.kind.padEnd(20)}  ${m.name}`),
    '',
    'Quantities are text with a unit ("12 mm", "-0.9 bar(g)", "10 torr") or SI numbers.',
    'Every result is a screening, not a code calculation: see the cautions in each report.',
    ...(example ? ['', `Example (${example.name}):`, JSON.stringify(example.input, null, 2)] : []),
    '',
  ].join('\n');
}

function parseSweep(spec: string | undefined): SweepOptions {
  if (spec === undefined || spec.trim() === '') return {};
  const parts = spec.split(',').map((p) => p.trim());
  if (parts.length > 3) throw new UsageError('--sweep takes at most three parts: from,to,points');
  const [from, to, points] = parts;
  const options: { from?: string; to?: string; points?: number } = {};
  if (from) options.from = from;
  if (to) options.to = to;
  if (points) {
    if (!/^\d+$/.test(points))
      throw new UsageError(`--sweep: points "${points}" must be a whole number`);
    options.points = Number(points);
  }
  return options;
}

function parseOptions(args: readonly string[]): Options {
  let file: string | undefined;
  let format: Options['format'];
  let csv = false;
  let sweep: SweepOptions | undefined;
  let help = false;
  for (let i = 0; i < args.length; i++) {
    const arg = args[i]!;
    if (arg === '-h' || arg === '--help') help = true;
    else if (arg === '--csv') csv = true;
    else if (arg === '--input-format' || arg.startsWith('--input-format=')) {
      const value = arg.includes('=') ? arg.slice(arg.indexOf('=') + 1) : args[++i];
      if (value !== 'json' && value !== 'csv')
        throw new UsageError('--input-format must be json or csv');
      format = value;
    } else if (arg === '--sweep' || arg.startsWith('--sweep=')) {
      let spec: string | undefined;
      if (arg.includes('=')) spec = arg.slice(arg.indexOf('=') + 1);
      // A bare --sweep may be followed by the file; a range always has a comma.
      else if (args[i + 1]?.includes(',')) spec = args[++i];
      sweep = parseSweep(spec);
    } else if (arg.startsWith('-') && arg !== '-')
      throw new UsageError(`unknown option ${arg} (see --help)`);
    else if (file === undefined) file = arg;
    else throw new UsageError(`one input file only (got "${file}" and "${arg}")`);
  }
  if (csv && sweep) throw new UsageError('choose --csv or --sweep, not both');
  return { file, format, csv, sweep, help };
}

function readInput(file: string | undefined, io: CliIo): string {
  if (file === undefined || file === '-') {
    const text = io.readStdin();
    if (text === null)
      throw new UsageError('no input: give a file or pipe a case on stdin (see --help)');
    return text;
  }
  // `pnpm calc` runs from the repository root; a path is meant from where it was typed.
  const base = io.env.npm_lifecycle_event === 'calc' ? (io.env.INIT_CWD ?? io.cwd) : io.cwd;
  try {
    return io.readFile(resolve(base, file));
  } catch (error) {
    const code = (error as NodeJS.ErrnoException).code;
    throw new CalcInputError([
      {
        path: '',
        message: `cannot read ${file}${code === 'ENOENT' ? ': no such file' : code ? ` (${code})` : ''}`,
      },
    ]);
  }
}

function casesOf(text: string, format: 'json' | 'csv'): { cases: Case[]; list: boolean } {
  if (format === 'csv') {
    return {
      cases: readCsvCases(text).map((c) => ({ label: `row ${c.row}`, input: c.input })),
      list: true,
    };
  }
  let data: unknown;
  try {
    data = JSON.parse(text);
  } catch (error) {
    throw new CalcInputError([
      {
        path: '',
        message: `the input is not valid JSON (${(error as Error).message.split('\n')[0]})`,
      },
    ]);
  }
  if (Array.isArray(data)) {
    if (data.length === 0)
      throw new CalcInputError([{ path: '', message: 'the list of cases is empty' }]);
    return { cases: data.map((input, i) => ({ label: `case ${i + 1}`, input })), list: true };
  }
  return { cases: [{ label: undefined, input: data }], list: false };
}

function nameOf(input: unknown): string | undefined {
  const name =
    input !== null && typeof input === 'object' ? (input as { name?: unknown }).name : undefined;
  return typeof name === 'string' && name.trim() !== '' ? name.trim() : undefined;
}

function run(args: readonly string[], io: CliIo): number {
  const options = parseOptions(args);
  if (options.help) {
    io.stdout(helpText());
    return 0;
  }
  const format = options.format ?? (options.file?.toLowerCase().endsWith('.csv') ? 'csv' : 'json');
  const { cases, list } = casesOf(readInput(options.file, io), format);

  // Every case is checked before anything is printed: bad input changes nothing.
  const problems: string[] = [];
  for (const c of cases) {
    try {
      if (options.sweep) sweepThickness(c.input, options.sweep);
      else parseComponent(c.input);
    } catch (error) {
      if (!(error instanceof CalcInputError)) throw error;
      problems.push(c.label ? `${c.label}: ${error.message}` : error.message);
    }
  }
  if (problems.length > 0) {
    for (const p of problems) io.stderr(`hoopline-calc: ${p}\n`);
    return EXIT_INPUT;
  }

  if (options.sweep) {
    const sweeps = cases.map((c) => sweepThickness(c.input, options.sweep));
    io.stdout(`${JSON.stringify(list ? sweeps : sweeps[0], null, 2)}\n`);
    return 0;
  }
  const reports: Report[] = cases.map((c) => screen(c.input));
  if (options.csv) {
    io.stdout(
      checksToCsv(
        reports,
        cases.map((c) => nameOf(c.input) ?? c.label),
      ),
    );
    return 0;
  }
  io.stdout(`${JSON.stringify(list ? reports : reports[0], null, 2)}\n`);
  return 0;
}

/**
 * Runs the CLI on its arguments (without the node and script paths) and
 * returns the exit status; nothing but `io` is touched.
 */
export function runCli(args: readonly string[], io: CliIo): number {
  try {
    return run(args, io);
  } catch (error) {
    if (error instanceof UsageError) {
      io.stderr(`hoopline-calc: ${error.message}\n`);
      return EXIT_USAGE;
    }
    if (error instanceof CalcInputError) {
      io.stderr(`hoopline-calc: ${error.message}\n`);
      return EXIT_INPUT;
    }
    const message = error instanceof Error ? error.message : String(error);
    io.stderr(`hoopline-calc: internal error: ${message.split('\n')[0]}\n`);
    return EXIT_ENGINE;
  }
}
