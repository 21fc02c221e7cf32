import { describe, expect, it } from 'vitest';
import { checkValue, relativeError } from '../../../test/check-values';
import { issuesOf, textProblems } from '../../../test/report-checks';
import { zoneMetal, type Section } from '../../../test/reinforcement-zone';
import type { CaseReport, Report } from '../../core/report';
import { screen } from '../../screen';
import { opening, type OpeningInput } from './opening';
import { sizePad } from './opening-areas';

/**
 * The opening method against outside sources:
 * - the areas against an independent reckoning of the reinforcement zone by
 *   plane geometry (test/reinforcement-zone.ts: polygons clipped to the zone
 *   and measured), which knows nothing of UG-37's closed forms;
 * - the required thicknesses against the UG-27/UG-32 check values
 *   (test/check-values.json, a handbook's reproduction of the code table);
 * - under external pressure, against the engine's own cylindrical-shell and
 *   sphere-or-head screenings at the thickness found (they are tested
 *   against Roark, Huston & Josephs and the rest in their own folders);
 * - the allowable stresses and f_r against ASME II-D table values (from memory);
 * - the clauses of UG-36, UG-37 and UG-40, which are from memory: no copy of
 *   the code was read, and no published worked example with its numbers is
 *   used (none was at hand whose figures could be trusted).
 */

const SA106B = {
  name: 'SA-106 Gr B seamless pipe',
  elasticModulus: '200 GPa',
  poissonRatio: 0.3,
  strength: '240 MPa',
  strengthBasis: 'yield' as const,
  ultimateStrength: '415 MPa',
};

function port(overrides: Partial<OpeningInput> = {}): OpeningInput {
  return {
    kind: 'opening',
    shell: {
      shape: 'cylinder',
      diameter: '1000 mm',
      diameterBasis: 'inside',
      thickness: '10 mm',
      material: 'carbon-steel',
    },
    nozzle: {
      outsideDiameter: '219.1 mm',
      thickness: '8.18 mm',
      projection: '200 mm',
      material: 'carbon-steel',
    },
    loadCases: [{ name: 'Design', internal: '15 bar(g)' }],
    ...overrides,
  } as OpeningInput;
}

function step(report: Report, id: string, caseIndex?: number): number {
  const steps = caseIndex === undefined ? report.steps : report.cases[caseIndex]!.steps;
  const found = steps.find((s) => s.id === id);
  if (found?.value === null || found === undefined) throw new Error(`no step value ${id}`);
  return found.value;
}

function output(c: CaseReport | undefined, id: string): number {
  const found = c?.outputs.find((o) => o.id === id);
  if (!found) throw new Error(`no output ${id}`);
  return found.value;
}

/** The warnings of one load case (the report carries them with the case's name). */
function caseWarnings(report: Report, caseIndex = 0) {
  const name = report.cases[caseIndex]!.loadCase.name;
  return report.warnings.filter((w) => w.loadCase === name);
}

function check(c: CaseReport | undefined, id: string) {
  const found = c?.checks.find((k) => k.id === id);
  if (!found) throw new Error(`no check ${id}`);
  return found;
}

/** The section of a report's opening, for the geometric reckoning (dimensions from the report's geometry steps). */
function sectionOf(
  report: Report,
  input: OpeningInput,
): { section: Section; zoneLimits: { X: number; ho: number; hi: number } } {
  const r = step(report, 'opening-radius');
  const t = step(report, 'shell-thickness-corroded');
  const tn = step(report, 'nozzle-thickness-corroded');
  const Lp = step(report, 'nozzle-projection');
  const inward = report.steps.some((s) => s.id === 'inward-projection-corroded')
    ? {
        length: step(report, 'inward-projection-corroded'),
        wall: step(report, 'inward-wall-corroded'),
      }
    : null;
  const pad = (report.inputs as { pad?: { outsideDiameter: number; thickness: number } }).pad;
  const welds = (report.inputs as { nozzle: { weldLeg: number; inwardWeldLeg: number } }).nozzle;
  const padWeld = (report.inputs as { pad?: { weldLeg: number } }).pad?.weldLeg ?? 0;
  const inwardWeldLeg = report.steps.some((s) => s.id === 'inward-weld-leg-corroded')
    ? step(report, 'inward-weld-leg-corroded')
    : welds.inwardWeldLeg;
  const fr1 = step(report, 'fr1');
  const fr2 = step(report, 'fr2');
  const fr3 = step(report, 'fr3');
  const fr4 = step(report, 'fr4');
  const e1 = step(report, 'e1');
  const te = pad?.thickness ?? 0;
  // UG-40(b), (c) (from memory): parallel, the larger of d and R_n + t_n + t; normal, the smaller of
  // 2.5·t and 2.5·t_n + t_e outward (and no further than the nozzle goes), of h, 2.5·t and 2.5·t_i inward.
  const zoneLimits = {
    X: Math.max(2 * r, r + tn + t),
    ho: Math.min(2.5 * t, 2.5 * tn + te, Lp),
    hi: inward ? Math.min(inward.length, 2.5 * t, 2.5 * inward.wall) : 0,
  };
  const setIn = (input.nozzle as { attachment?: string }).attachment !== 'set-on';
  return {
    section: {
      boreRadius: r,
      shellThickness: t,
      nozzleWall: tn,
      outwardProjection: Lp,
      setIn,
      inward,
      pad: pad ? { radius: pad.outsideDiameter / 2, thickness: pad.thickness } : null,
      welds: { outward: welds.weldLeg, pad: padWeld, inward: inwardWeldLeg },
      weights: {
        // E1 multiplies the whole band in UG-37's A1, the nozzle's part of it as well.
        shell: e1,
        nozzleInBand: e1 * fr1,
        nozzle: fr2,
        pad: fr4,
        outwardWeld: fr3,
        padWeld: fr4,
        inwardWeld: fr2,
      },
    },
    zoneLimits,
  };
}

