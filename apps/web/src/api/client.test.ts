import { afterEach, describe, expect, it, vi } from 'vitest';
import {
  ApiError,
  apiFetch,
  ConnectionError,
  fileNameFromDisposition,
  json,
  onSessionLost,
} from './client';
import { fakeApi } from '../test/render';

describe('apiFetch', () => {
  afterEach(() => {
    vi.unstubAllGlobals();
    document.cookie = 'hl_csrf=; expires=Thu, 01 Jan 1970 00:00:00 GMT; path=/';
  });

  it('echoes the hl_csrf cookie in x-csrf-token on writes, not on reads', async () => {
    document.cookie = 'hl_csrf=abc123; path=/';
    const api = fakeApi({
      'POST /projects': { body: { id: 'p' } },
      'GET /projects': { body: { items: [] } },
    });
    await apiFetch('/projects', json('POST', { number: '1' }));
    await apiFetch('/projects');
    const headers = (i: number) => api.calls[i]!.init!.headers as Record<string, string>;
    expect(headers(0)['x-csrf-token']).toBe('abc123');
    expect(headers(0)['content-type']).toBe('application/json');
    expect(headers(1)['x-csrf-token']).toBeUndefined();
  });

  it('refreshes once for parallel requests that meet an expired access token, then retries each', async () => {
    let expired = true;
    const api = fakeApi({
      'GET /me': () =>
        expired
          ? { status: 401, body: { error: { code: 'token_expired', message: 'expired' } } }
          : { body: { user: { id: 'u' } } },
      'GET /projects': () =>
        expired
          ? { status: 401, body: { error: { code: 'token_expired', message: 'expired' } } }
          : { body: { items: [] } },
      'POST /auth/refresh': () => {
        expired = false;
        return { body: {} };
      },
    });
    const [me, projects] = await Promise.all([apiFetch('/me'), apiFetch('/projects')]);
    expect(me).toEqual({ user: { id: 'u' } });
    expect(projects).toEqual({ items: [] });
    expect(api.calls.filter((c) => c.path === '/auth/refresh')).toHaveLength(1);
    expect(api.calls.filter((c) => c.path === '/me')).toHaveLength(2);
  });

  it('reports a lost session when the refresh is refused', async () => {
    fakeApi({
      'GET /me': { status: 401, body: { error: { code: 'unauthorized', message: 'sign in' } } },
      'POST /auth/refresh': {
        status: 401,
        body: { error: { code: 'unauthorized', message: 'no' } },
      },
    });
    const lost = vi.fn();
    const stop = onSessionLost(lost);
    await expect(apiFetch('/me')).rejects.toMatchObject({ status: 401, code: 'unauthorized' });
    expect(lost).toHaveBeenCalledTimes(1);
    stop();
  });

  it('does not refresh on a failed sign-in: the 401 is the answer', async () => {
    const api = fakeApi({
      'POST /auth/sign-in': {
        status: 401,
        body: { error: { code: 'unauthorized', message: 'wrong' } },
      },
    });
    await expect(apiFetch('/auth/sign-in', json('POST', {}))).rejects.toBeInstanceOf(ApiError);
    expect(api.calls).toHaveLength(1);
  });

  it('carries the field errors of a 400', async () => {
    fakeApi({
      'POST /projects': {
        status: 400,
        body: {
          error: {
            code: 'validation_failed',
            message: 'bad',
            fields: [{ path: 'number', message: 'is taken' }],
          },
        },
      },
    });
    await expect(apiFetch('/projects', json('POST', {}))).rejects.toMatchObject({
      code: 'validation_failed',
      fields: [{ path: 'number', message: 'is taken' }],
    });
  });

  it('turns a network failure into ConnectionError', async () => {
    vi.stubGlobal(
      'fetch',
      vi.fn(async () => Promise.reject(new TypeError('offline'))),
    );
    await expect(apiFetch('/me')).rejects.toBeInstanceOf(ConnectionError);
  });
});

describe('fileNameFromDisposition (RFC 6266)', () => {
  it('prefers the UTF-8 filename* to the ASCII fallback', () => {
    expect(
      fileNameFromDisposition(
        `attachment; filename="HL-1_T_r_rev2.pdf"; filename*=UTF-8''HL-1_T%C3%BCr_rev2.pdf`,
      ),
    ).toBe('HL-1_Tür_rev2.pdf');
  });
  it('reads a plain quoted or bare name, and nothing from nothing', () => {
    expect(fileNameFromDisposition('attachment; filename="a \\"b\\".pdf"')).toBe('a "b".pdf');
    expect(fileNameFromDisposition('inline; filename=photo.png')).toBe('photo.png');
    expect(fileNameFromDisposition(`attachment; filename*=UTF-8''%E0%A4%A; filename="x.pdf"`)).toBe(
      'x.pdf',
    );
    expect(fileNameFromDisposition('attachment')).toBeNull();
    expect(fileNameFromDisposition(null)).toBeNull();
  });
});
