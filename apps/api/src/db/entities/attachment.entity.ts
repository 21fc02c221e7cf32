import { Column, Entity, PrimaryColumn } from 'typeorm';

/** A file attached to a component; its bytes live in blob storage under `sha256`. */
@Entity('attachments')
export class AttachmentEntity {
  @PrimaryColumn('uuid') id: string;
  @Column('uuid', { name: 'component_id' }) componentId: string;
  @Column('uuid', { name: 'project_id' }) projectId: string;
  @Column('text') name: string;
  @Column('text') sha256: string;
  @Column('bigint', { transformer: { to: (v: number) => v, from: (v: string) => Number(v) } })
  size: number;
  @Column('text', { name: 'content_type' }) contentType: string;
  @Column('uuid', { name: 'uploaded_by', nullable: true }) uploadedBy: string | null;
  @Column('timestamptz', { name: 'created_at' }) createdAt: Date;
  /** Removed from the component (kept, so sheets countersigned before still name it). */
  @Column('timestamptz', { name: 'removed_at', nullable: true }) removedAt: Date | null;
  @Column('uuid', { name: 'removed_by', nullable: true }) removedBy: string | null;
}
