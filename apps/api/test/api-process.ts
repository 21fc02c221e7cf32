import { spawn, type ChildProcess } from 'node:child_process';
import path from 'node:path';
import request from 'supertest';
import { freePort } from './throwaway-cluster';

const API_ROOT = path.resolve(import.meta.dirname, '..');
const sleep = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

/**
 * The API as a real child process (`node --import tsx src/main.ts`, as the
 * start command runs it), for tests that kill it: SIGKILL leaves what a
 * crash or an out-of-memory kill leaves.
 */
export interface ApiProcess {
  readonly url: string;
  readonly child: ChildProcess;
  /** What it wrote to stdout and stderr (its log). */
  output(): string;
  kill(signal?: NodeJS.Signals): Promise<void>;
}

export async function startApiProcess(environment: Record<string, string>): Promise<ApiProcess> {
  const port = await freePort();
  const child = spawn(process.execPath, ['--import', 'tsx', 'src/main.ts'], {
    cwd: API_ROOT,
    env: {
      PATH: process.env['PATH'] ?? '',
      NODE_ENV: 'test',
      HOOPLINE_HOST: '127.0.0.1',
      HOOPLINE_PORT: String(port),
      HOOPLINE_LOG_LEVEL: 'info',
      ...environment,
    },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  let log = '';
  child.stdout?.on('data', (chunk: Buffer) => (log += chunk.toString()));
  child.stderr?.on('data', (chunk: Buffer) => (log += chunk.toString()));
  const exited = new Promise<void>((resolve) => child.once('exit', () => resolve()));
  const url = `http://127.0.0.1:${port}`;
  for (let waited = 0; ; waited += 100) {
    if (child.exitCode !== null) throw new Error(`the API exited at start:\n${log}`);
    const ok = await request(url)
      .get('/api/health')
      .timeout(2000)
      .then((r) => r.status === 200)
      .catch(() => false);
    if (ok) break;
    if (waited > 60_000) {
      child.kill('SIGKILL');
      throw new Error(`the API did not answer /api/health in 60 s:\n${log}`);
    }
    await sleep(100);
  }
  return {
    url,
    child,
    output: () => log,
    kill: async (signal = 'SIGKILL') => {
      if (child.exitCode === null && child.signalCode === null) child.kill(signal);
      await exited;
    },
  };
}
