import { useState } from 'react';
import {
  contentPath,
  inlineContentUrl,
  useAttachments,
  useDeleteAttachment,
} from '../../api/attachments';
import { apiDownload, saveFile } from '../../api/client';
import type { Attachment } from '@hoopline/contract';
import { Button } from '../../components/button';
import { DataTable, type Column } from '../../components/data-table';
import { Dialog } from '../../components/dialog';
import { ErrorView } from '../../components/error-view';
import { FormError } from '../../components/field';
import { HashText } from '../../components/hash-text';
import { messageFor } from '../../components/server-errors';
import { TableSkeleton } from '../../components/skeleton';
import { formatDateTime } from '../../lib/dates';
import { formatBytes } from '../../lib/files';

const THUMBNAIL_TYPES = new Set(['image/png', 'image/jpeg']);

const GLYPH: Record<string, string> = {
  'application/pdf': 'PDF',
  'image/vnd.dxf': 'DXF',
  'image/png': 'PNG',
  'image/jpeg': 'JPEG',
};

/** A thumbnail for a PNG or JPEG (the server sends images inline on request); a type mark otherwise. */
export function AttachmentPreview({
  attachment,
  size = 'md',
}: {
  attachment: Attachment;
  size?: 'sm' | 'md';
}) {
  const [failed, setFailed] = useState(false);
  const box = size === 'sm' ? 'h-9 w-9' : 'h-12 w-12';
  if (THUMBNAIL_TYPES.has(attachment.contentType) && !failed) {
    return (
      <img
        src={inlineContentUrl(attachment.id)}
        alt={`Preview of ${attachment.name}`}
        loading="lazy"
        onError={() => setFailed(true)}
        className={`${box} shrink-0 rounded border border-line bg-sunken object-cover`}
      />
    );
  }
  return (
    <span
      aria-hidden="true"
      className={`${box} flex shrink-0 items-center justify-center rounded border border-line bg-sunken font-mono text-[10px] text-muted`}
    >
      {GLYPH[attachment.contentType] ?? 'FILE'}
    </span>
  );
}

/** Saves an attachment through the API client (so an expired session is refreshed first). */
function useDownload() {
  const [busy, setBusy] = useState<string | null>(null);
  const [error, setError] = useState<string | null>(null);
  const download = async (a: Attachment) => {
    setBusy(a.id);
    setError(null);
    try {
      saveFile(await apiDownload(contentPath(a.id)), a.name);
    } catch (e) {
      setError(`${a.name} could not be downloaded: ${messageFor(e)}`);
    } finally {
      setBusy(null);
    }
  };
  return { busy, error, download };
}

/**
 * A component's attachments as a table: preview, name, kind, size, SHA-256
 * (short, full on hover and copy), who uploaded it and when; download, and
 * delete for designers (after a confirmation).
 */
export function AttachmentTable({
  componentId,
  componentName,
  canDelete,
}: {
  componentId: string;
  componentName: string;
  canDelete: boolean;
}) {
  const attachments = useAttachments(componentId);
  const remove = useDeleteAttachment(componentId);
  const { busy, error, download } = useDownload();
  const [deleting, setDeleting] = useState<Attachment | null>(null);
  const [deleteError, setDeleteError] = useState<string | null>(null);

  if (attachments.isPending) return <TableSkeleton label="Loading attachments" />;
  if (attachments.isError) return <ErrorView error={attachments.error} />;

  const columns: Column<Attachment>[] = [
    {
      key: 'preview',
      header: <span className="sr-only">Preview</span>,
      render: (a) => <AttachmentPreview attachment={a} />,
    },
    { key: 'name', header: 'Name', render: (a) => <span className="break-all">{a.name}</span> },
    { key: 'kind', header: 'Kind', render: (a) => a.kind },
    { key: 'size', header: 'Size', numeric: true, render: (a) => formatBytes(a.size) },
    {
      key: 'hash',
      header: 'SHA-256',
      render: (a) => <HashText hash={a.sha256} label={a.name} />,
    },
    { key: 'by', header: 'Uploaded by', render: (a) => a.uploadedBy?.name ?? '–' },
    { key: 'at', header: 'Uploaded', numeric: true, render: (a) => formatDateTime(a.createdAt) },
    {
      key: 'actions',
      header: <span className="sr-only">Actions</span>,
      render: (a) => (
        <span className="flex justify-end gap-1.5">
          <Button size="sm" busy={busy === a.id} onClick={() => void download(a)}>
            Download<span className="sr-only"> {a.name}</span>
          </Button>
          {canDelete ? (
            <Button size="sm" variant="danger" onClick={() => setDeleting(a)}>
              Delete<span className="sr-only"> {a.name}</span>
            </Button>
          ) : null}
        </span>
      ),
    },
  ];

  return (
    <>
      <FormError message={error ?? deleteError} />
      <DataTable
        caption={`Attachments of ${componentName}`}
        columns={columns}
        rows={attachments.data.items}
        rowKey={(a) => a.id}
        empty="Nothing is attached to this component."
      />
      <Dialog
        open={deleting !== null}
        title="Delete attachment"
        onClose={() => setDeleting(null)}
        footer={
          <>
            <Button onClick={() => setDeleting(null)}>Cancel</Button>
            <Button
              variant="danger"
              busy={remove.isPending}
              onClick={() =>
                deleting &&
                remove.mutate(deleting.id, {
                  onSuccess: () => {
                    setDeleteError(null);
                    setDeleting(null);
                  },
                  onError: (e) => {
                    setDeleteError(messageFor(e));
                    setDeleting(null);
                  },
                })
              }
            >
              Delete
            </Button>
          </>
        }
      >
        <p className="text-sm">
          Delete {deleting?.name} from {componentName}? It is no longer listed here, on the review
          page or on sheets downloaded from now on. Sheets downloaded before keep its name and hash.
        </p>
      </Dialog>
    </>
  );
}

