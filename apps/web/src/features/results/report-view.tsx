import type { Report } from '@hoopline/calc';
import { useDeferredValue, useMemo, type ReactNode } from 'react';
import type { UnitSystem } from '@hoopline/contract';
import { VerdictBadge } from '../../components/badges';
import { ScreeningCaution } from '../../components/screening-caution';
import { ScrollArea } from '../../components/scroll-area';
import { UtilisationBar } from '../../components/utilisation-bar';
import {
  presentReport,
  sketchOf,
  type PresentedReport,
  type PresentedWarning,
} from '@hoopline/present';
import { BucklingModeShape } from './buckling-mode';
import { ComponentSketch, lobeCount } from './sketches';
import { currentOf, sweepForPlot } from './sweep';
import { SweepPlot } from './sweep-plot';
import { TrailTable } from './trail-table';
import { useReaderUnits } from '../../lib/unit-system';

const SEVERITY_CLASS: Record<PresentedWarning['severityCode'], string> = {
  'outside-validity': 'border-warn bg-warn-soft',
  caution: 'border-line-strong bg-sunken',
  info: 'border-line bg-panel',
};

/**
 * The report as @hoopline/present shows it: every number and word here comes
 * from presentReport, the same one the PDF sheet prints, so screen and sheet
 * cannot disagree.
 */
export function usePresented(report: Report, system: UnitSystem): PresentedReport {
  // The system as the caller shows it; vacuum levels in the reader's vacuum unit.
  const { vacuumUnit } = useReaderUnits();
  return useMemo(() => presentReport(report, { system, vacuumUnit }), [report, system, vacuumUnit]);
}

export function ReportSummary({
  report,
  source,
  system = 'si',
  stale = false,
}: {
  report: Report;
  source?: ReactNode;
  system?: UnitSystem;
  /** The inputs changed and cannot be read: the verdict shown would be an old one, so it is not shown. */
  stale?: boolean;
}) {
  const shown = usePresented(report, system);
  const g = shown.governing;
  return (
    <div className="flex flex-col gap-1.5">
      <div className="flex flex-wrap items-center gap-2">
        {stale ? (
          <span className="inline-flex items-center rounded-full border border-line-strong px-3 py-0.5 text-sm font-medium text-muted">
            No verdict: inputs not readable
          </span>
        ) : (
          <VerdictBadge verdict={report.verdict} size="lg" />
        )}
        <span className="text-sm font-medium">{shown.title}</span>
      </div>
      <p className="text-sm">
        {g ? (
          <>
            Governing: <strong>{g.checkLabel}</strong> in load case <strong>{g.loadCase}</strong> at{' '}
            <strong className="num">{g.utilisation}</strong>.
          </>
        ) : (
          'No pass/fail checks for this component: the numbers below are for information.'
        )}
      </p>
      <p className="text-xs text-muted">
        {source}
        {source ? ' · ' : ''}
        {report.engine.name} {report.engine.version} · ambient {shown.ambient}
      </p>
    </div>
  );
}

/** The validity warnings, their numbers in the reader's units (@hoopline/present wordedText). */
export function WarningsList({ report, system }: { report: Report; system: UnitSystem }) {
  const shown = usePresented(report, system);
  if (shown.warnings.length === 0) return null;
  return (
    <section aria-labelledby="warnings-title" className="flex flex-col gap-1.5">
      <h3 id="warnings-title" className="text-sm font-semibold">
        Validity warnings
      </h3>
      <ul className="flex flex-col gap-1.5">
        {shown.warnings.map((w, i) => (
          <li
            key={`${w.code}-${i}`}
            className={`rounded border px-2.5 py-1.5 text-sm ${SEVERITY_CLASS[w.severityCode]}`}
          >
            <span className="font-semibold">{w.severity}</span>
            {w.loadCase ? <span className="text-muted"> ({w.loadCase})</span> : null}: {w.message}
          </li>
        ))}
      </ul>
    </section>
  );
}

