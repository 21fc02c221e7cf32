import type { Verdict } from '@hoopline/calc';

/** One component on a package's index: its countersigned revision, or none. */
export interface PackageIndexEntry {
  readonly componentName: string;
  readonly tag: string;
  readonly kind: string;
  /** The latest countersigned revision the package holds; null: "not countersigned", not included. */
  readonly revision: {
    readonly number: number;
    readonly contentHash: string;
    readonly verifyCode: string;
    readonly engineVersion: string;
    readonly verdict: Verdict;
    readonly governing: {
      readonly checkLabel: string;
      readonly loadCase: string;
      readonly utilisation: number;
    } | null;
    readonly preparedBy: string;
    readonly submittedAt: string | null;
    readonly countersignedBy: string;
    readonly countersignedAt: string;
  } | null;
}

/** Everything a package's index prints, gathered by the sheet service. */
export interface PackageIndexData {
  readonly project: { readonly number: string; readonly name: string; readonly client: string };
  /** SHA-256 (hex) over the project id and the sorted content hashes of the included revisions. */
  readonly packageHash: string;
  /** PKG-xxxx-xxxx-xxxx. */
  readonly packageCode: string;
  /** Public page that resolves the package code. */
  readonly verifyUrl: string;
  /** Today's engine version, beside which a revision from another one is marked. */
  readonly engineVersion: string;
  readonly paperSize: 'A4' | 'LETTER';
  readonly generatedAt: string;
  /** In index order; the included ones' sheets follow the index in this order. */
  readonly entries: readonly PackageIndexEntry[];
}

/** Where each included sheet sits in the package, worked out after the sheets are laid out. */
export interface PackagePageRanges {
  readonly indexPages: number;
  /** Per entry: first and last package page of its sheet, or null for one not included. */
  readonly ranges: readonly ({ readonly first: number; readonly last: number } | null)[];
  readonly totalPages: number;
}

/** A package to put together: the index data and the included sheets, already rendered, in entry order. */
export interface PackageJob {
  readonly index: PackageIndexData;
  readonly sheets: readonly Uint8Array[];
}
