import type { Revision } from '@hoopline/contract';
import { Panel } from '../../components/page';
import { formatDateTime } from '../../lib/dates';
import { useUnitSystem } from '../../lib/unit-system';
import {
  CautionsList,
  ChecksByCase,
  ReportPictures,
  ReportSummary,
  WarningsList,
} from '../results/report-view';
import { TrailTable, useTrailHighlight } from '../results/trail-table';
import { CommentWithSteps, StepRemarksList, useStepLabels } from './returned-notice';
import { presentInputs, type UnitSystem } from '@hoopline/present';
import { ScrollArea } from '../../components/scroll-area';

export function RevisionMeta({ revision }: { revision: Revision }) {
  return (
    <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm">
      <dt className="text-muted">Author</dt>
      <dd>{revision.author.name}</dd>
      <dt className="text-muted">Saved</dt>
      <dd className="num">{formatDateTime(revision.createdAt)}</dd>
      <dt className="text-muted">Submitted</dt>
      <dd className="num">{formatDateTime(revision.submittedAt)}</dd>
      <dt className="text-muted">Decided</dt>
      <dd className="num">{formatDateTime(revision.decidedAt)}</dd>
      <dt className="text-muted">Engine</dt>
      <dd className="num">{revision.engineVersion}</dd>
      <dt className="text-muted">Verify code</dt>
      <dd className="num font-mono">{revision.verifyCode}</dd>
      <dt className="text-muted">Content hash</dt>
      <dd className="font-mono text-xs break-all">{revision.contentHash}</dd>
      {revision.note ? (
        <>
          <dt className="text-muted">Note</dt>
          <dd className="whitespace-pre-line">{revision.note}</dd>
        </>
      ) : null}
    </dl>
  );
}

export function SignOffHistory({ revision }: { revision: Revision }) {
  const labels = useStepLabels(revision);
  if (revision.signOffs.length === 0)
    return <p className="text-sm text-muted">No sign-offs yet.</p>;
  return (
    <ol className="flex flex-col gap-2">
      {revision.signOffs.map((s) => (
        <li key={s.id} className="rounded border border-line px-2.5 py-1.5 text-sm">
          <p>
            <strong>{s.decision === 'countersigned' ? 'Countersigned' : 'Returned'}</strong> by{' '}
            {s.checker.name}, <span className="num">{formatDateTime(s.createdAt)}</span>
          </p>
          {s.comment ? (
            <p className="mt-0.5 whitespace-pre-line">
              <CommentWithSteps comment={s.comment} stepCount={labels.size} />
            </p>
          ) : null}
          <StepRemarksList signOff={s} labels={labels} />
          <p className="mt-0.5 font-mono text-xs break-all text-muted">
            signed hash {s.hashSigned}
          </p>
        </li>
      ))}
    </ol>
  );
}

/**
 * The inputs as the designer entered them, with each quantity in the
 * reader's units: the rows of presentInputs, the ones the sheet prints.
 */
export function InputsTable({ inputs, system }: { inputs: unknown; system: UnitSystem }) {
  const rows = presentInputs(inputs, system);
  return (
    <ScrollArea label="Inputs as entered (table)" framed={false}>
      <table className="w-full text-sm">
        <caption className="sr-only">Inputs as entered</caption>
        <thead>
          <tr className="text-left text-xs text-muted">
            <th scope="col" className="py-1 pr-3 font-medium">
              Field
            </th>
            <th scope="col" className="py-1 pr-3 font-medium">
              As entered
            </th>
            <th scope="col" className="py-1 font-medium">
              {system === 'us' ? 'US customary' : 'SI'}
            </th>
          </tr>
        </thead>
        <tbody>
          {rows.map((row) => (
            <tr key={row.path} className="border-b border-line align-top last:border-b-0">
              <th scope="row" className="py-1 pr-3 text-left font-normal text-muted">
                {row.label}
              </th>
              <td className="num py-1 pr-3 font-mono text-xs">{row.asTyped}</td>
              <td className="num py-1 font-mono text-xs">{row.inSystem}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </ScrollArea>
  );
}

/** A saved revision, read-only: who and when, the inputs as entered, the server's report. */
export function RevisionBody({ revision, aside }: { revision: Revision; aside?: React.ReactNode }) {
  const system = useUnitSystem();
  const highlight = useTrailHighlight();
  return (
    <div className="flex flex-col gap-4">
      <div className="grid items-start gap-4 lg:grid-cols-[minmax(300px,380px)_minmax(0,1fr)]">
        <div className="flex flex-col gap-4">
          {aside}
          <Panel title="Revision" id="revision-meta">
            <RevisionMeta revision={revision} />
          </Panel>
          <Panel title="Sign-offs" id="revision-signoffs">
            <SignOffHistory revision={revision} />
          </Panel>
          <Panel title="Inputs as entered" id="revision-inputs">
            <InputsTable inputs={revision.inputs} system={system} />
          </Panel>
        </div>
        <section aria-labelledby="results-title" className="flex min-w-0 flex-col gap-4">
          <h2 id="results-title" className="sr-only">
            Results
          </h2>
          <ReportSummary
            report={revision.report}
            source={`Revision ${revision.number}, computed by the server`}
          />
          <CautionsList report={revision.report} />
          <WarningsList report={revision.report} system={system} />
          <div className="grid gap-4 2xl:grid-cols-[minmax(0,1fr)_minmax(0,440px)]">
            <ChecksByCase report={revision.report} system={system} />
            <ReportPictures report={revision.report} system={system} rawInput={revision.inputs} />
          </div>
        </section>
      </div>
      <section aria-labelledby="trail-title">
        <h2 id="trail-title" className="mb-1 text-sm font-semibold">
          Calculation trail
        </h2>
        <TrailTable report={revision.report} system={system} highlight={highlight} />
      </section>
    </div>
  );
}
