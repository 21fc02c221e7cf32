import { useId, type ReactNode } from 'react';
import type { UnitSystem } from '../../../api/types';
import { show } from '@hoopline/present';
import { Dimension, DimensionDefs } from './dimension';
import { drawnThickness, fitToBox, pointsOnCircle, pointsOnRectangle } from './geometry';

const W = 420;
const H = 240;

function Frame({
  title,
  children,
  note,
  height = H,
}: {
  title: string;
  children: (id: string) => ReactNode;
  note?: string | null;
  height?: number;
}) {
  const raw = useId();
  const id = `s${raw.replace(/[^a-zA-Z0-9]/g, '')}`;
  return (
    <figure className="m-0">
      <svg
        viewBox={`0 0 ${W} ${height}`}
        role="img"
        aria-label={title}
        className="h-auto w-full max-w-[480px]"
      >
        <DimensionDefs id={id} />
        {children(id)}
      </svg>
      <figcaption className="text-xs text-muted">
        {title}
        {note ? ` ${note}` : ''}
      </figcaption>
    </figure>
  );
}

const NOT_TO_SCALE = '(thickness not to scale)';

/** Section through a flat circular plate: span, thickness, and the edge support. */
export function CircularPlateSketch({
  diameter,
  thickness,
  edge,
  system,
}: {
  diameter: number;
  thickness: number;
  edge: 'clamped' | 'simply-supported';
  system: UnitSystem;
}) {
  const height = 170;
  const span = 260;
  const scale = span / diameter;
  const t = drawnThickness(thickness, scale, 6, 30);
  const x0 = 50;
  const y0 = 78 - t.px / 2;
  const clamped = edge === 'clamped';
  const tx = x0 + span + 40;
  return (
    <Frame
      height={height}
      title={`Section of a flat circular plate, ${clamped ? 'clamped' : 'simply supported'} edge, span ${show(diameter, 'm', system)}, thickness ${show(thickness, 'm', system)}.`}
      note={t.toScale ? null : NOT_TO_SCALE}
    >
      {(id) => (
        <>
          <rect
            x={x0}
            y={y0}
            width={span}
            height={t.px}
            className="fill-accent-soft stroke-ink"
            strokeWidth={1.2}
          />
          {clamped ? (
            <>
              <rect
                x={x0 - 24}
                y={y0 - 20}
                width={24}
                height={t.px + 40}
                fill={`url(#${id}-hatch)`}
                className="stroke-muted"
              />
              <rect
                x={x0 + span}
                y={y0 - 20}
                width={24}
                height={t.px + 40}
                fill={`url(#${id}-hatch)`}
                className="stroke-muted"
              />
            </>
          ) : (
            <>
              <path d={`M${x0},${y0 + t.px} l-9,16 h18 z`} className="fill-panel stroke-ink" />
              <path
                d={`M${x0 + span},${y0 + t.px} l-9,16 h18 z`}
                className="fill-panel stroke-ink"
              />
            </>
          )}
          {Array.from({ length: 7 }, (_, i) => {
            const ax = x0 + (span * (i + 1)) / 8;
            return (
              <line
                key={i}
                x1={ax}
                y1={y0 - 30}
                x2={ax}
                y2={y0 - 4}
                className="stroke-muted"
                strokeWidth={1}
                markerEnd={`url(#${id}-arrow)`}
              />
            );
          })}
          <text
            x={x0 + span / 2}
            y={y0 - 36}
            textAnchor="middle"
            className="fill-muted text-[10px]"
          >
            pressure difference
          </text>
          <Dimension
            id={id}
            x1={x0}
            y1={y0 + t.px}
            x2={x0 + span}
            y2={y0 + t.px}
            offset={34}
            label={`span ${show(diameter, 'm', system)}`}
          />
          <line
            x1={x0 + span + 24}
            y1={y0}
            x2={tx + 6}
            y2={y0}
            className="stroke-muted"
            strokeWidth={0.8}
          />
          <line
            x1={x0 + span + 24}
            y1={y0 + t.px}
            x2={tx + 6}
            y2={y0 + t.px}
            className="stroke-muted"
            strokeWidth={0.8}
          />
          <line
            x1={tx}
            y1={y0 - 14}
            x2={tx}
            y2={y0}
            className="stroke-ink"
            markerEnd={`url(#${id}-arrow)`}
          />
          <line
            x1={tx}
            y1={y0 + t.px + 14}
            x2={tx}
            y2={y0 + t.px}
            className="stroke-ink"
            markerEnd={`url(#${id}-arrow)`}
          />
          <text x={tx + 8} y={y0 + t.px / 2 + 4} className="fill-ink text-[11px] font-medium">
            t {show(thickness, 'm', system)}
          </text>
        </>
      )}
    </Frame>
  );
}