/**
 * The balance of the zone by geometry: weighted metal within it, less what
 * pressure needs there (F·t_r over the zone's width in the shell, t_rn over
 * the outward limit in each nozzle wall, at the nozzle's weight).
 */
function geometricBalance(report: Report, input: OpeningInput, caseIndex = 0) {
  const { section, zoneLimits } = sectionOf(report, input);
  const metal = zoneMetal(section, {
    halfWidth: zoneLimits.X,
    above: zoneLimits.ho,
    below: zoneLimits.hi,
  });
  const tr = step(report, 'shell-required-thickness', caseIndex);
  const trn = step(report, 'nozzle-required-thickness', caseIndex);
  const F = step(report, 'correction-factor-f');
  const needed = 2 * zoneLimits.X * F * tr + 2 * zoneLimits.ho * trn * section.weights.nozzle;
  return { metal, needed, zoneLimits, section };
}

const bothWaysInput = port({
  shell: {
    shape: 'cylinder',
    diameter: '1000 mm',
    diameterBasis: 'inside',
    thickness: '10 mm',
    material: 'carbon-steel',
    corrosionAllowance: '1 mm',
  },
  nozzle: {
    outsideDiameter: '219.1 mm',
    thickness: '8.18 mm',
    projection: '200 mm',
    inwardProjection: '30 mm',
    material: SA106B,
    corrosionAllowance: '1 mm',
    weldLeg: '6 mm',
    inwardWeldLeg: '6 mm',
  },
  pad: { outsideDiameter: '360 mm', thickness: '10 mm', weldLeg: '8 mm' },
});

