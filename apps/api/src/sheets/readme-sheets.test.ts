import { execFileSync } from 'node:child_process';
import { mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { SI_UNIT, parseQuantity } from '@hoopline/calc';
import {
  THIN_SPACE,
  formatPercent,
  presentInputs,
  presentReport,
  type UnitSystem,
} from '@hoopline/present';
import { misprint } from '@hoopline/present/testing';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { makeWorld, signIn, type Session, type World } from '../../test/fixtures';
import { startTestApp, type TestApp } from '../../test/test-app';
import { breakable } from './sheet-document';

/**
 * Every README example's sheet, rendered through the API and read back with
 * pdftotext (poppler): each number on it is found in its row and read back
 * with the engine's own quantity parser, and must be the report's value to
 * the figures printed. The screen's half of the comparison is
 * apps/web/src/features/results/report-view.numbers.test.tsx; both print
 * through @hoopline/present.
 */
const README = readFileSync(
  path.resolve(import.meta.dirname, '../../../../packages/calc/README.md'),
  'utf8',
);
const EXAMPLES = [...README.matchAll(/```json\n([\s\S]*?)```/g)].flatMap((m) => {
  const parsed = JSON.parse(m[1]!) as unknown;
  return (Array.isArray(parsed) ? parsed : [parsed]) as Record<string, unknown>[];
});
const ARTIFACTS = path.resolve(import.meta.dirname, '../../test-results/readme-sheets');

// pdftotext writes no glyph for a thin space; layout whitespace collapses to one space.
const flat = (text: string) => text.replaceAll(THIN_SPACE, '').replace(/\s+/g, ' ');
const escape = (text: string) => flat(text).replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
// A printed quantity: a number (fixed or with an exponent) and its unit.
const QTY = String.raw`(-?\d+(?:\.\d+)?(?:e-?\d+)?(?: [^\s]+)?)`;

function pdfText(pdf: Buffer, name: string): string {
  const file = path.join(ARTIFACTS, `${name}.pdf`);
  writeFileSync(file, pdf);
  return flat(
    execFileSync('pdftotext', ['-raw', '-enc', 'UTF-8', file, '-'], { encoding: 'utf8' }),
  );
}

describe('README example sheets: every number on the sheet is the report’s value', () => {
  let t: TestApp;
  let w: World;
  let fabricator: Session;
  const projects: Record<UnitSystem, string> = { si: '', us: '' };

  beforeAll(async () => {
    // A deployment's own address: the sheet's verify link and QR code must use it.
    t = await startTestApp({ HOOPLINE_PUBLIC_URL: 'http://screening.example.test' });
    w = await makeWorld(t);
    fabricator = await signIn(t, w.fabricator);
    projects.si = w.projectId;
    const us = await t.services.projects.create(w.designer, {
      number: `US-${w.projectId.slice(0, 6)}`,
      name: 'US customary project',
      site: { altitude: '5280 ft' },
      unitSystem: 'us',
    });
    await t.services.projects.setMember(w.admin, us.id, w.checker.id, 'checker');
    await t.services.projects.setMember(w.admin, us.id, w.fabricator.id, 'fabricator');
    projects.us = us.id;
    mkdirSync(ARTIFACTS, { recursive: true });
  });
  afterAll(async () => {
    await t.close();
  });

  it('has README examples', () => {
    expect(EXAMPLES.length).toBeGreaterThanOrEqual(7);
  });

  it.each(
    EXAMPLES.flatMap((input, i) =>
      (['si', 'us'] as const).map((system) => [i, system, input] as const),
    ),
  )('example %i, %s project', async (i, system, input) => {
    const created = await t.services.components.create(w.designer, projects[system], {
      name: `README example ${i}`,
      inputs: input,
    });
    await t.services.revisions.submit(w.designer, created.revision.id);
    await t.services.revisions.decide(w.checker, created.revision.id, 'countersigned', {
      hash: created.revision.contentHash,
    });
    const res = await fabricator.download(`/api/revisions/${created.revision.id}/sheet.pdf`);
    expect(res.status).toBe(200);
    const text = pdfText(res.body as Buffer, `example-${i}-${system}`);
    expect(text).toContain(`http://screening.example.test/verify/${created.revision.verifyCode}`);
    const report = created.revision.report;
    const shown = presentReport(report, system);
    const problems: string[] = [];
    const read = (
      what: string,
      printed: string | undefined,
      value: number,
      unit: string,
      figures = 4,
    ) => {
      if (printed === undefined) {
        problems.push(`${what}: not found on the sheet`);
        return;
      }
      const problem = misprint(printed, value, unit, figures);
      if (problem) problems.push(`${what}: ${problem}`);
    };

    // 1 Load cases: inside, outside and the difference, in the case's row.
    report.cases.forEach((c, index) => {
      const row = new RegExp(
        `${escape(c.loadCase.name)} ${QTY} ${QTY} ${QTY} ${escape(shown.cases[index]!.direction)}`,
      ).exec(text);
      read(`load case ${index + 1} inside`, row?.[1], c.loadCase.internal, 'Pa');
      read(`load case ${index + 1} outside`, row?.[2], c.loadCase.external, 'Pa');
      read(`load case ${index + 1} Δp`, row?.[3], Math.abs(c.loadCase.differential), 'Pa');
    });

    // 3 Checks: demand, capacity and utilisation in the check's row.
    for (const c of report.cases) {
      for (const check of c.checks) {
        const row = new RegExp(
          `${escape(c.loadCase.name)} ${escape(check.label)}(?: \\(governing\\))? ${QTY} ${QTY} (-?[\\d.]+(?:e-?\\d+)?) % (pass|FAIL)`,
        ).exec(text);
        read(`${check.label} demand`, row?.[1], check.demand, check.unit);
        read(`${check.label} capacity`, row?.[2], check.capacity, check.unit);
        if (row) {
          const percent = Number(row[3]);
          // Never across 100 %: a pass reads below (or at) it, a fail above.
          if (
            check.pass ? percent > 100 || (check.utilisation < 1 && percent >= 100) : percent <= 100
          )
            problems.push(`${check.label}: ${row[3]} % is on the wrong side of 100 %`);
          if (Math.abs(percent - check.utilisation * 100) > Math.max(0.1, check.utilisation * 0.05))
            problems.push(`${check.label}: ${row[3]} % for a utilisation of ${check.utilisation}`);
          expect(`${row[3]} %`).toBe(formatPercent(check.utilisation).replaceAll(THIN_SPACE, ''));
          expect(row[4]).toBe(check.pass ? 'pass' : 'FAIL');
        }
      }
    }

    // 4 Calculation trail: the value of every step, by its number, in SI and in the project's units.
    const steps = [...report.steps, ...report.cases.flatMap((c) => c.steps)];
    steps.forEach((step, index) => {
      const number = index + 1;
      const prefix = `${number} ${escape(step.label)} ${escape(breakable(step.expression))} ${escape(breakable(step.substituted))} `;
      if (step.value === null) {
        if (!new RegExp(`${prefix}–`).test(text))
          problems.push(`step ${number}: no "–" for a step without a value`);
        return;
      }
      const row = new RegExp(
        `${prefix}${step.unit === '1' ? String.raw`(-?\d+(?:\.\d+)?(?:e-?\d+)?)` : QTY}(?: ${QTY})?`,
      ).exec(text);
      read(`step ${number} (${step.label})`, row?.[1], step.value, step.unit, 6);
      const shownAs = shown.steps[index]!.shownAs;
      if (shownAs) read(`step ${number} in project units`, row?.[2], step.value, step.unit);
    });

    // 2 Inputs: each typed quantity, with its value in the project's units and in SI.
    for (const row of presentInputs(input, system, { omit: ['loadCases'] })) {
      if (!row.inSi || row.path === 'material') continue;
      const found = new RegExp(
        `${escape(row.label)} ${escape(row.asTyped)} ${system === 'us' ? `${QTY} ` : ''}${QTY}`,
      ).exec(text);
      const typed = parseQuantity(row.asTyped.replace(/ \((a|g)\)$/, '($1)'));
      const unit = SI_UNIT[typed.dimension];
      if (system === 'us') read(`input ${row.path} (US)`, found?.[1], typed.si, unit);
      read(`input ${row.path} (SI)`, found?.[system === 'us' ? 2 : 1], typed.si, unit);
    }

    expect(problems, `example ${i} (${system})`).toEqual([]);
  });
});
