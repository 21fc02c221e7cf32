import fc from 'fast-check';
import Qty from 'js-quantities';
import { unit as mathUnit } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { checkValue, relativeError } from '../../test/check-values';
import { UNITS, UnitError, convert, findUnit, fromSi, toSi, unitsOf } from './units';

const NIST = 'NIST SP 811 (2008) App. B.8/B.9';

/** Pa per unit as a check value states it. */
function expectedPa(id: string, key = 'pressure_Pa'): { value: number; tolerance: number } {
  const cv = checkValue(id);
  return { value: cv.expected[key]!, tolerance: cv.tolerance_rel };
}

describe(`pressure factors against the published check values (${NIST})`, () => {
  const cases: Array<[id: string, unit: string, source: string]> = [
    ['unit_psi_to_Pa', 'psi', NIST],
    ['unit_torr_to_Pa', 'torr', NIST],
    ['unit_mmHg_to_Pa', 'mmHg', NIST],
    ['unit_inHg_to_Pa', 'inHg', NIST],
    ['unit_inH2O_4C_to_Pa', 'inH2O_4C', `${NIST}, inch of water (39.2 °F)`],
    ['unit_inH2O_60F_to_Pa', 'inH2O_60F', `${NIST}, inch of water (60 °F)`],
    ['unit_inH2O_conventional_to_Pa', 'inH2O', `${NIST}, inch of water, conventional`],
    ['unit_mmH2O_to_Pa', 'mmH2O', `${NIST}, millimetre of water, conventional`],
    ['unit_atm_to_Pa', 'atm', `${NIST} (exact)`],
    [
      'unit_inH2O_68F_to_Pa',
      'inH2O_68F',
      'computed from ρ_water(20 °C) = 998.2067 kg/m³ (from memory) × g0 × 0.0254 m; not in SP 811',
    ],
  ];
  it.each(cases)('%s: 1 %s (%s)', (id, unit) => {
    const { value, tolerance } = expectedPa(id);
    expect(relativeError(toSi(1, unit), value)).toBeLessThanOrEqual(tolerance);
  });

  it(`unit_kgf_cm2_and_lbf: 1 kgf/cm² = 98 066.5 Pa, 1 kgf = 9.80665 N, 1 lbf = 4.448222 N (${NIST})`, () => {
    const cv = checkValue('unit_kgf_cm2_and_lbf');
    expect(relativeError(toSi(1, 'kgf/cm2'), cv.expected.pressure_Pa!)).toBeLessThanOrEqual(1e-12);
    expect(relativeError(toSi(1, 'kgf'), cv.expected.kgf_N!)).toBeLessThanOrEqual(1e-12);
    expect(relativeError(toSi(1, 'lbf'), cv.expected.lbf_N!)).toBeLessThanOrEqual(cv.tolerance_rel);
  });

  it(`unit_bar_mbar_hPa: bar, millibar exact, hPa by SI prefix (${NIST})`, () => {
    const cv = checkValue('unit_bar_mbar_hPa');
    expect(toSi(1, 'bar')).toBe(cv.expected.bar_Pa);
    expect(toSi(1, 'mbar')).toBe(cv.expected.mbar_Pa);
    expect(toSi(1, 'hPa')).toBe(cv.expected.hPa_Pa);
  });

  it('unit_atm_in_other_units: one atmosphere in torr, psi, inHg, mbar, inH2O (computed from exact definitions)', () => {
    const cv = checkValue('unit_atm_in_other_units');
    const atm = cv.inputs.pressure_Pa as number;
    const pairs: Array<[string, string]> = [
      ['torr', 'torr'],
      ['psi', 'psi'],
      ['inHg_conv', 'inHg'],
      ['mbar', 'mbar'],
      ['inH2O_conv', 'inH2O'],
    ];
    for (const [key, unit] of pairs) {
      expect(relativeError(fromSi(atm, unit), cv.expected[key]!)).toBeLessThanOrEqual(
        cv.tolerance_rel,
      );
    }
  });

  it('exact definitions hold to the last digit where SP 811 prints a rounded factor', () => {
    // psi from the exact pound (0.453 592 37 kg), g0 (9.806 65 m/s²) and inch (0.0254 m); torr = atm/760.
    expect(
      relativeError(
        toSi(1, 'psi'),
        checkValue('unit_psi_to_Pa').computed_check!.exact_definition_Pa!,
      ),
    ).toBeLessThan(1e-15);
    expect(relativeError(toSi(1, 'torr'), 101325 / 760)).toBeLessThan(1e-15);
    expect(
      relativeError(
        toSi(1, 'lbf'),
        checkValue('unit_kgf_cm2_and_lbf').computed_check!.lbf_exact_N!,
      ),
    ).toBeLessThan(1e-15);
  });
});

