import type { ComponentTable, ComponentTableRow } from '@hoopline/contract';
import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { sortRows } from '../../components/data-table';
import { renderApp } from '../../test/render';
import { ComponentTableView } from './component-table';

const row = (
  name: string,
  revision: Partial<NonNullable<ComponentTableRow['revision']>> | null,
  utilisation: number | null,
  issued: number | null = null,
): ComponentTableRow => ({
  component: { id: name, name, kind: 'stiffened-wall', tag: '' },
  revision: revision
    ? {
        id: `${name}-r`,
        number: 1,
        status: 'draft',
        superseded: false,
        verdict: utilisation !== null && utilisation > 1 ? 'fail' : 'pass',
        engineVersion: '1.0.0',
        createdAt: '2026-03-01T10:00:00Z',
        submittedAt: null,
        decidedAt: null,
        ...revision,
      }
    : null,
  governing:
    utilisation === null
      ? null
      : {
          checkId: 'x',
          checkLabel: `Check of ${name}`,
          loadCase: 'Design underpressure',
          utilisation,
        },
  issuedRevisionNumber: issued,
});

const TABLE: ComponentTable = {
  projectId: 'p1',
  engineVersion: '1.0.0',
  rows: [
    row('Viewport', { number: 3, status: 'submitted' }, 0.9996),
    row('Oven wall', { number: 10, status: 'countersigned' }, 1.0004, 10),
    row('Antechamber', { number: 2, status: 'returned', engineVersion: '0.9.0' }, 0.42, 1),
    row('Blank', null, null),
  ],
};

const names = () =>
  screen
    .getAllByRole('row')
    .slice(1)
    .map((r) => within(r).getAllByRole('cell')[0]!.textContent);

describe('the project table', () => {
  it('opens sorted by name, and sorts by any column both ways, blanks last', async () => {
    const user = userEvent.setup();
    renderApp(<ComponentTableView table={TABLE} empty="none" />);
    expect(names()).toEqual(['Antechamber', 'Blank', 'Oven wall', 'Viewport']);
    const header = (name: string) => screen.getByRole('button', { name: new RegExp(`^${name}`) });

    await user.click(header('Utilisation'));
    expect(names()).toEqual(['Antechamber', 'Viewport', 'Oven wall', 'Blank']);
    expect(screen.getByRole('columnheader', { name: /Utilisation/ })).toHaveAttribute(
      'aria-sort',
      'ascending',
    );
    await user.click(header('Utilisation'));
    expect(names()).toEqual(['Oven wall', 'Viewport', 'Antechamber', 'Blank']);

    // Revision numbers as numbers (10 after 3), statuses in the workflow's order.
    await user.click(header('Revision'));
    expect(names()).toEqual(['Antechamber', 'Viewport', 'Oven wall', 'Blank']);
    await user.click(header('Status'));
    expect(names()).toEqual(['Viewport', 'Oven wall', 'Antechamber', 'Blank']);
    await user.click(header('Verdict'));
    await user.click(header('Verdict'));
    expect(names()[0]).toBe('Oven wall'); // the fail first, descending
  });

  it('prints utilisation by present’s rule: a pass never shows 100 %, nor a fail', () => {
    renderApp(<ComponentTableView table={TABLE} empty="none" />);
    const cells = (name: string) =>
      within(screen.getByRole('row', { name: new RegExp(`^${name}`) }))
        .getAllByRole('cell')
        .map((c) => c.textContent);
    expect(cells('Viewport')).toContain('99.9 %');
    expect(cells('Oven wall')).toContain('100.1 %');
    expect(cells('Blank')).toContain('–');
    // A report another engine version wrote says so, and is not screened again.
    expect(screen.getByRole('row', { name: /^Antechamber/ })).toHaveTextContent(
      /stored report from engine 0\.9\.0 .*not screened again/,
    );
    expect(screen.getByRole('row', { name: /^Oven wall/ })).toHaveTextContent('Rev 10');
  });

  it('sorts stably, nulls last in either order', () => {
    const rows = [
      { n: 'a', v: 2 },
      { n: 'b', v: null },
      { n: 'c', v: 1 },
      { n: 'd', v: 2 },
    ];
    const column = { sortValue: (r: (typeof rows)[number]) => r.v };
    expect(sortRows(rows, column, 'asc').map((r) => r.n)).toEqual(['c', 'a', 'd', 'b']);
    expect(sortRows(rows, column, 'desc').map((r) => r.n)).toEqual(['a', 'd', 'c', 'b']);
  });
});
