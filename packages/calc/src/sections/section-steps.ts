import { withUnit } from '../core/format';
import type { Trail } from '../core/trail';
import {
  sectionProperties,
  withPlate,
  type CompositeSection,
  type SectionProperties,
  type SectionShape,
} from './section-properties';

/**
 * Trail steps for a section's properties and for the section with the plate
 * strip acting with it, so a checker can follow every number of the
 * stiffener or ring check (Hoopline method notes §l.1).
 */

export const SOURCE_SECTION =
  'section geometry: the parts’ areas and the parallel-axis theorem, rolled radii as spandrels of area (1 − π/4)·r² with centroid 0.2234·r from the corner (Hoopline method notes §l.1)';
const SOURCE_COMPOSITE =
  'the section and the plate strip as one beam: parallel-axis theorem about their common neutral axis (Hoopline method notes §l.1)';

const SHAPE_WORDS: Record<SectionShape['shape'], string> = {
  'flat-bar': 'flat bar on edge',
  angle: 'angle, one leg standing and the other a free flange',
  channel: 'channel, web standing and one flange on the plate',
  rhs: 'rectangular hollow section',
  properties: 'properties entered directly',
};

const m = (v: number) => withUnit(v, 'm');

function dimensionsText(s: SectionShape): string {
  switch (s.shape) {
    case 'flat-bar':
      return `h = ${m(s.depth)}, t = ${m(s.thickness)}`;
    case 'angle':
      return `h = ${m(s.depth)}, b = ${m(s.width)}, t = ${m(s.thickness)}, r_1 = ${m(s.rootRadius ?? 0)}, r_2 = ${m(s.toeRadius ?? 0)}`;
    case 'channel':
      return `h = ${m(s.depth)}, b = ${m(s.width)}, t_w = ${m(s.webThickness)}, t_f = ${m(s.flangeThickness)}, r = ${m(s.rootRadius ?? 0)}`;
    case 'rhs':
      return `h = ${m(s.depth)}, b = ${m(s.width)}, t = ${m(s.thickness)}, r_o = ${m(s.cornerRadius ?? 0)}, r_i = ${m(s.innerCornerRadius ?? Math.max((s.cornerRadius ?? 0) - s.thickness, 0))}`;
    case 'properties':
      return `A = ${withUnit(s.area, 'm²')}, I = ${withUnit(s.momentOfInertia, 'm^4')}, e = ${m(s.centroid)}, h = ${m(s.depth)}, t_w = ${m(s.webThickness)}`;
  }
}

const PARTS_WORDS: Record<Exclude<SectionShape['shape'], 'properties'>, string> = {
  'flat-bar': 'A = h·t',
  angle: 'A = (h − t)·t + b·t + (1 − π/4)·(r_1² − 2·r_2²)',
  channel: 'A = 2·b·t_f + (h − 2·t_f)·t_w + 2·(1 − π/4)·r²',
  rhs: 'A = b·h − (b − 2t)·(h − 2t) − 4·(1 − π/4)·(r_o² − r_i²)',
};

/** Writes the section's own properties (A, centroid, I) and returns them. */
export function sectionSteps(
  trail: Trail,
  section: SectionShape,
  name: { readonly id: string; readonly label: string },
): SectionProperties {
  const props = sectionProperties(section);
  trail.step({
    id: `${name.id}-section`,
    label: `${name.label}: ${SHAPE_WORDS[section.shape]}`,
    expression: 'section and its dimensions',
    substituted: dimensionsText(section),
    value: null,
    unit: 'm',
    source: section.shape === 'properties' ? 'entered by the user' : 'input',
  });
  if (section.shape === 'properties') return props;
  trail.step({
    id: `${name.id}-area`,
    label: `${name.label}: area`,
    expression: PARTS_WORDS[section.shape],
    substituted: `A = ${withUnit(props.area, 'm²')}`,
    value: props.area,
    unit: 'm²',
    source: SOURCE_SECTION,
  });
  trail.step({
    id: `${name.id}-centroid`,
    label: `${name.label}: centroid from the welded face`,
    expression: 'e = Σ(A_i·y_i)/A over the parts',
    substituted: `e = ${m(props.centroid)}`,
    value: props.centroid,
    unit: 'm',
    source: SOURCE_SECTION,
  });
  trail.step({
    id: `${name.id}-moment-of-inertia`,
    label: `${name.label}: second moment of area about its own centroid`,
    expression: 'I = Σ(I_i + A_i·(y_i − e)²) over the parts',
    substituted: `I = ${withUnit(props.momentOfInertia, 'm^4')}`,
    value: props.momentOfInertia,
    unit: 'm^4',
    source: SOURCE_SECTION,
  });
  return props;
}

/** Writes the section with its plate strip (area, neutral axis, I, fibre distances) and returns it. */
export function compositeSteps(
  trail: Trail,
  props: SectionProperties,
  plate: { readonly width: number; readonly thickness: number },
  name: { readonly id: string; readonly label: string; readonly plate: string },
): CompositeSection {
  const c = withPlate(props, plate.width, plate.thickness);
  const bText = m(plate.width);
  const tText = m(plate.thickness);
  trail.step({
    id: `${name.id}-area`,
    label: `${name.label}: area with the ${name.plate}`,
    expression: 'A_c = A + b_e·t_p',
    substituted: `A_c = ${withUnit(props.area, 'm²')} + ${bText}·${tText}`,
    value: c.area,
    unit: 'm²',
    source: SOURCE_COMPOSITE,
  });
  trail.step({
    id: `${name.id}-neutral-axis`,
    label: `${name.label}: neutral axis from the welded face (negative: in the ${name.plate})`,
    expression: 'y_n = (A·e − b_e·t_p·t_p/2)/A_c',
    substituted: `y_n = (${withUnit(props.area, 'm²')}·${m(props.centroid)} − ${bText}·${tText}·${tText}/2)/${withUnit(c.area, 'm²')}`,
    value: c.neutralAxis,
    unit: 'm',
    source: SOURCE_COMPOSITE,
  });
  trail.step({
    id: `${name.id}-moment-of-inertia`,
    label: `${name.label}: second moment of area with the ${name.plate}`,
    expression: 'I_c = I + A·(e − y_n)² + b_e·t_p³/12 + b_e·t_p·(t_p/2 + y_n)²',
    substituted: `I_c = ${withUnit(props.momentOfInertia, 'm^4')} + ${withUnit(props.area, 'm²')}·(${m(props.centroid)} − ${m(c.neutralAxis)})² + ${bText}·(${tText})³/12 + ${bText}·${tText}·(${tText}/2 + ${m(c.neutralAxis)})²`,
    value: c.momentOfInertia,
    unit: 'm^4',
    source: SOURCE_COMPOSITE,
  });
  trail.step({
    id: `${name.id}-to-edge`,
    label: `${name.label}: neutral axis to the section’s far edge`,
    expression: 'c_s = h − y_n',
    substituted: `c_s = ${m(props.depth)} − ${m(c.neutralAxis)}`,
    value: c.toSectionEdge,
    unit: 'm',
    source: 'geometry',
  });
  trail.step({
    id: `${name.id}-to-plate`,
    label: `${name.label}: neutral axis to the ${name.plate}’s free face`,
    expression: 'c_p = y_n + t_p',
    substituted: `c_p = ${m(c.neutralAxis)} + ${tText}`,
    value: c.toPlateFace,
    unit: 'm',
    source: 'geometry',
  });
  return c;
}
