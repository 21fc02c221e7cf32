import { bench, describe } from 'vitest';
import { screen } from '../../screen';
import { pumpDown, pumpDownCurve } from './pump-down';

// Live recompute as the user types: one screen of each example input.
describe('pump-down: screen()', () => {
  for (const example of pumpDown.examples) {
    bench(example.name, () => {
      screen(example.input);
    });
  }
});

describe('pump-down: pumpDownCurve()', () => {
  const parameters = {
    volume: 1,
    effectiveSpeed: 0.01,
    startPressure: 101_325,
    ultimatePressure: 0.2,
  };
  bench('1001 points', () => {
    pumpDownCurve(parameters, { endTime: 1000, points: 1001 });
  });
});
