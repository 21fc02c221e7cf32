import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { Route, Routes } from 'react-router-dom';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { MemberList, Project } from '@hoopline/contract';
import { fakeApi, ME, renderApp } from '../test/render';
import { ProjectMembersRoute } from './project-members';

const project: Project = {
  id: 'p1',
  number: 'HL-1',
  name: 'Larchmont bell jar',
  client: '',
  site: {},
  siteAsTyped: {},
  ambientPressure: 101325,
  designBasis: { allowableStress: 'asme-viii-1', barometer: 'standard' },
  designTemperature: null,
  signOffPassword: false,
  unitSystem: 'si',
  notes: '',
  version: 1,
  createdAt: '2026-01-01T00:00:00Z',
  updatedAt: '2026-01-01T00:00:00Z',
  myRole: 'designer',
};
const dana = { id: 'u-designer', name: 'Dana Designer', email: 'dana@example.test' };
const olga = { id: 'u-olga', name: 'Olga Owner', email: 'olga@example.test' };
const finn = { id: 'u-finn', name: 'Finn Fabricator', email: 'finn@example.test' };
const managers: MemberList['managers'] = [
  { id: olga.id, name: olga.name, owner: true },
  { id: 'u-ada', name: 'Ada Admin', owner: false },
];
const list = (over: Partial<MemberList>): MemberList => ({
  items: [
    { user: olga, role: 'designer', addedAt: '2026-01-01T00:00:00Z' },
    { user: dana, role: 'designer', addedAt: '2026-01-01T00:00:00Z' },
    { user: finn, role: 'fabricator', addedAt: '2026-01-01T00:00:00Z' },
  ],
  canManage: false,
  managers,
  hasChecker: false,
  ...over,
});

function renderMembers() {
  return renderApp(
    <Routes>
      <Route path="/projects/:projectId/members" element={<ProjectMembersRoute />} />
    </Routes>,
    { path: '/projects/p1/members' },
  );
}

describe('Members page: who changes roles (issue 16.3)', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('a designer who is not the owner sees roles as text, no Remove, and who can change them', async () => {
    fakeApi({
      'GET /projects/p1': { body: project },
      'GET /projects/p1/members': { body: list({ canManage: false }) },
    });
    renderMembers();
    const table = await screen.findByRole('table', { name: 'Project members' });
    expect(within(table).getAllByText('Designer').length).toBeGreaterThan(0);
    expect(screen.queryByRole('combobox', { name: /Role of/ })).toBeNull();
    expect(screen.queryByRole('button', { name: /Remove/ })).toBeNull();
    expect(screen.queryByText('Add a member')).toBeNull();
    expect(
      screen.getByText(
        /Only Olga Owner \(the project’s owner\) and the administrator Ada Admin add members and change roles/,
      ),
    ).toBeInTheDocument();
    // No checker: said, with who can add one.
    expect(screen.getByRole('status')).toHaveTextContent(
      'This project has no checker: nobody can countersign its revisions yet. Olga Owner (the project’s owner) and the administrator Ada Admin can add one.',
    );
  });

  it('the owner gets role controls, cannot pick checker for themselves, and changes another member', async () => {
    const { calls } = fakeApi({
      'GET /projects/p1': { body: project },
      'GET /projects/p1/members': { body: list({ canManage: true, hasChecker: true }) },
      'PUT /projects/p1/members/u-finn': {
        body: { user: finn, role: 'checker', addedAt: '2026-01-01T00:00:00Z' },
      },
    });
    renderApp(
      <Routes>
        <Route path="/projects/:projectId/members" element={<ProjectMembersRoute />} />
      </Routes>,
      { path: '/projects/p1/members', me: { ...ME, user: { ...ME.user, id: olga.id } } },
    );
    const own = await screen.findByRole('combobox', { name: 'Role of Olga Owner' });
    expect(within(own).getByRole('option', { name: 'Checker' })).toBeDisabled();
    const other = screen.getByRole('combobox', { name: 'Role of Finn Fabricator' });
    expect(within(other).getByRole('option', { name: 'Checker' })).not.toBeDisabled();
    expect(screen.getByRole('button', { name: /Remove\s*Finn Fabricator/ })).toBeInTheDocument();
    expect(screen.queryByRole('status')).toBeNull();
    await userEvent.selectOptions(other, 'checker');
    await waitFor(() => expect(calls.find((c) => c.method === 'PUT')).toBeDefined());
    const put = calls.find((c) => c.method === 'PUT')!;
    expect(put.path).toBe('/projects/p1/members/u-finn');
    expect(JSON.parse(String(put.init?.body))).toEqual({ role: 'checker' });
  });
});
