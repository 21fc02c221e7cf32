import { useId, useState } from 'react';
import { downloadSheet } from '../../api/sheets';
import { useMe } from '../../api/session';
import {
  defaultPaper,
  type PaperSize,
  type RevisionStatus,
  type Role,
  type UnitSystem,
} from '@hoopline/contract';
import { Button } from '../../components/button';
import { messageFor } from '../../components/server-errors';

/**
 * Which sheet, if any, this person may have of a revision: the stamped FOR
 * REVIEW sheet once it is countersigned (everyone who sees the revision), a
 * DRAFT preview before that (designers and checkers only). A fabricator only
 * ever sees countersigned revisions; the API refuses anything else (404), so
 * the control is not shown rather than shown to fail.
 */
export function sheetKind(
  revision: { readonly status: RevisionStatus },
  role: Role | null,
): 'review' | 'draft' | null {
  if (revision.status === 'countersigned') return 'review';
  if (role === 'designer' || role === 'checker') return 'draft';
  return null;
}

const PAPER_LABEL: Record<PaperSize, string> = { a4: 'A4', letter: 'US Letter' };

/**
 * A paper choice and a download button. The file comes through the API
 * client (so an expired session is refreshed first) and is saved under the
 * server's name (Content-Disposition).
 */
export function SheetDownload({
  revision,
  kind,
  context,
  size = 'md',
  unitSystem,
}: {
  revision: { readonly id: string; readonly number: number };
  kind: 'review' | 'draft';
  /** What the control is for, for screen readers in a table row ("Cabinet door plate revision 1"). */
  context?: string;
  size?: 'sm' | 'md';
  /** The project's unit system: its paper is the default (US Letter, SI A4); else the person's. */
  unitSystem?: UnitSystem;
}) {
  const me = useMe();
  const id = useId();
  const [paper, setPaper] = useState<PaperSize>(defaultPaper(unitSystem ?? me.user.unitSystem));
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const label = kind === 'review' ? 'Download sheet' : 'Preview draft sheet';
  const about = context ? ` of ${context}` : '';
  return (
    <span className="inline-flex flex-wrap items-center gap-1.5">
      <label htmlFor={`${id}-paper`} className="sr-only">
        Paper size{about}
      </label>
      <select
        id={`${id}-paper`}
        value={paper}
        onChange={(event) => setPaper(event.target.value as PaperSize)}
        className={`rounded border border-line-strong bg-panel px-1.5 text-ink ${size === 'sm' ? 'h-7 text-xs' : 'h-8.5 text-sm'}`}
      >
        {(Object.keys(PAPER_LABEL) as PaperSize[]).map((p) => (
          <option key={p} value={p}>
            {PAPER_LABEL[p]}
          </option>
        ))}
      </select>
      <Button
        size={size}
        variant={kind === 'review' && size === 'md' ? 'primary' : 'secondary'}
        busy={busy}
        aria-describedby={error ? `${id}-error` : undefined}
        title={
          kind === 'draft'
            ? 'Stamped DRAFT — NOT CHECKED: for reading, not for issue.'
            : 'Stamped FOR REVIEW — NOT FOR CONSTRUCTION.'
        }
        onClick={async () => {
          setBusy(true);
          setError(null);
          try {
            await downloadSheet(revision, paper);
          } catch (e) {
            setError(`The sheet could not be downloaded: ${messageFor(e)}`);
          } finally {
            setBusy(false);
          }
        }}
      >
        {label}
        {about ? <span className="sr-only">{about}</span> : null}
      </Button>
      {error ? (
        <span id={`${id}-error`} role="alert" className="text-xs font-medium text-fail">
          {error}
        </span>
      ) : null}
    </span>
  );
}