/**
 * Cross-check against general-purpose units libraries from the npm registry:
 * mathjs 15.2.0 for most units, js-quantities 1.8.0 for inHg and inH2O, which
 * mathjs does not define. Where a library uses another definition or rounds
 * its factor, the tolerance says so.
 */
describe('conversions against mathjs and js-quantities', () => {
  const viaMath = (value: number, from: string, to: string) => mathUnit(value, from).toNumber(to);
  const cases: Array<
    [ours: string, theirs: string, dimensionSi: string, tolerance: number, note: string]
  > = [
    ['Pa', 'Pa', 'Pa', 1e-15, 'mathjs'],
    ['kPa', 'kPa', 'Pa', 1e-15, 'mathjs'],
    ['MPa', 'MPa', 'Pa', 1e-15, 'mathjs'],
    ['bar', 'bar', 'Pa', 1e-15, 'mathjs'],
    ['mbar', 'mbar', 'Pa', 1e-15, 'mathjs'],
    ['hPa', 'hPa', 'Pa', 1e-15, 'mathjs'],
    ['atm', 'atm', 'Pa', 1e-15, 'mathjs'],
    // mathjs psi = 6894.75729276459 Pa, rounded at the 11th digit.
    ['psi', 'psi', 'Pa', 1e-10, 'mathjs (factor rounded at 1e-10)'],
    // mathjs has no ksi: 1 ksi = 1 kip/in², kip rounded to 4448.2216 N there.
    ['ksi', 'kip/in^2', 'Pa', 1e-8, 'mathjs kip/in² (kip rounded at 1e-8)'],
    // mathjs defines torr and mmHg as 133.322 Pa (rounded); ours are atm/760 and 13.5951 g/cm³ × g0.
    ['torr', 'torr', 'Pa', 3e-6, 'mathjs (133.322 Pa, rounded)'],
    ['mmHg', 'mmHg', 'Pa', 3e-6, 'mathjs (133.322 Pa, rounded)'],
    ['mmH2O', 'mmH2O', 'Pa', 1e-15, 'mathjs (conventional, 9.80665 Pa)'],
    // mathjs has no inH2O: the conventional inch of water is 25.4 conventional millimetres of water.
    ['inH2O', '25.4 mmH2O', 'Pa', 1e-15, 'mathjs, 25.4 mmH2O'],
    ['m', 'm', 'm', 1e-15, 'mathjs'],
    ['mm', 'mm', 'm', 1e-15, 'mathjs'],
    ['in', 'in', 'm', 1e-15, 'mathjs'],
    ['ft', 'ft', 'm', 1e-15, 'mathjs'],
    ['N', 'N', 'N', 1e-15, 'mathjs'],
    ['kN', 'kN', 'N', 1e-15, 'mathjs'],
    ['kgf', 'kgf', 'N', 1e-15, 'mathjs'],
    // mathjs has no tonne-force: 1000 kgf.
    ['tf', '1000 kgf', 'N', 1e-15, 'mathjs, 1000 kgf'],
    ['lbf', 'lbf', 'N', 1e-15, 'mathjs'],
    ['kip', 'kip', 'N', 1e-8, 'mathjs (4448.2216 N, rounded)'],
    ['m3', 'm^3', 'm^3', 1e-15, 'mathjs'],
    ['L', 'L', 'm^3', 1e-15, 'mathjs'],
    ['ft3', 'ft^3', 'm^3', 1e-15, 'mathjs'],
    ['J', 'J', 'J', 1e-15, 'mathjs'],
    ['kJ', 'kJ', 'J', 1e-15, 'mathjs'],
    ['mm2', 'mm^2', 'm^2', 1e-15, 'mathjs'],
    ['in2', 'in^2', 'm^2', 1e-15, 'mathjs'],
    ['m4', 'm^4', 'm^4', 1e-15, 'mathjs'],
    ['cm4', 'cm^4', 'm^4', 1e-15, 'mathjs'],
    ['mm4', 'mm^4', 'm^4', 1e-15, 'mathjs'],
    ['in4', 'in^4', 'm^4', 1e-15, 'mathjs'],
  ];
  it.each(cases)('1 %s = 1 %s (%s)', (ours, theirs, si, tolerance) => {
    const expected = theirs.includes(' ') ? mathUnit(theirs).toNumber(si) : viaMath(1, theirs, si);
    expect(relativeError(toSi(1, ours), expected)).toBeLessThanOrEqual(tolerance);
  });

  it('inHg and inH2O against js-quantities (which mathjs lacks)', () => {
    // js-quantities: inHg = 25.4 × its mmHg (= torr, 133.322368 Pa), so it sits 1.5e-7 below the
    // conventional 13.5951 g/cm³ inch of mercury; its inH2O is the 4 °C (39.2 °F) inch of water.
    expect(relativeError(toSi(1, 'inHg'), Qty('1 inHg').to('Pa').scalar)).toBeLessThan(2e-7);
    expect(relativeError(toSi(1, 'inH2O_4C'), Qty('1 inH2O').to('Pa').scalar)).toBeLessThan(1e-6);
    // ...and differs from the conventional inch of water (1000 kg/m³) by 2.8e-5, as SP 811's two entries do.
    expect(relativeError(toSi(1, 'inH2O'), Qty('1 inH2O').to('Pa').scalar)).toBeGreaterThan(2e-5);
    expect(relativeError(toSi(1, 'torr'), Qty('1 torr').to('Pa').scalar)).toBeLessThan(1e-8);
  });

  it('temperatures against mathjs: degC, degF, K', () => {
    for (const t of [-40, 0, 20, 37.5, 100, 500]) {
      expect(convert(t, 'degC', 'K')).toBeCloseTo(viaMath(t, 'degC', 'K'), 10);
      expect(convert(t, 'degF', 'K')).toBeCloseTo(viaMath(t, 'degF', 'K'), 10);
      expect(convert(t, 'degF', 'degC')).toBeCloseTo(viaMath(t, 'degF', 'degC'), 10);
      expect(convert(t, 'K', 'degF')).toBeCloseTo(viaMath(t, 'K', 'degF'), 10);
    }
    // Fixed points, exact by definition (NIST SP 811 B.8): −40 °C = −40 °F, 100 °C = 212 °F.
    expect(convert(-40, 'degC', 'degF')).toBeCloseTo(-40, 12);
    expect(convert(100, 'degC', 'degF')).toBeCloseTo(212, 12);
  });

  it('conversions between units of a dimension, against mathjs', () => {
    expect(relativeError(convert(2, 'bar', 'psi'), viaMath(2, 'bar', 'psi'))).toBeLessThan(1e-10);
    expect(relativeError(convert(3, 'ft', 'mm'), viaMath(3, 'ft', 'mm'))).toBeLessThan(1e-15);
    expect(relativeError(convert(50, 'L', 'ft3'), viaMath(50, 'L', 'ft^3'))).toBeLessThan(1e-14);
    expect(relativeError(convert(1100, 'lbf', 'kN'), viaMath(1100, 'lbf', 'kN'))).toBeLessThan(
      1e-14,
    );
  });
});

