import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { Attachment } from '@hoopline/contract';
import { fakeApi, renderApp } from '../../test/render';
import { AttachmentSummary, AttachmentTable } from './attachment-list';

const pdf: Attachment = {
  id: 'a-pdf',
  componentId: 'c1',
  name: 'door-drawing.pdf',
  sha256: '0123456789abcdef'.repeat(4),
  size: 2048,
  contentType: 'application/pdf',
  kind: 'PDF document',
  uploadedBy: { id: 'u-designer', name: 'Dana Designer' },
  createdAt: '2026-03-01T10:00:00Z',
};
const png: Attachment = {
  ...pdf,
  id: 'a-png',
  name: 'seal-photo.png',
  sha256: 'fedcba9876543210'.repeat(4),
  size: 300,
  contentType: 'image/png',
  kind: 'PNG image',
};

describe('attachments', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('lists name, kind, size, a short hash with the full one, uploader; thumbnails for images only', async () => {
    fakeApi({ 'GET /components/c1/attachments': { body: { items: [png, pdf] } } });
    renderApp(<AttachmentTable componentId="c1" componentName="Door plate" canDelete={false} />);
    const table = await screen.findByRole('table', { name: 'Attachments of Door plate' });
    const row = within(table).getByRole('row', { name: /door-drawing\.pdf/ });
    expect(row).toHaveTextContent('PDF document');
    expect(row).toHaveTextContent('2.0 KiB');
    expect(row).toHaveTextContent('0123 4567 89ab…');
    expect(within(row).getByTitle(pdf.sha256)).toHaveTextContent(pdf.sha256);
    expect(row).toHaveTextContent('Dana Designer');
    expect(screen.getByRole('img', { name: 'Preview of seal-photo.png' })).toHaveAttribute(
      'src',
      '/api/attachments/a-png/content?disposition=inline',
    );
    expect(screen.queryByRole('img', { name: 'Preview of door-drawing.pdf' })).toBeNull();
    expect(screen.queryByRole('button', { name: /Delete/ })).toBeNull();
  });

  it('lets a designer delete after confirming', async () => {
    let items = [png, pdf];
    const api = fakeApi({
      'GET /components/c1/attachments': () => ({ body: { items } }),
      'DELETE /attachments/a-pdf': () => {
        items = [png];
        return { status: 204 };
      },
    });
    renderApp(<AttachmentTable componentId="c1" componentName="Door plate" canDelete />);
    await userEvent.click(
      await screen.findByRole('button', { name: /^Delete\s*door-drawing\.pdf$/ }),
    );
    const dialog = screen.getByRole('dialog', { name: 'Delete attachment' });
    expect(dialog).toHaveTextContent('Delete door-drawing.pdf from Door plate?');
    expect(api.calls.some((c) => c.method === 'DELETE')).toBe(false);
    await userEvent.click(within(dialog).getByRole('button', { name: 'Delete' }));
    await vi.waitFor(() =>
      expect(screen.queryByRole('row', { name: /door-drawing\.pdf/ })).toBeNull(),
    );
    expect(api.calls.filter((c) => c.method === 'DELETE').map((c) => c.path)).toEqual([
      '/attachments/a-pdf',
    ]);
  });

  it('on the review page: names and full hashes, or says nothing is attached', async () => {
    fakeApi({ 'GET /components/c1/attachments': { body: { items: [pdf] } } });
    renderApp(<AttachmentSummary componentId="c1" />);
    const list = await screen.findByRole('list', { name: 'Attached files' });
    expect(list).toHaveTextContent('door-drawing.pdf');
    expect(list).toHaveTextContent(`SHA-256 ${pdf.sha256}`);
    vi.unstubAllGlobals();
    fakeApi({ 'GET /components/c2/attachments': { body: { items: [] } } });
    renderApp(<AttachmentSummary componentId="c2" />);
    expect(await screen.findByText('Nothing is attached to this component.')).toBeInTheDocument();
  });

  it('for a countersigned revision, sets apart what was attached after the countersign', async () => {
    const later = { ...png, createdAt: '2026-03-05T08:00:00Z' };
    fakeApi({ 'GET /components/c1/attachments': { body: { items: [later, pdf] } } });
    renderApp(<AttachmentSummary componentId="c1" countersignedAt="2026-03-02T09:30:00Z" />);
    expect(await screen.findByRole('list', { name: 'Attached files' })).toHaveTextContent(pdf.name);
    expect(screen.getByRole('list', { name: 'Attached files' })).not.toHaveTextContent(png.name);
    expect(screen.getByRole('list', { name: 'Attached after the countersign' })).toHaveTextContent(
      png.name,
    );
  });
});
