import { describe, expect, it } from 'vitest';
import { fontOf, pointsOf, strokeOf } from './scene';

// The one place the web's SVG and the sheet's react-pdf Svg take their
// stroke, point and font attributes from (common practice, no source: the
// dash lengths are this project's drawing convention, in view units).
describe('shape attributes both renderers pass on', () => {
  it('strokes: width 1 unless given; dashes for hidden and centre lines; opacity for paths', () => {
    expect(
      strokeOf({ type: 'rect', x: 0, y: 0, width: 1, height: 1, fill: 'none', stroke: 'ink' }),
    ).toEqual({ strokeWidth: 1 });
    expect(
      strokeOf({ type: 'circle', cx: 0, cy: 0, r: 1, fill: 'none', stroke: 'ink', dashed: true }),
    ).toEqual({ strokeWidth: 1, strokeDasharray: '6 3' });
    expect(
      strokeOf({ type: 'line', x1: 0, y1: 0, x2: 1, y2: 1, stroke: 'ink', pattern: 'centre' }),
    ).toEqual({ strokeWidth: 1, strokeDasharray: '10 3 2 3' });
    expect(
      strokeOf({
        type: 'path',
        points: [],
        fill: 'none',
        stroke: 'ink',
        strokeWidth: 2,
        opacity: 0.5,
      }),
    ).toEqual({ strokeWidth: 2, strokeOpacity: 0.5 });
  });

  it('points to 0.1 view unit; labels medium at 11, notes regular at 10', () => {
    const path = {
      type: 'path' as const,
      points: [
        { x: 1, y: 2.25 },
        { x: 3.04, y: -4 },
      ],
      fill: 'none' as const,
      stroke: 'ink' as const,
    };
    expect(pointsOf(path)).toBe('1.0,2.3 3.0,-4.0');
    const text = { type: 'text' as const, x: 0, y: 0, text: 'd', anchor: 'start' as const };
    expect(fontOf({ ...text, size: 'label', role: 'ink' })).toEqual({
      fontSize: 11,
      fontWeight: 500,
    });
    expect(fontOf({ ...text, size: 'note', role: 'muted' })).toEqual({
      fontSize: 10,
      fontWeight: 400,
    });
  });
});
