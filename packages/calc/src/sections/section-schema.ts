import { z } from 'zod';
import { area, length, secondMomentOfArea } from '../core/fields';
import { formatNumber } from '../core/format';
import type { Vocabulary } from '../core/vocabulary';
import type { SectionShape } from './section-properties';

/**
 * The input of a stiffener or ring section: a shape and its dimensions, or
 * its properties entered directly. Used by the stiffened wall (its
 * stiffeners) and the cylindrical shell (its stiffening rings).
 */

const dimension = () => length({ positive: true, max: 2 });
const radius = () => length({ nonNegative: true, max: 1 }).optional();

const shapes = [
  z
    .object({
      shape: z.literal('flat-bar'),
      /** Height off the plate. */
      depth: dimension(),
      thickness: dimension(),
    })
    .strict(),
  z
    .object({
      shape: z.literal('angle'),
      /** The leg standing off the plate, welded at its toe. */
      depth: dimension(),
      /** The other leg: the free flange. */
      width: dimension(),
      thickness: dimension(),
      rootRadius: radius(),
      toeRadius: radius(),
    })
    .strict(),
  z
    .object({
      shape: z.literal('channel'),
      depth: dimension(),
      /** Flange width. */
      width: dimension(),
      webThickness: dimension(),
      flangeThickness: dimension(),
      rootRadius: radius(),
    })
    .strict(),
  z
    .object({
      shape: z.literal('rhs'),
      depth: dimension(),
      width: dimension(),
      thickness: dimension(),
      /** Outside corner radius. */
      cornerRadius: radius(),
      /** Inside corner radius; by default the outside radius less the thickness. */
      innerCornerRadius: radius(),
    })
    .strict(),
  z
    .object({
      shape: z.literal('properties'),
      area: area({ positive: true, max: 1 }),
      /** Second moment of area about its own centroidal axis parallel to the plate. */
      momentOfInertia: secondMomentOfArea({ positive: true, max: 1 }),
      /** Centroid's distance from the face welded to the plate. */
      centroid: length({ positive: true, max: 2 }),
      /** Distance from the welded face to the farthest fibre. */
      depth: dimension(),
      /** For the shear stress in the web. */
      webThickness: dimension(),
    })
    .strict(),
] as const;

const mm = (m: number) => `${formatNumber(m * 1000)} mm`;

/** A stiffener or ring section: a flat bar, angle, channel, hollow section, or properties. */
export const sectionSchema = z
  .discriminatedUnion('shape', shapes, {
    error:
      'must be a section: {"shape": "flat-bar" | "angle" | "channel" | "rhs" | "properties", …} with its dimensions',
  })
  .superRefine((s, ctx) => {
    const issue = (path: string, message: string) =>
      ctx.addIssue({ code: 'custom', path: [path], message });
    switch (s.shape) {
      case 'flat-bar':
        return;
      case 'angle': {
        if (s.thickness >= s.depth)
          issue('thickness', `must be less than the depth (${mm(s.depth)})`);
        else if (s.thickness >= s.width)
          issue('thickness', `must be less than the width (${mm(s.width)})`);
        const room = Math.min(s.depth, s.width) - s.thickness;
        if (s.rootRadius !== undefined && s.rootRadius > room && room > 0)
          issue('rootRadius', `must be at most the leg less the thickness (${mm(room)})`);
        if (s.toeRadius !== undefined && s.toeRadius > s.thickness)
          issue('toeRadius', `must be at most the thickness (${mm(s.thickness)})`);
        return;
      }
      case 'channel': {
        if (2 * s.flangeThickness >= s.depth)
          issue('flangeThickness', `must be less than half the depth (${mm(s.depth / 2)})`);
        if (s.webThickness >= s.width)
          issue('webThickness', `must be less than the flange width (${mm(s.width)})`);
        const room = Math.min(s.width - s.webThickness, s.depth / 2 - s.flangeThickness);
        if (s.rootRadius !== undefined && room > 0 && s.rootRadius > room)
          issue('rootRadius', `must be at most ${mm(room)} (the room between web and flange)`);
        return;
      }
      case 'rhs': {
        const side = Math.min(s.depth, s.width);
        if (2 * s.thickness >= side)
          issue('thickness', `must be less than half the smaller side (${mm(side / 2)})`);
        if (s.cornerRadius !== undefined && s.cornerRadius > side / 2)
          issue('cornerRadius', `must be at most half the smaller side (${mm(side / 2)})`);
        const hole = side - 2 * s.thickness;
        if (s.innerCornerRadius !== undefined && hole > 0 && s.innerCornerRadius > hole / 2)
          issue(
            'innerCornerRadius',
            `must be at most half the smaller inside width (${mm(hole / 2)})`,
          );
        return;
      }
      case 'properties': {
        if (s.centroid >= s.depth) issue('centroid', `must lie within the depth (${mm(s.depth)})`);
        // No section of area A within a depth h has I above A·h²/4 (its area all at the two
        // extreme fibres): a larger I is a typing error (cm^4 for mm^4, say).
        const most = (s.area * s.depth * s.depth) / 4;
        if (s.momentOfInertia > most)
          issue(
            'momentOfInertia',
            `is more than any section of this area and depth can have (A·h²/4 = ${formatNumber(most * 1e8)} cm4)`,
          );
        if (s.webThickness * s.depth > s.area * (1 + 1e-9))
          issue('webThickness', 'gives a web (depth × thickness) larger than the area');
        return;
      }
    }
  });

