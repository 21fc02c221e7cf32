import type { EntitySchema, MixedList } from 'typeorm';
import { AttachmentEntity } from './entities/attachment.entity';
import { AuditEventEntity } from './entities/audit-event.entity';
import { ComponentEntity } from './entities/component.entity';
import { InvitationEntity } from './entities/invitation.entity';
import { MailOutboxEntity } from './entities/mail-outbox.entity';
import { PasswordResetEntity } from './entities/password-reset.entity';
import {
  CustomMaterialEntity,
  ProjectEntity,
  ProjectMemberEntity,
} from './entities/project.entity';
import { RefreshTokenEntity } from './entities/refresh-token.entity';
import { RevisionEntity, SignOffEntity } from './entities/revision.entity';
import { UserEntity } from './entities/user.entity';

/** Every entity class, in one list for the DataSource. */
// eslint-disable-next-line @typescript-eslint/no-unsafe-function-type -- TypeORM's own type for entity lists
export const entities: MixedList<Function | string | EntitySchema> = [
  UserEntity,
  RefreshTokenEntity,
  InvitationEntity,
  PasswordResetEntity,
  ProjectEntity,
  ProjectMemberEntity,
  CustomMaterialEntity,
  ComponentEntity,
  RevisionEntity,
  SignOffEntity,
  AuditEventEntity,
  MailOutboxEntity,
  AttachmentEntity,
];