/** Front view of a door or cover: the seal line and the latches or bolts on it. */
export function ClosureSketch({
  outline,
  fastenerCount,
  system,
}: {
  outline:
    | { shape: 'circle'; sealDiameter: number }
    | { shape: 'rectangle'; sealWidth: number; sealHeight: number };
  fastenerCount?: number | undefined;
  system: UnitSystem;
}) {
  const width = outline.shape === 'circle' ? outline.sealDiameter : outline.sealWidth;
  const height = outline.shape === 'circle' ? outline.sealDiameter : outline.sealHeight;
  const fit = fitToBox(width * 1.2, height * 1.2, W, H, 34);
  const w = width * fit.scale;
  const h = height * fit.scale;
  const cx = W / 2;
  const cy = H / 2;
  const n = Math.min(fastenerCount ?? 0, 72);
  const fasteners =
    outline.shape === 'circle'
      ? pointsOnCircle(n, cx, cy, (w / 2) * 1.1)
      : pointsOnRectangle(n, cx - (w / 2) * 1.1, cy - (h / 2) * 1.1, w * 1.1, h * 1.1);
  const title =
    outline.shape === 'circle'
      ? `Closure, circular seal line ${show(width, 'm', system)}${n ? `, ${n} fasteners` : ''}.`
      : `Closure, rectangular seal line ${show(width, 'm', system)} by ${show(height, 'm', system)}${n ? `, ${n} fasteners` : ''}.`;
  return (
    <Frame title={title}>
      {(id) => (
        <>
          {outline.shape === 'circle' ? (
            <>
              <circle
                cx={cx}
                cy={cy}
                r={(w / 2) * 1.18}
                className="fill-accent-soft stroke-ink"
                strokeWidth={1.2}
              />
              <circle
                cx={cx}
                cy={cy}
                r={w / 2}
                fill="none"
                className="stroke-accent"
                strokeWidth={1.5}
                strokeDasharray="6 3"
              />
              <Dimension
                id={id}
                x1={cx - w / 2}
                y1={cy}
                x2={cx + w / 2}
                y2={cy}
                offset={0}
                label={`seal ${show(width, 'm', system)}`}
              />
            </>
          ) : (
            <>
              <rect
                x={cx - (w / 2) * 1.18}
                y={cy - (h / 2) * 1.18}
                width={w * 1.18}
                height={h * 1.18}
                className="fill-accent-soft stroke-ink"
                strokeWidth={1.2}
              />
              <rect
                x={cx - w / 2}
                y={cy - h / 2}
                width={w}
                height={h}
                fill="none"
                className="stroke-accent"
                strokeWidth={1.5}
                strokeDasharray="6 3"
              />
              <Dimension
                id={id}
                x1={cx - w / 2}
                y1={cy + h / 2}
                x2={cx + w / 2}
                y2={cy + h / 2}
                offset={-12}
                label={`${show(width, 'm', system)}`}
              />
              <Dimension
                id={id}
                x1={cx + w / 2}
                y1={cy - h / 2}
                x2={cx + w / 2}
                y2={cy + h / 2}
                offset={-12}
                label={`${show(height, 'm', system)}`}
              />
            </>
          )}
          {fasteners.map((p, i) => (
            <circle key={i} cx={p.x} cy={p.y} r={3.2} className="fill-ink" />
          ))}
        </>
      )}
    </Frame>
  );
}

