import type { Report } from '@hoopline/calc';
import type { UnitSystem } from '@hoopline/present';

/** Everything a sheet prints, gathered by the sheet service from the stored revision. */
export interface SheetData {
  readonly project: {
    readonly number: string;
    readonly name: string;
    readonly client: string;
    readonly unitSystem: UnitSystem;
  };
  readonly component: { readonly name: string; readonly kind: string; readonly tag: string };
  readonly revision: {
    readonly number: number;
    readonly status: string;
    readonly contentHash: string;
    readonly verifyCode: string;
    readonly engineVersion: string;
    readonly createdAt: string;
    readonly submittedAt: string | null;
    readonly note: string;
    readonly inputs: unknown;
    readonly report: Report;
  };
  readonly author: { readonly name: string };
  /** The countersign, when there is one. */
  readonly countersign: {
    readonly checker: string;
    readonly at: string;
    readonly comment: string;
    readonly hashSigned: string;
  } | null;
  readonly attachments: readonly {
    readonly name: string;
    readonly sha256: string;
    readonly size: number;
  }[];
  /** Public page that resolves the verify code. */
  readonly verifyUrl: string;
  /** 'review': countersigned, "FOR REVIEW — NOT FOR CONSTRUCTION"; 'draft': not checked yet. */
  readonly stamp: 'review' | 'draft';
  readonly paperSize: 'A4' | 'LETTER';
  readonly generatedAt: string;
}

export const STAMP_TEXT = {
  review: 'FOR REVIEW — NOT FOR CONSTRUCTION',
  draft: 'DRAFT — NOT CHECKED',
} as const;
