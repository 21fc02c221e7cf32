import { describe, expect, it } from 'vitest';
import { checkValue, relativeError } from '../../../test/check-values';
import { screen } from '../../screen';

/**
 * The rectangular plate's allowable stress and cautions (issue 10). Its coefficients
 * are tested in rectangular-plate.test.ts.
 */
const door = {
  kind: 'rectangular-plate',
  width: '600 mm',
  height: '400 mm',
  thickness: '12 mm',
  edge: 'simply-supported',
  material: 'carbon-steel',
  loadCases: [{ name: 'Full vacuum', internal: 'full vacuum' }],
} as const;

function allowable(report: ReturnType<typeof screen>): number {
  return report.steps.find((s) => s.id === 'allowable-stress')!.value!;
}

describe('rectangular plate: the allowable basis is the code’s', () => {
  it('carbon steel and 316L on the ASME II-D room-temperature allowables (asme_iid_allowable_room_temperature; from memory)', () => {
    const cv = checkValue('asme_iid_allowable_room_temperature');
    for (const material of ['carbon-steel', 'stainless-316l'] as const) {
      const report = screen({ ...door, material });
      expect(
        relativeError(allowable(report), cv.expected[`${material}_Pa`]!),
        material,
      ).toBeLessThan(cv.tolerance_rel);
      // The stress check is made against it.
      expect(report.cases[0]!.checks.find((k) => k.id === 'stress')!.capacity).toBe(
        allowable(report),
      );
    }
  });

  it('the project may choose the EN 13445-3 basis (en13445_nominal_design_stress; from memory)', () => {
    const report = screen({ ...door, designBasis: { allowableStress: 'en-13445-3' } });
    expect(
      relativeError(
        allowable(report),
        checkValue('en13445_nominal_design_stress').expected['carbon-steel_Pa']!,
      ),
    ).toBeLessThan(1e-9);
  });

  it('a glass panel under vacuum carries the implosion caution; a steel one does not', () => {
    const glass = screen({ ...door, material: 'borosilicate-3.3', thickness: '20 mm' });
    expect(glass.cautions.map((c) => c.code)).toEqual(
      expect.arrayContaining(['brittle-material', 'implosion']),
    );
    expect(glass.cautions.map((c) => c.code)).not.toContain('polymer-creep');
    expect(screen(door).cautions.map((c) => c.code)).not.toContain('implosion');
  });
});
