import { Circle, Line, Polygon, Polyline, Rect, Svg, Text } from '@react-pdf/renderer';
import { TEXT_SIZE, type Sketch, type SketchRole, type SketchShape } from '@hoopline/present';
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
          strokeWidth={shape.strokeWidth ?? 1}
          {...(shape.dashed ? { strokeDasharray: '6 3' } : {})}
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
          strokeWidth={shape.strokeWidth ?? 1}
          {...(shape.dashed ? { strokeDasharray: '6 3' } : {})}
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
          strokeWidth={shape.strokeWidth ?? 1}
          {...(shape.pattern === 'dash'
            ? { strokeDasharray: '6 3' }
            : shape.pattern === 'centre'
              ? { strokeDasharray: '10 3 2 3' }
              : {})}
        />
      );
    case 'path': {
      const points = shape.points.map((p) => `${p.x.toFixed(1)},${p.y.toFixed(1)}`).join(' ');
      const common = {
        points,
        fill: colour(shape.fill),
        stroke: colour(shape.stroke),
        strokeWidth: shape.strokeWidth ?? 1,
        ...(shape.opacity !== undefined ? { strokeOpacity: shape.opacity } : {}),
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
          style={{
            fontFamily: FONT_FAMILY,
            fontSize: TEXT_SIZE[shape.size],
            fontWeight: shape.size === 'label' ? 500 : 400,
          }}
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
