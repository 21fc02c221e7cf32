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
  /** Named by an administrator as someone who may start projects. */
  readonly mayCreateProjects: boolean;
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
  /** Whether this person may start a project now (GET /api/settings decides who may). */
  readonly canCreateProjects: boolean;
}

/** Installation settings (admins): who may start projects. */
export interface Settings {
  readonly projectCreation: 'everyone' | 'named';
}

/** A site in SI (m, Pa). */
export type Site = { readonly altitude?: number } | { readonly ambientPressure?: number };
/** A site as typed ("5280 ft"), or SI numbers for a project from before typed sites were kept. */
export type SiteAsTyped =
  { readonly altitude?: string | number } | { readonly ambientPressure?: string | number };

/** The project's design basis (API.md): the engine's `designBasis`, every key set. */
export interface DesignBasis {
  readonly allowableStress: 'asme-viii-1' | 'en-13445-3';
  readonly barometer: 'standard' | 'high';
}

export interface Project {
  readonly id: string;
  readonly number: string;
  readonly name: string;
  readonly client: string;
  readonly site: Site | null;
  readonly siteAsTyped: SiteAsTyped;
  readonly ambientPressure: number;
  readonly designBasis: DesignBasis;
  /** The components' default design temperature, as typed ("150 degC"); null: none (room temperature). */
  readonly designTemperature: string | number | null;
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

/** POST /invitations: mailed to the invitee, or (no SMTP server configured) the token for the admin. */
export type InvitationCreated =
  | { readonly invitation: Invitation; readonly delivery: 'mail' }
  | { readonly invitation: Invitation; readonly delivery: 'shown'; readonly token: string };

/** POST /users/:id/password-reset: mailed to the user, or the token shown to the admin. */
export type PasswordResetIssued =
  | { readonly delivery: 'mail'; readonly expiresAt: string }
  | { readonly delivery: 'shown'; readonly token: string; readonly expiresAt: string };

export interface Attachment {
  readonly id: string;
  readonly componentId: string;
  readonly name: string;
  /** SHA-256 of the bytes, hex. */
  readonly sha256: string;
  /** Bytes. */
  readonly size: number;
  /** As sniffed from the content by the server: application/pdf, image/png, image/jpeg, image/vnd.dxf. */
  readonly contentType: string;
  /** The server's words for the type ("PDF document"). */
  readonly kind: string;
  readonly uploadedBy: PersonRef | null;
  readonly createdAt: string;
}

/** GET /verify/:code (public). */
export type VerifyResult =
  | { readonly match: false }
  | {
      readonly match: true;
      readonly status: 'current' | 'superseded';
      readonly projectNumber: string;
      readonly componentName: string;
      readonly revisionNumber: number;
      readonly countersignedAt: string;
    };

/** GET /users/lookup?email= (admins and designers): one person by their exact address. */
export interface UserLookup {
  readonly user: PersonRef & { readonly email: string };
}

export type PaperSize = 'a4' | 'letter';
