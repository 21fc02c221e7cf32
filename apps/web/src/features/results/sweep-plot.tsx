import { findUnit, fromSi } from '@hoopline/calc';
import { useId } from 'react';
import type { UnitSystem } from '@hoopline/contract';
import {
  formatPercent as percent,
  formatSignificant,
  printed as prettyUnit,
} from '@hoopline/present';
import { linearScale, niceCeil, niceTicks } from './chart-scale';
import { curvePieces, type PlotSweep } from './sweep';

const W = 560;
const H = 250;
const M = { left: 50, right: 14, top: 14, bottom: 40 };

/**
 * Governing utilisation against thickness (or stiffener spacing): the curve,
 * the 100 % line, the current design and the smallest thickness (largest
 * spacing) that passes. Where the engine
 * flags the method as outside its validity range the curve is dashed over a
 * shaded band (a legend entry says so). Utilisations above the top of the
 * chart are drawn at the top (the caption has the numbers).
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
  // Two paths, split where a stretch outside validity begins or ends (sweep.ts, curvePieces).
  const at = (p: { value: number; utilisation: number }) =>
    `${x(toLen(p.value)).toFixed(1)},${yOf(p.utilisation).toFixed(1)}`;
  let inside = '';
  let outside = '';
  for (const piece of curvePieces(sweep)) {
    const d = piece.points.map((p, i) => `${i === 0 ? 'M' : 'L'}${at(p)}`).join(' ') + ' ';
    if (piece.outside) outside += d;
    else inside += d;
  }
  const runs = sweep.outsideValidity;
  const xTicks = niceTicks(toLen(sweep.from), toLen(sweep.to), 6);
  const yTicks = niceTicks(0, yTop, 5);
  const current = sweep.current;
  const min = sweep.limit;
  const lenText = (m: number) => `${formatSignificant(toLen(m))} ${prettyUnit(lengthUnit)}`;
  const spacing = sweep.parameter === 'spacing';
  const what = spacing ? 'spacing' : 'thickness';
  const limitOutside = typeof min === 'number' && sweep.limitOutsideValidity;
  const rangeText = (r: (typeof runs)[number]) =>
    r.from <= sweep.from
      ? `up to ${lenText(r.to)}`
      : r.to >= sweep.to
        ? `from ${lenText(r.from)}`
        : `${lenText(r.from)} to ${lenText(r.to)}`;
  // The current design's validity is the report's (its warnings), by the rule the sweep uses.
  const currentValidity =
    current.outsideValidity === null || runs.length === 0
      ? ''
      : current.outsideValidity
        ? ` The current ${what} is outside the validity range: see the validity warnings.`
        : ` The current ${what} is inside the validity range.`;
  const outsideWords = limitOutside
    ? ", outside the method's validity range: no basis for a decision."
    : '.';

  const summary =
    `Current ${what} ${lenText(current.value)}` +
    (current.utilisation !== null
      ? ` at ${percent(current.utilisation)} governing utilisation` +
        (current.outsideValidity ? ', outside the validity range. ' : '. ')
      : '. ') +
    (typeof min === 'number'
      ? spacing
        ? `Largest spacing that passes: ${lenText(min)}${outsideWords}`
        : `Smallest thickness that passes: ${lenText(min)}${outsideWords}`
      : min === 'all-pass'
        ? spacing
          ? `Every spacing up to ${lenText(sweep.to)} passes.`
          : `Every thickness from ${lenText(sweep.from)} passes.`
        : spacing
          ? `No spacing from ${lenText(sweep.from)} passes.`
          : `No thickness up to ${lenText(sweep.to)} passes.`) +
    (runs.length > 0
      ? ` Outside the method's validity range (dashed, shaded): ${runs
          .map(rangeText)
          .join(' and ')}; results there are not reliable.${currentValidity}`
      : '');

  return (
    <figure className="m-0">
      <svg
        viewBox={`0 0 ${W} ${H}`}
        role="img"
        aria-labelledby={titleId}
        className="h-auto w-full max-w-[640px] text-ink"
      >
        <title
          id={titleId}
        >{`Utilisation against ${spacing ? 'stiffener spacing' : 'thickness'}. ${summary}`}</title>
        {runs.map((r) => (
          <rect
            key={`outside-${r.from}`}
            data-testid="outside-validity-band"
            x={x(toLen(r.from))}
            width={Math.max(x(toLen(r.to)) - x(toLen(r.from)), 1)}
            y={M.top}
            height={H - M.bottom - M.top}
            className="fill-warn-soft"
          />
        ))}

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
              {formatSignificant(t, { significant: 3 })}
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
        {inside ? (
          <path d={inside.trim()} fill="none" className="stroke-accent" strokeWidth={2} />
        ) : null}
        {outside ? (
          <path
            d={outside.trim()}
            fill="none"
            data-testid="outside-validity-curve"
            className="stroke-warn"
            strokeWidth={2}
            strokeDasharray="6 4"
          />
        ) : null}
        {typeof min === 'number' ? (
          <g>
            <line
              x1={x(toLen(min))}
              x2={x(toLen(min))}
              y1={M.top}
              y2={H - M.bottom}
              className={limitOutside ? 'stroke-warn' : 'stroke-pass'}
              strokeWidth={1.2}
              {...(limitOutside ? { strokeDasharray: '3 2' } : {})}
            />
            <text
              data-testid="sweep-minimum"
              x={x(toLen(min)) + (x(toLen(min)) > W - 150 ? -4 : 4)}
              y={M.top + 10}
              textAnchor={x(toLen(min)) > W - 150 ? 'end' : 'start'}
              className={`${limitOutside ? 'fill-warn' : 'fill-pass'} text-[10px] font-medium`}
            >
              {spacing ? 'max' : 'min'} {lenText(min)}
              {limitOutside ? ', outside validity' : ''}
            </text>
          </g>
        ) : null}
        {current.utilisation !== null ? (
          <g>
            <line
              x1={x(toLen(current.value))}
              x2={x(toLen(current.value))}
              y1={yOf(current.utilisation)}
              y2={H - M.bottom}
              className="stroke-ink"
              strokeDasharray="2 2"
            />
            <circle
              cx={x(toLen(current.value))}
              cy={yOf(current.utilisation)}
              r={4.5}
              className="fill-panel stroke-ink"
              strokeWidth={2}
            />
            <text
              data-testid="sweep-current"
              x={x(toLen(current.value)) + (x(toLen(current.value)) > W - 190 ? -7 : 7)}
              y={yOf(current.utilisation) - 7}
              textAnchor={x(toLen(current.value)) > W - 190 ? 'end' : 'start'}
              className={`${current.outsideValidity ? 'fill-warn' : 'fill-ink'} text-[10px] font-medium`}
            >
              current {lenText(current.value)}, {percent(current.utilisation)}
              {current.outsideValidity ? ', outside validity' : ''}
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
      <ul aria-label="Legend" className="mt-1 flex flex-wrap gap-x-4 gap-y-1 text-xs text-muted">
        <li className="flex items-center gap-1.5">
          <svg aria-hidden="true" width="22" height="8">
            <line x1="1" x2="21" y1="4" y2="4" className="stroke-accent" strokeWidth={2} />
          </svg>
          Governing utilisation
        </li>
        <li className="flex items-center gap-1.5">
          <svg aria-hidden="true" width="22" height="8">
            <line
              x1="1"
              x2="21"
              y1="4"
              y2="4"
              className="stroke-fail"
              strokeWidth={1.2}
              strokeDasharray="5 3"
            />
          </svg>
          100 % limit
        </li>
        {runs.length > 0 ? (
          <li className="flex items-center gap-1.5">
            <svg aria-hidden="true" width="22" height="10">
              <rect x="0" y="0" width="22" height="10" className="fill-warn-soft" />
              <line
                x1="1"
                x2="21"
                y1="5"
                y2="5"
                className="stroke-warn"
                strokeWidth={2}
                strokeDasharray="6 4"
              />
            </svg>
            Outside the method&apos;s validity range
          </li>
        ) : null}
      </ul>
      <figcaption className="mt-1 text-xs text-muted">{summary}</figcaption>
    </figure>
  );
}
