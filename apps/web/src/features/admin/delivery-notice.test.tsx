import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { Invitation, User } from '@hoopline/contract';
import { PeopleRoute } from '../../routes/people';
import { fakeApi, ME, renderApp } from '../../test/render';

const admin = { ...ME, user: { ...ME.user, isAdmin: true } };
const invitation: Invitation = {
  id: 'i1',
  email: 'ines@example.test',
  name: 'Ines Invitee',
  isAdmin: false,
  invitedBy: null,
  createdAt: '2026-03-01T10:00:00Z',
  expiresAt: '2026-03-08T10:00:00Z',
  acceptedAt: null,
};
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

async function invite() {
  await userEvent.type(await screen.findByLabelText(/^E-mail/), 'ines@example.test');
  await userEvent.type(screen.getByLabelText(/^Name/), 'Ines Invitee');
  await userEvent.click(screen.getByRole('button', { name: 'Send invitation' }));
}

describe('People: how invitations and resets were delivered', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('says an invitation was mailed, and shows no link, when the server mailed it', async () => {
    fakeApi({
      'GET /users': page([ravi]),
      'GET /invitations': page([]),
      'POST /invitations': { status: 201, body: { invitation, delivery: 'mail' } },
    });
    renderApp(<PeopleRoute />, { me: admin });
    await invite();
    expect(
      await screen.findByText(/^Invitation mailed to ines@example\.test\./),
    ).toBeInTheDocument();
    expect(screen.queryByRole('textbox', { name: 'Link' })).toBeNull();
  });

  it('keeps the copyable link when the server has no mail server and shows the token', async () => {
    fakeApi({
      'GET /users': page([ravi]),
      'GET /invitations': page([]),
      'POST /invitations': {
        status: 201,
        body: { invitation, delivery: 'shown', token: 'tok-abc' },
      },
    });
    renderApp(<PeopleRoute />, { me: admin });
    await invite();
    expect(await screen.findByRole('textbox', { name: 'Link' })).toHaveValue(
      `${window.location.origin}/invitation/tok-abc`,
    );
    expect(screen.getByText(/No mail server is configured/)).toBeInTheDocument();
  });

  it('says a reset link was mailed, or shows it, as the server answered', async () => {
    let delivery: 'mail' | 'shown' = 'mail';
    fakeApi({
      'GET /users': page([ravi]),
      'GET /invitations': page([]),
      'POST /users/u-ravi/password-reset': () => ({
        status: 201,
        body:
          delivery === 'mail'
            ? { delivery, expiresAt: '2026-03-02T10:00:00Z' }
            : { delivery, token: 'reset-1', expiresAt: '2026-03-02T10:00:00Z' },
      }),
    });
    renderApp(<PeopleRoute />, { me: admin });
    const reset = await screen.findByRole('button', { name: /Reset password\s*of Ravi Reader/ });
    await userEvent.click(reset);
    expect(
      await screen.findByText(/^Reset link mailed to ravi@example\.test\./),
    ).toBeInTheDocument();
    delivery = 'shown';
    await userEvent.click(reset);
    expect(await screen.findByRole('textbox', { name: 'Link' })).toHaveValue(
      `${window.location.origin}/reset-password/reset-1`,
    );
    expect(screen.queryByText(/^Reset link mailed/)).toBeNull();
  });
});
