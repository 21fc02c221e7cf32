import type { DataSource } from 'typeorm';
import type { Services } from './domain';
import { Passwords } from './credentials/passwords';
import { pgPool } from './db/pg-pool';
import { accessTokens } from './credentials/tokens';
import type { Config } from './config/config';
import type { BlobStorage } from './storage/storage';
import { workerSheetRenderer, type SheetRenderer } from './sheets/sheet-renderer';
import { AttachmentsService } from './domain/attachments/attachments.service';
import { AuditService } from './domain/audit/audit.service';
import { AuthService } from './domain/auth/auth.service';
import { ComponentTableService } from './domain/components/component-table';
import { ComponentsService } from './domain/components/components.service';
import { OutboxNotifier } from './mail/outbox-notifier';
import type { Notifier } from './mail/notifier';
import { ProjectsService } from './domain/projects/projects.service';
import { RevisionsService } from './domain/revisions/revisions.service';
import { ScreenService } from './domain/screen/screen.service';
import { SettingsService } from './domain/settings/settings.service';
import { SheetCache } from './domain/sheets/sheet-cache';
import { SheetsService } from './domain/sheets/sheets.service';
import { UsersService } from './domain/users/users.service';

export type { Services };

/**
 * The app's wiring: every service built once per process from the config,
 * the database and the adapters (storage, mail, sheet threads).
 */
export function createServices(
  dataSource: DataSource,
  config: Config,
  storage: BlobStorage,
  notifier: Notifier = new OutboxNotifier(config.publicUrl),
  sheetRenderer: SheetRenderer = workerSheetRenderer(config.sheets.renderThreads),
): Services {
  const passwords = new Passwords(config.auth.argon2);
  const tokens = accessTokens(config.auth.jwtSecret, config.auth.accessTokenTtl);
  const auth = new AuthService(dataSource, config.auth, passwords, notifier, tokens);
  const attachments = new AttachmentsService(dataSource, storage);
  return {
    passwords,
    tokens,
    auth,
    users: new UsersService(dataSource, config.auth, auth, notifier, config.mail.smtp !== null),
    projects: new ProjectsService(dataSource, notifier),
    components: new ComponentsService(dataSource),
    componentTable: new ComponentTableService(dataSource),
    revisions: new RevisionsService(dataSource, notifier, passwords),
    audit: new AuditService(dataSource),
    attachments,
    sheets: new SheetsService(
      dataSource,
      attachments,
      config.publicUrl,
      sheetRenderer,
      new SheetCache(() => pgPool(dataSource), config.sheets.cacheBytes),
    ),
    sheetRenderer,
    settings: new SettingsService(dataSource),
    screen: new ScreenService(),
  };
}
