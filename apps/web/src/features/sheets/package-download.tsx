import { useId, useState } from 'react';
import { Link } from 'react-router-dom';
import { downloadComponentsCsv, downloadIssuePackage } from '../../api/sheets';
import { useMe } from '../../api/session';
import { defaultPaper, type PaperSize, type UnitSystem } from '@hoopline/contract';
import { Button } from '../../components/button';
import { messageFor } from '../../components/server-errors';

const PAPER_LABEL: Record<PaperSize, string> = { a4: 'A4', letter: 'US Letter' };

/**
 * The project table's downloads: its CSV, and, once a component is
 * countersigned, the issue package (an index sheet, then every countersigned
 * sheet) with the package code it was issued under.
 */
export function ProjectDownloads({
  projectId,
  hasIssued,
  unitSystem,
}: {
  projectId: string;
  hasIssued: boolean;
  /** The project's unit system: its paper is the default (US Letter, SI A4). */
  unitSystem?: UnitSystem;
}) {
  const me = useMe();
  const id = useId();
  const [paper, setPaper] = useState<PaperSize>(defaultPaper(unitSystem ?? me.user.unitSystem));
  const [busy, setBusy] = useState<'csv' | 'package' | null>(null);
  const [error, setError] = useState<string | null>(null);
  const [code, setCode] = useState<string | null>(null);
  const run = async (what: 'csv' | 'package') => {
    setBusy(what);
    setError(null);
    try {
      if (what === 'csv') await downloadComponentsCsv(projectId);
      else setCode(await downloadIssuePackage(projectId, paper));
    } catch (e) {
      setError(
        `The ${what === 'csv' ? 'table' : 'issue package'} could not be downloaded: ${messageFor(e)}`,
      );
    } finally {
      setBusy(null);
    }
  };
  return (
    <div className="mb-2 flex flex-wrap items-center gap-2">
      <Button size="sm" busy={busy === 'csv'} onClick={() => run('csv')}>
        Download table (CSV)
      </Button>
      {hasIssued ? (
        <>
          <label htmlFor={`${id}-paper`} className="sr-only">
            Paper size of the issue package
          </label>
          <select
            id={`${id}-paper`}
            value={paper}
            onChange={(event) => setPaper(event.target.value as PaperSize)}
            className="h-7 rounded border border-line-strong bg-panel px-1.5 text-xs text-ink"
          >
            {(Object.keys(PAPER_LABEL) as PaperSize[]).map((p) => (
              <option key={p} value={p}>
                {PAPER_LABEL[p]}
              </option>
            ))}
          </select>
          <Button
            size="sm"
            variant="primary"
            busy={busy === 'package'}
            title="An index sheet, then the latest countersigned sheet of every component, stamped FOR REVIEW — NOT FOR CONSTRUCTION."
            onClick={() => run('package')}
          >
            Download issue package
          </Button>
        </>
      ) : (
        <span className="text-xs text-muted">
          The issue package comes once a component is countersigned.
        </span>
      )}
      {code ? (
        <p role="status" className="text-xs">
          Issued as package <span className="font-mono font-medium">{code}</span>:{' '}
          <Link to={`/verify/${code}`} className="text-accent hover:underline">
            verify it
          </Link>
        </p>
      ) : null}
      {error ? (
        <p role="alert" className="text-xs font-medium text-fail">
          {error}
        </p>
      ) : null}
    </div>
  );
}
