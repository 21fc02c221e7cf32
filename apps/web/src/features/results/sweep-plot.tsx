import { findUnit, fromSi } from '@hoopline/calc';
import { useId } from 'react';
import type { UnitSystem } from '../../api/types';
import { formatValue, percent, prettyUnit } from '../../lib/units';
import { linearScale, niceCeil, niceTicks } from './chart-scale';
import type { PlotSweep } from './sweep';

const W = 560;
const H = 250;
const M = { left: 50, right: 14, top: 14, bottom: 40 };

/**
 * Governing utilisation against thickness: the curve, the 100 % line, the
 * current design and the smallest thickness that passes. Utilisations above
 * the top of the chart are drawn at the top (the caption has the numbers).
 */
export function SweepPlot({ sweep, system }: { sweep: PlotSweep; system: UnitSystem }) {
  const titleId = useId();
  const lengthUnit = system === 'si' ? 'mm' : 'in';
  const unit = findUnit(lengthUnit)!;
  const toLen = (m: number) => fromSi(m, unit);
  const pts = sweep.points;
  if (pts.length < 2) return null;

  const maxU = Math.max(...pts.map((p) => p.utilisation), sweep.current.utilisation ?? 0);
  const yTop = Math.min(Math.max(niceCeil(maxU * 100), 120), 300);
  const x = linearScale([toLen(sweep.from), toLen(sweep.to)], [M.left, W - M.right]);
  const y = linearScale([0, yTop], [H - M.bottom, M.top]);
  const yOf = (u: number) => y(Math.min(u * 100, yTop));
  const path = pts
    .map(
      (p, i) =>
        `${i === 0 ? 'M' : 'L'}${x(toLen(p.thickness)).toFixed(1)},${yOf(p.utilisation).toFixed(1)}`,
    )
    .join(' ');
  const xTicks = niceTicks(toLen(sweep.from), toLen(sweep.to), 6);
  const yTicks = niceTicks(0, yTop, 5);
  const current = sweep.current;
  const min = sweep.minimumPassing;
  const lenText = (m: number) => `${formatValue(toLen(m))} ${prettyUnit(lengthUnit)}`;

  const summary =
    `Current thickness ${lenText(current.thickness)}` +
    (current.utilisation !== null
      ? ` at ${percent(current.utilisation)} governing utilisation. `
      : '. ') +
    (typeof min === 'number'
      ? `Smallest thickness that passes: ${lenText(min)}.`
      : min === 'below'
        ? `Every thickness from ${lenText(sweep.from)} passes.`
        : `No thickness up to ${lenText(sweep.to)} passes.`);

  return (
    <figure className="m-0">
      <svg
        viewBox={`0 0 ${W} ${H}`}
        role="img"
        aria-labelledby={titleId}
        className="h-auto w-full max-w-[640px] text-ink"
      >
        <title id={titleId}>{`Utilisation against thickness. ${summary}`}</title>

        {yTicks.map((t) => (
          <g key={`y${t}`}>
            <line
              x1={M.left}
              x2={W - M.right}
              y1={y(t)}
              y2={y(t)}
              className="stroke-line"
              strokeWidth={1}
            />
            <text x={M.left - 6} y={y(t) + 3.5} textAnchor="end" className="fill-muted text-[10px]">
              {t} %
            </text>
          </g>
        ))}
        {xTicks.map((t) => (
          <g key={`x${t}`}>
            <line
              x1={x(t)}
              x2={x(t)}
              y1={H - M.bottom}
              y2={H - M.bottom + 4}
              className="stroke-line-strong"
            />
            <text
              x={x(t)}
              y={H - M.bottom + 15}
              textAnchor="middle"
              className="fill-muted text-[10px]"
            >
              {formatValue(t, 3)}
            </text>
          </g>
        ))}
        <text
          x={(M.left + W - M.right) / 2}
          y={H - 6}
          textAnchor="middle"
          className="fill-muted text-[11px]"
        >
          {sweep.label} ({prettyUnit(lengthUnit)})
        </text>
        <line
          x1={M.left}
          x2={W - M.right}
          y1={y(100)}
          y2={y(100)}
          className="stroke-fail"
          strokeDasharray="5 3"
          strokeWidth={1.2}
        />
        <text x={W - M.right - 2} y={y(100) - 4} textAnchor="end" className="fill-fail text-[10px]">
          100 % (limit)
        </text>
        <path d={path} fill="none" className="stroke-accent" strokeWidth={2} />
        {typeof min === 'number' ? (
          <g>
            <line
              x1={x(toLen(min))}
              x2={x(toLen(min))}
              y1={M.top}
              y2={H - M.bottom}
              className="stroke-pass"
              strokeWidth={1.2}
            />
            <text
              x={x(toLen(min)) + 4}
              y={M.top + 10}
              className="fill-pass text-[10px] font-medium"
            >
              min {lenText(min)}
            </text>
          </g>
        ) : null}
        {current.utilisation !== null ? (
          <g>
            <line
              x1={x(toLen(current.thickness))}
              x2={x(toLen(current.thickness))}
              y1={yOf(current.utilisation)}
              y2={H - M.bottom}
              className="stroke-ink"
              strokeDasharray="2 2"
            />
            <circle
              cx={x(toLen(current.thickness))}
              cy={yOf(current.utilisation)}
              r={4.5}
              className="fill-panel stroke-ink"
              strokeWidth={2}
            />
            <text
              x={x(toLen(current.thickness)) + 7}
              y={yOf(current.utilisation) - 7}
              className="fill-ink text-[10px] font-medium"
            >
              current {lenText(current.thickness)}, {percent(current.utilisation)}
            </text>
          </g>
        ) : null}
        <line x1={M.left} x2={M.left} y1={M.top} y2={H - M.bottom} className="stroke-line-strong" />
        <line
          x1={M.left}
          x2={W - M.right}
          y1={H - M.bottom}
          y2={H - M.bottom}
          className="stroke-line-strong"
        />
      </svg>
      <figcaption className="mt-1 text-xs text-muted">
        {summary} Validity warnings, if any, are those listed for the current design.
      </figcaption>
    </figure>
  );
}
