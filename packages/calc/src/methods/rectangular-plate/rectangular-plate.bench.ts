import { bench, describe } from 'vitest';
import { computeReport, parseComponent, screen } from '../../screen';
import { sweepThickness } from '../../sweep';
import { clampedSums } from './clamped-superposition-series';
import { levySums } from './simply-supported-levy-series';
import { rectangularPlate } from './rectangular-plate';

// Target (brief): one screening well under 50 µs, a 200-point sweep under 5 ms. Parsing
// (zod, unit text) is measured apart. The clamped series keeps its last solution, so the
// "solved each time" cases alternate between two widths to measure a cold solve.
const door = rectangularPlate.examples[0]!.input;
const parsedDoor = parseComponent(door);
const wall = rectangularPlate.examples[1]!.input;
const wallOther = { ...wall, width: '300.001 mm' };
let flip = false;
let ratio = 1;

describe('rectangular plate', () => {
  bench('screen(): steel door, 2 cases', () => {
    screen(door);
  });
  bench('computeReport(): steel door, parsed', () => {
    computeReport(parsedDoor);
  });
  bench('screen(): clamped wall a/b = 2.67, series solved each time', () => {
    flip = !flip;
    screen(flip ? wall : wallOther);
  });
  bench('sweep 200 points: clamped wall (one solve, then cached)', () => {
    flip = !flip;
    sweepThickness(flip ? wall : wallOther, { points: 200 });
  });
});

describe('plate series alone', () => {
  bench('levySums(), a/b from 1 to 2', () => {
    ratio = ratio >= 2 ? 1 : ratio + 0.001;
    levySums(ratio);
  });
  for (const base of [1, 2.5, 4, 6]) {
    const other = base > 1 ? base - 1e-9 : base + 1e-9; // still solved by the series
    bench(`clampedSums(), a/b = ${base}, solved each time`, () => {
      flip = !flip;
      clampedSums(flip ? base : other);
    });
  }
});
