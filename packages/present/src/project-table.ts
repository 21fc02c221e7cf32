import type { ComponentTableRow, PackageVerifyResult } from '@hoopline/contract';
import { THIN_SPACE } from './numbers';
import { formatPercent } from './percent';
import { VERDICT_WORDS, kindName, statusWords } from './words';

/**
 * The project's component table and its issue package in words: the web
 * table, its CSV download and the package's index print every cell through
 * these, so the three cannot show a number differently.
 */

/** One row of the project table, every cell as it is shown. */
export interface PresentedTableRow {
  readonly name: string;
  readonly tag: string;
  readonly kind: string;
  /** "3", or '–' for a component without a revision one may see. */
  readonly revision: string;
  readonly status: string;
  readonly verdict: string;
  /** The governing check's label, or '–'. */
  readonly governing: string;
  readonly loadCase: string;
  /** formatPercent of the stored utilisation: never a pass rounded up to 100 %, nor a fail down to it. */
  readonly utilisation: string;
  /** Null when today's engine computed the report; else what to say about it. */
  readonly engineNote: string | null;
}

export const NO_VALUE = '–';

export function engineNote(stored: string, current: string): string | null {
  return stored === current
    ? null
    : `stored report from engine ${stored} (today's is ${current}); not screened again`;
}

export function presentTableRow(row: ComponentTableRow, currentEngine: string): PresentedTableRow {
  const r = row.revision;
  const g = row.governing;
  return {
    name: row.component.name,
    tag: row.component.tag,
    kind: kindName(row.component.kind),
    revision: r ? String(r.number) : NO_VALUE,
    status: r ? statusWords(r.status, r.superseded) : NO_VALUE,
    verdict: r ? VERDICT_WORDS[r.verdict].word : NO_VALUE,
    governing: g ? g.checkLabel : NO_VALUE,
    loadCase: g ? g.loadCase : NO_VALUE,
    utilisation: g ? formatPercent(g.utilisation) : NO_VALUE,
    engineNote: r ? engineNote(r.engineVersion, currentEngine) : null,
  };
}

/** A percentage as a spreadsheet reads it: the shown figure without its sign or thin spaces. */
export function percentFigure(shown: string): string {
  return shown === NO_VALUE ? '' : shown.replace(/ ?%$/, '').replaceAll(THIN_SPACE, '');
}

/** The CSV columns of the project table, in order. */
export const TABLE_CSV_HEADER = [
  'Project number',
  'Component',
  'Tag',
  'Kind',
  'Revision',
  'Status',
  'Verdict',
  'Governing check',
  'Governing load case',
  'Utilisation (%)',
  'Engine version',
  'Engine note',
  'Revision saved (UTC)',
  'Submitted (UTC)',
  'Decided (UTC)',
  'Latest countersigned revision',
] as const;

/** An ISO 8601 instant to the second, in UTC ("2026-03-14T09:12:05Z"). */
export function isoInstant(iso: string | null): string {
  if (!iso) return '';
  return `${new Date(iso).toISOString().slice(0, 19)}Z`;
}

/** One CSV record of the table: the same texts as the table's cells, percent as a figure. */
export function tableCsvRecord(
  projectNumber: string,
  row: ComponentTableRow,
  currentEngine: string,
): string[] {
  const shown = presentTableRow(row, currentEngine);
  const r = row.revision;
  const blank = (text: string) => (text === NO_VALUE ? '' : text);
  return [
    projectNumber,
    shown.name,
    shown.tag,
    shown.kind,
    blank(shown.revision),
    blank(shown.status),
    blank(shown.verdict),
    blank(shown.governing),
    blank(shown.loadCase),
    percentFigure(shown.utilisation),
    r?.engineVersion ?? '',
    shown.engineNote ?? '',
    isoInstant(r?.createdAt ?? null),
    isoInstant(r?.submittedAt ?? null),
    isoInstant(r?.decidedAt ?? null),
    row.issuedRevisionNumber === null ? '' : String(row.issuedRevisionNumber),
  ];
}

// ── The issue package ───────────────────────────────────────────────────────

/** "PKG-3f9a-0c11-7be2": the first 12 hex digits of a package hash. */
export function packageCode(packageHash: string): string {
  const h = packageHash.slice(0, 12);
  return `PKG-${h.slice(0, 4)}-${h.slice(4, 8)}-${h.slice(8, 12)}`;
}

export const PACKAGE_WORDS = {
  title: 'Issue package',
  notCountersigned: 'not countersigned',
  notIncluded: 'not included',
  current: 'This is the current set: no component has a later countersigned revision.',
} as const;

/** "superseded for component VDC-3 door (revision 3 countersigned since)". */
export function supersededFor(componentName: string, laterRevision: number | null): string {
  return `superseded for component ${componentName}${
    laterRevision === null ? '' : ` (revision ${laterRevision} countersigned since)`
  }`;
}

/** "countersigned since for component X (revision 1), not in this package". */
export function countersignedSince(componentName: string, revision: number): string {
  return `countersigned since for component ${componentName} (revision ${revision}), not in this package`;
}

/** Why a verified package is no longer the current set, one line a component; empty when it is. */
export function packageStaleness(result: Extract<PackageVerifyResult, { match: true }>): string[] {
  return [
    ...result.components
      .filter((c) => c.status === 'superseded')
      .map((c) => supersededFor(c.componentName, c.supersededBy)),
    ...result.countersignedSince.map((c) => countersignedSince(c.componentName, c.revisionNumber)),
  ];
}
