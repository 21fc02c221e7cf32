import type { Report } from '@hoopline/calc';
import type { UnitSystem } from '../../../api/types';
import {
  CircularPlateSketch,
  ClosureSketch,
  CylinderSketch,
  HeadSketch,
  RectangularPlateSketch,
  type HeadShape,
} from './sketches';

const num = (value: unknown): number | undefined =>
  typeof value === 'number' && Number.isFinite(value) && value > 0 ? value : undefined;

/**
 * The sketch for a report, drawn from its normalised (SI) inputs. Kinds
 * whose methods are still arriving in the engine are read by the field names
 * their schemas are expected to use; a missing field means no sketch, never
 * a wrong one.
 */
export function ComponentSketch({ report, system }: { report: Report; system: UnitSystem }) {
  const inputs = report.inputs as Record<string, unknown>;
  switch (report.kind) {
    case 'circular-plate': {
      const diameter = num(inputs['diameter']);
      const thickness = num(inputs['thickness']);
      if (!diameter || !thickness) return null;
      return (
        <CircularPlateSketch
          diameter={diameter}
          thickness={thickness}
          edge={inputs['edge'] === 'simply-supported' ? 'simply-supported' : 'clamped'}
          system={system}
        />
      );
    }
    case 'flat-area-load': {
      const outline = inputs['outline'] as Record<string, unknown> | undefined;
      const count =
        typeof inputs['fastenerCount'] === 'number' ? inputs['fastenerCount'] : undefined;
      if (outline?.['shape'] === 'circle') {
        const d = num(outline['sealDiameter']);
        return d ? (
          <ClosureSketch
            outline={{ shape: 'circle', sealDiameter: d }}
            fastenerCount={count}
            system={system}
          />
        ) : null;
      }
      if (outline?.['shape'] === 'rectangle') {
        const w = num(outline['sealWidth']);
        const h = num(outline['sealHeight']);
        return w && h ? (
          <ClosureSketch
            outline={{ shape: 'rectangle', sealWidth: w, sealHeight: h }}
            fastenerCount={count}
            system={system}
          />
        ) : null;
      }
      return null;
    }
    case 'rectangular-plate': {
      const a = num(inputs['length']) ?? num(inputs['width']) ?? num(inputs['a']);
      const b =
        num(inputs['width']) !== a
          ? (num(inputs['width']) ?? num(inputs['height']) ?? num(inputs['b']))
          : num(inputs['height']);
      const t = num(inputs['thickness']);
      return a && b && t ? (
        <RectangularPlateSketch
          width={Math.max(a, b)}
          height={Math.min(a, b)}
          thickness={t}
          system={system}
        />
      ) : null;
    }
    case 'cylindrical-shell': {
      const d =
        num(inputs['outsideDiameter']) ?? num(inputs['diameter']) ?? num(inputs['meanDiameter']);
      const t = num(inputs['thickness']);
      const l = num(inputs['length']) ?? num(inputs['unsupportedLength']);
      return d && t && l ? (
        <CylinderSketch diameter={d} thickness={t} length={l} system={system} />
      ) : null;
    }
    case 'sphere-or-head': {
      const d =
        num(inputs['outsideDiameter']) ??
        num(inputs['diameter']) ??
        (num(inputs['radius']) ? num(inputs['radius'])! * 2 : undefined);
      const t = num(inputs['thickness']);
      const raw = String(inputs['shape'] ?? inputs['headType'] ?? inputs['type'] ?? '');
      const shape: HeadShape | undefined = raw.includes('tori')
        ? 'torispherical'
        : raw.includes('ellip')
          ? 'ellipsoidal'
          : raw.includes('hemi')
            ? 'hemispherical'
            : raw.includes('sphere')
              ? 'sphere'
              : undefined;
      if (!d || !t || !shape) return null;
      const crown = num(inputs['crownRadius']);
      const knuckle = num(inputs['knuckleRadius']);
      return (
        <HeadSketch
          shape={shape}
          diameter={d}
          thickness={t}
          system={system}
          {...(crown ? { crownRadius: crown } : {})}
          {...(knuckle ? { knuckleRadius: knuckle } : {})}
        />
      );
    }
    default:
      return null;
  }
}

/** The lobe count of a cylinder's buckling mode, from its outputs, if the report has one. */
export function lobeCount(report: Report): number | null {
  if (report.kind !== 'cylindrical-shell') return null;
  const governingCase = report.cases[report.governing?.caseIndex ?? 0] ?? report.cases[0];
  const candidates = [governingCase, ...report.cases];
  for (const c of candidates) {
    const output = c?.outputs.find((o) => /lobe/i.test(o.id) || /lobe/i.test(o.label));
    if (output && Number.isFinite(output.value) && output.value >= 2)
      return Math.round(output.value);
  }
  return null;
}