/** Every caution of the report, open. The screening caution first, always; no toggle hides any. */
export function CautionsList({ report }: { report: Report }) {
  const screening = report.cautions.find((c) => c.code === 'screening-only');
  const others = report.cautions.filter((c) => c.code !== 'screening-only');
  return (
    <div className="flex flex-col gap-2">
      <ScreeningCaution {...(screening ? { caution: screening } : {})} />
      {others.length > 0 ? (
        <section aria-labelledby="cautions-title">
          <h3 id="cautions-title" className="mb-1 text-sm font-semibold">
            Cautions
          </h3>
          <ul className="flex flex-col gap-1.5">
            {others.map((c) => (
              <li
                key={c.code}
                className="rounded border border-line bg-panel px-2.5 py-1.5 text-sm"
              >
                <span className="font-semibold">{c.title}.</span> {c.text}
              </li>
            ))}
          </ul>
        </section>
      ) : null}
    </div>
  );
}

export function ChecksByCase({
  report,
  system,
  stale = false,
}: {
  report: Report;
  system: UnitSystem;
  /** The inputs changed and cannot be read: the figures are old ones, so no check says pass or fail. */
  stale?: boolean;
}) {
  const shown = usePresented(report, system);
  return (
    // min-w-0: a grid item (the workbench's, the review page's) may shrink below its table's width; the table scrolls.
    <section aria-labelledby="checks-title" className="flex min-w-0 flex-col gap-3">
      <h3 id="checks-title" className="text-sm font-semibold">
        Checks by load case
      </h3>
      {shown.cases.map((c, index) => (
        <article
          key={`${c.name}-${index}`}
          aria-label={`Load case ${c.name}`}
          className={`rounded-md border bg-panel ${c.governing ? 'border-accent' : 'border-line'}`}
        >
          <header className="flex flex-wrap items-baseline justify-between gap-2 border-b border-line px-3 py-1.5">
            <h4 className="text-sm font-semibold">
              {c.name}
              {c.governing ? (
                <span className="ml-2 rounded bg-accent px-1.5 py-px text-xs font-medium text-accent-ink">
                  Governing
                </span>
              ) : null}
            </h4>
            <span className="num text-xs text-muted">
              Δp {c.differential}, {c.direction}
              {c.factor !== null ? ` (× ${c.factor})` : ''}
            </span>
          </header>
          <p className="px-3 pt-1 text-xs text-muted">
            Inside {c.inside} (abs), outside {c.outside} (abs): {c.description}
          </p>
          {c.checks.length > 0 ? (
            <ScrollArea label={`Checks for ${c.name}`} framed={false} className="mt-1">
              <table className="w-full text-sm">
                <caption className="sr-only">Checks for {c.name}</caption>
                <thead>
                  <tr className="text-left text-xs text-muted">
                    <th scope="col" className="px-3 py-1 font-medium">
                      Check
                    </th>
                    <th scope="col" className="px-3 py-1 text-right font-medium">
                      Demand
                    </th>
                    <th scope="col" className="px-3 py-1 text-right font-medium">
                      Capacity
                    </th>
                    <th scope="col" className="px-3 py-1 font-medium">
                      Utilisation
                    </th>
                  </tr>
                </thead>
                <tbody>
                  {c.checks.map((k) => (
                    <tr
                      key={k.id}
                      className={`border-t border-line ${k.governing ? 'bg-accent-soft/50' : ''}`}
                    >
                      <th scope="row" className="min-w-[9rem] px-3 py-1.5 text-left font-normal">
                        {k.label}
                        <span className="block font-mono text-xs text-muted">{k.basis}</span>
                      </th>
                      <td className="num px-3 py-1.5 text-right whitespace-nowrap">{k.demand}</td>
                      <td className="num px-3 py-1.5 text-right whitespace-nowrap">{k.capacity}</td>
                      <td className="px-3 py-1.5">
                        <UtilisationBar
                          utilisation={k.utilisationRatio}
                          pass={k.pass}
                          label={`${k.label}, ${c.name}`}
                          stale={stale}
                        />
                      </td>
                    </tr>
                  ))}
                </tbody>
              </table>
            </ScrollArea>
          ) : (
            <p className="px-3 py-1.5 text-xs text-muted">No checks in this load case.</p>
          )}
          {c.outputs.length > 0 ? (
            <dl className="grid grid-cols-[1fr_auto] gap-x-4 gap-y-0.5 border-t border-line px-3 py-1.5 text-xs sm:grid-cols-[1fr_auto_1fr_auto]">
              {c.outputs.map((o) => (
                <div key={o.id} className="contents">
                  <dt className="text-muted">{o.label}</dt>
                  <dd className="num text-right font-medium">{o.value}</dd>
                </div>
              ))}
            </dl>
          ) : null}
        </article>
      ))}
    </section>
  );
}

