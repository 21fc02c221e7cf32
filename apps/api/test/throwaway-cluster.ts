import { execFileSync, spawnSync } from 'node:child_process';
import { chownSync, existsSync, mkdtempSync, readdirSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import os from 'node:os';
import path from 'node:path';

/**
 * A PostgreSQL cluster of one test file's own, in a temporary folder on an
 * ephemeral port, which the test may stop and start as it likes (the fault
 * tests) without touching the shared test cluster other files use at the same
 * time. Needs the server binaries (Debian's postgresql package, which
 * scripts/pg.sh installs). As root, the server runs as the `postgres` OS user.
 */
export interface ThrowawayCluster {
  readonly port: number;
  /** postgres://…/<database> on this cluster. */
  url(database?: string): string;
  start(): void;
  /** `fast` ends sessions cleanly; `immediate` is a crash (recovery at the next start). */
  stop(mode?: 'fast' | 'immediate'): void;
  destroy(): void;
}

function binaries(): string {
  const root = '/usr/lib/postgresql';
  const versions = existsSync(root)
    ? readdirSync(root)
        .filter((v) => existsSync(path.join(root, v, 'bin', 'initdb')))
        .sort((a, b) => Number(a) - Number(b))
    : [];
  const newest = versions.at(-1);
  if (!newest) throw new Error('no PostgreSQL server binaries under /usr/lib/postgresql');
  return path.join(root, newest, 'bin');
}

export async function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const address = server.address();
      const port = typeof address === 'object' && address ? address.port : 0;
      server.close(() => resolve(port));
    });
  });
}

export async function createThrowawayCluster(): Promise<ThrowawayCluster> {
  const bin = binaries();
  const root = process.getuid?.() === 0;
  const folder = mkdtempSync(path.join(os.tmpdir(), 'hoopline-pg-fault-'));
  const data = path.join(folder, 'data');
  const as = (command: string, args: string[]) => {
    const [file, argv] = root
      ? ['runuser', ['-u', 'postgres', '--', command, ...args]]
      : [command, args];
    const result = spawnSync(file, argv, { cwd: '/', encoding: 'utf8' });
    if (result.status !== 0) {
      throw new Error(`${command} ${args.join(' ')} failed:\n${result.stdout}\n${result.stderr}`);
    }
  };
  if (root) chownSync(folder, Number(execFileSync('id', ['-u', 'postgres']).toString().trim()), 0);
  as(path.join(bin, 'initdb'), [
    '-D',
    data,
    '-U',
    'hoopline',
    '--auth=trust',
    '--encoding=UTF8',
    '--locale=C.UTF-8',
  ]);
  const port = await freePort();
  const log = path.join(folder, 'server.log');
  const options = `-p ${port} -c listen_addresses=127.0.0.1 -c unix_socket_directories= -c fsync=off -c max_connections=60`;
  const cluster: ThrowawayCluster = {
    port,
    url: (database = 'postgres') => `postgres://hoopline@127.0.0.1:${port}/${database}`,
    start: () =>
      as(path.join(bin, 'pg_ctl'), ['-D', data, '-l', log, '-o', options, '-w', 'start']),
    stop: (mode = 'fast') => as(path.join(bin, 'pg_ctl'), ['-D', data, '-m', mode, '-w', 'stop']),
    destroy: () => {
      spawnSync(
        root ? 'runuser' : path.join(bin, 'pg_ctl'),
        root
          ? [
              '-u',
              'postgres',
              '--',
              path.join(bin, 'pg_ctl'),
              '-D',
              data,
              '-m',
              'immediate',
              'stop',
            ]
          : ['-D', data, '-m', 'immediate', 'stop'],
        { cwd: '/' },
      );
      rmSync(folder, { recursive: true, force: true });
    },
  };
  cluster.start();
  return cluster;
}
