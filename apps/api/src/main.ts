import { pino } from 'pino';
import { createApp } from './app';
import { ConfigError, loadConfig } from './config/config';
import { createDataSource } from './db/data-source';
import { MailWorker } from './mail/mail-worker';

async function main() {
  let config;
  try {
    config = loadConfig();
  } catch (error) {
    if (error instanceof ConfigError) {
      console.error(`hoopline-api: ${error.message}`);
      process.exit(1);
    }
    throw error;
  }
  // Asynchronous, buffered writes: a synchronous write(2) per access-log line
  // was a tenth of a request's CPU time; pino flushes the buffer on exit.
  const logger = pino(
    { level: config.logLevel, base: { service: 'hoopline-api' } },
    pino.destination({ sync: false, minLength: 4096 }),
  );
  const dataSource = createDataSource(config.databaseUrl);
  await dataSource.initialize();
  const pending = await dataSource.showMigrations();
  if (pending) {
    logger.warn('the database has pending migrations: run `pnpm --filter @hoopline/api migrate`');
  }
  const app = createApp({ config, dataSource, logger });
  const server = app.listen(config.port, config.host, () => {
    logger.info(
      { url: config.publicUrl },
      `Hoopline API listening on http://${config.host}:${config.port}`,
    );
  });
  const smtp = config.mail.smtp;
  const mailWorker = smtp ? new MailWorker(dataSource, { ...config.mail, smtp }, logger) : null;
  if (mailWorker && smtp) {
    mailWorker.start();
    logger.info(`mail: sending through ${smtp.host}:${smtp.port}`);
  } else {
    logger.warn(
      'mail: no HOOPLINE_SMTP_HOST; mail waits in the outbox and tokens are shown to admins',
    );
  }
  const shutdown = (signal: string) => {
    logger.info({ signal }, 'shutting down');
    server.close(() => {
      void (mailWorker?.stop() ?? Promise.resolve())
        .then(() => dataSource.destroy())
        .finally(() => process.exit(0));
    });
    setTimeout(() => process.exit(0), 5000).unref();
  };
  process.on('SIGINT', () => shutdown('SIGINT'));
  process.on('SIGTERM', () => shutdown('SIGTERM'));
}

main().catch((error: unknown) => {
  console.error(
    `hoopline-api: failed to start: ${error instanceof Error ? error.message : String(error)}`,
  );
  process.exit(1);
});
