/** Entry point of bin/hoopline-calc.js: runs the CLI on this process. */
import { readFileSync } from 'node:fs';
import { runCli } from './run';

process.exitCode = runCli(process.argv.slice(2), {
  stdout: (text) => process.stdout.write(text),
  stderr: (text) => process.stderr.write(text),
  readFile: (path) => readFileSync(path, 'utf8'),
  readStdin: () => (process.stdin.isTTY ? null : readFileSync(0, 'utf8')),
  cwd: process.cwd(),
  env: process.env,
});
