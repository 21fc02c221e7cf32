import { useQueryClient } from '@tanstack/react-query';
import { useEffect, useId, useRef, useState, type DragEvent } from 'react';
import { attachmentKeys, uploadAttachment } from '../../api/attachments';
import { ApiError } from '../../api/client';
import { buttonClass } from '../../components/button';
import { messageFor } from '../../components/server-errors';
import { ACCEPTED_FILES, formatBytes } from '../../lib/files';

function withStop(text: string): string {
  const t = text.trim();
  return /[.!?]$/.test(t) ? t : `${t}.`;
}

function sentence(text: string): string {
  const t = withStop(text);
  return t.charAt(0).toUpperCase() + t.slice(1);
}

/**
 * Why the server refused a file, in words: 413 too large, 415 not an accepted
 * type (by content), 400 the name; the reason is the server's own, from the
 * field `file` of its error (API.md, attachments).
 */
export function refusalReason(error: unknown): string {
  if (!(error instanceof ApiError)) return sentence(messageFor(error));
  const field = error.fields.find((f) => f.path === 'file') ?? error.fields[0];
  switch (error.status) {
    case 413:
      return `Too large: ${withStop(error.message)}`;
    case 415:
      return `Not an accepted type: ${withStop(field?.message ?? error.message)}`;
    case 400:
      return `Refused: ${withStop(field?.message ?? error.message)}`;
    default:
      return sentence(messageFor(error));
  }
}

interface Upload {
  readonly key: number;
  readonly name: string;
  readonly size: number;
  readonly loaded: number;
  readonly state: 'uploading' | 'done';
  readonly abort: AbortController;
}

interface Refusal {
  readonly key: number;
  readonly name: string;
  readonly reason: string;
}

/**
 * Upload for a component's attachments: a file picker (the keyboard's way)
 * inside a drop zone, a real progress bar per file (XMLHttpRequest's upload
 * progress), and the server's refusals on the control.
 */
