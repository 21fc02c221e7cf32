import { describe, expect, it } from 'vitest';
import { checkValue, relativeError } from '../../test/check-values';
import { issuesOf } from '../../test/report-checks';
import type { Report } from '../core/report';
import { screen } from '../screen';
import { roomTemperatureContext } from '../core/temperature';
import {
  MATERIALS,
  codeAllowableStress,
  customMaterialSchema,
  findMaterial,
  isCodeMaterial,
  materialCautions,
  resolveMaterial,
  type Material,
} from './materials';

/** Room temperature, none given: how a material resolves in a component without a design temperature. */
const AT_ROOM = { temperature: roomTemperatureContext() };

function builtIn(id: string): Material {
  const m = findMaterial(id);
  if (!m) throw new Error(`no material ${id}`);
  return m;
}

function stepOf(report: Report, id: string) {
  const found = report.steps.find((s) => s.id === id);
  if (!found) throw new Error(`no step ${id}`);
  return found;
}

/** A clamped 500 mm plate at full vacuum: the simplest report that states the allowable stress. */
function plateOf(material: unknown, extra: Record<string, unknown> = {}): Report {
  return screen({
    kind: 'circular-plate',
    diameter: '500 mm',
    thickness: '20 mm',
    edge: 'clamped',
    material,
    loadCases: [{ name: 'Full vacuum', internal: 'full vacuum' }],
    ...extra,
  });
}

describe('the allowable stress basis is the code’s', () => {
  it('ASME VIII-1 basis: the room-temperature allowables of ASME II-D Tables 1A/1B (asme_iid_allowable_room_temperature; table read from memory)', () => {
    const cv = checkValue('asme_iid_allowable_room_temperature');
    for (const [id, expected] of Object.entries(cv.expected)) {
      const material = id.replace(/_Pa$/, '');
      const report = plateOf(material);
      const S = stepOf(report, 'allowable-stress').value!;
      expect(relativeError(S, expected), material).toBeLessThan(cv.tolerance_rel);
      // Never more than half a per cent above the table: the engine is not the flattering one.
      expect(S, material).toBeLessThanOrEqual(expected * 1.005);
    }
  });

  it('names the governing term: tensile for SA-516-70 and 6061-T6, yield for 304 and 316L', () => {
    const governs = (id: string) => codeAllowableStress(builtIn(id), 'asme-viii-1')!.governing.name;
    expect(governs('carbon-steel')).toBe('tensile');
    expect(governs('aluminium-6061-t6')).toBe('tensile');
    expect(governs('aluminium-6061-t6-welded')).toBe('tensile');
    expect(governs('stainless-304')).toBe('yield');
    expect(governs('stainless-316l')).toBe('yield');
    const step = stepOf(plateOf('carbon-steel'), 'allowable-stress');
    expect(step.label).toBe('Allowable stress S, ASME VIII-1 basis: the tensile term governs');
    expect(step.expression).toBe('S = min(S_T/3.5, 2/3·S_Y)');
    expect(step.source).toMatch(/^ASME BPVC Section II Part D, Mandatory Appendix 1, 1-100/);
    expect(step.source).toContain('the ASME VIII-1 basis is the default');
  });

  it('EN 13445-3 basis on request: f = min(R_p0.2/1.5, R_m/2.4), the yield term governing here (en13445_nominal_design_stress; from memory)', () => {
    const cv = checkValue('en13445_nominal_design_stress');
    for (const [id, expected] of Object.entries(cv.expected)) {
      const material = id.replace(/_Pa$/, '');
      const report = plateOf(material, { designBasis: { allowableStress: 'en-13445-3' } });
      const step = stepOf(report, 'allowable-stress');
      expect(relativeError(step.value!, expected), material).toBeLessThan(cv.tolerance_rel);
      expect(step.label).toBe('Allowable stress S, EN 13445-3 basis: the yield term governs');
      expect(step.source).toMatch(/^EN 13445-3 clause 6.2/);
      expect(step.source).toContain('the EN 13445-3 basis is the project’s choice');
      expect(report.designBasis.allowableStress).toBe('en-13445-3');
    }
    // Austenitic steels may use more by EN 13445-3 (clause 6.4): not taken, and the trail says so.
    const austenitic = plateOf('stainless-304', { designBasis: { allowableStress: 'en-13445-3' } });
    expect(stepOf(austenitic, 'allowable-stress').source).toContain('not taken here: conservative');
  });

  it('6061-T6 on the ASME basis is less than half of yield/1.5 on the typical 276 MPa (issue 10)', () => {
    const S = codeAllowableStress(builtIn('aluminium-6061-t6'), 'asme-viii-1')!.value;
    // 276 MPa is the Aluminum Association typical yield (Hoopline method notes §j).
    expect(S).toBeLessThan(276e6 / 1.5 / 2);
    // As welded the heat-affected zone is annealed: far lower still.
    const welded = codeAllowableStress(builtIn('aluminium-6061-t6-welded'), 'asme-viii-1')!.value;
    expect(welded).toBeLessThan(0.6 * S);
  });

  it('brittle, polymer and design-value materials are outside the codes’ bases: their own factor stands in, and the trail says so', () => {
    for (const id of ['cast-acrylic', 'polycarbonate', 'borosilicate-3.3']) {
      const m = builtIn(id);
      expect(isCodeMaterial(m)).toBe(false);
      expect(codeAllowableStress(m, 'asme-viii-1')).toBeNull();
      const step = stepOf(plateOf(id), 'allowable-stress');
      expect(step.value).toBeCloseTo(m.strength / m.designFactor, 0);
      expect(step.expression).toMatch(/\/n_s$/);
      expect(step.source).toContain('outside the codes’ allowable-stress bases');
    }
  });

  it('a value or a factor entered above the code basis is a caution; an allowable stress entered wins', () => {
    const given = plateOf('carbon-steel', { allowableStress: '173 MPa' });
    expect(stepOf(given, 'allowable-stress').value).toBe(173e6);
    expect(given.warnings.find((w) => w.code === 'allowable-above-code-basis')?.severity).toBe(
      'caution',
    );
    const factor = plateOf('carbon-steel', { designFactor: 1.5 });
    expect(stepOf(factor, 'allowable-stress').value).toBeCloseTo(260e6 / 1.5, 0);
    expect(factor.warnings.map((w) => w.code)).toContain('allowable-above-code-basis');
    // Below the basis: no caution.
    const lower = plateOf('carbon-steel', { allowableStress: '100 MPa' });
    expect(lower.warnings.map((w) => w.code)).not.toContain('allowable-above-code-basis');
  });

  it('a metal without its tensile strength takes the yield term alone, and a caution says the other may govern', () => {
    const report = plateOf({
      name: 'Plate, yield only',
      elasticModulus: '200 GPa',
      poissonRatio: 0.3,
      strength: '260 MPa',
    });
    const step = stepOf(report, 'allowable-stress');
    expect(step.expression).toBe('S = 2/3·S_Y');
    expect(step.label).toContain('yield term only');
    expect(report.warnings.find((w) => w.code === 'allowable-term-missing')?.severity).toBe(
      'caution',
    );
  });
});

