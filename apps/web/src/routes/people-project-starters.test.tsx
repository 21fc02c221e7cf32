import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { User } from '@hoopline/contract';
import { fakeApi, ME, renderApp } from '../test/render';
import { PeopleRoute } from './people';
import { ProjectsRoute } from './projects';

const admin = { ...ME, user: { ...ME.user, isAdmin: true } };
const ravi: User = {
  id: 'u-ravi',
  email: 'ravi@example.test',
  name: 'Ravi Reader',
  isAdmin: false,
  active: true,
  unitSystem: 'si',
  vacuumUnit: null,
  mayCreateProjects: false,
  createdAt: '2026-01-01T00:00:00Z',
};
const page = (items: unknown[]) => ({
  body: { items, page: 1, pageSize: 25, total: items.length },
});

describe('People: who may start projects (issue 17.1)', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('shows the setting, changes it, and names a person under "named"', async () => {
    const { calls } = fakeApi({
      'GET /users': page([ravi]),
      'GET /invitations': page([]),
      'GET /settings': { body: { projectCreation: 'named' } },
      'PATCH /settings': { body: { projectCreation: 'everyone' } },
      'PATCH /users/u-ravi': { body: { ...ravi, mayCreateProjects: true } },
    });
    renderApp(<PeopleRoute />, { me: admin });
    const named = await screen.findByRole('radio', { name: /people ticked/ });
    await waitFor(() => expect(named).toBeChecked());
    const tick = await screen.findByRole('checkbox', { name: 'Ravi Reader may start projects' });
    expect(tick).not.toBeChecked();
    await userEvent.click(tick);
    await waitFor(() =>
      expect(calls.find((c) => c.method === 'PATCH' && c.path === '/users/u-ravi')).toBeDefined(),
    );
    const patch = calls.find((c) => c.method === 'PATCH' && c.path === '/users/u-ravi')!;
    expect(JSON.parse(String(patch.init?.body))).toEqual({ mayCreateProjects: true });

    await userEvent.click(screen.getByRole('radio', { name: 'Everyone with an account' }));
    await waitFor(() =>
      expect(calls.find((c) => c.method === 'PATCH' && c.path === '/settings')).toBeDefined(),
    );
    const setting = calls.find((c) => c.method === 'PATCH' && c.path === '/settings')!;
    expect(JSON.parse(String(setting.init?.body))).toEqual({ projectCreation: 'everyone' });
    await waitFor(() =>
      expect(screen.getByRole('radio', { name: 'Everyone with an account' })).toBeChecked(),
    );
  });

  it('shows each person’s units, with the vacuum unit where they chose one', async () => {
    fakeApi({
      'GET /users': page([
        ravi,
        { ...ravi, id: 'u-mo', name: 'Mo Metric', unitSystem: 'us', vacuumUnit: 'mTorr' },
      ]),
      'GET /invitations': page([]),
      'GET /settings': { body: { projectCreation: 'named' } },
    });
    renderApp(<PeopleRoute />, { me: admin });
    expect(await screen.findByRole('row', { name: /Mo Metric/ })).toHaveTextContent(
      'US, vacuum in mTorr',
    );
    const plain = screen.getByRole('row', { name: /Ravi Reader/ });
    expect(plain).toHaveTextContent('SI');
    expect(plain).not.toHaveTextContent('vacuum');
  });

  it('offers "New project" only to those who may start one', async () => {
    fakeApi({ 'GET /projects': page([]) });
    const { unmount } = renderApp(<ProjectsRoute />, { me: { ...ME, canCreateProjects: false } });
    expect(await screen.findByRole('heading', { name: 'Projects' })).toBeInTheDocument();
    expect(screen.queryByRole('link', { name: 'New project' })).toBeNull();
    unmount();
    renderApp(<ProjectsRoute />, { me: ME });
    expect(await screen.findByRole('link', { name: 'New project' })).toBeInTheDocument();
  });
});