describe('round trips (property)', () => {
  // Normal doubles only: a subnormal (below about 2e-308) has too few bits for 1e-12.
  const normal = (x: number) => x === 0 || Math.abs(x) >= 1e-200;
  const value = fc
    .oneof(
      fc.double({ min: -1e100, max: 1e100, noNaN: true }),
      fc.double({ min: -1e-3, max: 1e-3, noNaN: true }),
    )
    .filter(normal);
  it('fromSi(toSi(x)) = x for every unit, to 1e-12 relative', () => {
    fc.assert(
      fc.property(fc.constantFrom(...UNITS), value, (u, x) => {
        const back = fromSi(toSi(x, u), u);
        // An affine scale (°C, °F) carries its offset through SI: compare relative to the
        // offset too, where x is small beside it.
        const scale = Math.max(Math.abs(x), Math.abs(u.offset / u.factor));
        return Math.abs(back - x) <= 1e-12 * scale || back === x;
      }),
      { numRuns: 5000 },
    );
  });

  it('convert(convert(x, a, b), b, a) = x within a dimension, to 1e-12 relative', () => {
    const pair = fc
      .constantFrom(...UNITS)
      .chain((a) => fc.tuple(fc.constant(a), fc.constantFrom(...unitsOf(a.dimension))));
    fc.assert(
      fc.property(
        pair,
        fc.double({ min: -1e50, max: 1e50, noNaN: true }).filter(normal),
        ([a, b], x) => {
          const back = convert(convert(x, a.symbol, b.symbol), b.symbol, a.symbol);
          const scale = Math.max(
            Math.abs(x),
            Math.abs(a.offset / a.factor),
            Math.abs(b.offset / a.factor),
          );
          return Math.abs(back - x) <= 1e-12 * scale || back === x;
        },
      ),
      { numRuns: 5000 },
    );
  });
});

describe('unit lookup', () => {
  it('finds aliases and unambiguous case variants, and refuses what it does not know', () => {
    expect(findUnit('PSI')?.symbol).toBe('psi');
    expect(findUnit('Torr')?.symbol).toBe('torr');
    expect(findUnit('N/mm²')?.symbol).toBe('MPa');
    expect(findUnit('tonne-force')?.symbol).toBe('tf');
    expect(findUnit('parsec')).toBeUndefined();
    expect(() => convert(1, 'bar', 'mm')).toThrow(UnitError);
    expect(() => convert(1, 'bar', 'bogus')).toThrow(/unknown unit "bogus"/);
  });

  it('has exactly one SI unit of factor 1 first in each dimension', () => {
    for (const u of UNITS) {
      const first = unitsOf(u.dimension)[0]!;
      expect(first.factor).toBe(1);
      expect(first.offset).toBe(0);
    }
  });
});
