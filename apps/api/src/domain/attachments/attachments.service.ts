import type { Attachment } from '@hoopline/contract';
import { createHash, randomUUID } from 'node:crypto';
import type { DataSource, EntityManager } from 'typeorm';
import type { AttachmentEntity } from '../../db/entities/attachment.entity';
import { AppError, notFound, validationFailed } from '../../http/errors';
import { canDesign, type Actor } from '../../policy/policy';
import { enforce } from '../../policy/enforce';
import type { BlobStorage } from '../../storage/storage';
import {
  ALLOWED_TYPES,
  checkFileName,
  displayName,
  sniffFileType,
} from '../../uploads/file-checks';
import { findActiveContent } from '../../uploads/pdf-active-content';
import { attachmentRepository } from '../../repositories/attachments.repository';
import { userRepository } from '../../repositories/users.repository';
import { recordAudit } from '../audit/audit.service';
import { requireComponent } from '../components/component-access';
import { isoRequired } from '../iso-dates';

async function viewsOf(
  manager: EntityManager,
  entities: AttachmentEntity[],
): Promise<Attachment[]> {
  const ids = [
    ...new Set(entities.map((a) => a.uploadedBy).filter((id): id is string => id !== null)),
  ];
  const names = await userRepository.namesByIds(manager, ids);
  return entities.map((a) => ({
    id: a.id,
    componentId: a.componentId,
    name: a.name,
    sha256: a.sha256,
    size: a.size,
    contentType: a.contentType,
    kind: ALLOWED_TYPES[a.contentType as keyof typeof ALLOWED_TYPES]?.label ?? a.contentType,
    uploadedBy: a.uploadedBy ? { id: a.uploadedBy, name: names.get(a.uploadedBy) ?? '' } : null,
    createdAt: isoRequired(a.createdAt),
  }));
}

/**
 * Drawings, photos and certificates attached to a component: checked by
 * content and name before anything is stored, stored once by content hash.
 */
export class AttachmentsService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly storage: BlobStorage,
  ) {}

  async list(actor: Actor, componentId: string): Promise<Attachment[]> {
    const manager = this.dataSource.manager;
    await requireComponent(manager, actor, componentId);
    return viewsOf(manager, await attachmentRepository.ofComponent(manager, componentId));
  }

  /** Attachments of a component up to a moment (the sheet lists those as of the countersign). */
  async listAsOf(
    manager: EntityManager,
    componentId: string,
    asOf: Date | null,
  ): Promise<Attachment[]> {
    return viewsOf(manager, await attachmentRepository.ofComponentAsOf(manager, componentId, asOf));
  }

  async upload(
    actor: Actor,
    componentId: string,
    file: { originalName: string; bytes: Buffer },
  ): Promise<Attachment> {
    const manager = this.dataSource.manager;
    const { standing } = await requireComponent(manager, actor, componentId);
    enforce(canDesign(standing));
    const name = checkFileName(file.originalName);
    if (!name.ok) throw validationFailed([{ path: 'file', message: name.reason }]);
    if (file.bytes.length === 0) throw validationFailed([{ path: 'file', message: 'is empty' }]);
    const sniffed = await sniffFileType(file.bytes);
    if (!sniffed.ok) {
      throw new AppError(415, 'unsupported_file_type', sniffed.reason, [
        { path: 'file', message: sniffed.reason },
      ]);
    }
    if (sniffed.type === 'application/pdf') {
      const active = await findActiveContent(file.bytes);
      if (active.found) {
        const reason = `the PDF carries active content (${active.what}); attach a plain PDF (print it to PDF again)`;
        throw new AppError(422, 'pdf_active_content', reason, [{ path: 'file', message: reason }]);
      }
    }
    const storedName = displayName(name.name, sniffed.type);
    const sha256 = createHash('sha256').update(file.bytes).digest('hex');
    // The blob first: a row never points at bytes that are not there. A row
    // that then fails to commit leaves an unreferenced blob, which is harmless.
    await this.storage.put(sha256, file.bytes, sniffed.type);
    return this.dataSource.transaction(async (tx) => {
      const { component } = await requireComponent(tx, actor, componentId, { lock: true });
      const entity = await attachmentRepository.insert(tx, {
        id: randomUUID(),
        componentId,
        projectId: component.projectId,
        name: storedName,
        sha256,
        size: file.bytes.length,
        contentType: sniffed.type,
        uploadedBy: actor.id,
        createdAt: new Date(),
        removedAt: null,
        removedBy: null,
      });
      await recordAudit(tx, {
        actorId: actor.id,
        action: 'attachment.uploaded',
        entityType: 'attachment',
        entityId: entity.id,
        projectId: component.projectId,
        after: {
          componentId,
          name: entity.name,
          ...(entity.name !== file.originalName ? { givenName: file.originalName } : {}),
          sha256,
          size: entity.size,
          contentType: entity.contentType,
        },
      });
      const [view] = await viewsOf(tx, [entity]);
      return view!;
    });
  }

  async content(
    actor: Actor,
    attachmentId: string,
  ): Promise<{ attachment: Attachment; bytes: Buffer }> {
    const manager = this.dataSource.manager;
    const entity = await attachmentRepository.findActive(manager, attachmentId);
    if (!entity) throw notFound('attachment');
    await requireComponent(manager, actor, entity.componentId).catch(() => {
      throw notFound('attachment');
    });
    const bytes = await this.storage.get(entity.sha256);
    if (!bytes) throw new AppError(410, 'attachment_missing', 'the stored file is missing');
    const [attachment] = await viewsOf(manager, [entity]);
    return { attachment: attachment!, bytes };
  }

  async remove(actor: Actor, attachmentId: string): Promise<void> {
    await this.dataSource.transaction(async (manager) => {
      const entity = await attachmentRepository.findActive(manager, attachmentId);
      if (!entity) throw notFound('attachment');
      const { standing } = await requireComponent(manager, actor, entity.componentId).catch(() => {
        throw notFound('attachment');
      });
      enforce(canDesign(standing));
      // Kept, marked removed: a sheet countersigned before still names it.
      await attachmentRepository.markRemoved(manager, attachmentId, actor.id, new Date());
      await recordAudit(manager, {
        actorId: actor.id,
        action: 'attachment.removed',
        entityType: 'attachment',
        entityId: attachmentId,
        projectId: entity.projectId,
        before: { componentId: entity.componentId, name: entity.name, sha256: entity.sha256 },
      });
    });
  }
}