describe('UG-37 areas against the geometry of the reinforcement zone (independent reckoning)', () => {
  it('a set-in nozzle projecting inside, weaker than the shell, with a pad and three fillets', () => {
    const report = screen(bothWaysInput);
    const g = geometricBalance(report, bothWaysInput);
    // The limits as UG-40 defines them (from memory).
    expect(step(report, 'limit-parallel')).toBeCloseTo(g.zoneLimits.X, 12);
    expect(step(report, 'limit-normal-outward')).toBeCloseTo(g.zoneLimits.ho, 12);
    expect(step(report, 'limit-normal-inward')).toBeCloseTo(g.zoneLimits.hi, 12);
    // Part by part (the nozzle is weaker: f_r < 1 everywhere it counts).
    expect(step(report, 'fr2')).toBeLessThan(1);
    expect(relativeError(step(report, 'a5', 0), g.metal.pad)).toBeLessThan(1e-12);
    expect(relativeError(step(report, 'a41', 0), g.metal.outwardWeld)).toBeLessThan(1e-12);
    expect(relativeError(step(report, 'a42', 0), g.metal.padWeld)).toBeLessThan(1e-12);
    expect(relativeError(step(report, 'a43', 0), g.metal.inwardWeld)).toBeLessThan(1e-12);
    expect(relativeError(step(report, 'a3', 0), g.metal.nozzleInside)).toBeLessThan(1e-12);
    const trn = step(report, 'nozzle-required-thickness', 0);
    const fr2 = step(report, 'fr2');
    expect(
      relativeError(step(report, 'a2', 0), g.metal.nozzleOutside - 2 * g.zoneLimits.ho * trn * fr2),
    ).toBeLessThan(1e-12);
    // A1 and A together: the shell band's metal less F·t_r over the zone's whole width.
    const tr = step(report, 'shell-required-thickness', 0);
    expect(
      relativeError(
        step(report, 'a1', 0) - step(report, 'area-required', 0),
        g.metal.shellBand - 2 * g.zoneLimits.X * tr,
      ),
    ).toBeLessThan(1e-12);
    // And the whole: available − required = metal in the zone − metal pressure needs there.
    const total = Object.values(g.metal).reduce((a, b) => a + b, 0);
    expect(
      relativeError(
        output(report.cases[0], 'area-available') - output(report.cases[0], 'area-required'),
        total - g.needed,
      ),
    ).toBeLessThan(1e-12);
  });

  it('a small, thick nozzle: the parallel limit is R_n + t_n + t, not d', () => {
    const input = port({
      shell: {
        shape: 'cylinder',
        diameter: '600 mm',
        diameterBasis: 'inside',
        thickness: '25 mm',
        material: 'carbon-steel',
      },
      nozzle: {
        outsideDiameter: '33.4 mm',
        thickness: '6.35 mm',
        projection: '100 mm',
        material: 'stainless-316l',
        weldLeg: '5 mm',
      },
      loadCases: [{ name: 'Design', internal: '60 bar(g)' }],
    });
    const report = screen(input);
    const g = geometricBalance(report, input);
    const d = 2 * step(report, 'opening-radius');
    expect(g.zoneLimits.X).toBeGreaterThan(d);
    expect(step(report, 'a1', 0)).toBe(step(report, 'a1-by-walls', 0));
    const total = Object.values(g.metal).reduce((a, b) => a + b, 0);
    expect(
      relativeError(
        output(report.cases[0], 'area-available') - output(report.cases[0], 'area-required'),
        total - g.needed,
      ),
    ).toBeLessThan(1e-12);
  });

  it('a pad wider than the parallel limits and thicker than the outward limit counts only within them', () => {
    const input = port({
      shell: {
        shape: 'cylinder',
        diameter: '1000 mm',
        diameterBasis: 'inside',
        thickness: '6 mm',
        material: 'carbon-steel',
      },
      nozzle: {
        outsideDiameter: '114.3 mm',
        thickness: '3 mm',
        projection: '150 mm',
        material: 'carbon-steel',
      },
      pad: { outsideDiameter: '400 mm', thickness: '20 mm' },
      loadCases: [{ name: 'Design', internal: '8 bar(g)' }],
    });
    const report = screen(input);
    const g = geometricBalance(report, input);
    expect(2 * g.zoneLimits.X).toBeLessThan(0.4);
    expect(g.zoneLimits.ho).toBeLessThan(0.02);
    expect(relativeError(step(report, 'a5', 0), g.metal.pad)).toBeLessThan(1e-12);
    expect(report.warnings.map((w) => w.code)).toEqual(
      expect.arrayContaining(['pad-past-limits', 'pad-past-outward-limit']),
    );
  });

  it('a fillet reaching past the limits is not credited, which the geometry shows is conservative', () => {
    // A 40 mm outside fillet on a 3 mm wall: the outward limit is 2.5·t_n = 7.5 mm.
    const input = port({
      shell: {
        shape: 'cylinder',
        diameter: '1000 mm',
        diameterBasis: 'inside',
        thickness: '6 mm',
        material: 'carbon-steel',
      },
      nozzle: {
        outsideDiameter: '114.3 mm',
        thickness: '3 mm',
        projection: '150 mm',
        material: 'carbon-steel',
        weldLeg: '40 mm',
      },
      loadCases: [{ name: 'Design', internal: '5 bar(g)' }],
    });
    const report = screen(input);
    const g = geometricBalance(report, input);
    expect(step(report, 'a41', 0)).toBe(0);
    expect(g.metal.outwardWeld).toBeGreaterThan(0);
  });

  it('a set-on nozzle: f_r1 = 1 and the shell reaches the bore', () => {
    const input = port({
      nozzle: {
        outsideDiameter: '219.1 mm',
        thickness: '8.18 mm',
        attachment: 'set-on',
        projection: '200 mm',
        material: SA106B,
        weldLeg: '8 mm',
      },
    });
    const report = screen(input);
    expect(step(report, 'fr1')).toBe(1);
    expect(step(report, 'fr2')).toBeLessThan(1);
    const g = geometricBalance(report, input);
    const total = Object.values(g.metal).reduce((a, b) => a + b, 0);
    expect(
      relativeError(
        output(report.cases[0], 'area-available') - output(report.cases[0], 'area-required'),
        total - g.needed,
      ),
    ).toBeLessThan(1e-12);
  });

  it('E1 below 1 (an opening through a longitudinal seam) lowers the shell’s credit in proportion', () => {
    const plain = screen(port());
    const seam = screen(
      port({
        shell: {
          shape: 'cylinder',
          diameter: '1000 mm',
          diameterBasis: 'inside',
          thickness: '10 mm',
          material: 'carbon-steel',
          jointEfficiency: 0.85,
        },
      }),
    );
    expect(step(seam, 'a1', 0)).toBeLessThan(step(plain, 'a1', 0));
    const g = geometricBalance(seam, port());
    expect(g.section.weights.shell).toBe(0.85);
    expect(
      relativeError(
        step(seam, 'a1', 0) - step(seam, 'area-required', 0),
        g.metal.shellBand - 2 * g.zoneLimits.X * step(seam, 'shell-required-thickness', 0),
      ),
    ).toBeLessThan(1e-12);
  });
});