/** Front view of a rectangular plate with its section thickness. */
export function RectangularPlateSketch({
  width,
  height,
  thickness,
  system,
}: {
  width: number;
  height: number;
  thickness: number;
  system: UnitSystem;
}) {
  const fit = fitToBox(width, height, W - 80, H, 40);
  const w = width * fit.scale;
  const h = height * fit.scale;
  const x0 = (W - 80 - w) / 2;
  const y0 = (H - h) / 2;
  const t = drawnThickness(thickness, fit.scale, 5, 24);
  return (
    <Frame
      title={`Rectangular plate ${show(width, 'm', system)} by ${show(height, 'm', system)}, thickness ${show(thickness, 'm', system)}.`}
      note={t.toScale ? null : NOT_TO_SCALE}
    >
      {(id) => (
        <>
          <rect
            x={x0}
            y={y0}
            width={w}
            height={h}
            className="fill-accent-soft stroke-ink"
            strokeWidth={1.2}
          />
          <rect
            x={W - 60}
            y={y0}
            width={t.px}
            height={h}
            className="fill-accent-soft stroke-ink"
            strokeWidth={1.2}
          />
          <text
            x={W - 60 + t.px / 2}
            y={y0 - 6}
            textAnchor="middle"
            className="fill-muted text-[10px]"
          >
            section
          </text>
          <Dimension
            id={id}
            x1={x0}
            y1={y0 + h}
            x2={x0 + w}
            y2={y0 + h}
            offset={-16}
            label={show(width, 'm', system)}
          />
          <Dimension
            id={id}
            x1={x0}
            y1={y0}
            x2={x0}
            y2={y0 + h}
            offset={16}
            label={show(height, 'm', system)}
          />
          <Dimension
            id={id}
            x1={W - 60}
            y1={y0 + h}
            x2={W - 60 + t.px}
            y2={y0 + h}
            offset={-16}
            label={`t ${show(thickness, 'm', system)}`}
          />
        </>
      )}
    </Frame>
  );
}

/** Side view of a cylindrical shell: diameter, length, wall. */
export function CylinderSketch({
  diameter,
  thickness,
  length,
  system,
}: {
  diameter: number;
  thickness: number;
  length: number;
  system: UnitSystem;
}) {
  const fit = fitToBox(length, diameter, W, H, 46);
  const l = length * fit.scale;
  const d = diameter * fit.scale;
  const x0 = (W - l) / 2;
  const y0 = (H - d) / 2;
  const t = drawnThickness(thickness, fit.scale, 4, 20);
  return (
    <Frame
      title={`Cylindrical shell, diameter ${show(diameter, 'm', system)}, length ${show(length, 'm', system)}, wall ${show(thickness, 'm', system)}.`}
      note={t.toScale ? null : NOT_TO_SCALE}
    >
      {(id) => (
        <>
          <rect x={x0} y={y0} width={l} height={t.px} className="fill-accent-soft stroke-ink" />
          <rect
            x={x0}
            y={y0 + d - t.px}
            width={l}
            height={t.px}
            className="fill-accent-soft stroke-ink"
          />
          <line x1={x0} y1={y0} x2={x0} y2={y0 + d} className="stroke-ink" />
          <line x1={x0 + l} y1={y0} x2={x0 + l} y2={y0 + d} className="stroke-ink" />
          <line
            x1={x0 - 10}
            y1={H / 2}
            x2={x0 + l + 10}
            y2={H / 2}
            className="stroke-muted"
            strokeDasharray="10 3 2 3"
          />
          <Dimension
            id={id}
            x1={x0}
            y1={y0 + d}
            x2={x0 + l}
            y2={y0 + d}
            offset={-18}
            label={`L ${show(length, 'm', system)}`}
          />
          <Dimension
            id={id}
            x1={x0}
            y1={y0}
            x2={x0}
            y2={y0 + d}
            offset={18}
            label={`D ${show(diameter, 'm', system)}`}
          />
          <text
            x={x0 + l / 2}
            y={y0 - 6}
            textAnchor="middle"
            className="fill-ink text-[11px] font-medium"
          >
            t {show(thickness, 'm', system)}
          </text>
        </>
      )}
    </Frame>
  );
}

export type HeadShape = 'hemispherical' | 'ellipsoidal' | 'torispherical' | 'sphere';

/**
 * Profile of a head: the half-section outline, from the crown to the
 * tangent line, drawn from the head's own radii.
 */
