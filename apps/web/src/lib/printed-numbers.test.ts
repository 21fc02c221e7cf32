import fc from 'fast-check';
import { UNITS, fromSi, unitsOf } from '@hoopline/calc';
import { formatSignificant, show } from '@hoopline/present';
import { misprint, printedCases } from '@hoopline/present/testing';
import { describe, expect, it } from 'vitest';
import { readQuantity } from '../components/unit-input';

/**
 * The round-trip property of the sheet's numbers, over the web app's own
 * printers: what the screen shows, read back by the engine's quantity
 * parser, is the value to the significant figures shown (issue: the signed
 * sheet printed 1500 Pa as "15 Pa").
 */
describe('numbers the web app prints read back as the values they stand for', () => {
  it('report values in display units (fast-check, 100 000 values from 1e-9 to 1e12, both signs, every unit and system)', () => {
    fc.assert(
      fc.property(printedCases(), ({ value, unit, system }) => {
        expect(misprint(show(value, unit, system), value, unit, 4)).toBeNull();
      }),
      { numRuns: 100_000, seed: 5280 },
    );
  }, 60_000);

  // Every unit a person can type, except the dimensionless "1".
  const typable = UNITS.filter((u) => u.dimension !== 'dimensionless');

  it('the reading line under a quantity field ("= 12.7 mm = 0.0127 m"), for values typed in every unit', () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...typable),
        fc.double({ min: -6, max: 9, noNaN: true }),
        fc.constantFrom('si' as const, 'us' as const),
        (unit, exponent, system) => {
          const typedValue = 10 ** exponent;
          const typed = `${formatSignificant(typedValue, { significant: 8, group: false })} ${unit.symbol}`;
          const reading = readQuantity(typed, unit.dimension, system);
          if (reading.state !== 'ok' || reading.si === null) return;
          // Each side of the reading is the typed value in another unit.
          for (const part of reading.text.split(' = ')) {
            const si = reading.si;
            expect(misprint(part, si, unitsOf(unit.dimension)[0]!.symbol, 4)).toBeNull();
          }
        },
      ),
      { numRuns: 20_000, seed: 17 },
    );
  }, 60_000);

  it('the property can fail: a formatter that drops whole-number zeros is caught', () => {
    const dropsZeros = (value: number) => value.toFixed(0).replace(/\.?0+$/, '');
    expect(misprint(`${dropsZeros(fromSi(1500, 'Pa'))} Pa`, 1500, 'Pa', 4)).not.toBeNull();
  });
});
