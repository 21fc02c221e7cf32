import { CsvError, parse } from 'csv-parse/browser/esm/sync';
import { CalcInputError, type InputIssue } from '../core/errors';
import type { Report } from '../core/report';

/**
 * Batch screening from a table: one component per row, the first row giving
 * each column's field as a dotted path ("kind", "diameter",
 * "loadCases.0.internal", "material.elasticModulus"). Pure: text in, raw
 * component inputs out; reading the file is the caller's business.
 */

/** One component read from a CSV row. */
export interface CsvCase {
  /** Row number as a spreadsheet counts it: the header is row 1, the first component row 2. */
  readonly row: number;
  /** The raw component input, for `screen` or `parseComponent`. */
  readonly input: Record<string, unknown>;
}

type Segment = string | number;

const MAX_INDEX = 99;
// A cell that is a plain number becomes one (SI for quantities, or a count or factor);
// anything with a unit stays text for the quantity parser.
const PLAIN_NUMBER = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/;

function headerPath(header: string, column: number): Segment[] {
  const text = header.trim();
  const where = `column ${column + 1}`;
  if (text === '')
    throw new CalcInputError([{ path: 'header', message: `${where} has no field name` }]);
  return text.split('.').map((segment): Segment => {
    if (segment === '') {
      throw new CalcInputError([
        { path: 'header', message: `${where}: "${text}" has an empty part` },
      ]);
    }
    if (/^\d+$/.test(segment)) {
      const index = Number(segment);
      if (index > MAX_INDEX) {
        throw new CalcInputError([
          { path: 'header', message: `${where}: list index ${index} is above ${MAX_INDEX}` },
        ]);
      }
      return index;
    }
    return segment;
  });
}

function cellValue(text: string, path: readonly Segment[]): unknown {
  const last = path[path.length - 1];
  if (last === 'name') return text; // names stay text even when they look like numbers
  if (PLAIN_NUMBER.test(text)) return Number(text);
  if (text === 'true') return true;
  if (text === 'false') return false;
  return text;
}

function isContainer(value: unknown): value is Record<string | number, unknown> {
  return value !== null && typeof value === 'object';
}

/** Sets a value at a dotted path, building objects and lists; a clash names both columns. */
function assign(
  target: Record<string, unknown>,
  path: readonly Segment[],
  value: unknown,
  header: string,
  owners: Map<string, string>,
): InputIssue | null {
  let node: Record<string | number, unknown> = target;
  for (let i = 0; i < path.length - 1; i++) {
    const key = path[i]!;
    const prefix = path.slice(0, i + 1).join('.');
    let child = node[key];
    if (child === undefined) {
      child = typeof path[i + 1] === 'number' ? [] : {};
      node[key] = child;
      owners.set(prefix, header);
    } else if (!isContainer(child) || Array.isArray(child) !== (typeof path[i + 1] === 'number')) {
      return {
        path: header,
        message: `clashes with column "${owners.get(prefix) ?? prefix}" in the same row`,
      };
    }
    node = child as Record<string | number, unknown>;
  }
  const key = path[path.length - 1]!;
  const existing = node[key];
  if (existing !== undefined) {
    return {
      path: header,
      message: `clashes with column "${owners.get(path.join('.')) ?? path.join('.')}" in the same row`,
    };
  }
  node[key] = value;
  owners.set(path.join('.'), header);
  return null;
}

/** Lists built from numbered columns lose the holes left by empty cells. */
function compact(value: unknown): unknown {
  if (Array.isArray(value)) return value.filter((v) => v !== undefined).map(compact);
  if (isContainer(value)) {
    for (const key of Object.keys(value)) value[key] = compact(value[key]);
  }
  return value;
}

/**
 * Reads a CSV table of components (RFC 4180: commas, double-quoted fields
 * with "" for a quote, CRLF or LF line ends; a byte-order mark is skipped).
 * Empty cells are left out, so rows with fewer load cases than the header
 * has columns for are fine; plain-number cells become numbers, "true" and
 * "false" booleans, everything else (quantities with units) stays text.
 *
 * Throws CalcInputError for a malformed table (path "header" or "row N");
 * the rows' own fields are checked when each row is screened.
 */