export function headProfile(
  shape: HeadShape,
  diameter: number,
  crownRadius?: number,
  knuckleRadius?: number,
): { x: number; y: number }[] {
  const R = diameter / 2;
  const points: { x: number; y: number }[] = [];
  const steps = 48;
  if (shape === 'hemispherical' || shape === 'sphere') {
    for (let i = 0; i <= steps; i++) {
      const a = (Math.PI * i) / steps;
      points.push({ x: -R * Math.cos(a), y: R * Math.sin(a) });
    }
  } else if (shape === 'ellipsoidal') {
    const h = R / 2; // 2:1 head: depth D/4
    for (let i = 0; i <= steps; i++) {
      const a = (Math.PI * i) / steps;
      points.push({ x: -R * Math.cos(a), y: h * Math.sin(a) });
    }
  } else {
    const L = crownRadius ?? diameter;
    const r = knuckleRadius ?? 0.06 * diameter;
    // Knuckle centre at (R − r, 0); crown centre on the axis below, at −(L − r)·cos β… solved from tangency.
    const cx = R - r;
    const dist = L - r;
    const cy = -Math.sqrt(Math.max(dist * dist - cx * cx, 0));
    const beta = Math.atan2(-cy, cx); // angle where knuckle meets crown
    const knuckle = (n: number, from: number, to: number) =>
      Array.from({ length: n + 1 }, (_, i) => {
        const a = from + ((to - from) * i) / n;
        return { x: cx + r * Math.cos(a), y: r * Math.sin(a) };
      });
    const right = knuckle(12, 0, beta);
    const crown = Array.from({ length: 25 }, (_, i) => {
      const a = beta + ((Math.PI / 2 - beta) * i) / 24;
      return { x: L * Math.cos(a), y: cy + L * Math.sin(a) };
    });
    const half = [...right, ...crown];
    points.push(...half.map((p) => ({ x: -p.x, y: p.y })));
    points.push(...[...half].reverse());
  }
  return points;
}

export function HeadSketch({
  shape,
  diameter,
  thickness,
  crownRadius,
  knuckleRadius,
  system,
}: {
  shape: HeadShape;
  diameter: number;
  thickness: number;
  crownRadius?: number;
  knuckleRadius?: number;
  system: UnitSystem;
}) {
  const profile = headProfile(shape, diameter, crownRadius, knuckleRadius);
  const depth = Math.max(...profile.map((p) => p.y));
  const fullSphere = shape === 'sphere';
  const fit = fitToBox(diameter, fullSphere ? diameter : depth + diameter * 0.12, W, H, 40);
  const cx = W / 2;
  const base = fullSphere ? H / 2 : H - 50;
  const path = profile
    .map(
      (p, i) =>
        `${i === 0 ? 'M' : 'L'}${(cx + p.x * fit.scale).toFixed(1)},${(base - p.y * fit.scale).toFixed(1)}`,
    )
    .join(' ');
  const mirrored = fullSphere
    ? profile
        .map(
          (p, i) =>
            `${i === 0 ? 'M' : 'L'}${(cx + p.x * fit.scale).toFixed(1)},${(base + p.y * fit.scale).toFixed(1)}`,
        )
        .join(' ')
    : '';
  const d = diameter * fit.scale;
  const t = drawnThickness(thickness, fit.scale, 3, 14);
  const names: Record<HeadShape, string> = {
    hemispherical: 'Hemispherical head',
    ellipsoidal: '2:1 ellipsoidal head',
    torispherical: 'Torispherical head',
    sphere: 'Sphere',
  };
  return (
    <Frame
      title={`${names[shape]}, diameter ${show(diameter, 'm', system)}, thickness ${show(thickness, 'm', system)}.`}
      note={t.toScale ? null : NOT_TO_SCALE}
    >
      {(id) => (
        <>
          <path
            d={path}
            fill="none"
            className="stroke-ink"
            strokeWidth={t.px}
            strokeOpacity={0.25}
          />
          <path d={path} fill="none" className="stroke-ink" strokeWidth={1.2} />
          {fullSphere ? (
            <path d={mirrored} fill="none" className="stroke-ink" strokeWidth={1.2} />
          ) : null}
          {!fullSphere ? (
            <>
              <line
                x1={cx - d / 2}
                y1={base}
                x2={cx - d / 2}
                y2={base + 22}
                className="stroke-ink"
              />
              <line
                x1={cx + d / 2}
                y1={base}
                x2={cx + d / 2}
                y2={base + 22}
                className="stroke-ink"
              />
              <line
                x1={cx - d / 2 - 12}
                y1={base}
                x2={cx + d / 2 + 12}
                y2={base}
                className="stroke-muted"
                strokeDasharray="6 3"
              />
            </>
          ) : null}
          <Dimension
            id={id}
            x1={cx - d / 2}
            y1={fullSphere ? base : base + 22}
            x2={cx + d / 2}
            y2={fullSphere ? base : base + 22}
            offset={fullSphere ? 0 : -10}
            label={`D ${show(diameter, 'm', system)}`}
          />
          <text
            x={cx}
            y={base - depth * fit.scale - 8}
            textAnchor="middle"
            className="fill-ink text-[11px] font-medium"
          >
            t {show(thickness, 'm', system)}
          </text>
        </>
      )}
    </Frame>
  );
}
