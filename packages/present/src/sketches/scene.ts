/**
 * A sketch as plain shapes in a box of view units, drawn by two small
 * renderers: the web app's SVG and the sheet's react-pdf Svg. Only shapes
 * both can draw are used: no markers, patterns or clip paths (arrowheads and
 * hatching are built here from lines and polygons).
 */

/** What a shape is, so each renderer can colour it in its own palette (light, dark, paper). */
export type Role =
  /** The component's material, in section or in view. */
  | 'body'
  /** Outlines, dimension lines and labels. */
  | 'ink'
  /** Extension lines, hatching, notes. */
  | 'muted'
  /** A seal line, a pressure arrow. */
  | 'accent'
  /** A support or a fastener, drawn on the background. */
  | 'support';

export type Shape =
  | {
      readonly type: 'rect';
      readonly x: number;
      readonly y: number;
      readonly width: number;
      readonly height: number;
      readonly fill: Role | 'none';
      readonly stroke: Role | 'none';
      readonly strokeWidth?: number;
      readonly dashed?: boolean;
    }
  | {
      readonly type: 'circle';
      readonly cx: number;
      readonly cy: number;
      readonly r: number;
      readonly fill: Role | 'none';
      readonly stroke: Role | 'none';
      readonly strokeWidth?: number;
      readonly dashed?: boolean;
    }
  | {
      readonly type: 'line';
      readonly x1: number;
      readonly y1: number;
      readonly x2: number;
      readonly y2: number;
      readonly stroke: Role;
      readonly strokeWidth?: number;
      /** 'dash' for hidden or seal lines, 'centre' for a centre line (long–short). */
      readonly pattern?: 'dash' | 'centre';
    }
  | {
      /** A polyline or polygon through points (closed when `closed`). */
      readonly type: 'path';
      readonly points: readonly { readonly x: number; readonly y: number }[];
      readonly closed?: boolean;
      readonly fill: Role | 'none';
      readonly stroke: Role | 'none';
      readonly strokeWidth?: number;
      readonly opacity?: number;
    }
  | {
      readonly type: 'text';
      readonly x: number;
      readonly y: number;
      readonly text: string;
      readonly anchor: 'start' | 'middle' | 'end';
      readonly size: 'label' | 'note';
      readonly role: 'ink' | 'muted' | 'accent';
    };

export interface Sketch {
  readonly width: number;
  readonly height: number;
  /** What the sketch shows, in words (the figure's caption and its accessible name). */
  readonly title: string;
  /** "(thickness not to scale)" and the like, or null. */
  readonly note: string | null;
  readonly shapes: readonly Shape[];
}

/** Font sizes of sketch text, in view units. */
export const TEXT_SIZE = { label: 11, note: 10 } as const;

/**
 * A width estimate for text in view units, on the wide side (0.62 em a
 * character; IBM Plex Sans digits and lower case run 0.5–0.6 em), so that a
 * label kept inside the box by it is inside when drawn.
 */
export function textWidth(text: string, size: 'label' | 'note'): number {
  return text.length * TEXT_SIZE[size] * 0.62;
}

/** How a shape's outline is stroked, as SVG attributes both renderers pass on as they are. */
export interface StrokeAttributes {
  readonly strokeWidth: number;
  readonly strokeDasharray?: string;
  readonly strokeOpacity?: number;
}

const DASH = { dash: '6 3', centre: '10 3 2 3' } as const;

/** The stroke of a shape: its width (1 unless given), its dash pattern and opacity where it has them. */
export function strokeOf(shape: Exclude<Shape, { type: 'text' }>): StrokeAttributes {
  const strokeWidth = shape.strokeWidth ?? 1;
  switch (shape.type) {
    case 'rect':
    case 'circle':
      return shape.dashed ? { strokeWidth, strokeDasharray: DASH.dash } : { strokeWidth };
    case 'line':
      return shape.pattern
        ? { strokeWidth, strokeDasharray: DASH[shape.pattern] }
        : { strokeWidth };
    case 'path':
      return shape.opacity !== undefined
        ? { strokeWidth, strokeOpacity: shape.opacity }
        : { strokeWidth };
  }
}

/** A path's points as an SVG `points` attribute, to 0.1 view unit. */
export function pointsOf(shape: Extract<Shape, { type: 'path' }>): string {
  return shape.points.map((p) => `${p.x.toFixed(1)},${p.y.toFixed(1)}`).join(' ');
}

/** A text's font size (view units) and weight: labels medium, notes regular. */
export function fontOf(shape: Extract<Shape, { type: 'text' }>): {
  readonly fontSize: number;
  readonly fontWeight: 400 | 500;
} {
  return { fontSize: TEXT_SIZE[shape.size], fontWeight: shape.size === 'label' ? 500 : 400 };
}
