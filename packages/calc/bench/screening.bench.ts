/**
 * Speed of the engine: one full screening of every example of every method,
 * its parse / compute split, and a 200-point thickness sweep per method that
 * has one. Prints median and mean. Run: `pnpm --filter @hoopline/calc bench`.
 *
 * Targets (DEVELOPERS.md: speed is measured here, never asserted in tests):
 * a screening well under 50 µs, a 200-point sweep under 5 ms.
 */
import { Bench, type Task } from 'tinybench';
import { METHODS, computeReport, parseComponent, screen, sweepThickness } from '../src/index';

const SCREEN_TARGET_US = 50;
const SWEEP_TARGET_MS = 5;

interface Row {
  readonly name: string;
  readonly group: 'screen' | 'part' | 'sweep';
}

const rows = new Map<string, Row>();
const bench = new Bench({ time: 1000, warmupTime: 250 });
const add = (name: string, group: Row['group'], fn: () => void) => {
  rows.set(name, { name, group });
  bench.add(name, fn);
};

for (const method of METHODS) {
  method.examples.forEach((example, index) => {
    const label = `${method.kind} #${index}`;
    const input = example.input as unknown;
    add(`screen ${label}`, 'screen', () => void screen(input));
    const parsed = parseComponent(input);
    add(`  parse ${label}`, 'part', () => void parseComponent(input));
    add(`  compute+assemble ${label}`, 'part', () => void computeReport(parsed));
  });
  const first = method.examples[0];
  if (method.sweep && first) {
    add(
      `sweep 200 points ${method.kind} #0`,
      'sweep',
      () => void sweepThickness(first.input, { points: 200 }),
    );
  }
}

await bench.run();

function stats(task: Task): { median: number; mean: number; samples: number } | null {
  const result = task.result;
  if (result.state !== 'completed') return null;
  return {
    median: result.latency.p50,
    mean: result.latency.mean,
    samples: result.latency.samplesCount,
  };
}

const lines: string[] = [];
let worstScreen = 0;
let worstSweep = 0;
for (const task of bench.tasks) {
  const row = rows.get(task.name)!;
  const s = stats(task);
  if (!s) {
    lines.push(`${task.name.padEnd(46)} did not complete (${task.result.state})`);
    continue;
  }
  const inMs = row.group === 'sweep';
  const unit = inMs ? 'ms' : 'µs';
  const scale = inMs ? 1 : 1000; // tinybench reports milliseconds
  const median = s.median * scale;
  const mean = s.mean * scale;
  if (row.group === 'screen') worstScreen = Math.max(worstScreen, median);
  if (row.group === 'sweep') worstSweep = Math.max(worstSweep, median);
  lines.push(
    `${task.name.padEnd(46)} median ${median.toFixed(inMs ? 3 : 1).padStart(8)} ${unit}   mean ${mean
      .toFixed(inMs ? 3 : 1)
      .padStart(8)} ${unit}   (${s.samples} samples)`,
  );
}
console.log(lines.join('\n'));
console.log('');
console.log(
  `slowest screening (median): ${worstScreen.toFixed(1)} µs — target under ${SCREEN_TARGET_US} µs: ${
    worstScreen < SCREEN_TARGET_US ? 'met' : 'NOT met'
  }`,
);
if (worstSweep > 0) {
  console.log(
    `slowest 200-point sweep (median): ${worstSweep.toFixed(2)} ms — target under ${SWEEP_TARGET_MS} ms: ${
      worstSweep < SWEEP_TARGET_MS ? 'met' : 'NOT met'
    }`,
  );
}
