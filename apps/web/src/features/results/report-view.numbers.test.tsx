import { METHODS, screen as runEngine, type Report } from '@hoopline/calc';
import { presentReport, UNIT_SYSTEMS } from '@hoopline/present';
import { misprint } from '@hoopline/present/testing';
import { render, screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { ChecksByCase } from './report-view';
import { TrailTable } from './trail-table';

/**
 * The screen half of "screen and sheet never disagree": the report view
 * shows exactly the texts of presentReport (the sheet's test,
 * apps/api/src/sheets/readme-sheets.test.ts, checks the PDF against the same
 * texts), and every number it shows reads back as the engine's value.
 */
const EXAMPLES: { name: string; report: Report }[] = METHODS.flatMap((m) =>
  m.examples.map((e) => ({ name: e.name, report: runEngine(e.input) })),
);

// Collapse layout whitespace only: a thin space (U+2009) is part of a number.
const collapse = (text: string | null) => (text ?? '').replace(/[ \t\r\n]+/g, ' ').trim();

describe.each(EXAMPLES)('the report view of “$name”', ({ report }) => {
  it.each(UNIT_SYSTEMS)(
    'shows the presented checks and trail, numbers that stand for the report (%s)',
    (system) => {
      const shown = presentReport(report, system);
      const problems: string[] = [];
      const { unmount } = render(
        <>
          <ChecksByCase report={report} system={system} />
          <TrailTable report={report} system={system} />
        </>,
      );
      shown.cases.forEach((c, index) => {
        const article = screen.getByRole('article', { name: `Load case ${c.name}` });
        expect(collapse(article.textContent)).toContain(`Δp ${c.differential}, ${c.direction}`);
        const source = report.cases[index]!;
        const dp = misprint(c.differential, Math.abs(source.loadCase.differential), 'Pa', 4);
        if (dp) problems.push(dp);
        c.checks.forEach((check, j) => {
          const row = within(article).getByRole('row', {
            name: new RegExp(`^${escape(check.label)}`),
          });
          const cells = within(row)
            .getAllByRole('cell')
            .map((cell) => collapse(cell.textContent));
          expect(cells[0]).toBe(check.demand);
          expect(cells[1]).toBe(check.capacity);
          expect(cells[2]).toContain(check.utilisation);
          const k = source.checks[j]!;
          for (const [text, value] of [
            [check.demand, k.demand],
            [check.capacity, k.capacity],
          ] as const) {
            const problem = misprint(text, value, k.unit, 4);
            if (problem) problems.push(`${check.label}: ${problem}`);
          }
        });
      });
      const trail = screen.getByRole('table', { name: 'Calculation trail' });
      const rows = within(trail)
        .getAllByRole('row')
        .filter((row) => /^\d+$/.test(collapse(row.firstElementChild?.textContent ?? null)));
      expect(rows).toHaveLength(shown.steps.length);
      rows.forEach((row, i) => {
        const step = shown.steps[i]!;
        const cells = [...row.children].map((cell) => collapse(cell.textContent));
        expect(cells[0]).toBe(String(step.number));
        expect(cells[1]).toBe(step.label);
        expect(cells[4]).toBe(step.value);
        expect(cells[5]).toBe(step.unit);
        expect(cells[6]).toBe(step.shownAs);
      });
      unmount();
      expect(problems).toEqual([]);
    },
    30_000,
  );
});

function escape(text: string): string {
  return text.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
}