describe('material values on a stated basis', () => {
  it('built-in metals carry specified minimum strengths, each named by its standard', () => {
    for (const m of MATERIALS.filter(isCodeMaterial)) {
      expect(m.valueBasis.strength, m.id).toBe('specified minimum');
      expect(m.valueBasis.ultimateStrength, m.id).toBe('specified minimum');
      expect(m.sources.strength, m.id).toMatch(/minimum/);
      expect(m.sources.ultimateStrength, m.id).toMatch(/minimum/);
      expect(`${m.sources.strength} ${m.sources.ultimateStrength}`, m.id).toMatch(
        /ASTM|ASME|Aluminum Design Manual|AWS/,
      );
      expect(m.ultimateStrength, m.id).not.toBeNull();
    }
    // ASTM A240 minimums, CASTI table (Hoopline method notes §j, confirmed): 205/515 MPa and 170 MPa.
    expect(builtIn('stainless-304').strength).toBe(205e6);
    expect(builtIn('stainless-304').ultimateStrength).toBe(515e6);
    expect(builtIn('stainless-316l').strength).toBe(170e6);
  });

  it('6061-T6 is on its ASTM B209 minimum, below the typical values; welded on its as-welded minimum', () => {
    const plain = builtIn('aluminium-6061-t6');
    // Aluminum Association typical 276/310 MPa (Hoopline method notes §j, confirmed) are above the minimums.
    expect(plain.strength).toBeLessThan(276e6);
    expect(plain.ultimateStrength!).toBeLessThan(310e6);
    const welded = builtIn('aluminium-6061-t6-welded');
    expect(welded.sources.strength).toMatch(/as-welded/);
    // MMPDS-01's welded F_ty about 20 ksi (138 MPa, as quoted; §j): the value taken is not above it.
    expect(welded.strength).toBeLessThanOrEqual(138e6);
  });

  it('the trail says of every material value whether it is a minimum or typical', () => {
    const report = plateOf('carbon-steel');
    expect(stepOf(report, 'elastic-modulus').label).toContain('(typical)');
    expect(stepOf(report, 'yield-strength').label).toContain('(specified minimum)');
    expect(stepOf(report, 'tensile-strength').label).toContain('(specified minimum)');
    const acrylic = plateOf('cast-acrylic');
    expect(stepOf(acrylic, 'tensile-strength').label).toBe(
      'Short-term tensile strength S_T (typical)',
    );
    const glass = plateOf('borosilicate-3.3');
    expect(stepOf(glass, 'design-strength').label).toContain('(design value)');
  });

  it('non-metals take the low end of the typical range read (the conservative end)', () => {
    // US Plastic and designerdata.nl cast PMMA: E 2.8–3.3 GPa, tensile 69–75 MPa (§j).
    expect(builtIn('cast-acrylic').elasticModulus).toBe(2.8e9);
    expect(builtIn('cast-acrylic').strength).toBe(69e6);
    // SABIC / Trident: 2.3 GPa, 60–62 MPa; glass 63–64 GPa (§j).
    expect(builtIn('polycarbonate').strength).toBe(60e6);
    expect(builtIn('borosilicate-3.3').elasticModulus).toBe(63e9);
  });
});

