/**
 * @hoopline/contract: what crosses the API. The request schemas the API
 * validates with (zod; a field-named 400 from their issues), the response
 * schemas and types its services return and the web app's hooks read, and
 * the enumerations both ends share, each declared once. API.md describes the
 * routes; the shapes are these.
 */

export * from './enums';
export {
  MAX_PAGE_SIZE,
  calcInputs,
  email,
  emptyBody,
  idParams,
  newPassword,
  pageOf,
  paginationQuery,
  paginationShape,
  text,
  uuid,
  version,
} from './fields';

// Requests
export * from './requests/auth';
export * from './requests/me';
export * from './requests/users';
export * from './requests/projects';
export * from './requests/components';
export * from './requests/revisions';
export * from './requests/attachments';
export * from './requests/sheets';
export * from './requests/audit';
export * from './requests/issued';
export * from './requests/screen';
export * from './requests/verify';
export * from './requests/issue-package';

// Responses
export * from './responses/people';
export * from './responses/projects';
export * from './responses/revisions';
export * from './responses/attachments';
export * from './responses/audit';
export * from './responses/errors';
export * from './responses/project-table';
export * from './responses/issue-package';

/** A page of a list, as every list route answers. */
export interface Page<T> {
  readonly items: readonly T[];
  readonly page: number;
  readonly pageSize: number;
  readonly total: number;
}
