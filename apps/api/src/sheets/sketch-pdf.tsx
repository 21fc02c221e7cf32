import { Circle, Line, Polygon, Polyline, Rect, Svg, Text } from '@react-pdf/renderer';
import {
  fontOf,
  pointsOf,
  strokeOf,
  type Sketch,
  type SketchRole,
  type SketchShape,
} from '@hoopline/present';
import type { ReactNode } from 'react';
import { FONT_FAMILY } from './fonts';

/** The sheet's palette for each role of a sketch (the web app's, on paper). */
const COLOUR: Record<SketchRole, string> = {
  body: '#ccfbf1',
  ink: '#1e293b',
  muted: '#64748b',
  accent: '#0f766e',
  support: '#ffffff',
};

const colour = (role: SketchRole | 'none') => (role === 'none' ? 'none' : COLOUR[role]);

function draw(shape: SketchShape, key: number): ReactNode {
  switch (shape.type) {
    case 'rect':
      return (
        <Rect
          key={key}
          x={shape.x}
          y={shape.y}
          width={shape.width}
          height={shape.height}
          fill={colour(shape.fill)}
          stroke={colour(shape.stroke)}
          {...strokeOf(shape)}
        />
      );
    case 'circle':
      return (
        <Circle
          key={key}
          cx={shape.cx}
          cy={shape.cy}
          r={shape.r}
          fill={colour(shape.fill)}
          stroke={colour(shape.stroke)}
          {...strokeOf(shape)}
        />
      );
    case 'line':
      return (
        <Line
          key={key}
          x1={shape.x1}
          y1={shape.y1}
          x2={shape.x2}
          y2={shape.y2}
          stroke={COLOUR[shape.stroke]}
          {...strokeOf(shape)}
        />
      );
    case 'path': {
      const common = {
        points: pointsOf(shape),
        fill: colour(shape.fill),
        stroke: colour(shape.stroke),
        ...strokeOf(shape),
      };
      return shape.closed ? <Polygon key={key} {...common} /> : <Polyline key={key} {...common} />;
    }
    case 'text':
      return (
        <Text
          key={key}
          x={shape.x}
          y={shape.y}
          textAnchor={shape.anchor}
          fill={COLOUR[shape.role]}
          style={{ fontFamily: FONT_FAMILY, ...fontOf(shape) }}
        >
          {shape.text}
        </Text>
      );
  }
}

/** A sketch of @hoopline/present on the sheet: the one the screen draws. */
export function SketchPdf({ sketch, width }: { sketch: Sketch; width: number }) {
  return (
    <Svg
      viewBox={`0 0 ${sketch.width} ${sketch.height}`}
      width={width}
      height={(width * sketch.height) / sketch.width}
    >
      {sketch.shapes.map(draw)}
    </Svg>
  );
}