describe('custom materials', () => {
  const base = { name: 'Mine', elasticModulus: '200 GPa', poissonRatio: 0.3, strength: '300 MPa' };

  it('the default factor follows the strength basis: tensile 3.5, yield 1.5, a design value 1', () => {
    const resolve = (extra: Record<string, unknown>) =>
      resolveMaterial(customMaterialSchema.parse({ ...base, ...extra }), AT_ROOM);
    expect(resolve({ strengthBasis: 'tensile' }).designFactor).toBe(3.5);
    expect(resolve({ strengthBasis: 'yield' }).designFactor).toBe(1.5);
    expect(resolve({}).designFactor).toBe(1.5);
    expect(resolve({ strengthBasis: 'design-value' }).designFactor).toBe(1);
    // A ductile custom metal on tensile strength: S = S_T/3.5 (the ASME tensile term).
    const tensile = plateOf({ ...base, strengthBasis: 'tensile' });
    expect(stepOf(tensile, 'allowable-stress').value).toBeCloseTo(300e6 / 3.5, 0);
    // A design value is taken as it stands, and the least conservative default is said as a caution.
    const design = plateOf({ ...base, strengthBasis: 'design-value' });
    expect(stepOf(design, 'allowable-stress').value).toBe(300e6);
    expect(design.warnings.find((w) => w.code === 'design-value-factor-default')?.severity).toBe(
      'caution',
    );
  });

  it('a brittle or polymer material on a short-term strength defaults to 10, not to a metal’s factor', () => {
    const glassy = plateOf({ ...base, strength: '50 MPa', brittle: true });
    expect(stepOf(glassy, 'allowable-stress').value).toBeCloseTo(5e6, 0);
    const polymer = plateOf({
      ...base,
      elasticModulus: '2 GPa',
      strength: '40 MPa',
      polymer: true,
    });
    expect(stepOf(polymer, 'allowable-stress').value).toBeCloseTo(4e6, 0);
  });

  it('a brittle custom material gets the brittle caution, not the polymer one; the polymer flag decides creep', () => {
    const glass = resolveMaterial(
      { ...base, elasticModulus: 70e9, strength: 40e6, brittle: true },
      AT_ROOM,
    );
    expect(materialCautions(glass)).toEqual(['brittle-material']);
    const polymer = resolveMaterial(
      {
        ...base,
        elasticModulus: 2e9,
        strength: 40e6,
        polymer: true,
      },
      AT_ROOM,
    );
    expect(materialCautions(polymer)).toEqual(['polymer-creep']);
    // Built-ins: acrylic and polycarbonate are polymers, glass is not.
    expect(materialCautions(builtIn('cast-acrylic'))).toEqual([
      'brittle-material',
      'polymer-creep',
    ]);
    expect(materialCautions(builtIn('borosilicate-3.3'))).toEqual(['brittle-material']);
    expect(materialCautions(builtIn('carbon-steel'))).toEqual([]);
  });

  it('refuses a long-term modulus on a non-polymer, above E, and an ultimate strength below yield', () => {
    const plate = (material: Record<string, unknown>) => ({
      kind: 'circular-plate',
      diameter: 0.5,
      thickness: 0.02,
      edge: 'clamped',
      material,
      loadCases: [{ name: 'v', internal: 'full vacuum' }],
    });
    expect(issuesOf(plate({ ...base, longTermModulus: '1 GPa' }))).toEqual([
      {
        path: 'material.longTermModulus',
        message: 'applies to polymers only: set "polymer": true',
      },
    ]);
    expect(
      issuesOf(
        plate({ ...base, elasticModulus: '2 GPa', polymer: true, longTermModulus: '3 GPa' }),
      ),
    ).toEqual([
      {
        path: 'material.longTermModulus',
        message:
          'must not exceed the elastic modulus: a polymer’s modulus falls under sustained load',
      },
    ]);
    expect(issuesOf(plate({ ...base, ultimateStrength: '200 MPa' }))).toEqual([
      { path: 'material.ultimateStrength', message: 'must be at least the yield strength' },
    ]);
  });
});
