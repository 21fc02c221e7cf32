import type { Verdict } from '@hoopline/calc';
import { Column, Entity, PrimaryColumn } from 'typeorm';
import type { JsonObject } from './json';

import type { RevisionStatus } from '@hoopline/contract';

export type { RevisionStatus };
export type SignOffDecision = 'countersigned' | 'returned';

/** Immutable once written, except for its status and the times that go with it. */
@Entity('revisions')
export class RevisionEntity {
  @PrimaryColumn('uuid') id: string;
  @Column('uuid', { name: 'component_id' }) componentId: string;
  @Column('uuid', { name: 'project_id' }) projectId: string;
  @Column('integer') number: number;
  @Column('text') status: RevisionStatus;
  @Column('text') note: string;
  /** The calc input as saved (site filled from the project when absent). */
  @Column('jsonb') inputs: JsonObject;
  @Column('text', { name: 'engine_version' }) engineVersion: string;
  /** The report the server computed; never one a client sent. */
  @Column('jsonb') report: JsonObject;
  /** SHA-256 (hex) of the RFC 8785 canonical JSON of { inputs, engineVersion, report }. */
  @Column('text', { name: 'content_hash' }) contentHash: string;
  @Column('text') verdict: Verdict;
  @Column('uuid', { name: 'author_id' }) authorId: string;
  @Column('timestamptz', { name: 'created_at' }) createdAt: Date;
  @Column('timestamptz', { name: 'submitted_at', nullable: true }) submittedAt: Date | null;
  @Column('timestamptz', { name: 'decided_at', nullable: true }) decidedAt: Date | null;
  @Column('timestamptz', { name: 'superseded_at', nullable: true }) supersededAt: Date | null;
  @Column('uuid', { name: 'superseded_by', nullable: true }) supersededBy: string | null;
}

@Entity('sign_offs')
export class SignOffEntity {
  @PrimaryColumn('uuid') id: string;
  @Column('uuid', { name: 'revision_id' }) revisionId: string;
  @Column('uuid', { name: 'checker_id' }) checkerId: string;
  @Column('text') decision: SignOffDecision;
  @Column('text') comment: string;
  @Column('text', { name: 'hash_signed' }) hashSigned: string;
  @Column('timestamptz', { name: 'created_at' }) createdAt: Date;
  /** A return's remarks by trail step number (migration 1765500006000). */
  @Column('jsonb', { default: () => "'[]'::jsonb" }) remarks: SignOffRemark[];
}

/** One remark of a sign-off: the trail step's number (1…N) and the text. */
export interface SignOffRemark {
  step: number;
  text: string;
}
