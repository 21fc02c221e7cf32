/**
 * Domain errors with a stable machine-readable code. Services throw these; the
 * one error middleware turns them into `{ error: { code, message, fields? } }`.
 */
export interface FieldError {
  /** Dotted path of the offending field, e.g. "loadCases.0.internal". */
  readonly path: string;
  readonly message: string;
}

export class AppError extends Error {
  override readonly name = 'AppError';
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields?: readonly FieldError[],
    readonly details?: Readonly<Record<string, unknown>>,
  ) {
    super(message);
  }
}

export const badRequest = (code: string, message: string, fields?: readonly FieldError[]) =>
  new AppError(400, code, message, fields);
export const validationFailed = (fields: readonly FieldError[]) =>
  new AppError(
    400,
    'validation_failed',
    fields.length === 1 && fields[0]
      ? `${fields[0].path || 'request'}: ${fields[0].message}`
      : `${fields.length} fields are invalid`,
    fields,
  );
export const unauthorized = (message = 'sign in first') =>
  new AppError(401, 'unauthorized', message);
export const forbidden = (code: string, message: string) => new AppError(403, code, message);
export const notFound = (what = 'resource') => new AppError(404, 'not_found', `${what} not found`);
export const conflict = (code: string, message: string, details?: Record<string, unknown>) =>
  new AppError(409, code, message, undefined, details);