/** Sketch, buckling mode and the thickness sweep (the sweep needs the raw input to vary). */
export function ReportPictures({
  report,
  system,
  rawInput,
}: {
  report: Report;
  system: UnitSystem;
  rawInput?: unknown;
}) {
  const deferredInput = useDeferredValue(rawInput);
  const sweep = useMemo(
    () => (deferredInput === undefined ? null : sweepForPlot(deferredInput, currentOf(report))),
    [deferredInput, report],
  );
  // A stiffened wall has a spacing to sweep too (null for every other kind).
  const spacingSweep = useMemo(
    () =>
      deferredInput === undefined
        ? null
        : sweepForPlot(deferredInput, currentOf(report), {}, 'spacing'),
    [deferredInput, report],
  );
  const lobes = lobeCount(report);
  // No heading over nothing: stored energy and pump-down have no sketch.
  const hasSketch = useMemo(() => sketchOf(report, system) !== null, [report, system]);
  return (
    <div className="flex min-w-0 flex-col gap-4">
      {hasSketch ? (
        <section aria-labelledby="sketch-title">
          <h3 id="sketch-title" className="mb-1 text-sm font-semibold">
            Sketch
          </h3>
          <ComponentSketch report={report} system={system} />
        </section>
      ) : null}
      {lobes !== null ? (
        <section aria-labelledby="mode-title">
          <h3 id="mode-title" className="mb-1 text-sm font-semibold">
            Buckling mode shape
          </h3>
          <BucklingModeShape lobes={lobes} />
        </section>
      ) : null}
      {sweep ? (
        <section aria-labelledby="sweep-title">
          <h3 id="sweep-title" className="mb-1 text-sm font-semibold">
            Thickness sweep
          </h3>
          <SweepPlot sweep={sweep} system={system} />
        </section>
      ) : null}
      {spacingSweep ? (
        <section aria-labelledby="spacing-sweep-title">
          <h3 id="spacing-sweep-title" className="mb-1 text-sm font-semibold">
            Spacing sweep
          </h3>
          <SweepPlot sweep={spacingSweep} system={system} />
        </section>
      ) : null}
    </div>
  );
}

/** The whole result, top to bottom: for revision and review pages. */
export function ReportView({
  report,
  system,
  rawInput,
  source,
}: {
  report: Report;
  system: UnitSystem;
  rawInput?: unknown;
  source?: ReactNode;
}) {
  return (
    <div className="flex flex-col gap-4">
      <ReportSummary report={report} source={source} system={system} />
      <CautionsList report={report} />
      <WarningsList report={report} system={system} />
      <div className="grid grid-cols-[minmax(0,1fr)] gap-4 xl:grid-cols-[minmax(0,1fr)_minmax(0,480px)]">
        <ChecksByCase report={report} system={system} />
        <ReportPictures
          report={report}
          system={system}
          {...(rawInput !== undefined ? { rawInput } : {})}
        />
      </div>
      <section aria-labelledby="trail-title">
        <h3 id="trail-title" className="mb-1 text-sm font-semibold">
          Calculation trail
        </h3>
        <TrailTable report={report} system={system} />
      </section>
    </div>
  );
}
