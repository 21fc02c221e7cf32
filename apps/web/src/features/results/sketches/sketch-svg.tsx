import {
  fontOf,
  pointsOf,
  strokeOf,
  type Sketch,
  type SketchRole,
  type SketchShape,
} from '@hoopline/present';
import type { ReactNode } from 'react';

/** Theme classes for each role (they follow light and dark mode). */
const FILL: Record<SketchRole, string> = {
  body: 'fill-accent-soft',
  ink: 'fill-ink',
  muted: 'fill-muted',
  accent: 'fill-accent',
  support: 'fill-panel',
};
const STROKE: Record<SketchRole, string> = {
  body: 'stroke-accent-soft',
  ink: 'stroke-ink',
  muted: 'stroke-muted',
  accent: 'stroke-accent',
  support: 'stroke-panel',
};

function paint(
  fill: SketchRole | 'none',
  stroke: SketchRole | 'none',
): {
  className: string;
  fill?: string;
} {
  const classes = [fill !== 'none' ? FILL[fill] : '', stroke !== 'none' ? STROKE[stroke] : '']
    .filter(Boolean)
    .join(' ');
  return fill === 'none' ? { className: classes, fill: 'none' } : { className: classes };
}

function draw(shape: SketchShape, key: number): ReactNode {
  switch (shape.type) {
    case 'rect':
      return (
        <rect
          key={key}
          x={shape.x}
          y={shape.y}
          width={shape.width}
          height={shape.height}
          {...strokeOf(shape)}
          {...paint(shape.fill, shape.stroke)}
        />
      );
    case 'circle':
      return (
        <circle
          key={key}
          cx={shape.cx}
          cy={shape.cy}
          r={shape.r}
          {...strokeOf(shape)}
          {...paint(shape.fill, shape.stroke)}
        />
      );
    case 'line':
      return (
        <line
          key={key}
          x1={shape.x1}
          y1={shape.y1}
          x2={shape.x2}
          y2={shape.y2}
          className={STROKE[shape.stroke]}
          {...strokeOf(shape)}
        />
      );
    case 'path':
      return shape.closed ? (
        <polygon
          key={key}
          points={pointsOf(shape)}
          {...strokeOf(shape)}
          {...paint(shape.fill, shape.stroke)}
        />
      ) : (
        <polyline
          key={key}
          points={pointsOf(shape)}
          {...strokeOf(shape)}
          {...paint(shape.fill, shape.stroke)}
        />
      );
    case 'text':
      return (
        <text
          key={key}
          x={shape.x}
          y={shape.y}
          textAnchor={shape.anchor}
          className={FILL[shape.role]}
          {...fontOf(shape)}
        >
          {shape.text}
        </text>
      );
  }
}

/** A sketch of @hoopline/present drawn as SVG: the same sketch the sheet prints. */
export function SketchSvg({ sketch }: { sketch: Sketch }) {
  return (
    <figure className="m-0">
      <svg
        viewBox={`0 0 ${sketch.width} ${sketch.height}`}
        role="img"
        aria-label={sketch.title}
        className="h-auto w-full max-w-[480px]"
      >
        {sketch.shapes.map(draw)}
      </svg>
      <figcaption className="text-xs text-muted">
        {sketch.title}
        {sketch.note ? ` ${sketch.note}` : ''}
      </figcaption>
    </figure>
  );
}