describe('the pad that closes a deficit', () => {
  const bare = opening.examples[2]!.input;

  it('fails without a pad, and the pad sized closes the zone’s balance exactly (geometry, its welds left out)', () => {
    const report = screen(bare);
    expect(report.verdict).toBe('fail');
    expect(check(report.cases[0], 'reinforcement-area').pass).toBe(false);
    expect(report.warnings.map((w) => w.code)).toContain('pad-needed');
    const Dp = output(report.cases[0], 'pad-outside-diameter-needed');
    const te = output(report.cases[0], 'pad-thickness-needed');
    // The sizing takes a pad as thick as the shell (common practice, no source).
    expect(te).toBe(0.008);
    const withPad = { ...bare, pad: { outsideDiameter: Dp, thickness: te } } as OpeningInput;
    const sized = screen(withPad);
    const g = geometricBalance(sized, withPad);
    // Without the outside fillet (the sizing credits no weld but the inside one, here none).
    const metal = { ...g.metal, outwardWeld: 0 };
    const total = Object.values(metal).reduce((a, b) => a + b, 0);
    expect(Math.abs(total - g.needed)).toBeLessThan(1e-9 * output(sized.cases[0], 'area-required'));
    expect(check(sized.cases[0], 'reinforcement-area').pass).toBe(true);
    expect(sized.verdict).toBe('pass');
  });

  it('the example with its 300 × 8 mm pad passes, and the smallest pad of that thickness is reported', () => {
    const report = screen(opening.examples[1]!.input);
    expect(report.verdict).toBe('pass');
    const Dp = output(report.cases[0], 'pad-outside-diameter-needed');
    expect(Dp).toBeGreaterThan(0.2191);
    expect(Dp).toBeLessThan(0.3);
    // The same number as the bare example's sizing: the given pad's thickness is the shell's.
    expect(Dp).toBe(output(screen(bare).cases[0], 'pad-outside-diameter-needed'));
  });

  it('out to the limits, a thicker pad; past 2.5·t, none: sizePad checked against the zone’s geometry', () => {
    // A small bore in a thick, weak-walled nozzle: the zone beyond the nozzle is narrow, so the
    // pad runs out of width before it runs out of thickness.
    const geometry = {
      d: 0.05,
      t: 0.012,
      tn: 0.02,
      outwardProjection: 0.2,
      setIn: true,
      inward: null,
      pad: null,
      welds: { outward: 0, pad: 0, inward: 0 },
    };
    const factors = { fr1: 0.2, fr2: 0.2, fr3: 0.2, fr4: 1 };
    const base = { geometry, factors, e1: 1, f: 1, trn: 0.001, share: 1 };
    const balance = (tr: number, te: number, radius: number) => {
      const section: Section = {
        boreRadius: 0.025,
        shellThickness: 0.012,
        nozzleWall: 0.02,
        outwardProjection: 0.2,
        setIn: true,
        inward: null,
        pad: { radius, thickness: te },
        welds: { outward: 0, pad: 0, inward: 0 },
        weights: {
          shell: 1,
          nozzleInBand: 0.2,
          nozzle: 0.2,
          pad: 1,
          outwardWeld: 0.2,
          padWeld: 1,
          inwardWeld: 0.2,
        },
      };
      // UG-40 limits (from memory): X = max(d, R_n + t_n + t), h_o = min(2.5·t, 2.5·t_n + t_e, L_p).
      const X = Math.max(0.05, 0.025 + 0.02 + 0.012);
      const ho = Math.min(2.5 * 0.012, 2.5 * 0.02 + te, 0.2);
      const metal = zoneMetal(section, { halfWidth: X, above: ho, below: 0 });
      const total = Object.values(metal).reduce((a, b) => a + b, 0);
      return { value: total - (2 * X * tr + 2 * ho * 0.001 * 0.2), X };
    };
    const thicker = sizePad({ ...base, tr: 0.0115 }, 0.012);
    expect(thicker.kind).toBe('thicker');
    if (thicker.kind === 'thicker') {
      const b = balance(0.0115, thicker.thickness, thicker.outsideDiameter / 2);
      expect(thicker.outsideDiameter).toBeCloseTo(2 * b.X, 12);
      expect(thicker.thickness).toBeGreaterThan(0.012);
      expect(Math.abs(b.value)).toBeLessThan(1e-12);
    }
    // With t_r equal to t nothing is left in the shell; even 2.5·t of pad out to the limits is short.
    const none = sizePad({ ...base, tr: 0.012, factors: { ...factors, fr4: 0.3 } }, 0.012);
    expect(none.kind).toBe('impossible');
  });
});

