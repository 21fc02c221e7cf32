import { Column, Entity, PrimaryColumn } from 'typeorm';
import type { JsonObject } from './json';

@Entity('audit_events')
export class AuditEventEntity {
  @PrimaryColumn('uuid') id: string;
  // The table's `seq` (bigserial, the log's sort order) is filled by the database and read only in SQL.
  @Column('uuid', { name: 'actor_id', nullable: true }) actorId: string | null;
  @Column('text') action: string;
  @Column('text', { name: 'entity_type' }) entityType: string;
  @Column('uuid', { name: 'entity_id', nullable: true }) entityId: string | null;
  @Column('uuid', { name: 'project_id', nullable: true }) projectId: string | null;
  @Column('jsonb') summary: JsonObject;
  @Column('timestamptz', { name: 'created_at' }) createdAt: Date;
}
