import { useState } from 'react';
import { shortHash } from '../lib/files';

/**
 * A SHA-256 shown short, with the full value on hover (title), to screen
 * readers, and one click away on the clipboard.
 */
export function HashText({ hash, label }: { hash: string; label: string }) {
  const [copied, setCopied] = useState(false);
  return (
    <span className="inline-flex items-center gap-1.5">
      <span className="font-mono text-xs" title={hash}>
        <span aria-hidden="true">{shortHash(hash)}…</span>
        <span className="sr-only">{hash}</span>
      </span>
      <button
        type="button"
        className="rounded border border-line px-1.5 text-xs text-muted hover:bg-sunken hover:text-ink"
        onClick={() => {
          void navigator.clipboard?.writeText(hash).then(
            () => setCopied(true),
            () => setCopied(false),
          );
        }}
      >
        {copied ? 'Copied' : 'Copy'}
        <span className="sr-only"> the SHA-256 of {label}</span>
      </button>
    </span>
  );
}
