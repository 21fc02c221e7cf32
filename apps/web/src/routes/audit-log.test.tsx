import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { AuditEvent } from '@hoopline/contract';
import { fakeApi, ME, renderApp } from '../test/render';
import { AuditLogRoute } from './audit-log';

const admin = { ...ME, user: { ...ME.user, isAdmin: true } };
const dana = { id: 'u-dana', name: 'Dana Okafor' };
const countersigned: AuditEvent = {
  id: 'e1',
  actor: dana,
  action: 'revision.countersigned',
  entityType: 'revision',
  entityId: 'r-3',
  projectId: 'p-7',
  target: {
    project: { id: 'p-7', number: 'P-107', name: 'Drying line' },
    component: { id: 'c-2', tag: 'D-2', name: 'Door' },
    revision: { id: 'r-3', number: 3 },
    person: null,
    fileName: null,
  },
  summary: { before: { status: 'submitted' }, after: { status: 'countersigned' } },
  createdAt: '2026-12-03T08:33:00.123Z',
};
const oldCode: AuditEvent = {
  ...countersigned,
  id: 'e2',
  action: 'legacy.thing',
  entityType: 'gadget',
  target: { project: null, component: null, revision: null, person: null, fileName: null },
  summary: {},
  createdAt: '2026-12-02T23:59:59Z',
};
const page = (items: unknown[]) => ({
  body: { items, page: 1, pageSize: 50, total: items.length },
});
const projects = page([
  { id: 'p-7', number: 'P-107', name: 'Drying line' },
  { id: 'p-8', number: 'P-108', name: 'Bell jar' },
]);

describe('Audit log page (issue 16.9)', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('shows each event in words with links to its records and an ISO UTC time', async () => {
    fakeApi({ 'GET /audit': page([countersigned, oldCode]), 'GET /projects': projects });
    renderApp(<AuditLogRoute />, { me: admin, path: '/audit-log' });
    const table = await screen.findByRole('table');
    const row = (await within(table).findByText('2026-12-03T08:33:00Z')).closest('tr')!;
    expect(row.textContent).toContain('Dana Okafor countersigned revision 3 of Door D-2');
    expect(within(row).getByRole('link', { name: 'Door D-2' })).toHaveAttribute(
      'href',
      '/components/c-2',
    );
    expect(within(row).getByRole('link', { name: 'revision 3' })).toHaveAttribute(
      'href',
      '/revisions/r-3',
    );
    expect(within(row).getByRole('link', { name: 'Dana Okafor' })).toHaveAttribute(
      'href',
      '/audit-log?actorId=u-dana',
    );
    expect(within(row).getByText('2026-12-03T08:33:00Z')).toBeInTheDocument();
    expect(within(row).getByText('Revision countersigned')).toBeInTheDocument();

    // A code older than the list shows as the code.
    const old = within(table).getByText('2026-12-02T23:59:59Z').closest('tr')!;
    expect(old.textContent).toContain('Dana Okafor: legacy.thing');
  });

  it('filters by project, and the CSV link carries the same filters', async () => {
    const { calls } = fakeApi({ 'GET /audit': page([countersigned]), 'GET /projects': projects });
    renderApp(<AuditLogRoute />, { me: admin, path: '/audit-log?page=2' });
    const select = await screen.findByRole('combobox', { name: 'Project' });
    await screen.findByRole('option', { name: 'P-108 Bell jar' });
    await userEvent.selectOptions(select, 'p-8');
    await userEvent.selectOptions(
      screen.getByRole('combobox', { name: 'Action' }),
      'sheet.downloaded',
    );
    await userEvent.click(screen.getByRole('button', { name: 'Filter' }));
    await waitFor(() =>
      expect(
        calls.some(
          (c) =>
            c.path === '/audit' &&
            new URLSearchParams(c.search).get('projectId') === 'p-8' &&
            new URLSearchParams(c.search).get('action') === 'sheet.downloaded',
        ),
      ).toBe(true),
    );
    const csv = screen.getByRole('link', { name: 'Download CSV' });
    const href = new URL(csv.getAttribute('href')!, 'http://localhost');
    expect(href.pathname).toBe('/api/audit.csv');
    expect(href.searchParams.get('projectId')).toBe('p-8');
    expect(href.searchParams.get('action')).toBe('sheet.downloaded');
    expect(href.searchParams.has('page')).toBe(false);
  });
});
