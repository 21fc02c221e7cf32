import type { ComponentKind } from '@hoopline/calc';
import { Column, Entity, PrimaryColumn } from 'typeorm';

@Entity('components')
export class ComponentEntity {
  @PrimaryColumn('uuid') id: string;
  @Column('uuid', { name: 'project_id' }) projectId: string;
  @Column('text') name: string;
  /** A calc ComponentKind; fixed by the first revision's inputs. */
  /** One of the engine's kinds (the API refuses inputs of another). */
  @Column('text') kind: ComponentKind;
  @Column('text') tag: string;
  /** Optimistic version: bumped by every edit and every new revision. */
  @Column('integer') version: number;
  @Column('uuid', { name: 'latest_revision_id', nullable: true }) latestRevisionId: string | null;
  /** The latest countersigned revision. */
  @Column('uuid', { name: 'issued_revision_id', nullable: true }) issuedRevisionId: string | null;
  @Column('uuid', { name: 'created_by', nullable: true }) createdBy: string | null;
  @Column('timestamptz', { name: 'created_at' }) createdAt: Date;
  @Column('timestamptz', { name: 'updated_at' }) updatedAt: Date;
}
