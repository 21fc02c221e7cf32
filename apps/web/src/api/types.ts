import type { ComponentKind, Report, Verdict } from '@hoopline/calc';

/** Response shapes of apps/api/API.md ("Shapes"). */
export type UnitSystem = 'si' | 'us';
export type Role = 'designer' | 'checker' | 'fabricator';
export type RevisionStatus = 'draft' | 'submitted' | 'countersigned' | 'returned';

export interface User {
  readonly id: string;
  readonly email: string;
  readonly name: string;
  readonly isAdmin: boolean;
  readonly active: boolean;
  readonly unitSystem: UnitSystem;
  readonly createdAt: string;
}

export interface Membership {
  readonly projectId: string;
  readonly projectNumber: string;
  readonly role: Role;
}

export interface Me {
  readonly user: User;
  readonly memberships: readonly Membership[];
}

export type Site = { readonly altitude?: number } | { readonly ambientPressure?: number };

export interface Project {
  readonly id: string;
  readonly number: string;
  readonly name: string;
  readonly client: string;
  readonly site: Site | null;
  readonly ambientPressure: number;
  readonly unitSystem: UnitSystem;
  readonly notes: string;
  readonly version: number;
  readonly createdAt: string;
  readonly updatedAt: string;
  readonly myRole: Role | null;
}

export interface PersonRef {
  readonly id: string;
  readonly name: string;
}

export interface Member {
  readonly user: PersonRef & { readonly email: string };
  readonly role: Role;
  readonly addedAt: string;
}

export interface RevisionSummary {
  readonly id: string;
  readonly number: number;
  readonly status: RevisionStatus;
  readonly verdict: Verdict;
  readonly contentHash: string;
  readonly author: PersonRef;
  readonly createdAt: string;
  readonly submittedAt: string | null;
  readonly decidedAt: string | null;
  readonly superseded: boolean;
}

export interface SignOff {
  readonly id: string;
  readonly checker: PersonRef;
  readonly decision: 'countersigned' | 'returned';
  readonly comment: string;
  readonly hashSigned: string;
  readonly createdAt: string;
}

export interface Revision extends RevisionSummary {
  readonly componentId: string;
  readonly projectId: string;
  readonly note: string;
  readonly inputs: Record<string, unknown>;
  readonly engineVersion: string;
  readonly report: Report;
  readonly signOffs: readonly SignOff[];
  readonly verifyCode: string;
}

export interface Component {
  readonly id: string;
  readonly projectId: string;
  readonly name: string;
  readonly kind: ComponentKind;
  readonly tag: string;
  readonly version: number;
  readonly createdAt: string;
  readonly updatedAt: string;
  readonly latestRevision: RevisionSummary | null;
  readonly issuedRevision: RevisionSummary | null;
}

export interface Change {
  readonly path: string;
  readonly label?: string;
  readonly before: unknown;
  readonly after: unknown;
}

export interface RevisionDiff {
  readonly from: RevisionSummary | string;
  readonly to: RevisionSummary | string;
  readonly inputs: readonly Change[];
  readonly results: readonly Change[];
  readonly verdictChanged: boolean;
}

export interface QueueItem extends RevisionSummary {
  readonly project: { readonly id: string; readonly number: string; readonly name: string };
  readonly component: { readonly id: string; readonly name: string; readonly kind: ComponentKind };
}

export interface IssuedItem {
  readonly project: { readonly id: string; readonly number: string; readonly name: string };
  readonly component: { readonly id: string; readonly name: string; readonly kind: ComponentKind };
  readonly revision: RevisionSummary;
}

export interface Invitation {
  readonly id: string;
  readonly email: string;
  readonly name: string;
  readonly isAdmin: boolean;
  readonly invitedBy: PersonRef | string | null;
  readonly createdAt: string;
  readonly expiresAt: string;
  readonly acceptedAt: string | null;
}

export interface AuditEvent {
  readonly id: string;
  readonly actor: PersonRef | null;
  readonly action: string;
  readonly entityType: string;
  readonly entityId: string;
  readonly projectId: string | null;
  readonly summary: { readonly before?: unknown; readonly after?: unknown };
  readonly createdAt: string;
}

export interface CustomMaterialItem {
  readonly id: string;
  readonly name: string;
  readonly material: Record<string, unknown>;
  readonly createdAt: string;
}
