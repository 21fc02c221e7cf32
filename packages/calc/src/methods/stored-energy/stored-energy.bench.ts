import { bench, describe } from 'vitest';
import { screen } from '../../screen';
import { storedEnergy } from './stored-energy';

// Live recompute as the user types: one screen of each example input.
describe('stored-energy: screen()', () => {
  for (const example of storedEnergy.examples) {
    bench(example.name, () => {
      screen(example.input);
    });
  }
});
