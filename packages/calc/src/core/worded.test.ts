import { describe, expect, it } from 'vitest';
import { EXTRA_CASES, TEMPERATURE_CASES } from '../../test/example-reports';
import { METHODS, TEMPERATURE_DATA, screen } from '../index';
import type { Report } from './report';
import { joinWorded, prefixWorded, q, worded, type Worded } from './worded';

/** Every report the fixture holds: each method's examples and the extra cases. */
function allReports(): [string, Report][] {
  const out: [string, Report][] = [];
  for (const method of METHODS)
    method.examples.forEach((e, i) => out.push([`${method.kind}#${i}`, screen(e.input)]));
  for (const [key, input] of Object.entries({ ...EXTRA_CASES, ...TEMPERATURE_CASES }))
    out.push([key, screen(input)]);
  return out;
}

/** The template with each placeholder as "any text": the message must be the template filled in. */
function templatePattern(w: Worded): RegExp {
  let source = '';
  const parts = w.template.split(/(\{\{|\}\}|\{[A-Za-z]\w*\})/);
  for (const part of parts) {
    if (part === '{{') source += '\\{';
    else if (part === '}}') source += '\\}';
    else if (/^\{[A-Za-z]\w*\}$/.test(part)) {
      expect(w.values, `placeholder ${part} has a value`).toHaveProperty(part.slice(1, -1));
      source += '(.+?)';
    } else source += part.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
  }
  return new RegExp(`^${source}$`);
}

// A number with an SI unit after it, in literal text: what a reader in US units must not meet unconverted.
// A literal that already gives the US value beside it ("371 °C, 700 °F", "9.525 mm (3/8 in") is fine.
const TEMPERATURE_REASONS = Object.values(TEMPERATURE_DATA).flatMap((d) =>
  Object.values(d as object)
    .filter((v): v is { reason: string } => typeof v === 'object' && v !== null && 'reason' in v)
    .map((v) => v.reason),
);

const SI_NUMBER =
  /(?<![\w.])\d[\d.,\u2009]*(?:e-?\d+)?\s?(?:MPa|kPa|Pa|mm|kJ|J|°C|kN|N|m)(?![\w²³·/])(?!\s*(?:\(|,)\s*[\d/ .]+\s?(?:°F|in|psi|ksi|ft|lbf))/;

describe('worded text', () => {
  it('fills the SI text in the units the engine prints, and doubles literal braces', () => {
    const w = worded`case "${'{x}'}": the deflection (${q('deflection', 0.168854, 'm', { as: 'mm' })}) at ${q('temperature', 403.15, 'K', { as: '°C' })}, ${q('p', 101325, 'Pa', { absolute: true })}`;
    expect(w.message).toBe('case "{x}": the deflection (168.854 mm) at 130 °C, 101325 Pa');
    expect(w.template).toBe('case "{{x}}": the deflection ({deflection}) at {temperature}, {p}');
    expect(w.values).toEqual({
      deflection: { value: 0.168854, unit: 'm' },
      temperature: { value: 403.15, unit: 'K' },
      p: { value: 101325, unit: 'Pa', absolute: true },
    });
  });

  it('joins and prefixes, and refuses a name twice', () => {
    const joined = joinWorded(worded`a ${q('x', 1, 'm')}`, null, worded`, b {`);
    expect(joined).toEqual({
      message: 'a 1 m, b {',
      template: 'a {x}, b {{',
      values: { x: { value: 1, unit: 'm' } },
    });
    expect(prefixWorded('panel {1}: ', joined).template).toBe('panel {{1}}: a {x}, b {{');
    expect(() => joinWorded(worded`${q('x', 1, 'm')}`, worded`${q('x', 2, 'm')}`)).toThrow(/twice/);
  });

  const reports = allReports();

  it.each(reports)('%s: every template reads as its message, every value named', (_key, report) => {
    const texts: (Worded & { message: string; where: string })[] = [];
    for (const w of report.warnings)
      if (w.template !== undefined)
        texts.push({ ...w, template: w.template, values: w.values ?? {}, where: w.code });
    for (const c of report.cases) {
      const lc = c.loadCase;
      expect(lc.worded, `load case "${lc.name}" is worded`).toBeDefined();
      if (lc.worded) texts.push({ ...lc.worded, message: lc.description, where: lc.name });
    }
    for (const t of texts) {
      expect(t.message, t.where).toMatch(templatePattern(t));
      for (const v of Object.values(t.values)) {
        expect(Number.isFinite(v.value), t.where).toBe(true);
        expect(['Pa', 'm', 'J', 'K', 'N', 's', 'm²', 'm³'], t.where).toContain(v.unit);
      }
    }
  });

  it.each(reports)(
    '%s: no warning holds a number with an SI unit outside its values',
    (_key, report) => {
      for (const w of report.warnings) {
        // Load-case names are the designer's words, quoted: not the engine's numbers.
        let literal = w.template ?? w.message;
        // Left as written (issue 16.5, not done): the materials' temperature-limit reasons quote
        // makers' data and code limits in °C, most with °F beside; they are fixed texts.
        for (const reason of TEMPERATURE_REASONS) literal = literal.replace(reason, '…');
        literal = literal.replace(/\{[A-Za-z]\w*\}/g, '#').replace(/"[^"]*"/g, '"…"');
        expect(literal, `${w.code}: ${w.message}`).not.toMatch(SI_NUMBER);
      }
    },
  );
});
