import { Foundation1764640000000 } from './1764640000000-foundation';
import { Accounts1764700000000 } from './1764700000000-accounts';
import { ProjectsAndRevisions1764700001000 } from './1764700001000-projects-and-revisions';
import { MailAndAttachments1764800000000 } from './1764800000000-mail-and-attachments';
import { AttachmentRemoval1764800001000 } from './1764800001000-attachment-removal';
import { SiteAsTyped1765000000000 } from './1765000000000-site-as-typed';
import { SharedSessionsAndLimits1765100000000 } from './1765100000000-shared-sessions-and-limits';
import { SheetRenders1765100001000 } from './1765100001000-sheet-renders';
import { ListIndexes1765100002000 } from './1765100002000-list-indexes';
import { SessionNotifications1765100003000 } from './1765100003000-session-notifications';
import { ProjectStarters1765200000000 } from './1765200000000-project-starters';
import { ProjectDesignBasis1765300000000 } from './1765300000000-project-design-basis';
import { ProjectDesignTemperature1765400000000 } from './1765400000000-project-design-temperature';
import { IssuePackages1765500003000 } from './1765500003000-issue-packages';
import { SignOffPassword1765500005000 } from './1765500005000-sign-off-password';
import { SignOffRemarks1765500006000 } from './1765500006000-sign-off-remarks';
import { VacuumUnit1765500007000 } from './1765500007000-vacuum-unit';

/** Every migration class, oldest first. Add new ones at the end. */
export const migrations = [
  Foundation1764640000000,
  Accounts1764700000000,
  ProjectsAndRevisions1764700001000,
  MailAndAttachments1764800000000,
  AttachmentRemoval1764800001000,
  SiteAsTyped1765000000000,
  SharedSessionsAndLimits1765100000000,
  SheetRenders1765100001000,
  ListIndexes1765100002000,
  SessionNotifications1765100003000,
  ProjectStarters1765200000000,
  ProjectDesignBasis1765300000000,
  ProjectDesignTemperature1765400000000,
  IssuePackages1765500003000,
  SignOffPassword1765500005000,
  SignOffRemarks1765500006000,
  VacuumUnit1765500007000,
];