describe('required thicknesses for internal pressure: the engine’s UG-27 and head rules', () => {
  // ug27 check values: P = 1 MPa, R = 0.5 m; S = 138 MPa (E folded in where the value has one).
  it('cylinder: t_r by UG-27(c)(1) with E = 1 (ug27_cylinder_thickness, S·E of the check value as S)', () => {
    const cv = checkValue('ug27_cylinder_thickness');
    const S = (cv.inputs.allowable_stress_Pa as number) * (cv.inputs.joint_efficiency as number);
    const report = screen(
      port({
        shell: {
          shape: 'cylinder',
          diameter: 2 * (cv.inputs.inside_radius_m as number),
          diameterBasis: 'inside',
          thickness: '10 mm',
          material: 'carbon-steel',
          allowableStress: S,
        },
        loadCases: [
          { name: 'P', differential: cv.inputs.pressure_Pa as number, direction: 'internal-over' },
        ],
      }),
    );
    expect(
      relativeError(
        step(report, 'shell-required-thickness', 0),
        cv.expected.thickness_circumferential_m!,
      ),
    ).toBeLessThan(cv.tolerance_rel);
  });

  const headInput = (shape: string, extra: Record<string, unknown>, offset?: number) =>
    port({
      shell: {
        shape,
        diameter: 1,
        diameterBasis: 'inside',
        thickness: '10 mm',
        material: 'carbon-steel',
        allowableStress: 138e6,
        ...extra,
      } as OpeningInput['shell'],
      nozzle: {
        outsideDiameter: '114.3 mm',
        thickness: '6 mm',
        projection: '150 mm',
        material: 'carbon-steel',
        allowableStress: 138e6,
      } as OpeningInput['nozzle'],
      ...(offset !== undefined ? { offset } : {}),
      loadCases: [{ name: 'P', differential: 1e6, direction: 'internal-over' }],
    });
  const cv = checkValue('ug27_sphere_and_heads_thickness');

  it('hemispherical head: the sphere formula UG-27(d) (sphere_thickness)', () => {
    const report = screen(headInput('hemispherical', {}));
    expect(
      relativeError(step(report, 'shell-required-thickness', 0), cv.expected.sphere_thickness_m!),
    ).toBeLessThan(cv.tolerance_rel);
  });

  it('2:1 ellipsoidal head, central: a sphere of K1·D = 0.9·D (Table UG-37, from memory), the sphere value scaled by 0.9/0.5', () => {
    const report = screen(headInput('ellipsoidal-2-1', {}));
    expect(
      relativeError(
        step(report, 'shell-required-thickness', 0),
        (cv.expected.sphere_thickness_m! * 0.9) / 0.5,
      ),
    ).toBeLessThan(cv.tolerance_rel);
  });

  it('2:1 ellipsoidal head, off centre past 80 % of D: the head’s UG-32(d) thickness (ellipsoidal_2to1_thickness)', () => {
    const report = screen(headInput('ellipsoidal-2-1', {}, 0.36));
    expect(
      relativeError(
        step(report, 'shell-required-thickness', 0),
        cv.expected.ellipsoidal_2to1_thickness_m!,
      ),
    ).toBeLessThan(cv.tolerance_rel);
    expect(report.warnings.map((w) => w.code)).toEqual(
      expect.arrayContaining(['outside-central-zone', 'hillside-nozzle']),
    );
  });

  it('torispherical head, in the crown: Appendix 1-4(d) with M = 1, the same algebra as UG-32(d) with D = L (ellipsoidal value)', () => {
    const report = screen(headInput('torispherical', { crownRadius: 1, knuckleRadius: 0.06 }));
    expect(
      relativeError(
        step(report, 'shell-required-thickness', 0),
        cv.expected.ellipsoidal_2to1_thickness_m!,
      ),
    ).toBeLessThan(cv.tolerance_rel);
  });

  it('torispherical head, reaching into the knuckle: the head’s UG-32(e) thickness (torispherical_thickness)', () => {
    const report = screen(headInput('torispherical', { crownRadius: 1, knuckleRadius: 0.06 }, 0.4));
    expect(
      relativeError(
        step(report, 'shell-required-thickness', 0),
        cv.expected.torispherical_thickness_m!,
      ),
    ).toBeLessThan(cv.tolerance_rel);
  });

  it('non-standard torispherical head in the knuckle: M as the head’s own screening finds it', () => {
    const input = headInput('torispherical', { crownRadius: 0.9, knuckleRadius: 0.1 }, 0.38);
    const report = screen(input);
    // Appendix 1-4(d) (from memory): M = (3 + sqrt(L/r))/4, and t = P·L·M/(2·S − 0.2·P).
    const M = (3 + Math.sqrt(0.9 / 0.1)) / 4;
    expect(
      relativeError(
        step(report, 'shell-required-thickness', 0),
        (1e6 * 0.9 * M) / (2 * 138e6 - 0.2e6),
      ),
    ).toBeLessThan(1e-12);
  });

  it('nozzle: t_rn by UG-27(c)(1) with E = 1 on the bore radius (ug27_cylinder_thickness)', () => {
    const cvc = checkValue('ug27_cylinder_thickness');
    const S = (cvc.inputs.allowable_stress_Pa as number) * (cvc.inputs.joint_efficiency as number);
    // A nozzle of 1 m bore (1.02 m outside, 10 mm wall) in a 3 m shell: R_n = 0.5 m.
    const report = screen(
      port({
        shell: {
          shape: 'cylinder',
          diameter: '3 m',
          diameterBasis: 'inside',
          thickness: '30 mm',
          material: 'carbon-steel',
        },
        nozzle: {
          outsideDiameter: '1020 mm',
          thickness: '10 mm',
          projection: '300 mm',
          material: 'carbon-steel',
          allowableStress: S,
        },
        loadCases: [{ name: 'P', differential: 1e6, direction: 'internal-over' }],
      }),
    );
    expect(
      relativeError(
        step(report, 'nozzle-required-thickness', 0),
        cvc.expected.thickness_circumferential_m!,
      ),
    ).toBeLessThan(cvc.tolerance_rel);
  });
});

