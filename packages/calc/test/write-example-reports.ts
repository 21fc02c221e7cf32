/**
 * Writes test/fixtures/example-reports.json: the report of every example of
 * the methods listed in FIXTURE_KINDS, as the engine produces it now. The
 * fixture test (src/engine.test.ts) compares against it, so a speed-up or a
 * refactor cannot change a report unnoticed. Regenerate deliberately, after a
 * reviewed change of report content: `pnpm exec tsx test/write-example-reports.ts`.
 */
import { writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { METHODS, screen } from '../src/index';
import { EXTRA_CASES, FIXTURE_KINDS, TEMPERATURE_CASES } from './example-reports';

const reports: Record<string, unknown> = {};
for (const method of METHODS) {
  if (!FIXTURE_KINDS.includes(method.kind)) continue;
  method.examples.forEach((example, index) => {
    reports[`${method.kind}#${index}`] = screen(example.input);
  });
}
for (const [key, input] of Object.entries({ ...EXTRA_CASES, ...TEMPERATURE_CASES }))
  reports[key] = screen(input);
const target = fileURLToPath(new URL('./fixtures/example-reports.json', import.meta.url));
writeFileSync(target, `${JSON.stringify(reports, null, 2)}\n`);
console.log(`wrote ${Object.keys(reports).length} reports to ${target}`);
