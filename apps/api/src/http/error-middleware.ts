import type { ErrorRequestHandler, RequestHandler } from 'express';
import { DATABASE_RETRY_AFTER_SECONDS, isDatabaseUnavailable } from './database-unavailable';
import { AppError } from './errors';

/** Unknown /api routes: 404 in the JSON error format. */
export const apiNotFound: RequestHandler = (req, res) => {
  res.status(404).json({
    error: { code: 'route_not_found', message: `no route for ${req.method} ${req.originalUrl}` },
  });
};

interface BodyParserError {
  type?: string;
  status?: number;
  expose?: boolean;
}

/**
 * The one error handler. Domain errors keep their status and code; errors the
 * body parser raises for what a client sent become 4xx; a database that cannot
 * be reached is a 503 with Retry-After (database_unavailable); anything else is a
 * 500 with a generic message (the detail goes to the log, never to the user).
 */
export const errorMiddleware: ErrorRequestHandler = (error: unknown, req, res, next) => {
  if (res.headersSent) {
    next(error);
    return;
  }
  if (error instanceof AppError) {
    res.status(error.status).json({
      error: {
        code: error.code,
        message: error.message,
        ...(error.fields ? { fields: error.fields } : {}),
        ...(error.details ?? {}),
      },
    });
    return;
  }
  // A path segment that is not valid percent-encoded UTF-8 ("%ED%A0%80", a
  // lone surrogate): the router cannot decode the parameter (issue 13.1 fuzz).
  if (error instanceof URIError && (error as { status?: number }).status === 400) {
    res.status(400).json({
      error: {
        code: 'validation_failed',
        message: 'the address is not valid percent-encoded UTF-8',
        fields: [{ path: 'path', message: 'is not valid percent-encoded UTF-8' }],
      },
    });
    return;
  }
  const parserError = error as BodyParserError;
  if (parserError && typeof parserError === 'object' && parserError.expose && parserError.status) {
    const code =
      parserError.type === 'entity.parse.failed'
        ? 'invalid_json'
        : parserError.type === 'entity.too.large'
          ? 'payload_too_large'
          : 'bad_request';
    const message =
      code === 'invalid_json'
        ? 'the request body is not valid JSON'
        : code === 'payload_too_large'
          ? 'the request body is too large'
          : 'the request could not be read';
    res.status(parserError.status).json({ error: { code, message } });
    return;
  }
  if (isDatabaseUnavailable(error)) {
    // Nothing was written (a transaction commits whole or not at all): the
    // client may send the same request again once the database is back.
    req.log?.warn({ err: error }, 'database unavailable');
    res
      .status(503)
      .set('retry-after', String(DATABASE_RETRY_AFTER_SECONDS))
      .json({
        error: {
          code: 'database_unavailable',
          message: 'the database is unavailable for a moment: try again shortly',
          retryAfterSeconds: DATABASE_RETRY_AFTER_SECONDS,
        },
      });
    return;
  }
  req.log?.error({ err: error }, 'unhandled error');
  res.status(500).json({
    error: {
      code: 'internal_error',
      message: 'something went wrong on the server; it has been logged',
    },
  });
};