describe('external pressure: half the area, with t_r from the shell’s own screening (UG-37(d)(1), from memory)', () => {
  const vacuum = opening.examples[0]!.input;

  it('t_r is the thickness at which the cylindrical-shell screening of the chamber just holds the vacuum', () => {
    const report = screen(vacuum);
    const tr = step(report, 'shell-required-thickness', 0);
    const cylinder = (t: number) =>
      screen({
        kind: 'cylindrical-shell',
        diameter: '600 mm',
        diameterBasis: 'outside',
        thickness: t,
        length: '900 mm',
        material: 'stainless-304',
        loadCases: [{ name: 'Operating: full vacuum', internal: 'full vacuum' }],
      });
    expect(cylinder(tr * (1 + 1e-8)).cases[0]!.checks[0]!.pass).toBe(true);
    expect(cylinder(tr * (1 - 1e-8)).cases[0]!.checks[0]!.pass).toBe(false);
    // External pressure governs this port: the vacuum case's utilisation is the report's.
    expect(report.governing?.loadCase).toBe('Operating: full vacuum');
  });

  it('the nozzle’s t_rn is where its own cylinder screening (over the projection) just holds', () => {
    const report = screen(vacuum);
    const trn = step(report, 'nozzle-required-thickness', 0);
    const nozzle = (t: number) =>
      screen({
        kind: 'cylindrical-shell',
        diameter: '168.3 mm',
        thickness: t,
        length: '150 mm',
        material: 'stainless-304',
        loadCases: [{ name: 'Operating: full vacuum', internal: 'full vacuum' }],
      });
    expect(nozzle(trn * (1 + 1e-8)).cases[0]!.checks[0]!.pass).toBe(true);
    expect(nozzle(trn * (1 - 1e-8)).cases[0]!.checks[0]!.pass).toBe(false);
  });

  it('the area required is half the internal form at the same t_r, and the zone balance holds', () => {
    const report = screen(vacuum);
    const tr = step(report, 'shell-required-thickness', 0);
    const d = 2 * step(report, 'opening-radius');
    const tn = step(report, 'nozzle-thickness-corroded');
    const fr1 = step(report, 'fr1');
    expect(
      relativeError(step(report, 'area-required', 0), 0.5 * (d * tr + 2 * tn * tr * (1 - fr1))),
    ).toBeLessThan(1e-12);
    const g = geometricBalance(report, vacuum);
    // Half of d·t_r is needed, the shell's band still spends F·t_r over its width outside the opening.
    const total = Object.values(g.metal).reduce((a, b) => a + b, 0);
    const available = output(report.cases[0], 'area-available');
    expect(
      relativeError(available - step(report, 'area-required', 0) * 2, total - g.needed),
    ).toBeLessThan(1e-12);
  });

  it('an ellipsoidal head under vacuum: t_r from sphere-or-head (buckling and the UG-33 internal rule)', () => {
    const input = port({
      shell: {
        shape: 'ellipsoidal-2-1',
        diameter: '600 mm',
        thickness: '4 mm',
        material: 'stainless-304',
      },
      nozzle: {
        outsideDiameter: '60.3 mm',
        thickness: '2.77 mm',
        projection: '100 mm',
        material: 'stainless-304',
      },
      loadCases: [{ name: 'Vacuum', internal: 'full vacuum' }],
    });
    const report = screen(input);
    const tr = step(report, 'shell-required-thickness', 0);
    const head = (t: number) =>
      screen({
        kind: 'sphere-or-head',
        shape: 'ellipsoidal-2-1',
        diameter: '600 mm',
        thickness: t,
        material: 'stainless-304',
        jointEfficiency: 1,
        loadCases: [{ name: 'Vacuum', internal: 'full vacuum' }],
      });
    expect(head(tr * (1 + 1e-8)).cases[0]!.checks.every((k) => k.pass)).toBe(true);
    expect(head(tr * (1 - 1e-8)).cases[0]!.checks.every((k) => k.pass)).toBe(false);
    expect(report.cautions.map((c) => c.code)).toContain('external-pressure-imperfection');
  });

  it('a long cylinder (no length given) needs more wall than one between close flanges', () => {
    const long = screen({
      ...vacuum,
      shell: { ...(vacuum.shell as object), length: undefined },
    } as OpeningInput);
    const short = screen(vacuum);
    expect(step(long, 'shell-required-thickness', 0)).toBeGreaterThan(
      step(short, 'shell-required-thickness', 0),
    );
  });

  it('an external pressure no wall carries is outside validity and fails', () => {
    const report = screen({
      ...vacuum,
      loadCases: [{ name: 'Crush', differential: '2000 MPa', direction: 'external-over' }],
    } as OpeningInput);
    expect(report.verdict).toBe('fail');
    expect(caseWarnings(report).map((w) => w.code)).toContain('shell-external-no-thickness');
  });
});

