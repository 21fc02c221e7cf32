import type { IncomingMessage, ServerResponse } from 'node:http';
import type { Logger } from 'pino';
import { pinoHttp } from 'pino-http';

/** Invitation tokens travel in the path of GET /auth/invitations/:token: keep them out of the log. */
export function loggableUrl(url: string | undefined): string | undefined {
  return url?.replace(/(\/auth\/invitations\/)[^/?#]+/, '$1[token]');
}

/**
 * One access-log line per request: id, method, path, status and time taken.
 * Headers are not logged: the whole request and response header sets made
 * each line about 1 kB and their serialisation and redaction a measurable
 * part of a request's CPU time (bench/profile-screen.ts), while cookies and
 * authorisation had to be redacted out of them anyway.
 */
export function requestLog(logger: Logger) {
  return pinoHttp({
    logger,
    quietReqLogger: true,
    serializers: {
      req: (req: IncomingMessage & { id?: unknown }) => ({
        id: req.id,
        method: req.method,
        url: loggableUrl(req.url),
      }),
      res: (res: ServerResponse) => ({ statusCode: res.statusCode }),
    },
    // 503: the database is away for a moment (logged once as a warning by the error handler).
    customLogLevel: (_req, res, error) =>
      res.statusCode === 503
        ? 'warn'
        : error || res.statusCode >= 500
          ? 'error'
          : res.statusCode >= 400
            ? 'warn'
            : 'info',
  });
}