/** A section as a method's compute gets it (SI). */
export type SectionInput = z.output<typeof sectionSchema>;

// The schema's output is the geometry's input, field for field.
export const asSectionShape = (s: SectionInput): SectionShape => s;

/** The words of a section's fields, under `prefix` ("stiffener", "ringSection"). */
export function sectionVocabulary(prefix: string, what: string): Vocabulary {
  return {
    [`${prefix}.shape`]: {
      label: `${what} section`,
      options: {
        'flat-bar': 'Flat bar on edge',
        angle: 'Angle (one leg standing, the other a free flange)',
        channel: 'Channel (web standing, a flange on the plate)',
        rhs: 'Rectangular hollow section',
        properties: 'Properties entered directly',
      },
    },
    [`${prefix}.depth`]: {
      label: `${what} depth (off the plate)`,
      hint: 'From the welded face to the farthest edge.',
    },
    [`${prefix}.width`]: {
      label: `${what} flange width`,
      hint: 'An angle’s free leg, a channel’s flange, a hollow section’s side along the plate.',
    },
    [`${prefix}.thickness`]: { label: `${what} thickness` },
    [`${prefix}.webThickness`]: { label: `${what} web thickness` },
    [`${prefix}.flangeThickness`]: { label: `${what} flange thickness` },
    [`${prefix}.rootRadius`]: {
      label: `${what} root radius`,
      hint: 'The rolled fillet between web and flange, as the section table gives it; blank is a sharp corner.',
    },
    [`${prefix}.toeRadius`]: {
      label: `${what} toe radius`,
      hint: 'Rounding at the leg ends (about half the root radius on rolled angles); blank is square.',
    },
    [`${prefix}.cornerRadius`]: {
      label: `${what} outside corner radius`,
      hint: 'About 1.5·t hot-finished, 2–3·t cold-formed; blank is a square corner.',
    },
    [`${prefix}.innerCornerRadius`]: {
      label: `${what} inside corner radius`,
      hint: 'Blank is the outside radius less the thickness.',
    },
    [`${prefix}.area`]: { label: `${what} area A` },
    [`${prefix}.momentOfInertia`]: {
      label: `${what} second moment of area I`,
      hint: 'About its own centroidal axis parallel to the plate, e.g. "177 cm4".',
    },
    [`${prefix}.centroid`]: {
      label: `${what} centroid from the welded face`,
    },
  };
}
