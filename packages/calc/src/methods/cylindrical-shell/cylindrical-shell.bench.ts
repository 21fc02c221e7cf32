import { bench, describe } from 'vitest';
import { computeReport, parseComponent, screen } from '../../screen';
import { cylindricalShell } from './cylindrical-shell';
import { vonMisesHydrostatic } from './shell-formulas';

// Target (brief): one screening well under 50 µs. Parsing (zod, unit text) is measured apart.
const vacuumDrum = cylindricalShell.examples[0]!.input;
const withoutRings = { ...vacuumDrum, ringSpacingFor: undefined };
const receiver = cylindricalShell.examples[1]!.input;
const parsedDrum = parseComponent(vacuumDrum);
const parsedWithoutRings = parseComponent(withoutRings);

describe('cylindrical shell', () => {
  bench('screen(): vacuum drum, 2 cases, with ring spacing', () => {
    screen(vacuumDrum);
  });
  bench('screen(): air receiver, 2 internal cases', () => {
    screen(receiver);
  });
  bench('computeReport(): vacuum drum, parsed, with ring spacing', () => {
    computeReport(parsedDrum);
  });
  bench('computeReport(): vacuum drum, parsed, no ring spacing', () => {
    computeReport(parsedWithoutRings);
  });
  bench('vonMisesHydrostatic(): D = 1 m, t = 5 mm, L = 1 m', () => {
    vonMisesHydrostatic(200e9, 0.3, 0.005, 0.5, 1);
  });
});
