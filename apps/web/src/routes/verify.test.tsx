import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { createMemoryRouter, RouterProvider } from 'react-router-dom';
import { fakeApi, type Reply } from '../test/render';
import { readVerifyCode } from '../features/verify/verify-code';
import { VerifyRoute } from './verify';

/** The page as a signed-out visitor opens it: no session in the cache. */
function open(path: string) {
  const client = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  const router = createMemoryRouter(
    [
      { path: '/verify', element: <VerifyRoute /> },
      { path: '/verify/:code', element: <VerifyRoute /> },
      { path: '/sign-in', element: <h1>Sign in</h1> },
    ],
    { initialEntries: [path] },
  );
  render(
    <QueryClientProvider client={client}>
      <RouterProvider router={router} />
    </QueryClientProvider>,
  );
  return router;
}

const matched = {
  match: true,
  projectNumber: 'LAM-2026-014',
  componentName: 'VDC-3 door plate',
  revisionNumber: 2,
  countersignedAt: '2026-03-02T09:30:00Z',
  contentHash: 'abcdef0123456789'.repeat(4),
  kind: 'circular-plate',
  thickness: 0.012,
  material: 'Stainless steel 304 (annealed)',
  verdict: 'pass',
  governing: {
    loadCase: 'Operating: full vacuum',
    checkLabel: 'Maximum stress against the allowable stress',
    utilisation: 0.9996,
  },
  preparedBy: 'Dana Okafor',
  countersignedBy: 'Ravi Lindqvist',
};

