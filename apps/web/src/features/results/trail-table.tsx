import { ScrollArea } from '../../components/scroll-area';
import type { Report, Step } from '@hoopline/calc';
import type { UnitSystem } from '../../api/types';
import { dimensionOfReportUnit, formatValue, toDisplay } from '../../lib/units';

function StepRows({
  steps,
  start,
  system,
}: {
  steps: readonly Step[];
  start: number;
  system: UnitSystem;
}) {
  return (
    <>
      {steps.map((step, i) => {
        const display =
          step.value !== null && dimensionOfReportUnit(step.unit)
            ? toDisplay(step.value, step.unit, system)
            : null;
        return (
          <tr key={`${step.id}-${i}`} className="border-b border-line align-top last:border-b-0">
            <td className="num px-2 py-1.5 text-right text-xs text-muted">{start + i}</td>
            <th scope="row" className="px-2 py-1.5 text-left font-normal">
              {step.label}
            </th>
            <td className="px-2 py-1.5 font-mono text-xs break-words">{step.expression}</td>
            <td className="px-2 py-1.5 font-mono text-xs break-words">{step.substituted}</td>
            <td className="num px-2 py-1.5 text-right font-mono text-xs whitespace-nowrap">
              {step.value === null ? '–' : formatValue(step.value, 6)}
            </td>
            <td className="px-2 py-1.5 font-mono text-xs">
              {step.value === null ? '' : step.unit === '1' ? '–' : step.unit}
            </td>
            <td className="num px-2 py-1.5 text-right text-xs whitespace-nowrap text-muted">
              {display && display.unit !== step.unit ? display.text : ''}
            </td>
            <td className="px-2 py-1.5 text-xs text-muted">{step.source}</td>
          </tr>
        );
      })}
    </>
  );
}

/**
 * The full trail the checker signs: every step with its formula, the values
 * put in, the result (SI, as the engine wrote it, and in display units) and
 * its source. Numbered continuously, so a comment can say "step 14".
 */
export function TrailTable({ report, system }: { report: Report; system: UnitSystem }) {
  const common = 1;
  const starts = report.cases.reduce<number[]>((acc, _c, i) => {
    const previous =
      i === 0 ? common + report.steps.length : acc[i - 1]! + report.cases[i - 1]!.steps.length;
    return [...acc, previous];
  }, []);
  return (
    <ScrollArea label="Calculation trail">
      <table className="w-full min-w-[960px] border-collapse text-sm">
        <caption className="sr-only">Calculation trail</caption>
        <thead>
          <tr className="border-b border-line bg-sunken text-left text-xs text-muted">
            <th scope="col" className="w-8 px-2 py-1.5 text-right font-medium">
              #
            </th>
            <th scope="col" className="w-52 px-2 py-1.5 font-medium">
              Step
            </th>
            <th scope="col" className="px-2 py-1.5 font-medium">
              Expression
            </th>
            <th scope="col" className="px-2 py-1.5 font-medium">
              Substituted
            </th>
            <th scope="col" className="px-2 py-1.5 text-right font-medium">
              Value
            </th>
            <th scope="col" className="px-2 py-1.5 font-medium">
              Unit
            </th>
            <th scope="col" className="px-2 py-1.5 text-right font-medium">
              Shown as
            </th>
            <th scope="col" className="w-64 px-2 py-1.5 font-medium">
              Source
            </th>
          </tr>
        </thead>
        <tbody>
          <tr className="border-b border-line bg-sunken/50">
            <th colSpan={8} scope="rowgroup" className="px-2 py-1 text-left text-xs font-semibold">
              Common to every load case
            </th>
          </tr>
          <StepRows steps={report.steps} start={common} system={system} />
          {report.cases.map((c, i) => (
            <CaseRows
              key={`${c.loadCase.name}-${i}`}
              name={c.loadCase.name}
              steps={c.steps}
              start={starts[i] ?? 0}
              system={system}
            />
          ))}
        </tbody>
      </table>
    </ScrollArea>
  );
}

function CaseRows({
  name,
  steps,
  start,
  system,
}: {
  name: string;
  steps: readonly Step[];
  start: number;
  system: UnitSystem;
}) {
  return (
    <>
      <tr className="border-y border-line bg-sunken/50">
        <th colSpan={8} scope="rowgroup" className="px-2 py-1 text-left text-xs font-semibold">
          Load case: {name}
        </th>
      </tr>
      <StepRows steps={steps} start={start} system={system} />
    </>
  );
}
