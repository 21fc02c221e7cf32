import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { fakeApi, ME, renderApp } from '../../test/render';
import { SheetDownload, sheetKind } from './sheet-download';

const pdf = '%PDF-1.7 stamped sheet';
const sheetReply = (stamp: 'review' | 'draft', name: string) => ({
  raw: pdf,
  headers: {
    'content-type': 'application/pdf',
    'content-disposition': `attachment; filename="${name.replace(/[^\x20-\x7e]/g, '_')}"; filename*=UTF-8''${encodeURIComponent(name)}`,
    'x-hoopline-stamp': stamp,
  },
});

describe('who gets which sheet', () => {
  it('the review sheet of a countersigned revision for every role; a draft preview for designers and checkers only', () => {
    expect(sheetKind({ status: 'countersigned' }, 'fabricator')).toBe('review');
    expect(sheetKind({ status: 'countersigned' }, null)).toBe('review');
    expect(sheetKind({ status: 'submitted' }, 'designer')).toBe('draft');
    expect(sheetKind({ status: 'draft' }, 'checker')).toBe('draft');
    expect(sheetKind({ status: 'returned' }, 'checker')).toBe('draft');
    // A fabricator is never offered a sheet of a revision that is not countersigned (the API says 404).
    expect(sheetKind({ status: 'submitted' }, 'fabricator')).toBeNull();
    expect(sheetKind({ status: 'draft' }, null)).toBeNull();
  });
});

describe('SheetDownload', () => {
  let saved: { href: string; download: string }[] = [];
  let blobs: Blob[] = [];
  beforeEach(() => {
    saved = [];
    blobs = [];
    // jsdom has no object URLs: stand in for them, keeping the blob to read back.
    URL.createObjectURL = vi.fn((blob: Blob) => {
      blobs.push(blob);
      return `blob:sheet-${blobs.length}`;
    });
    URL.revokeObjectURL = vi.fn();
    vi.spyOn(HTMLAnchorElement.prototype, 'click').mockImplementation(function (
      this: HTMLAnchorElement,
    ) {
      saved.push({ href: this.href, download: this.download });
    });
  });
  afterEach(() => {
    vi.unstubAllGlobals();
    vi.restoreAllMocks();
  });

  it('downloads the chosen paper size as a Blob saved under the server’s file name', async () => {
    const api = fakeApi({
      'GET /revisions/r1/sheet.pdf': sheetReply('review', 'HL-1_Door-plate_rev2.pdf'),
    });
    renderApp(
      <SheetDownload
        revision={{ id: 'r1', number: 2 }}
        kind="review"
        context="Door plate revision 2"
      />,
    );
    await userEvent.selectOptions(
      await screen.findByLabelText('Paper size of Door plate revision 2'),
      'US Letter',
    );
    await userEvent.click(
      screen.getByRole('button', { name: /^Download sheet\s*of Door plate revision 2$/ }),
    );
    await vi.waitFor(() => expect(saved).toHaveLength(1));
    expect(api.calls[0]).toMatchObject({
      method: 'GET',
      path: '/revisions/r1/sheet.pdf',
      search: '?paper=letter',
    });
    expect(saved[0]).toEqual({ href: 'blob:sheet-1', download: 'HL-1_Door-plate_rev2.pdf' });
    expect(await blobs[0]!.text()).toBe(pdf);
  });

  it('starts from A4, or US Letter for someone who reads US customary units', async () => {
    fakeApi({});
    renderApp(<SheetDownload revision={{ id: 'r1', number: 2 }} kind="review" />, {
      me: { ...ME, user: { ...ME.user, unitSystem: 'us' } },
    });
    expect(await screen.findByLabelText('Paper size')).toHaveValue('letter');
  });

  it('starts from the project’s paper where it is known: Letter for a US project, A4 for SI, whoever reads', async () => {
    fakeApi({});
    const { unmount } = renderApp(
      <SheetDownload revision={{ id: 'r1', number: 2 }} kind="review" unitSystem="us" />,
    );
    expect(await screen.findByLabelText('Paper size')).toHaveValue('letter');
    unmount();
    renderApp(<SheetDownload revision={{ id: 'r1', number: 2 }} kind="review" unitSystem="si" />, {
      me: { ...ME, user: { ...ME.user, unitSystem: 'us' } },
    });
    expect(await screen.findByLabelText('Paper size')).toHaveValue('a4');
  });

  it('names a draft preview as such and keeps a UTF-8 file name', async () => {
    fakeApi({ 'GET /revisions/r1/sheet.pdf': sheetReply('draft', 'HL-1_Tür_rev2_DRAFT.pdf') });
    renderApp(<SheetDownload revision={{ id: 'r1', number: 2 }} kind="draft" />);
    await userEvent.click(await screen.findByRole('button', { name: 'Preview draft sheet' }));
    await vi.waitFor(() => expect(saved).toHaveLength(1));
    expect(saved[0]!.download).toBe('HL-1_Tür_rev2_DRAFT.pdf');
  });

  it('goes through the client: an expired session is refreshed and the download retried', async () => {
    let expired = true;
    const api = fakeApi({
      'GET /revisions/r1/sheet.pdf': () =>
        expired
          ? { status: 401, body: { error: { code: 'token_expired', message: 'expired' } } }
          : sheetReply('review', 'sheet.pdf'),
      'POST /auth/refresh': () => {
        expired = false;
        return { body: {} };
      },
    });
    renderApp(<SheetDownload revision={{ id: 'r1', number: 2 }} kind="review" />);
    await userEvent.click(await screen.findByRole('button', { name: 'Download sheet' }));
    await vi.waitFor(() => expect(saved).toHaveLength(1));
    expect(api.calls.map((c) => `${c.method} ${c.path}`)).toEqual([
      'GET /revisions/r1/sheet.pdf',
      'POST /auth/refresh',
      'GET /revisions/r1/sheet.pdf',
    ]);
  });

  it('says so when the server refuses, and saves nothing', async () => {
    fakeApi({
      'GET /revisions/r1/sheet.pdf': {
        status: 404,
        body: { error: { code: 'not_found', message: 'revision not found' } },
      },
    });
    renderApp(<SheetDownload revision={{ id: 'r1', number: 2 }} kind="review" />);
    const button = await screen.findByRole('button', { name: 'Download sheet' });
    await userEvent.click(button);
    expect(await screen.findByRole('alert')).toHaveTextContent(
      'The sheet could not be downloaded: revision not found',
    );
    expect(button).toHaveAccessibleDescription(/revision not found/);
    expect(saved).toHaveLength(0);
  });
});