export function UploadControl({ componentId }: { componentId: string }) {
  const id = useId();
  const client = useQueryClient();
  const [uploads, setUploads] = useState<Upload[]>([]);
  const [refusals, setRefusals] = useState<Refusal[]>([]);
  const [dragging, setDragging] = useState(false);
  const [announcement, setAnnouncement] = useState('');
  const nextKey = useRef(0);
  const mounted = useRef(true);
  useEffect(() => {
    mounted.current = true;
    return () => {
      mounted.current = false;
    };
  }, []);

  const update = (key: number, change: Partial<Upload>) =>
    setUploads((list) => list.map((u) => (u.key === key ? { ...u, ...change } : u)));

  const start = (file: File) => {
    const key = (nextKey.current += 1);
    const abort = new AbortController();
    setUploads((list) => [
      ...list,
      { key, name: file.name, size: file.size, loaded: 0, state: 'uploading', abort },
    ]);
    uploadAttachment(
      componentId,
      file,
      ({ loaded }) => mounted.current && update(key, { loaded: Math.min(loaded, file.size) }),
      abort.signal,
    ).then(
      () => {
        if (!mounted.current) return;
        update(key, { loaded: file.size, state: 'done' });
        setAnnouncement(`Uploaded ${file.name}.`);
        void client.invalidateQueries({ queryKey: attachmentKeys.ofComponent(componentId) });
      },
      (error: unknown) => {
        if (!mounted.current) return;
        setUploads((list) => list.filter((u) => u.key !== key));
        if (error instanceof DOMException && error.name === 'AbortError') {
          setAnnouncement(`Upload of ${file.name} cancelled.`);
          return;
        }
        const reason = refusalReason(error);
        setRefusals((list) => [...list, { key, name: file.name, reason }]);
        setAnnouncement('');
      },
    );
  };

  const startAll = (files: FileList | readonly File[] | null) => {
    const list = Array.from(files ?? []);
    if (list.length === 0) return;
    // A new batch: what finished or was refused before is no longer news.
    setUploads((current) => current.filter((u) => u.state === 'uploading'));
    setRefusals([]);
    list.forEach(start);
  };

  const onDrop = (event: DragEvent<HTMLDivElement>) => {
    event.preventDefault();
    setDragging(false);
    startAll(event.dataTransfer.files);
  };

  const errorId = `${id}-error`;
  const hintId = `${id}-hint`;
  return (
    <div className="flex flex-col gap-2">
      <div
        data-testid="drop-zone"
        onDragEnter={(event) => {
          event.preventDefault();
          setDragging(true);
        }}
        onDragOver={(event) => {
          event.preventDefault();
          event.dataTransfer.dropEffect = 'copy';
        }}
        onDragLeave={(event) => {
          if (!event.currentTarget.contains(event.relatedTarget as Node | null)) setDragging(false);
        }}
        onDrop={onDrop}
        className={`flex flex-wrap items-center gap-3 rounded-md border-2 border-dashed px-3 py-3 text-sm ${
          dragging ? 'border-accent bg-accent-soft' : 'border-line-strong'
        } ${refusals.length > 0 ? 'border-fail' : ''}`}
      >
        <label
          className={`${buttonClass('secondary')} cursor-pointer has-[:focus-visible]:outline-2 has-[:focus-visible]:outline-focus`}
        >
          <input
            type="file"
            multiple
            accept={ACCEPTED_FILES}
            className="sr-only"
            aria-invalid={refusals.length > 0 ? true : undefined}
            aria-describedby={refusals.length > 0 ? `${errorId} ${hintId}` : hintId}
            onChange={(event) => {
              startAll(event.target.files);
              // The same file may be picked again after a refusal.
              event.target.value = '';
            }}
          />
          Choose files
        </label>
        <span className="text-muted">or drop drawings, photos and certificates here.</span>
        <p id={hintId} className="w-full text-xs text-muted">
          PDF, PNG, JPEG or DXF. The server checks each file by its content and keeps it under its
          SHA-256.
        </p>
      </div>
      {refusals.length > 0 ? (
        <div id={errorId} role="alert" className="text-xs font-medium text-fail">
          {refusals.map((r) => (
            <p key={r.key}>
              {r.name} was not uploaded. {r.reason}
            </p>
          ))}
        </div>
      ) : null}
      {uploads.length > 0 ? (
        <ul aria-label="Uploads" className="flex flex-col gap-1.5">
          {uploads.map((u) => {
            const pct = u.size > 0 ? Math.round((u.loaded / u.size) * 100) : 100;
            const shown = u.state === 'done' ? 100 : pct;
            // Every byte sent, no answer yet: the server is checking the content.
            const text =
              u.state === 'done' ? 'Uploaded' : pct >= 100 ? 'Sent, being checked…' : `${pct} %`;
            return (
              <li key={u.key} className="grid grid-cols-[minmax(0,1fr)_auto] items-center gap-x-3">
                <span className="truncate text-sm">
                  {u.name} <span className="text-xs text-muted">{formatBytes(u.size)}</span>
                </span>
                <span className="flex items-center gap-2 text-xs text-muted">
                  <span className="num">{text}</span>
                  {u.state === 'uploading' ? (
                    <button
                      type="button"
                      className="rounded px-1.5 hover:bg-sunken hover:text-ink"
                      onClick={() => u.abort.abort()}
                    >
                      Cancel<span className="sr-only"> the upload of {u.name}</span>
                    </button>
                  ) : null}
                </span>
                <div
                  role="progressbar"
                  aria-label={`Upload of ${u.name}`}
                  aria-valuemin={0}
                  aria-valuemax={100}
                  aria-valuenow={shown}
                  aria-valuetext={text}
                  className="col-span-2 h-1.5 overflow-hidden rounded-full bg-sunken"
                >
                  <span
                    className={`block h-full ${u.state === 'done' ? 'bg-pass' : 'bg-accent'}`}
                    style={{ width: `${shown}%` }}
                  />
                </div>
              </li>
            );
          })}
        </ul>
      ) : null}
      <p role="status" className="sr-only">
        {announcement}
      </p>
    </div>
  );
}
