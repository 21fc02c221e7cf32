import { IsNull, type EntityManager } from 'typeorm';
import { AttachmentEntity } from '../db/entities/attachment.entity';

/** Table attachments (the bytes live in blob storage, by their SHA-256). */
export const attachmentRepository = {
  /** A component's attachments that are not removed, newest first. */
  ofComponent(manager: EntityManager, componentId: string): Promise<AttachmentEntity[]> {
    return manager.find(AttachmentEntity, {
      where: { componentId, removedAt: IsNull() },
      order: { createdAt: 'DESC', id: 'ASC' },
    });
  },

  /**
   * A component's attachments as they were at a moment (attached by then and
   * not removed by then), oldest first; with no moment, those not removed.
   */
  ofComponentAsOf(
    manager: EntityManager,
    componentId: string,
    asOf: Date | null,
  ): Promise<AttachmentEntity[]> {
    const query = manager
      .getRepository(AttachmentEntity)
      .createQueryBuilder('a')
      .where('a.component_id = :componentId', { componentId })
      .orderBy('a.created_at', 'ASC')
      .addOrderBy('a.id', 'ASC');
    if (asOf) {
      query
        .andWhere('a.created_at <= :asOf', { asOf })
        .andWhere('(a.removed_at is null or a.removed_at > :asOf)', { asOf });
    } else {
      query.andWhere('a.removed_at is null');
    }
    return query.getMany();
  },

  /** The attachment unless it was removed. */
  findActive(manager: EntityManager, attachmentId: string): Promise<AttachmentEntity | null> {
    return manager.findOneBy(AttachmentEntity, { id: attachmentId, removedAt: IsNull() });
  },

  async insert(manager: EntityManager, fields: AttachmentEntity): Promise<AttachmentEntity> {
    const attachment: AttachmentEntity = Object.assign(new AttachmentEntity(), fields);
    await manager.insert(AttachmentEntity, attachment);
    return attachment;
  },

  /** Kept, marked removed: a sheet countersigned before still names it. */
  async markRemoved(
    manager: EntityManager,
    attachmentId: string,
    removedBy: string,
    at: Date,
  ): Promise<void> {
    await manager.update(AttachmentEntity, { id: attachmentId }, { removedAt: at, removedBy });
  },
};
