import type { Passwords } from '../credentials/passwords';
import type { AccessTokens } from '../credentials/tokens';
import type { SheetRenderer } from '../sheets/sheet-renderer';
import type { AttachmentsService } from './attachments/attachments.service';
import type { AuditService } from './audit/audit.service';
import type { AuthService } from './auth/auth.service';
import type { ComponentTableService } from './components/component-table';
import type { ComponentsService } from './components/components.service';
import type { ProjectsService } from './projects/projects.service';
import type { RevisionsService } from './revisions/revisions.service';
import type { ScreenService } from './screen/screen.service';
import type { SettingsService } from './settings/settings.service';
import type { SheetsService } from './sheets/sheets.service';
import type { UsersService } from './users/users.service';

/**
 * The services the routes call, each given only what it uses. Declared here,
 * beside the services, so that routes name it without importing the wiring
 * (src/wiring.ts builds it).
 */
export interface Services {
  readonly passwords: Passwords;
  /** Signs and checks access tokens (one key object per process). */
  readonly tokens: AccessTokens;
  readonly auth: AuthService;
  readonly users: UsersService;
  readonly projects: ProjectsService;
  readonly components: ComponentsService;
  /** The project's component table and its CSV. */
  readonly componentTable: ComponentTableService;
  readonly revisions: RevisionsService;
  readonly audit: AuditService;
  readonly attachments: AttachmentsService;
  readonly sheets: SheetsService;
  readonly settings: SettingsService;
  /** Screening that saves nothing (POST /screen). */
  readonly screen: ScreenService;
  /** The worker threads that render sheets (close it when done). */
  readonly sheetRenderer: SheetRenderer;
}
