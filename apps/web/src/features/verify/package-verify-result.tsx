import type { PackageVerifyResult } from '@hoopline/contract';
import {
  PACKAGE_WORDS,
  VERDICT_WORDS,
  formatPercent,
  isoInstant,
  kindName,
  packageStaleness,
} from '@hoopline/present';

/**
 * The public answer for a package code: the project, every revision the
 * package holds with what its index prints (hash, verdict, sign-offs), and
 * whether the set is still the current one, component by component.
 */
export function PackageVerifyAnswer({
  result,
  code,
}: {
  result: PackageVerifyResult;
  code: string;
}) {
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
          {code} does not match any issue package
        </h2>
        <p className="mt-1 text-sm">
          No issue package of countersigned Hoopline revisions has this code, or a revision in it no
          longer matches its hash. Do not quote or build from it; ask its sender for the current
          package.
        </p>
      </section>
    );
  }
  const stale = packageStaleness(result);
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
          ? `${result.packageCode} matches an issue package that has been superseded`
          : `${result.packageCode} matches the current issue package`}
      </h2>
      {superseded ? (
        <ul className="mt-1 list-disc pl-5 text-sm">
          {stale.map((line) => (
            <li key={line}>{line}</li>
          ))}
        </ul>
      ) : (
        <p className="mt-1 text-sm">{PACKAGE_WORDS.current}</p>
      )}
      <dl className="mt-3 grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm">
        <dt className="text-muted">Project</dt>
        <dd className="font-medium">
          {result.projectNumber} {result.projectName}
        </dd>
        <dt className="text-muted">First issued</dt>
        <dd className="num">{isoInstant(result.issuedAt)}</dd>
        <dt className="text-muted">Package hash</dt>
        <dd className="font-mono text-xs break-all">{result.packageHash}</dd>
      </dl>
      <h3 className="mt-4 text-sm font-semibold">Compare your package with these</h3>
      <p className="text-xs text-muted">
        A copied code on an altered package still matches: check that each sheet in your hands
        prints the same revision, hash and sign-offs.
      </p>
      <ul aria-label="Revisions in this package" className="mt-2 flex flex-col gap-2">
        {result.components.map((c) => (
          <li
            key={c.contentHash + c.componentName}
            aria-label={`${c.componentName} revision ${c.revisionNumber}`}
            className="rounded border border-line bg-panel px-3 py-2 text-sm"
          >
            <p className="font-medium">
              {c.componentName}
              {c.tag ? ` (${c.tag})` : ''} · revision {c.revisionNumber}
              {c.status === 'superseded' ? (
                <span className="ml-2 text-xs font-semibold text-warn">superseded</span>
              ) : null}
            </p>
            <dl className="mt-1 grid grid-cols-[auto_1fr] gap-x-4 text-xs">
              <dt className="text-muted">Kind</dt>
              <dd>{kindName(c.kind)}</dd>
              <dt className="text-muted">Screening result</dt>
              <dd>{VERDICT_WORDS[c.verdict].sentence}</dd>
              {c.governing ? (
                <>
                  <dt className="text-muted">Governing check</dt>
                  <dd>
                    {c.governing.checkLabel}, load case {c.governing.loadCase}, at{' '}
                    <span className="num font-medium">
                      {formatPercent(c.governing.utilisation)}
                    </span>
                  </dd>
                </>
              ) : null}
              <dt className="text-muted">Prepared by</dt>
              <dd>
                {c.preparedBy}, submitted {c.submittedAt ? isoInstant(c.submittedAt) : '—'}
              </dd>
              <dt className="text-muted">Countersigned by</dt>
              <dd>
                {c.countersignedBy}, {isoInstant(c.countersignedAt)}
              </dd>
              <dt className="text-muted">Content hash</dt>
              <dd className="font-mono break-all">{c.contentHash}</dd>
            </dl>
          </li>
        ))}
      </ul>
    </section>
  );
}
