import type { CaseReport, Report } from '@hoopline/calc';
import { useDeferredValue, useMemo, type ReactNode } from 'react';
import type { UnitSystem } from '../../api/types';
import { VerdictBadge } from '../../components/badges';
import { ScreeningCaution } from '../../components/screening-caution';
import { UtilisationBar } from '../../components/utilisation-bar';
import { percent, show } from '../../lib/units';
import { BucklingModeShape } from './buckling-mode';
import { ComponentSketch, lobeCount } from './sketches';
import { sweepForPlot } from './sweep';
import { SweepPlot } from './sweep-plot';
import { TrailTable } from './trail-table';

const DIRECTION: Record<CaseReport['loadCase']['direction'], string> = {
  'external-over': 'outside higher',
  'internal-over': 'inside higher',
  balanced: 'balanced',
};

const SEVERITY: Record<string, { label: string; className: string }> = {
  'outside-validity': { label: 'Outside validity', className: 'border-warn bg-warn-soft' },
  caution: { label: 'Caution', className: 'border-line-strong bg-sunken' },
  info: { label: 'Note', className: 'border-line bg-panel' },
};

export function ReportSummary({ report, source }: { report: Report; source?: ReactNode }) {
  const g = report.governing;
  return (
    <div className="flex flex-col gap-1.5">
      <div className="flex flex-wrap items-center gap-2">
        <VerdictBadge verdict={report.verdict} size="lg" />
        <span className="text-sm font-medium">{report.title}</span>
      </div>
      <p className="text-sm">
        {g ? (
          <>
            Governing: <strong>{g.checkLabel}</strong> in load case <strong>{g.loadCase}</strong> at{' '}
            <strong className="num">{percent(g.utilisation)}</strong>.
          </>
        ) : (
          'No pass/fail checks for this component: the numbers below are for information.'
        )}
      </p>
      <p className="text-xs text-muted">
        {source}
        {source ? ' · ' : ''}
        {report.engine.name} {report.engine.version} · ambient{' '}
        {show(report.ambient.pressure, 'Pa', 'si')}
        {report.ambient.basis === 'altitude' && report.ambient.altitude !== undefined
          ? ` (standard atmosphere at ${show(report.ambient.altitude, 'm', 'si')})`
          : report.ambient.basis === 'default'
            ? ' (sea level)'
            : ' (given)'}
      </p>
    </div>
  );
}

export function WarningsList({ report }: { report: Report }) {
  if (report.warnings.length === 0) return null;
  return (
    <section aria-labelledby="warnings-title" className="flex flex-col gap-1.5">
      <h3 id="warnings-title" className="text-sm font-semibold">
        Validity warnings
      </h3>
      <ul className="flex flex-col gap-1.5">
        {report.warnings.map((w, i) => {
          const s = SEVERITY[w.severity] ?? SEVERITY['info']!;
          return (
            <li
              key={`${w.code}-${i}`}
              className={`rounded border px-2.5 py-1.5 text-sm ${s.className}`}
            >
              <span className="font-semibold">{s.label}</span>
              {w.loadCase ? <span className="text-muted"> ({w.loadCase})</span> : null}: {w.message}
            </li>
          );
        })}
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

export function ChecksByCase({ report, system }: { report: Report; system: UnitSystem }) {
  return (
    <section aria-labelledby="checks-title" className="flex flex-col gap-3">
      <h3 id="checks-title" className="text-sm font-semibold">
        Checks by load case
      </h3>
      {report.cases.map((c, index) => {
        const governing = report.governing?.caseIndex === index;
        return (
          <article
            key={`${c.loadCase.name}-${index}`}
            aria-label={`Load case ${c.loadCase.name}`}
            className={`rounded-md border bg-panel ${governing ? 'border-accent' : 'border-line'}`}
          >
            <header className="flex flex-wrap items-baseline justify-between gap-2 border-b border-line px-3 py-1.5">
              <h4 className="text-sm font-semibold">
                {c.loadCase.name}
                {governing ? (
                  <span className="ml-2 rounded bg-accent px-1.5 py-px text-xs font-medium text-accent-ink">
                    Governing
                  </span>
                ) : null}
              </h4>
              <span className="num text-xs text-muted">
                Δp {show(Math.abs(c.loadCase.differential), 'Pa', system)},{' '}
                {DIRECTION[c.loadCase.direction]}
                {c.loadCase.factor !== 1 ? ` (× ${c.loadCase.factor})` : ''}
              </span>
            </header>
            <p className="px-3 pt-1 text-xs text-muted">{c.loadCase.description}</p>
            {c.checks.length > 0 ? (
              <table className="mt-1 w-full text-sm">
                <caption className="sr-only">Checks for {c.loadCase.name}</caption>
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
                      className={`border-t border-line ${c.governing?.checkId === k.id ? 'bg-accent-soft/50' : ''}`}
                    >
                      <th scope="row" className="px-3 py-1.5 text-left font-normal">
                        {k.label}
                        <span className="block font-mono text-xs text-muted">{k.basis}</span>
                      </th>
                      <td className="num px-3 py-1.5 text-right whitespace-nowrap">
                        {show(k.demand, k.unit, system)}
                      </td>
                      <td className="num px-3 py-1.5 text-right whitespace-nowrap">
                        {show(k.capacity, k.unit, system)}
                      </td>
                      <td className="px-3 py-1.5">
                        <UtilisationBar
                          utilisation={k.utilisation}
                          pass={k.pass}
                          label={`${k.label}, ${c.loadCase.name}`}
                        />
                      </td>
                    </tr>
                  ))}
                </tbody>
              </table>
            ) : (
              <p className="px-3 py-1.5 text-xs text-muted">No checks in this load case.</p>
            )}
            {c.outputs.length > 0 ? (
              <dl className="grid grid-cols-[1fr_auto] gap-x-4 gap-y-0.5 border-t border-line px-3 py-1.5 text-xs sm:grid-cols-[1fr_auto_1fr_auto]">
                {c.outputs.map((o) => (
                  <div key={o.id} className="contents">
                    <dt className="text-muted">{o.label}</dt>
                    <dd className="num text-right font-medium">{show(o.value, o.unit, system)}</dd>
                  </div>
                ))}
              </dl>
            ) : null}
          </article>
        );
      })}
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
    () =>
      deferredInput === undefined
        ? null
        : sweepForPlot(deferredInput, report.governing?.utilisation ?? null),
    [deferredInput, report],
  );
  const lobes = lobeCount(report);
  return (
    <div className="flex flex-col gap-4">
      <section aria-labelledby="sketch-title">
        <h3 id="sketch-title" className="mb-1 text-sm font-semibold">
          Sketch
        </h3>
        <ComponentSketch report={report} system={system} />
      </section>
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
      <ReportSummary report={report} source={source} />
      <CautionsList report={report} />
      <WarningsList report={report} />
      <div className="grid gap-4 xl:grid-cols-[minmax(0,1fr)_minmax(0,480px)]">
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
