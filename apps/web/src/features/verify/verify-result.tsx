import type { VerifyResult } from '@hoopline/contract';
import { VERDICT_WORDS, formatPercent, kindName, show } from '@hoopline/present';
import { formatDateTime } from '../../lib/dates';

/**
 * The public answer, and nothing more: whether the code matches a
 * countersigned revision, which one (project number, component, revision,
 * date), and whether a later countersign has superseded it.
 */
export function VerifyAnswer({ result, code }: { result: VerifyResult; code: string }) {
  if (!result.match) {
    return (
      <section
        aria-labelledby="verify-answer"
        className="rounded-md border border-fail border-l-4 bg-fail-soft px-4 py-3"
      >
        <h2 id="verify-answer" className="text-base font-semibold text-fail">
          <span aria-hidden="true" className="font-mono">
            ×{' '}
          </span>
          {code} does not match any countersigned revision
        </h2>
        <p className="mt-1 text-sm">
          No countersigned Hoopline revision has this code. The sheet may be a draft, may have been
          altered, or may come from another installation. Do not quote or build from it; ask its
          sender for the countersigned sheet.
        </p>
      </section>
    );
  }
  const superseded = result.status === 'superseded';
  return (
    <section
      aria-labelledby="verify-answer"
      className={`rounded-md border border-l-4 px-4 py-3 ${
        superseded ? 'border-warn bg-warn-soft' : 'border-pass bg-pass-soft'
      }`}
    >
      <h2
        id="verify-answer"
        className={`text-base font-semibold ${superseded ? 'text-warn' : 'text-pass'}`}
      >
        <span aria-hidden="true" className="font-mono">
          {superseded ? '! ' : '+ '}
        </span>
        {superseded
          ? `${code} matches a countersigned revision that has been superseded`
          : `${code} matches a countersigned revision`}
      </h2>
      <p className="mt-1 text-sm">
        {superseded
          ? 'A later revision of this component has been countersigned since. This sheet is no longer the issued one: ask for the current sheet before you quote or build.'
          : 'This is the latest countersigned revision of its component.'}
      </p>
      <dl className="mt-3 grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm">
        <dt className="text-muted">Project number</dt>
        <dd className="font-medium">{result.projectNumber}</dd>
        <dt className="text-muted">Component</dt>
        <dd className="font-medium">{result.componentName}</dd>
        <dt className="text-muted">Revision</dt>
        <dd className="num font-medium">{result.revisionNumber}</dd>
        <dt className="text-muted">Countersigned</dt>
        <dd className="num">
          <time dateTime={result.countersignedAt}>{formatDateTime(result.countersignedAt)}</time>
          <span className="text-muted"> (your time zone)</span>
        </dd>
      </dl>
      <h3 className="mt-4 text-sm font-semibold">Compare your sheet with these</h3>
      <p className="text-xs text-muted">
        A copied code on an altered sheet still matches: check that the sheet in your hands prints
        the same.
      </p>
      <dl className="mt-2 grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm">
        <dt className="text-muted">Kind</dt>
        <dd>{kindName(result.kind)}</dd>
        {result.thickness !== null ? (
          <>
            <dt className="text-muted">Thickness</dt>
            <dd className="num">
              {show(result.thickness, 'm', 'si')} ({show(result.thickness, 'm', 'us')})
            </dd>
          </>
        ) : null}
        {result.material ? (
          <>
            <dt className="text-muted">Material</dt>
            <dd>{result.material}</dd>
          </>
        ) : null}
        <dt className="text-muted">Screening result</dt>
        <dd>{VERDICT_WORDS[result.verdict].sentence}</dd>
        {result.governing ? (
          <>
            <dt className="text-muted">Governing check</dt>
            <dd>
              {result.governing.checkLabel}, load case {result.governing.loadCase}, at{' '}
              <span className="num font-medium">{formatPercent(result.governing.utilisation)}</span>
            </dd>
          </>
        ) : null}
        <dt className="text-muted">Prepared by</dt>
        <dd>{result.preparedBy}</dd>
        <dt className="text-muted">Countersigned by</dt>
        <dd>{result.countersignedBy}</dd>
        <dt className="text-muted">Content hash</dt>
        <dd className="font-mono text-xs break-all">{result.contentHash}</dd>
      </dl>
    </section>
  );
}