describe('allowable stresses on the code basis, and the strength-reduction factors', () => {
  it('f_r = S_n/S_v with S from ASME II-D at room temperature (asme_iid_allowable_room_temperature, from memory)', () => {
    const cv = checkValue('asme_iid_allowable_room_temperature');
    const report = screen(
      port({
        nozzle: {
          outsideDiameter: '219.1 mm',
          thickness: '8.18 mm',
          projection: '200 mm',
          material: 'stainless-316l',
        },
      }),
    );
    expect(
      relativeError(step(report, 'shell-allowable-stress'), cv.expected['carbon-steel_Pa']!),
    ).toBeLessThan(cv.tolerance_rel);
    expect(
      relativeError(step(report, 'nozzle-allowable-stress'), cv.expected['stainless-316l_Pa']!),
    ).toBeLessThan(cv.tolerance_rel);
    const table = cv.expected['stainless-316l_Pa']! / cv.expected['carbon-steel_Pa']!; // 16.7/20.0
    // The ratio of two values each within 2 % of the table; never more than 0.5 % above it (conservative).
    expect(relativeError(step(report, 'fr2'), table)).toBeLessThan(0.025);
    expect(step(report, 'fr2')).toBeLessThanOrEqual(table * 1.005);
    expect(step(report, 'fr1')).toBe(step(report, 'fr2'));
  });

  it('a nozzle stronger than the shell counts as the shell (f_r capped at 1)', () => {
    const report = screen(
      port({
        shell: {
          shape: 'cylinder',
          diameter: '1000 mm',
          diameterBasis: 'inside',
          thickness: '10 mm',
          material: 'stainless-316l',
        },
      }),
    );
    expect(step(report, 'fr2')).toBe(1);
  });

  it('the project’s EN 13445-3 basis changes S and f_r (en13445_nominal_design_stress)', () => {
    const cv = checkValue('en13445_nominal_design_stress');
    const report = screen(
      port({
        designBasis: { allowableStress: 'en-13445-3' },
        nozzle: {
          outsideDiameter: '219.1 mm',
          thickness: '8.18 mm',
          projection: '200 mm',
          material: 'stainless-304',
        },
      }),
    );
    expect(
      relativeError(step(report, 'shell-allowable-stress'), cv.expected['carbon-steel_Pa']!),
    ).toBeLessThan(cv.tolerance_rel);
    expect(
      relativeError(step(report, 'nozzle-allowable-stress'), cv.expected['stainless-304_Pa']!),
    ).toBeLessThan(cv.tolerance_rel);
    expect(
      relativeError(
        step(report, 'fr2'),
        cv.expected['stainless-304_Pa']! / cv.expected['carbon-steel_Pa']!,
      ),
    ).toBeLessThan(1e-12);
  });

  it('a pad material without a pad is the sizing’s: a weaker one needs a wider pad', () => {
    const bare = opening.examples[2]!.input;
    const shells = screen(bare);
    const weaker = screen({ ...bare, pad: { material: 'stainless-316l' } } as OpeningInput);
    expect(step(weaker, 'fr4')).toBeLessThan(1);
    expect(output(weaker.cases[0], 'pad-outside-diameter-needed')).toBeGreaterThan(
      output(shells.cases[0], 'pad-outside-diameter-needed'),
    );
    // No pad is screened: the areas are the bare opening's.
    expect(output(weaker.cases[0], 'area-available')).toBe(
      output(shells.cases[0], 'area-available'),
    );
  });

  it('a pad of its own, weaker material lowers f_r4 and its credit', () => {
    const withPad = (material?: string) =>
      screen(
        port({
          pad: { outsideDiameter: '380 mm', thickness: '10 mm', ...(material ? { material } : {}) },
        }),
      );
    const same = withPad();
    const weaker = withPad('stainless-316l');
    expect(step(same, 'fr4')).toBe(1);
    expect(step(weaker, 'fr4')).toBeLessThan(1);
    expect(
      relativeError(step(weaker, 'a5', 0) / step(same, 'a5', 0), step(weaker, 'fr4')),
    ).toBeLessThan(1e-12);
  });
});

describe('validity and notes', () => {
  const sized = (shellInside: string, nozzleOutside: string) =>
    screen(
      port({
        shell: {
          shape: 'cylinder',
          diameter: shellInside,
          diameterBasis: 'inside',
          thickness: '20 mm',
          material: 'carbon-steel',
        },
        nozzle: {
          outsideDiameter: nozzleOutside,
          thickness: '10 mm',
          projection: '300 mm',
          material: 'carbon-steel',
        },
        loadCases: [{ name: 'Design', internal: '2 bar(g)' }],
      }),
    );
  const codes = (r: Report) => r.warnings.map((w) => w.code);

  it('UG-36(b)(1) (from memory): up to D = 1524 mm, d up to D/2 and 508 mm', () => {
    expect(codes(sized('1000 mm', '500 mm'))).not.toContain('large-opening'); // d = 480 mm
    const large = sized('1000 mm', '540 mm'); // d = 520 mm > 508 mm
    expect(codes(large)).toContain('large-opening');
    expect(large.verdict).toBe('outside-validity');
    expect(large.warnings.find((w) => w.code === 'large-opening')!.message).toMatch(
      /UG-36\(b\)\(1\)/,
    );
  });

  it('UG-36(b)(1) (from memory): above D = 1524 mm, d up to D/3 and 1016 mm', () => {
    expect(codes(sized('2000 mm', '680 mm'))).not.toContain('large-opening'); // d = 660 < 666.7 mm
    expect(codes(sized('2000 mm', '700 mm'))).toContain('large-opening'); // d = 680 mm
  });

  it('UG-36(c)(3)(a) (from memory): a small welded opening is said to be exempt, and still screened', () => {
    const small = screen(
      port({
        nozzle: {
          outsideDiameter: '88.9 mm',
          thickness: '5.49 mm',
          projection: '150 mm',
          material: 'carbon-steel',
        },
      }),
    );
    const note = caseWarnings(small).find((w) => w.code === 'small-opening-exempt');
    expect(note?.severity).toBe('info');
    expect(check(small.cases[0], 'reinforcement-area')).toBeDefined();
    // d = 77.9 mm is over 60.3 mm where the required thickness passes 9.525 mm: no note.
    const thick = screen(
      port({
        shell: {
          shape: 'cylinder',
          diameter: '1000 mm',
          diameterBasis: 'inside',
          thickness: '30 mm',
          material: 'carbon-steel',
        },
        nozzle: {
          outsideDiameter: '88.9 mm',
          thickness: '5.49 mm',
          projection: '150 mm',
          material: 'carbon-steel',
        },
        loadCases: [{ name: 'Design', internal: '35 bar(g)' }],
      }),
    );
    expect(step(thick, 'shell-required-thickness', 0)).toBeGreaterThan(0.009525);
    expect(caseWarnings(thick).map((w) => w.code)).not.toContain('small-opening-exempt');
  });

  it('a brittle or polymer part is outside the rule', () => {
    const report = screen(
      port({
        nozzle: {
          outsideDiameter: '114.3 mm',
          thickness: '6 mm',
          projection: '100 mm',
          material: 'polycarbonate',
        },
        loadCases: [{ name: 'Low', internal: '1 bar(g)' }],
      }),
    );
    expect(report.verdict).toBe('outside-validity');
    expect(codes(report)).toContain('nozzle-not-a-code-material');
  });

  it('above 0.385·S the shell’s thin-wall formula is outside its range (UG-27, from memory)', () => {
    const report = screen(port({ loadCases: [{ name: 'High', internal: '600 bar(g)' }] }));
    expect(caseWarnings(report).map((w) => w.code)).toContain('shell-formula-range');
  });

  it('carries the cautions for welds, nozzle loads and fatigue, after the screening caution', () => {
    const report = screen(port());
    const cautions = report.cautions.map((c) => c.code);
    expect(cautions[0]).toBe('screening-only');
    expect(cautions).toEqual(
      expect.arrayContaining(['opening-welds-not-checked', 'nozzle-loads', 'opening-fatigue']),
    );
    expect(report.cautions.find((c) => c.code === 'opening-welds-not-checked')!.text).toMatch(
      /UG-41/,
    );
  });

  it('keeps its text to the fonts’ characters', () => {
    for (const e of opening.examples) expect(textProblems(screen(e.input))).toEqual([]);
    expect(textProblems(screen(bothWaysInput))).toEqual([]);
  });
});

