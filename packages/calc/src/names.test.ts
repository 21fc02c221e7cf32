import { describe, expect, it } from 'vitest';
import { EXTRA_CASES, TEMPERATURE_CASES } from '../test/example-reports';
import { METHODS, screen, type Report } from './index';

/**
 * Names of our own (issue 16.11): a result is named by its physics ("thickness
 * needed for hoop stress", "allowable pressure difference (screening)"); the
 * code clause it follows is cited in its `source` only, and a screening
 * allowable is never called "MAWP". A label that reads like a code's summary
 * page overstates what a screening number is.
 *
 * Read here: every step, check and output label, every check's basis and every
 * step's expression (the trail shows them) of every method's examples, the
 * fixture's extra cases and the branches below. The design bases a project
 * chooses ("ASME VIII-1 basis", "EN 13445-3 basis") are settings, named as the
 * project form names them, not clauses.
 */
const CLAUSE =
  /\bUG-\d|\bUW-\d|\bUCS-\d|\bUHA-\d|Appendix \d|§|\bclause\b|\bMAWP\b|\bAPI STD\b|\bPD 5500\b/i;

const BRANCHES: Record<string, unknown> = {
  'head under vacuum, the internal rule at 1.67 × the external pressure': {
    kind: 'sphere-or-head',
    shape: 'torispherical',
    diameter: '1 m',
    thickness: '6 mm',
    material: 'carbon-steel',
    loadCases: [{ name: 'Full vacuum', internal: 'full vacuum' }],
  },
  'head beyond the thickness formula (a pressure check instead)': {
    kind: 'sphere-or-head',
    shape: 'sphere',
    diameter: 2,
    thickness: 0.01,
    material: 'carbon-steel',
    allowableStress: '1 MPa',
    loadCases: [{ name: 'Absurd', differential: '20 MPa', direction: 'internal-over' }],
  },
  'head with the pipeline-code interaction': {
    kind: 'sphere-or-head',
    shape: 'hemispherical',
    diameter: '800 mm',
    thickness: '5 mm',
    material: 'stainless-304',
    externalPressure: { interaction: 'api-2rd' },
    loadCases: [{ name: 'Full vacuum', internal: 'full vacuum' }],
  },
  'shell with the pipeline-code interaction and a ring spacing': {
    kind: 'cylindrical-shell',
    diameter: '1 m',
    thickness: '5 mm',
    length: '1.2 m',
    material: 'stainless-304',
    externalPressure: { interaction: 'api-2rd' },
    ringSpacingFor: '4 mm',
    loadCases: [
      { name: 'Full vacuum', internal: 'full vacuum' },
      { name: 'Inside higher', internal: '3 bar(g)' },
    ],
  },
  'shell with rings given but no outside-higher case (the rings not checked)': {
    kind: 'cylindrical-shell',
    diameter: '1 m',
    thickness: '5 mm',
    length: '1.2 m',
    material: 'stainless-304',
    ringSection: { shape: 'flat-bar', depth: '50 mm', thickness: '8 mm' },
    loadCases: [{ name: 'Purge', internal: '0.5 bar(g)' }],
  },
};

function reports(): { name: string; report: Report }[] {
  const found: { name: string; report: Report }[] = [];
  for (const method of METHODS)
    method.examples.forEach((e) => found.push({ name: e.name, report: screen(e.input) }));
  for (const [name, input] of Object.entries({ ...EXTRA_CASES, ...TEMPERATURE_CASES, ...BRANCHES }))
    found.push({ name, report: screen(input) });
  return found;
}

/** The words of a report that name results: labels, bases, expressions (not sources, not warnings). */
function namesOf(report: Report): { where: string; text: string }[] {
  const names: { where: string; text: string }[] = [];
  const steps = (list: Report['steps'], at: string) =>
    list.forEach((s) => {
      names.push({ where: `${at} step ${s.id} label`, text: s.label });
      names.push({ where: `${at} step ${s.id} expression`, text: s.expression });
    });
  steps(report.steps, 'common');
  report.cases.forEach((c, i) => {
    steps(c.steps, `case ${i}`);
    for (const k of c.checks) {
      names.push({ where: `case ${i} check ${k.id} label`, text: k.label });
      names.push({ where: `case ${i} check ${k.id} basis`, text: k.basis });
    }
    for (const o of c.outputs) names.push({ where: `case ${i} output ${o.id}`, text: o.label });
  });
  return names;
}

describe('result names are the physics’, clause numbers only in the source', () => {
  const all = reports();

  it('reads the branches it means to read', () => {
    const ids = new Set(
      all.flatMap(({ report }) => [
        ...report.steps.map((s) => s.id),
        ...report.cases.flatMap((c) => [...c.steps.map((s) => s.id), ...c.checks.map((k) => k.id)]),
      ]),
    );
    for (const id of [
      'ug27-thickness',
      'mawp-circumferential',
      'mawp',
      'ug28-factor-a',
      'ug28-allowable',
      'ug33-internal-rule',
      'ug33-allowable-pressure',
      'internal-thickness',
      'collapse-pressure',
      'ring-spacing',
      'ring-check',
    ])
      expect(ids.has(id), id).toBe(true);
  });

  it('has no clause number and no "MAWP" in any label, basis or expression', () => {
    const bad: string[] = [];
    for (const { name, report } of all)
      for (const n of namesOf(report))
        if (CLAUSE.test(n.text)) bad.push(`${name}: ${n.where}: "${n.text}"`);
    expect(bad).toEqual([]);
  });

  it('still cites the clauses, in the source', () => {
    const sources = all.flatMap(({ report }) => [
      ...report.steps.map((s) => s.source),
      ...report.cases.flatMap((c) => c.steps.map((s) => s.source)),
    ]);
    for (const clause of ['UG-27', 'UG-28', 'UG-32', 'UG-33'])
      expect(
        sources.some((s) => s.includes(clause)),
        clause,
      ).toBe(true);
  });

  it('calls every allowable pressure difference a screening one', () => {
    for (const { name, report } of all)
      for (const c of report.cases)
        for (const o of c.outputs)
          if (o.id === 'allowable-pressure' && report.kind !== 'stored-energy')
            expect(o.label, name).toBe('Allowable pressure difference (screening)');
  });
});
