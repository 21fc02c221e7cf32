import type { RequestHandler } from 'express';
import type { Config } from '../config/config';
import type { Services } from '../domain/services';

/** What every router factory is given. */
export interface RouteDeps {
  readonly config: Config;
  readonly services: Services;
  /** Route middleware: 401 unless signed in. */
  readonly signedIn: RequestHandler;
}