describe('the allowable internal pressure of the opening', () => {
  it('is where the governing check reaches 1', () => {
    const report = screen(opening.examples[1]!.input);
    const allowable = output(report.cases[0], 'allowable-pressure');
    const at = (p: number) =>
      screen({
        ...opening.examples[1]!.input,
        loadCases: [{ name: 'P', differential: p, direction: 'internal-over' }],
      } as OpeningInput);
    expect(at(allowable * (1 - 1e-9)).governing!.utilisation).toBeLessThanOrEqual(1);
    expect(at(allowable * (1 + 1e-6)).governing!.utilisation).toBeGreaterThan(1);
  });
});

describe('bad input is refused, naming the field', () => {
  const paths = (input: unknown) => issuesOf(input).map((i) => i.path);
  it.each([
    [
      'nozzle wider than the shell',
      port({
        nozzle: {
          outsideDiameter: '1.2 m',
          thickness: '10 mm',
          projection: '200 mm',
          material: 'carbon-steel',
        },
      }),
      'nozzle.outsideDiameter',
    ],
    [
      'pad no wider than the nozzle',
      port({ pad: { outsideDiameter: '200 mm', thickness: '10 mm' } }),
      'pad.outsideDiameter',
    ],
    ['pad without its thickness', port({ pad: { outsideDiameter: '400 mm' } }), 'pad.thickness'],
    ['a pad weld with no pad', port({ pad: { weldLeg: '6 mm' } }), 'pad.weldLeg'],
    [
      'set-on nozzle projecting inside',
      port({
        nozzle: {
          outsideDiameter: '219.1 mm',
          thickness: '8 mm',
          attachment: 'set-on',
          projection: '200 mm',
          inwardProjection: '20 mm',
          material: 'carbon-steel',
        },
      }),
      'nozzle.inwardProjection',
    ],
    [
      'inside weld without an inward projection',
      port({
        nozzle: {
          outsideDiameter: '219.1 mm',
          thickness: '8 mm',
          projection: '200 mm',
          inwardWeldLeg: '5 mm',
          material: 'carbon-steel',
        },
      }),
      'nozzle.inwardWeldLeg',
    ],
    [
      'a length on a head',
      port({
        shell: {
          shape: 'ellipsoidal-2-1',
          diameter: '1 m',
          thickness: '10 mm',
          length: '1 m',
          material: 'carbon-steel',
        },
      }),
      'shell.length',
    ],
    ['an offset on a cylinder', port({ offset: '100 mm' }), 'offset'],
    [
      'a crown radius on an ellipsoidal head (the head’s own rule)',
      port({
        shell: {
          shape: 'ellipsoidal-2-1',
          diameter: '1 m',
          thickness: '10 mm',
          crownRadius: '1 m',
          material: 'carbon-steel',
        },
      }),
      'shell.crownRadius',
    ],
    [
      'a shell as thick as its radius (the cylinder’s own rule)',
      port({
        shell: {
          shape: 'cylinder',
          diameter: '100 mm',
          thickness: '60 mm',
          material: 'carbon-steel',
        },
      }),
      'shell.thickness',
    ],
    [
      'a nozzle allowance past its wall (the cylinder’s own rule)',
      port({
        nozzle: {
          outsideDiameter: '219.1 mm',
          thickness: '8 mm',
          projection: '200 mm',
          corrosionAllowance: '9 mm',
          material: 'carbon-steel',
        },
      }),
      'nozzle.corrosionAllowance',
    ],
    [
      'a nozzle off the head',
      port({
        shell: {
          shape: 'hemispherical',
          diameter: '1 m',
          thickness: '10 mm',
          material: 'carbon-steel',
        },
        offset: '0.45 m',
      }),
      'offset',
    ],
    [
      'a thickness with no unit sense',
      port({
        shell: {
          shape: 'cylinder',
          diameter: '1 m',
          thickness: '10 bar',
          material: 'carbon-steel',
        },
      }),
      'shell.thickness',
    ],
  ])('%s', (_name, input, path) => {
    expect(paths(input)).toContain(path);
  });
});
