import { appendFile, mkdir, writeFile } from 'node:fs/promises';
import path from 'node:path';
import { SMTPServer } from 'smtp-server';

/**
 * A local fake SMTP server for development and tests: it accepts every
 * message on 127.0.0.1 and stores it in a folder, one .eml file per message
 * and a line per message in index.jsonl, where tests and a developer can read
 * it. It never relays anything.
 */
export interface FakeSmtpServer {
  readonly port: number;
  close(): Promise<void>;
}

export interface StoredMailIndexLine {
  readonly file: string;
  readonly from: string;
  readonly to: readonly string[];
  readonly receivedAt: string;
  readonly size: number;
}

export async function startFakeSmtpServer(options: {
  readonly port: number;
  readonly host?: string;
  readonly folder: string;
}): Promise<FakeSmtpServer> {
  await mkdir(options.folder, { recursive: true });
  let counter = 0;
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    logger: false,
    size: 10 * 1024 * 1024,
    onData(stream, session, callback) {
      const chunks: Buffer[] = [];
      stream.on('data', (chunk: Buffer) => chunks.push(chunk));
      stream.on('end', () => {
        const bytes = Buffer.concat(chunks);
        const receivedAt = new Date().toISOString();
        counter += 1;
        const file = `${receivedAt.replace(/[:.]/g, '-')}-${process.pid}-${counter}.eml`;
        const line: StoredMailIndexLine = {
          file,
          from: session.envelope.mailFrom ? session.envelope.mailFrom.address : '',
          to: session.envelope.rcptTo.map((r) => r.address),
          receivedAt,
          size: bytes.length,
        };
        writeFile(path.join(options.folder, file), bytes)
          .then(() =>
            appendFile(path.join(options.folder, 'index.jsonl'), `${JSON.stringify(line)}\n`),
          )
          .then(
            () => callback(),
            (error: Error) => callback(error),
          );
      });
    },
  });
  const host = options.host ?? '127.0.0.1';
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(options.port, host, () => resolve());
  });
  const address = server.server.address();
  const port = typeof address === 'object' && address ? address.port : options.port;
  return {
    port,
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}
