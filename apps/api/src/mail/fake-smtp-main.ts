/**
 * Runs the fake SMTP server in the foreground:
 *   node --import tsx src/mail/fake-smtp-main.ts --port 2525 --folder ../../.data/mail
 * scripts/mail-fake.sh starts and stops it in the background.
 */
import path from 'node:path';
import { parseArgs } from 'node:util';
import { startFakeSmtpServer } from './fake-smtp-server';

const { values } = parseArgs({
  options: {
    port: { type: 'string', default: '2525' },
    folder: { type: 'string' },
    host: { type: 'string', default: '127.0.0.1' },
  },
});
const folder = path.resolve(
  values.folder ?? path.join(import.meta.dirname, '../../../../.data/mail'),
);
const port = Number(values.port);
if (!Number.isInteger(port) || port < 0 || port > 65535) {
  console.error(`fake-smtp: --port must be a port number, got ${values.port}`);
  process.exit(1);
}
const server = await startFakeSmtpServer({ port, host: values.host, folder }).catch(
  (error: unknown) => {
    console.error(
      `fake-smtp: cannot listen on ${values.host}:${port}: ${error instanceof Error ? error.message : String(error)}`,
    );
    process.exit(1);
  },
);
console.log(`fake-smtp: listening on ${values.host}:${server.port}, storing mail in ${folder}`);
const stop = () => void server.close().then(() => process.exit(0));
process.on('SIGTERM', stop);
process.on('SIGINT', stop);
