import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { Member } from '@hoopline/contract';
import { fakeApi, renderApp } from '../../test/render';
import { AddMemberForm } from './add-member-form';

const members: Member[] = [
  {
    user: { id: 'u-designer', name: 'Dana Designer', email: 'dana@example.test' },
    role: 'designer',
    addedAt: '2026-01-01T00:00:00Z',
  },
];
const carl = { id: 'u-carl', name: 'Carl Checker', email: 'carl@example.test' };

describe('AddMemberForm (a designer adds someone by e-mail)', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('looks the address up, then gives that person the chosen role', async () => {
    const api = fakeApi({
      'GET /users/lookup': { body: { user: carl } },
      'PUT /projects/p1/members/u-carl': {
        body: { user: carl, role: 'checker', addedAt: '2026-03-01T00:00:00Z' },
      },
    });
    renderApp(<AddMemberForm projectId="p1" members={members} />);
    await userEvent.type(await screen.findByLabelText('E-mail address'), ' carl@example.test ');
    await userEvent.selectOptions(screen.getByLabelText('Role'), 'Checker');
    await userEvent.click(screen.getByRole('button', { name: 'Add member' }));
    expect(await screen.findByRole('status')).toHaveTextContent(
      'Carl Checker (carl@example.test) added as Checker.',
    );
    expect(api.calls[0]).toMatchObject({
      method: 'GET',
      path: '/users/lookup',
      search: '?email=carl%40example.test',
    });
    expect(api.calls[1]).toMatchObject({ method: 'PUT', path: '/projects/p1/members/u-carl' });
    expect(JSON.parse(String(api.calls[1]!.init!.body))).toEqual({ role: 'checker' });
    expect(screen.getByLabelText('E-mail address')).toHaveValue('');
  });

  it('says on the field when no account has that address (404), and adds nobody', async () => {
    const api = fakeApi({
      'GET /users/lookup': {
        status: 404,
        body: { error: { code: 'not_found', message: 'user not found' } },
      },
    });
    renderApp(<AddMemberForm projectId="p1" members={members} />);
    const email = await screen.findByLabelText('E-mail address');
    await userEvent.type(email, 'nobody@example.test');
    await userEvent.click(screen.getByRole('button', { name: 'Add member' }));
    await vi.waitFor(() =>
      expect(email).toHaveAccessibleDescription(/No active Hoopline account has this address/),
    );
    expect(email).toHaveAttribute('aria-invalid', 'true');
    expect(api.calls.filter((c) => c.method === 'PUT')).toHaveLength(0);
  });

  it('needs an address, and does not look up someone already a member', async () => {
    const api = fakeApi({});
    renderApp(<AddMemberForm projectId="p1" members={members} />);
    await userEvent.click(await screen.findByRole('button', { name: 'Add member' }));
    const email = screen.getByLabelText('E-mail address');
    await vi.waitFor(() =>
      expect(email).toHaveAccessibleDescription('Enter the e-mail address they sign in with'),
    );
    await userEvent.type(email, 'DANA@example.test');
    await userEvent.click(screen.getByRole('button', { name: 'Add member' }));
    await vi.waitFor(() =>
      expect(email).toHaveAccessibleDescription(/Dana Designer is already a member \(Designer\)/),
    );
    expect(api.calls).toHaveLength(0);
  });

  it('shows the server’s refusal to add as a form error', async () => {
    fakeApi({
      'GET /users/lookup': { body: { user: carl } },
      'PUT /projects/p1/members/u-carl': {
        status: 403,
        body: {
          error: { code: 'not_a_designer', message: 'only a designer of the project can do this' },
        },
      },
    });
    renderApp(<AddMemberForm projectId="p1" members={members} />);
    await userEvent.type(await screen.findByLabelText('E-mail address'), 'carl@example.test');
    await userEvent.click(screen.getByRole('button', { name: 'Add member' }));
    expect(await screen.findByRole('alert')).toHaveTextContent(
      'only a designer of the project can do this',
    );
  });

  it('refuses to make the signed-in person their own checker, before asking the server', async () => {
    // ME is dana@example.test; here an administrator who is not yet a member.
    const api = fakeApi({});
    renderApp(<AddMemberForm projectId="p1" members={[]} />);
    await userEvent.type(await screen.findByLabelText('E-mail address'), 'Dana@example.test');
    const role = screen.getByLabelText('Role');
    await userEvent.selectOptions(role, 'Checker');
    await userEvent.click(screen.getByRole('button', { name: 'Add member' }));
    await vi.waitFor(() =>
      expect(role).toHaveAccessibleDescription(/Nobody makes themselves a checker/),
    );
    expect(api.calls).toHaveLength(0);
  });

  it('puts the server’s own_checker_role refusal on the role field', async () => {
    fakeApi({
      'GET /users/lookup': { body: { user: carl } },
      'PUT /projects/p1/members/u-carl': {
        status: 403,
        body: { error: { code: 'own_checker_role', message: 'nobody makes themselves a checker' } },
      },
    });
    renderApp(<AddMemberForm projectId="p1" members={members} />);
    await userEvent.type(await screen.findByLabelText('E-mail address'), 'carl@example.test');
    const role = screen.getByLabelText('Role');
    await userEvent.selectOptions(role, 'Checker');
    await userEvent.click(screen.getByRole('button', { name: 'Add member' }));
    await vi.waitFor(() =>
      expect(role).toHaveAccessibleDescription(/Nobody makes themselves a checker/),
    );
  });
});