function SummaryItem({
  attachment: a,
  busy,
  onDownload,
}: {
  attachment: Attachment;
  busy: boolean;
  onDownload: () => void;
}) {
  return (
    <li className="flex gap-2 rounded border border-line px-2 py-1.5">
      <AttachmentPreview attachment={a} size="sm" />
      <div className="min-w-0 flex-1">
        <div className="flex items-start justify-between gap-2">
          <p className="text-sm font-medium break-all">{a.name}</p>
          <Button size="sm" busy={busy} onClick={onDownload}>
            Download<span className="sr-only"> {a.name}</span>
          </Button>
        </div>
        <p className="text-xs text-muted">
          {a.kind} · {formatBytes(a.size)} · {formatDateTime(a.createdAt)}
        </p>
        <p className="font-mono text-xs break-all text-muted">
          <span className="sr-only">SHA-256 </span>
          {a.sha256}
        </p>
      </div>
    </li>
  );
}

/**
 * The attachments for a reader (the review and revision pages): names and full
 * hashes, the way the sheet lists them, each with a download. For a
 * countersigned revision, `countersignedAt` splits off what was attached
 * later: its sheet lists only what was there when it was signed.
 */
export function AttachmentSummary({
  componentId,
  countersignedAt = null,
}: {
  componentId: string;
  countersignedAt?: string | null;
}) {
  const attachments = useAttachments(componentId);
  const { busy, error, download } = useDownload();
  if (attachments.isPending) return <p className="text-sm text-muted">Loading attachments…</p>;
  if (attachments.isError)
    return (
      <FormError message={`Attachments could not be loaded: ${messageFor(attachments.error)}`} />
    );
  const items = attachments.data.items;
  const signedAt = countersignedAt ? new Date(countersignedAt).getTime() : Infinity;
  const signed = items.filter((a) => new Date(a.createdAt).getTime() <= signedAt);
  const later = items.filter((a) => new Date(a.createdAt).getTime() > signedAt);
  if (items.length === 0)
    return <p className="text-sm text-muted">Nothing is attached to this component.</p>;
  return (
    <>
      <FormError message={error} />
      {signed.length === 0 ? (
        <p className="text-sm text-muted">Nothing was attached when it was countersigned.</p>
      ) : (
        <ul aria-label="Attached files" className="flex flex-col gap-2">
          {signed.map((a) => (
            <SummaryItem
              key={a.id}
              attachment={a}
              busy={busy === a.id}
              onDownload={() => void download(a)}
            />
          ))}
        </ul>
      )}
      {later.length > 0 ? (
        <>
          <p className="mt-3 text-xs text-muted">
            Attached after the countersign, so not on this revision&apos;s sheet:
          </p>
          <ul aria-label="Attached after the countersign" className="mt-1 flex flex-col gap-2">
            {later.map((a) => (
              <SummaryItem
                key={a.id}
                attachment={a}
                busy={busy === a.id}
                onDownload={() => void download(a)}
              />
            ))}
          </ul>
        </>
      ) : null}
    </>
  );
}