describe('the public verify page', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('says a code matches the current countersigned revision, and names it', async () => {
    const api = fakeApi({
      'GET /verify/abcd-ef01-2345': { body: { ...matched, status: 'current' } },
    });
    open('/verify/abcd-ef01-2345');
    const answer = await screen.findByRole('region', {
      name: /abcd-ef01-2345 matches a countersigned revision$/,
    });
    expect(answer).toHaveTextContent('LAM-2026-014');
    expect(answer).toHaveTextContent('VDC-3 door plate');
    expect(answer).toHaveTextContent(/Revision\s*2/);
    expect(answer).toHaveTextContent('latest countersigned revision');
    // What the sheet prints, to compare the paper with: thickness in both systems (12 mm = 0.4724 in),
    // the governing check never rounded up to 100 %, who prepared and who countersigned it.
    expect(answer).toHaveTextContent('Circular flat plate');
    expect(answer).toHaveTextContent('12 mm (0.4724 in)');
    expect(answer).toHaveTextContent('Stainless steel 304 (annealed)');
    expect(answer).toHaveTextContent('PASSES every check');
    expect(answer).toHaveTextContent(
      /Maximum stress against the allowable stress, load case Operating: full vacuum, at\s*99\.9 %/,
    );
    expect(answer).toHaveTextContent('Dana Okafor');
    expect(answer).toHaveTextContent('Ravi Lindqvist');
    expect(answer).toHaveTextContent(matched.contentHash);
    expect(screen.getByRole('complementary', { name: 'Screening caution' })).toBeInTheDocument();
    // No app navigation for a visitor: only the way to sign in.
    expect(screen.queryByRole('navigation')).toBeNull();
    expect(screen.getByRole('link', { name: 'Sign in' })).toHaveAttribute('href', '/sign-in');
    expect(api.calls).toEqual([
      expect.objectContaining({ method: 'GET', path: '/verify/abcd-ef01-2345' }),
    ]);
  });

  it('says clearly when the revision has been superseded', async () => {
    fakeApi({ 'GET /verify/abcd-ef01-2345': { body: { ...matched, status: 'superseded' } } });
    open('/verify/abcd-ef01-2345');
    const answer = await screen.findByRole('region', { name: /has been superseded/ });
    expect(answer).toHaveTextContent('A later revision of this component has been countersigned');
    expect(answer).toHaveTextContent('ask for the current sheet');
  });

  it('says when a code matches nothing', async () => {
    fakeApi({ 'GET /verify/0000-0000-0000': { body: { match: false } } });
    open('/verify/0000-0000-0000');
    const answer = await screen.findByRole('region', {
      name: /0000-0000-0000 does not match any countersigned revision/,
    });
    expect(answer).not.toHaveTextContent('Project number');
  });

  it('shows the server’s 400 for a malformed code in the address on the form field', async () => {
    fakeApi({
      'GET /verify/not-a-code': {
        status: 400,
        body: {
          error: {
            code: 'validation_failed',
            message: 'the request is not valid',
            fields: [
              {
                path: 'code',
                message: 'must be a 64-digit hash or a 12-digit verify code (xxxx-xxxx-xxxx)',
              },
            ],
          },
        },
      },
    });
    open('/verify/not-a-code');
    const field = await screen.findByLabelText('Verify code or content hash');
    expect(field).toHaveValue('not-a-code');
    await vi.waitFor(() =>
      expect(field).toHaveAccessibleDescription(
        'must be a 64-digit hash or a 12-digit verify code (xxxx-xxxx-xxxx)',
      ),
    );
    expect(field).toHaveAttribute('aria-invalid', 'true');
    expect(screen.queryByRole('region', { name: /match/ })).toBeNull();
  });

  it('checks a typed code on the form and opens its page, as the QR code would', async () => {
    const routes: Record<string, Reply> = {
      'GET /verify/abcd-ef01-2345': { body: { ...matched, status: 'current' } },
    };
    const api = fakeApi(routes);
    const router = open('/verify');
    const field = await screen.findByLabelText('Verify code or content hash');
    await userEvent.type(field, 'ABCD EF01');
    await userEvent.click(screen.getByRole('button', { name: 'Verify' }));
    expect(field).toHaveAccessibleDescription(/That is 8 digits/);
    expect(api.calls).toHaveLength(0);
    await userEvent.clear(field);
    await userEvent.type(field, ' ABCDef012345 ');
    await userEvent.click(screen.getByRole('button', { name: 'Verify' }));
    expect(router.state.location.pathname).toBe('/verify/abcd-ef01-2345');
    expect(await screen.findByRole('region', { name: /matches/ })).toBeInTheDocument();
  });

  it('answers a package code: its revisions, and what superseded the set', async () => {
    const api = fakeApi({
      'GET /verify/packages/pkg-3F9A-0c11-7be2': {
        body: {
          match: true,
          packageCode: 'PKG-3f9a-0c11-7be2',
          packageHash: '3f9a0c117be2'.padEnd(64, '0'),
          status: 'superseded',
          projectNumber: 'LAM-2026-031',
          projectName: 'Glovebox GB-3',
          issuedAt: '2026-03-02T09:30:00.000Z',
          components: [
            {
              componentName: 'GB-3 side wall',
              tag: 'GB-3-W1',
              kind: 'stiffened-wall',
              revisionNumber: 1,
              contentHash: matched.contentHash,
              verdict: 'pass',
              governing: {
                checkLabel: 'Bending stress at the stiffener',
                loadCase: 'Design underpressure',
                utilisation: 0.9996,
              },
              preparedBy: 'Ravi Lindqvist',
              submittedAt: '2026-03-01T08:00:00.000Z',
              countersignedBy: 'Dana Okafor',
              countersignedAt: '2026-03-02T09:00:00.000Z',
              status: 'superseded',
              supersededBy: 2,
            },
          ],
          countersignedSince: [],
        },
      },
    });
    open('/verify/pkg-3F9A-0c11-7be2');
    const answer = await screen.findByRole('region', { name: /has been superseded/ });
    expect(answer).toHaveTextContent(
      'superseded for component GB-3 side wall (revision 2 countersigned since)',
    );
    expect(answer).toHaveTextContent('LAM-2026-031 Glovebox GB-3');
    expect(answer).toHaveTextContent(/at\s*99\.9 %/);
    expect(answer).toHaveTextContent('Dana Okafor, 2026-03-02T09:00:00Z');
    expect(api.calls[0]?.path).toBe('/verify/packages/pkg-3F9A-0c11-7be2');
  });
});

describe('readVerifyCode', () => {
  it('reads codes and hashes as the server does (dashes, spaces and case ignored)', () => {
    expect(readVerifyCode('ABCD-EF01-2345')).toEqual({ ok: true, code: 'abcd-ef01-2345' });
    expect(readVerifyCode('f'.repeat(64))).toEqual({ ok: true, code: 'f'.repeat(64) });
    expect(readVerifyCode('')).toMatchObject({ ok: false });
    expect(readVerifyCode('abcd-ef01-234g')).toMatchObject({
      ok: false,
      reason: expect.stringMatching(/only the digits 0–9 and the letters a–f/),
    });
    expect(readVerifyCode('a'.repeat(13))).toMatchObject({
      ok: false,
      reason: expect.stringMatching(/13 digits/),
    });
  });

  it('reads package codes as typed', () => {
    expect(readVerifyCode(' pkg 3F9A-0c11-7be2 ')).toEqual({
      ok: true,
      code: 'PKG-3f9a-0c11-7be2',
    });
    expect(readVerifyCode('PKG-3f9a')).toMatchObject({ ok: false });
  });
});
