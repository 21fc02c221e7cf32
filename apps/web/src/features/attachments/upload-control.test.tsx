import { act, fireEvent, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { ApiError } from '../../api/client';
import { fakeApi, renderApp } from '../../test/render';
import { refusalReason, UploadControl } from './upload-control';

/** An XMLHttpRequest the test drives: it records what was sent and answers when told. */
class FakeXhr {
  static last: FakeXhr[] = [];
  method = '';
  url = '';
  withCredentials = false;
  headers: Record<string, string> = {};
  body: FormData | null = null;
  status = 0;
  responseText = '';
  upload: { onprogress: ((e: ProgressEvent) => void) | null } = { onprogress: null };
  onload: (() => void) | null = null;
  onerror: (() => void) | null = null;
  onabort: (() => void) | null = null;
  constructor() {
    FakeXhr.last.push(this);
  }
  open(method: string, url: string) {
    this.method = method;
    this.url = url;
  }
  setRequestHeader(name: string, value: string) {
    this.headers[name.toLowerCase()] = value;
  }
  send(body: FormData) {
    this.body = body;
  }
  abort() {
    this.onabort?.();
  }
  progress(loaded: number, total: number) {
    act(() => this.upload.onprogress?.({ loaded, total, lengthComputable: true } as ProgressEvent));
  }
  answer(status: number, body: unknown) {
    this.status = status;
    this.responseText = JSON.stringify(body);
    act(() => this.onload?.());
  }
}

const attachment = {
  id: 'a1',
  componentId: 'c1',
  name: 'door-drawing.pdf',
  sha256: 'c0ffee'.repeat(10) + 'beef',
  size: 1000,
  contentType: 'application/pdf',
  kind: 'PDF document',
  uploadedBy: { id: 'u-designer', name: 'Dana Designer' },
  createdAt: '2026-03-01T10:00:00Z',
};

function refusal(status: number, code: string, message: string, field: string) {
  return { error: { code, message, fields: [{ path: 'file', message: field }] } };
}

describe('UploadControl', () => {
  beforeEach(() => {
    FakeXhr.last = [];
    vi.stubGlobal('XMLHttpRequest', FakeXhr);
    document.cookie = 'hl_csrf=tok-123; path=/';
  });
  afterEach(() => {
    vi.unstubAllGlobals();
    document.cookie = 'hl_csrf=; expires=Thu, 01 Jan 1970 00:00:00 GMT; path=/';
  });

  it('posts the file as the multipart part `file` with the CSRF header, and shows real progress', async () => {
    fakeApi({});
    const { client } = renderApp(<UploadControl componentId="c1" />);
    const invalidate = vi.spyOn(client, 'invalidateQueries');
    const file = new File([new Uint8Array(1000)], 'door-drawing.pdf', { type: 'application/pdf' });
    await userEvent.upload(await screen.findByLabelText('Choose files'), file);

    const xhr = FakeXhr.last[0]!;
    expect(xhr.method).toBe('POST');
    expect(xhr.url).toBe('/api/components/c1/attachments');
    expect(xhr.headers['x-csrf-token']).toBe('tok-123');
    const sent = xhr.body!.get('file') as File;
    expect([sent.name, sent.size]).toEqual(['door-drawing.pdf', 1000]);

    const bar = screen.getByRole('progressbar', { name: 'Upload of door-drawing.pdf' });
    expect(bar).toHaveAttribute('aria-valuenow', '0');
    xhr.progress(400, 1000);
    expect(bar).toHaveAttribute('aria-valuenow', '40');
    expect(screen.getByText('40 %')).toBeInTheDocument();
    xhr.progress(1000, 1000);
    expect(bar).toHaveAttribute('aria-valuetext', 'Sent, being checked…');
    xhr.answer(201, attachment);
    expect(await screen.findByText('Uploaded')).toBeInTheDocument();
    expect(bar).toHaveAttribute('aria-valuenow', '100');
    expect(screen.getByRole('status')).toHaveTextContent('Uploaded door-drawing.pdf.');
    expect(invalidate).toHaveBeenCalledWith({ queryKey: ['components', 'c1', 'attachments'] });
  });

  it('takes dropped files too', async () => {
    fakeApi({});
    renderApp(<UploadControl componentId="c1" />);
    const photo = new File([new Uint8Array(10)], 'seal.png', { type: 'image/png' });
    fireEvent.drop(await screen.findByTestId('drop-zone'), { dataTransfer: { files: [photo] } });
    expect((FakeXhr.last[0]!.body!.get('file') as File).name).toBe('seal.png');
    expect(screen.getByRole('progressbar', { name: 'Upload of seal.png' })).toBeInTheDocument();
  });

  it('shows the server’s refusals on the control: type (415), size (413), name (400)', async () => {
    fakeApi({});
    renderApp(<UploadControl componentId="c1" />);
    const input = await screen.findByLabelText('Choose files');
    // The picker's `accept` is only a hint: the server decides by content, so send what a user could.
    const user = userEvent.setup({ applyAccept: false });
    await user.upload(input, [
      new File(['GIF89a'], 'photo.gif'),
      new File([new Uint8Array(5)], 'huge.pdf'),
      new File([new Uint8Array(5)], 'a..pdf'),
    ]);
    const [gif, huge, dots] = FakeXhr.last;
    gif!.answer(
      415,
      refusal(
        415,
        'unsupported_file_type',
        'the content is image/gif (.gif); only PDF, PNG, JPEG and DXF files are accepted',
        'the content is image/gif (.gif); only PDF, PNG, JPEG and DXF files are accepted',
      ),
    );
    huge!.answer(
      413,
      refusal(
        413,
        'file_too_large',
        'the file is larger than 20 MiB',
        'must be at most 20971520 bytes',
      ),
    );
    dots!.answer(
      400,
      refusal(400, 'validation_failed', 'validation failed', 'the file name must not contain ".."'),
    );
    const alert = await screen.findByRole('alert');
    expect(alert).toHaveTextContent(
      'photo.gif was not uploaded. Not an accepted type: the content is image/gif (.gif); only PDF, PNG, JPEG and DXF files are accepted.',
    );
    expect(alert).toHaveTextContent(
      'huge.pdf was not uploaded. Too large: the file is larger than 20 MiB.',
    );
    expect(alert).toHaveTextContent(
      'a..pdf was not uploaded. Refused: the file name must not contain "..".',
    );
    expect(input).toHaveAttribute('aria-invalid', 'true');
    expect(input).toHaveAccessibleDescription(/photo\.gif was not uploaded/);
    expect(screen.queryByRole('progressbar')).toBeNull();

    // The next batch starts clean.
    await userEvent.upload(input, new File([new Uint8Array(5)], 'ok.pdf'));
    expect(screen.queryByRole('alert')).toBeNull();
    expect(input).not.toHaveAttribute('aria-invalid');
  });

  it('refreshes an expired session once and sends the file again', async () => {
    const api = fakeApi({ 'POST /auth/refresh': { body: {} } });
    renderApp(<UploadControl componentId="c1" />);
    await userEvent.upload(
      await screen.findByLabelText('Choose files'),
      new File(['%PDF-'], 'd.pdf'),
    );
    FakeXhr.last[0]!.answer(401, { error: { code: 'token_expired', message: 'expired' } });
    await vi.waitFor(() => expect(FakeXhr.last).toHaveLength(2));
    expect(api.calls.map((c) => c.path)).toEqual(['/auth/refresh']);
    FakeXhr.last[1]!.answer(201, attachment);
    expect(await screen.findByText('Uploaded')).toBeInTheDocument();
  });

  it('can cancel an upload under way', async () => {
    fakeApi({});
    renderApp(<UploadControl componentId="c1" />);
    await userEvent.upload(
      await screen.findByLabelText('Choose files'),
      new File(['x'], 'big.pdf'),
    );
    const list = screen.getByRole('list', { name: 'Uploads' });
    await userEvent.click(
      within(list).getByRole('button', { name: /^Cancel\s*the upload of big\.pdf$/ }),
    );
    expect(screen.queryByRole('list', { name: 'Uploads' })).toBeNull();
    expect(screen.getByRole('status')).toHaveTextContent('Upload of big.pdf cancelled.');
  });
});

describe('refusalReason', () => {
  it('prefers the `file` field’s reason, and says what kind of refusal it is', () => {
    const e = new ApiError(415, 'unsupported_file_type', 'x', [
      { path: 'other', message: 'no' },
      { path: 'file', message: 'the content is text/plain' },
    ]);
    expect(refusalReason(e)).toBe('Not an accepted type: the content is text/plain.');
    expect(refusalReason(new ApiError(403, 'not_a_designer', 'only designers upload'))).toBe(
      'Only designers upload.',
    );
  });
});
