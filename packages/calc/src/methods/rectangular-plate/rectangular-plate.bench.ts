import { bench, describe } from 'vitest';
import { computeReport, parseComponent, screen } from '../../screen';
import { rectangularPlate } from './rectangular-plate';

// Target (brief): one screening well under 50 µs. Parsing (zod, unit text) is measured apart.
const door = rectangularPlate.examples[0]!.input;
const parsedDoor = parseComponent(door);

describe('rectangular plate', () => {
  bench('screen(): steel door, 2 cases', () => {
    screen(door);
  });
  bench('computeReport(): steel door, parsed', () => {
    computeReport(parsedDoor);
  });
});
