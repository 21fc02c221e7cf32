import type { RequestHandler } from 'express';
import type { DataSource } from 'typeorm';
import type { Config } from '../config/config';
import type { Services } from '../domain';

/** What every router factory is given. */
export interface RouteDeps {
  readonly config: Config;
  readonly services: Services;
  /** For state shared by every API process that is not a service's (sign-in rate limits). */
  readonly dataSource: DataSource;
  /** Route middleware: 401 unless signed in. */
  readonly signedIn: RequestHandler;
}
