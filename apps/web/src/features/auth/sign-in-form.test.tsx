import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { fakeApi, ME, renderApp } from '../../test/render';
import { SignInForm } from './sign-in-form';

describe('SignInForm', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('names each missing field before sending anything', async () => {
    const api = fakeApi({});
    renderApp(<SignInForm onSignedIn={() => undefined} />);
    await userEvent.click(await screen.findByRole('button', { name: 'Sign in' }));
    expect(await screen.findByText('Enter your e-mail address')).toBeInTheDocument();
    expect(screen.getByText('Enter your password')).toBeInTheDocument();
    expect(screen.getByLabelText(/E-mail/)).toHaveAttribute('aria-invalid', 'true');
    expect(api.calls).toHaveLength(0);
  });

  it('says a malformed address is one', async () => {
    fakeApi({});
    renderApp(<SignInForm onSignedIn={() => undefined} />);
    await userEvent.type(await screen.findByLabelText(/E-mail/), 'dana');
    await userEvent.tab();
    expect(
      await screen.findByText('Enter an e-mail address such as name@example.com'),
    ).toBeInTheDocument();
  });

  it('signs in and hands over the session', async () => {
    const api = fakeApi({ 'POST /auth/sign-in': { body: ME } });
    const onSignedIn = vi.fn();
    renderApp(<SignInForm onSignedIn={onSignedIn} />);
    await userEvent.type(await screen.findByLabelText(/E-mail/), ' dana@example.test ');
    await userEvent.type(screen.getByLabelText(/Password/), 'correct horse');
    await userEvent.click(screen.getByRole('button', { name: 'Sign in' }));
    await vi.waitFor(() => expect(onSignedIn).toHaveBeenCalledWith(ME));
    expect(JSON.parse(String(api.calls[0]!.init!.body))).toEqual({
      email: 'dana@example.test',
      password: 'correct horse',
    });
  });

  it('says when the credentials are wrong, without saying which', async () => {
    fakeApi({
      'POST /auth/sign-in': {
        status: 401,
        body: { error: { code: 'unauthorized', message: 'x' } },
      },
    });
    renderApp(<SignInForm onSignedIn={() => undefined} />);
    await userEvent.type(await screen.findByLabelText(/E-mail/), 'dana@example.test');
    await userEvent.type(screen.getByLabelText(/Password/), 'wrong password');
    await userEvent.click(screen.getByRole('button', { name: 'Sign in' }));
    expect(await screen.findByRole('alert')).toHaveTextContent(
      'The e-mail address or password is not right.',
    );
  });

  it('puts the server’s field errors on the fields', async () => {
    fakeApi({
      'POST /auth/sign-in': {
        status: 400,
        body: {
          error: {
            code: 'validation_failed',
            message: 'invalid',
            fields: [{ path: 'email', message: 'is not an address we know how to read' }],
          },
        },
      },
    });
    renderApp(<SignInForm onSignedIn={() => undefined} />);
    await userEvent.type(await screen.findByLabelText(/E-mail/), 'dana@example.test');
    await userEvent.type(screen.getByLabelText(/Password/), 'something');
    await userEvent.click(screen.getByRole('button', { name: 'Sign in' }));
    expect(await screen.findByText('is not an address we know how to read')).toBeInTheDocument();
  });
});