export function readCsvCases(text: string): CsvCase[] {
  if (typeof text !== 'string') {
    throw new CalcInputError([{ path: 'csv', message: 'expected CSV text' }]);
  }
  let records: string[][];
  try {
    records = parse(text, {
      bom: true,
      skip_empty_lines: true,
      relax_column_count: false,
    }) as string[][];
  } catch (error) {
    if (error instanceof CsvError) {
      const lines = (error as CsvError & { lines?: number }).lines;
      throw new CalcInputError([
        {
          path: lines !== undefined ? `line ${lines}` : 'csv',
          message: `cannot be read as CSV: ${error.message.replace(/^[A-Za-z_]+: /, '')}`,
        },
      ]);
    }
    throw error;
  }
  const [headers, ...rows] = records;
  if (!headers)
    throw new CalcInputError([
      { path: 'csv', message: 'is empty: the first row names the fields' },
    ]);
  const paths = headers.map(headerPath);
  const seen = new Map<string, number>();
  paths.forEach((path, column) => {
    const key = path.join('.');
    const earlier = seen.get(key);
    if (earlier !== undefined) {
      throw new CalcInputError([
        {
          path: 'header',
          message: `column ${column + 1} repeats "${key}" (column ${earlier + 1})`,
        },
      ]);
    }
    seen.set(key, column);
  });
  if (!seen.has('kind')) {
    throw new CalcInputError([{ path: 'header', message: 'needs a "kind" column' }]);
  }

  const cases: CsvCase[] = [];
  rows.forEach((cells, index) => {
    const row = index + 2;
    if (cells.every((c) => c.trim() === '')) return;
    const input: Record<string, unknown> = {};
    const owners = new Map<string, string>();
    const issues: InputIssue[] = [];
    cells.forEach((cell, column) => {
      const textValue = cell.trim();
      if (textValue === '') return;
      const path = paths[column]!;
      const issue = assign(
        input,
        path,
        cellValue(textValue, path),
        headers[column]!.trim(),
        owners,
      );
      if (issue) issues.push(issue);
    });
    if (issues.length > 0) {
      throw new CalcInputError(
        issues.map((i) => ({ path: `row ${row}.${i.path}`, message: i.message })),
      );
    }
    cases.push({ row, input: compact(input) as Record<string, unknown> });
  });
  return cases;
}

/** One field of RFC 4180 output: quoted when it holds a comma, quote, line break or edge space. */
export function csvField(value: string | number | boolean): string {
  const text = typeof value === 'string' ? value : String(value);
  if (/[",\r\n]/.test(text) || text !== text.trim()) return `"${text.replace(/"/g, '""')}"`;
  return text;
}

function leafPaths(value: unknown, prefix: string, out: Map<string, unknown>): void {
  if (Array.isArray(value)) {
    value.forEach((item, index) => leafPaths(item, `${prefix}.${index}`, out));
    return;
  }
  if (isContainer(value)) {
    for (const [key, item] of Object.entries(value))
      leafPaths(item, prefix ? `${prefix}.${key}` : key, out);
    return;
  }
  if (value !== undefined && value !== null) out.set(prefix, value);
}

/**
 * Component inputs as the CSV table `readCsvCases` reads (and the CLI takes):
 * one row per component, a column per dotted field path, `kind` first, in the
 * order the fields first appear; a component without a field leaves its cell
 * empty. RFC 4180, CRLF line ends. Reading the table back gives the inputs.
 */
export function casesToCsv(cases: readonly Record<string, unknown>[]): string {
  const rows = cases.map((c) => {
    const leaves = new Map<string, unknown>();
    leafPaths(c, '', leaves);
    return leaves;
  });
  const columns: string[] = ['kind'];
  for (const row of rows)
    for (const path of row.keys()) if (!columns.includes(path)) columns.push(path);
  const lines = [columns.map(csvField).join(',')];
  for (const row of rows) {
    lines.push(
      columns
        .map((column) => {
          const value = row.get(column);
          return value === undefined ? '' : csvField(value as string | number | boolean);
        })
        .join(','),
    );
  }
  return `${lines.join('\r\n')}\r\n`;
}

/** Column names of `checksToCsv`. */
export const CHECKS_CSV_COLUMNS = [
  'component',
  'loadCase',
  'check',
  'label',
  'demand',
  'capacity',
  'unit',
  'utilisation',
  'pass',
] as const;

/**
 * The checks of many reports as one CSV table (RFC 4180, CRLF line ends):
 * one row per check of every load case. Numbers are written in full
 * precision, SI. `names` gives each report's component name; without one the
 * report's title is used.
 */
export function checksToCsv(
  reports: readonly Report[],
  names: readonly (string | undefined)[] = [],
): string {
  const lines = [CHECKS_CSV_COLUMNS.join(',')];
  reports.forEach((report, index) => {
    const component = names[index] ?? report.title;
    for (const c of report.cases) {
      for (const check of c.checks) {
        lines.push(
          [
            component,
            c.loadCase.name,
            check.id,
            check.label,
            check.demand,
            check.capacity,
            check.unit,
            check.utilisation,
            check.pass,
          ]
            .map(csvField)
            .join(','),
        );
      }
    }
  });
  return `${lines.join('\r\n')}\r\n`;
}
