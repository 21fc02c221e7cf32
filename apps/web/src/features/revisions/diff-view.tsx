import { ScrollArea } from '../../components/scroll-area';
import type { Change, RevisionDiff, RevisionSummary } from '@hoopline/contract';
import { StatusBadge, VerdictBadge } from '../../components/badges';
import { formatDateTime } from '../../lib/dates';
import {
  dimensionOfReportUnit,
  formatPercent as percent,
  formatSignificant,
  inputLabel,
  show,
} from '@hoopline/present';
import { useUnitSystem } from '../../lib/unit-system';
import type { UnitSystem } from '@hoopline/contract';

/**
 * A value in a diff cell: a utilisation as a percentage, a result whose label
 * names its SI unit ("Maximum stress (Pa)") in the reader's display unit,
 * other numbers to 6 figures, text as is, structures as compact JSON.
 */
export function diffValue(
  value: unknown,
  change?: Pick<Change, 'path' | 'label'>,
  system: UnitSystem = 'si',
): string {
  if (value === undefined || value === null) return '–';
  if (typeof value === 'number') {
    if (change && /(^|\.)utilisation$/.test(change.path)) return percent(value);
    const unit = /\(([^()]+)\)$/.exec(change?.label ?? '')?.[1];
    if (unit && dimensionOfReportUnit(unit)) return show(value, unit, system);
    return formatSignificant(value, { significant: 6 });
  }
  if (typeof value === 'string') return value;
  if (typeof value === 'boolean') return value ? 'yes' : 'no';
  return JSON.stringify(value);
}

function ChangeRows({
  changes,
  empty,
  kind,
}: {
  changes: readonly Change[];
  empty: string;
  kind: string;
}) {
  const system = useUnitSystem();
  if (changes.length === 0) {
    return (
      <tr>
        <td colSpan={3} className="px-3 py-2 text-sm text-muted">
          {empty}
        </td>
      </tr>
    );
  }
  return (
    <>
      {changes.map((change) => (
        <tr key={change.path} className="border-b border-line last:border-b-0" data-changed="true">
          <th scope="row" className="border-l-4 border-warn px-3 py-1.5 text-left font-normal">
            {change.label ?? inputLabel(kind, change.path)}
            <span className="block font-mono text-xs text-muted">{change.path}</span>
          </th>
          <td className="num bg-fail-soft/60 px-3 py-1.5 font-mono text-xs">
            <span className="sr-only">before: </span>
            {diffValue(change.before, change, system)}
          </td>
          <td className="num bg-pass-soft/60 px-3 py-1.5 font-mono text-xs">
            <span className="sr-only">after: </span>
            {diffValue(change.after, change, system)}
          </td>
        </tr>
      ))}
    </>
  );
}

/**
 * Two revisions side by side: their status and verdict, then every changed
 * input and every changed result, before on the left, after on the right.
 * Changed rows carry a marker bar and the words "before"/"after" for screen
 * readers, not colour alone.
 */
export function DiffView({
  from,
  to,
  diff,
  kind,
}: {
  from: RevisionSummary;
  to: RevisionSummary;
  diff: RevisionDiff;
  /** The component's kind, whose vocabulary labels the inputs. */
  kind: string;
}) {
  const header = (
    <thead>
      <tr className="border-b border-line bg-sunken text-left text-xs text-muted">
        <th scope="col" className="w-1/3 px-3 py-2 font-medium">
          &nbsp;
        </th>
        <th scope="col" className="px-3 py-2 font-medium">
          Revision {from.number}
        </th>
        <th scope="col" className="px-3 py-2 font-medium">
          Revision {to.number}
        </th>
      </tr>
    </thead>
  );
  return (
    <div className="flex flex-col gap-4">
      <ScrollArea label="Revisions">
        <table className="w-full border-collapse text-sm">
          <caption className="px-3 pt-2 text-left text-sm font-semibold">Revisions</caption>
          {header}
          <tbody>
            <tr className="border-b border-line">
              <th scope="row" className="px-3 py-1.5 text-left font-normal">
                Status
              </th>
              <td className="px-3 py-1.5">
                <StatusBadge status={from.status} superseded={from.superseded} />
              </td>
              <td className="px-3 py-1.5">
                <StatusBadge status={to.status} superseded={to.superseded} />
              </td>
            </tr>
            <tr
              className="border-b border-line"
              data-changed={diff.verdictChanged ? 'true' : undefined}
            >
              <th
                scope="row"
                className={`px-3 py-1.5 text-left font-normal ${diff.verdictChanged ? 'border-l-4 border-warn' : ''}`}
              >
                Verdict
                {diff.verdictChanged ? (
                  <span className="ml-1 text-xs font-medium text-warn">changed</span>
                ) : null}
              </th>
              <td className="px-3 py-1.5">
                <VerdictBadge verdict={from.verdict} />
              </td>
              <td className="px-3 py-1.5">
                <VerdictBadge verdict={to.verdict} />
              </td>
            </tr>
            <tr className="border-b border-line">
              <th scope="row" className="px-3 py-1.5 text-left font-normal">
                Author, saved
              </th>
              <td className="num px-3 py-1.5">
                {from.author.name}, {formatDateTime(from.createdAt)}
              </td>
              <td className="num px-3 py-1.5">
                {to.author.name}, {formatDateTime(to.createdAt)}
              </td>
            </tr>
          </tbody>
        </table>
      </ScrollArea>
      <ScrollArea label="Changed inputs">
        <table className="w-full border-collapse text-sm">
          <caption className="px-3 pt-2 text-left text-sm font-semibold">
            Changed inputs{' '}
            <span className="num font-normal text-muted">({diff.inputs.length})</span>
          </caption>
          {header}
          <tbody>
            <ChangeRows changes={diff.inputs} empty="No input changed." kind={kind} />
          </tbody>
        </table>
      </ScrollArea>
      <ScrollArea label="Changed results">
        <table className="w-full border-collapse text-sm">
          <caption className="px-3 pt-2 text-left text-sm font-semibold">
            Changed results{' '}
            <span className="num font-normal text-muted">({diff.results.length})</span>
          </caption>
          {header}
          <tbody>
            <ChangeRows changes={diff.results} empty="No result changed." kind={kind} />
          </tbody>
        </table>
      </ScrollArea>
    </div>
  );
}
