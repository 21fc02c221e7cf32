import { bench, describe } from 'vitest';
import { screen } from '../../screen';
import { sphereOrHead } from './sphere-or-head';

// Live recompute as the user types: one screen of each example input.
describe('sphere-or-head: screen()', () => {
  for (const example of sphereOrHead.examples) {
    bench(example.name, () => {
      screen(example.input);
    });
  }
});
