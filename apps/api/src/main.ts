import cluster from 'node:cluster';
import { pino, type Logger } from 'pino';
import { createApp } from './app';
import { ConfigError, loadConfig, type Config } from './config/config';
import { createDataSource } from './db/data-source';
import { MailWorker } from './mail/mail-worker';
import { startUploadSweeper } from './storage/upload-sweeper';
import { SessionCache } from './auth/session-cache';
import { pgPool } from './db/pg-pool';
import { workerSheetRenderer } from './sheets/sheet-renderer';

function configOrExit(): Config {
  try {
    return loadConfig();
  } catch (error) {
    if (error instanceof ConfigError) {
      console.error(`hoopline-api: ${error.message}`);
      process.exit(1);
    }
    throw error;
  }
}

function makeLogger(config: Config, bindings: Record<string, unknown>): Logger {
  // Asynchronous, buffered writes: a synchronous write(2) per access-log line
  // was a tenth of a request's CPU time; pino flushes the buffer on exit.
  return pino(
    { level: config.logLevel, base: { service: 'hoopline-api', ...bindings } },
    pino.destination({ sync: false, minLength: 4096 }),
  );
}

/**
 * HOOPLINE_WORKERS > 1: this process only forks the workers (Node's cluster
 * module shares the listening port among them) and starts a new one when a
 * worker dies; it opens no database connection. Everything a request needs
 * is in PostgreSQL (sessions, sign-in limits, the mail outbox's leases, the
 * sheet cache), so any worker may answer any request.
 */
function runPrimary(config: Config) {
  const logger = makeLogger(config, { role: 'primary' });
  let stopping = false;
  const fork = () => cluster.fork();
  for (let i = 0; i < config.workers; i += 1) fork();
  cluster.on('exit', (worker, code, signal) => {
    if (stopping) return;
    logger.error({ worker: worker.id, code, signal }, 'API worker died; starting another');
    setTimeout(fork, 1000).unref();
  });
  let listening = 0;
  cluster.on('listening', () => {
    listening += 1;
    if (listening === config.workers) {
      logger.info(
        { url: config.publicUrl, workers: config.workers },
        `Hoopline API listening on http://${config.host}:${config.port} (${config.workers} processes)`,
      );
    }
  });
  const shutdown = (signal: string) => {
    if (stopping) return;
    stopping = true;
    logger.info({ signal }, 'shutting down the API workers');
    for (const worker of Object.values(cluster.workers ?? {})) worker?.process.kill('SIGTERM');
    const done = () => {
      if (Object.keys(cluster.workers ?? {}).length === 0) process.exit(0);
    };
    cluster.on('exit', done);
    done();
    setTimeout(() => process.exit(0), 8000).unref();
  };
  process.on('SIGINT', () => shutdown('SIGINT'));
  process.on('SIGTERM', () => shutdown('SIGTERM'));
}

async function runServer(config: Config) {
  const worker = cluster.isWorker ? cluster.worker?.id : undefined;
  const logger = makeLogger(config, worker === undefined ? {} : { worker });
  const dataSource = createDataSource(config.databaseUrl);
  await dataSource.initialize();
  const pending = await dataSource.showMigrations();
  if (pending) {
    logger.warn('the database has pending migrations: run `pnpm --filter @hoopline/api migrate`');
  }
  const sheetRenderer = workerSheetRenderer(config.sheets.renderThreads);
  const sessionCache = new SessionCache(pgPool(dataSource).options, logger);
  sessionCache.start();
  const app = createApp({ config, dataSource, logger, sheetRenderer, sessionCache });
  const server = app.listen(config.port, config.host, () => {
    if (worker === undefined) {
      logger.info(
        { url: config.publicUrl },
        `Hoopline API listening on http://${config.host}:${config.port}`,
      );
    }
  });
  const uploadSweeper = startUploadSweeper(config.storage, dataSource, logger);
  // Every process runs the mail worker: rows are claimed with `for update
  // skip locked` and a lease, so N of them never send one mail twice.
  const smtp = config.mail.smtp;
  const mailWorker = smtp ? new MailWorker(dataSource, { ...config.mail, smtp }, logger) : null;
  if (mailWorker && smtp) {
    mailWorker.start();
    if (worker === undefined || worker === 1) {
      logger.info(`mail: sending through ${smtp.host}:${smtp.port}`);
    }
  } else if (worker === undefined || worker === 1) {
    logger.warn(
      'mail: no HOOPLINE_SMTP_HOST; mail waits in the outbox and tokens are shown to admins',
    );
  }
  const shutdown = (signal: string) => {
    logger.info({ signal }, 'shutting down');
    server.close(() => {
      void Promise.all([mailWorker?.stop(), uploadSweeper.stop()])
        .then(() => sheetRenderer.close())
        .then(() => sessionCache.stop())
        .then(() => dataSource.destroy())
        .finally(() => {
          logger.flush();
          process.exit(0);
        });
    });
    // Keep-alive connections would hold close() open: end them once idle.
    server.closeIdleConnections();
    setTimeout(() => process.exit(0), 5000).unref();
  };
  process.on('SIGINT', () => shutdown('SIGINT'));
  process.on('SIGTERM', () => shutdown('SIGTERM'));
}

const config = configOrExit();
if (cluster.isPrimary && config.workers > 1) {
  runPrimary(config);
} else {
  runServer(config).catch((error: unknown) => {
    console.error(
      `hoopline-api: failed to start: ${error instanceof Error ? error.message : String(error)}`,
    );
    process.exit(1);
  });
}
