import type { Vocabulary } from '../../core/vocabulary';
import { MATERIAL_VOCABULARY } from '../../materials/material-vocabulary';
import { EXTERNAL_PRESSURE_VOCABULARY } from '../cylindrical-shell/vocabulary';

/**
 * The material words of one part (shell, nozzle, pad) under its prefix:
 * "nozzle.material", "nozzle.material.elasticModulus", "nozzle.allowableStress"…
 */
function partMaterialWords(prefix: string, part: string, withAllowance: boolean): Vocabulary {
  const out: Record<string, (typeof MATERIAL_VOCABULARY)[string]> = {};
  for (const [path, words] of Object.entries(MATERIAL_VOCABULARY)) {
    if (path === 'corrosionAllowance' && !withAllowance) continue;
    const label =
      path === 'material'
        ? `${part} material`
        : `${part}, ${words.label.charAt(0).toLowerCase()}${words.label.slice(1)}`;
    out[`${prefix}.${path}`] = { ...words, label };
  }
  return out;
}

export const openingVocabulary: Vocabulary = {
  ...partMaterialWords('shell', 'Shell', true),
  ...partMaterialWords('nozzle', 'Nozzle', true),
  ...partMaterialWords('pad', 'Pad', false),
  ...EXTERNAL_PRESSURE_VOCABULARY,
  'externalPressure.knockdown': {
    label: 'Buckling knock-down factor of the shell or head',
    hint: 'As in its own screening; blank uses that method’s default. The nozzle takes the cylinder’s defaults.',
  },
  'shell.shape': {
    label: 'Opening in',
    options: {
      cylinder: 'A cylindrical shell',
      sphere: 'A sphere',
      hemispherical: 'A hemispherical head',
      'ellipsoidal-2-1': 'A 2:1 ellipsoidal head',
      torispherical: 'A torispherical head',
    },
  },
  'shell.diameter': { label: 'Shell or head diameter' },
  'shell.diameterBasis': {
    label: 'Diameter measured',
    options: { outside: 'On the outside', inside: 'On the inside' },
  },
  'shell.thickness': {
    label: 'Shell or head thickness',
    hint: 'The thickness at the opening (after forming, for a head).',
  },
  'shell.length': {
    label: 'Unsupported length of the cylinder',
    hint: 'Between rings or heads, for external pressure; blank takes the shell as long (conservative).',
  },
  'shell.crownRadius': { label: 'Crown radius', hint: 'Blank: the outside diameter.' },
  'shell.knuckleRadius': { label: 'Knuckle radius', hint: 'Blank: 6 % of the crown radius.' },
  'shell.jointEfficiency': {
    label: 'Joint efficiency at the opening (E1)',
    hint: 'Blank is 1: clear of seams, or in a circumferential (Category B) butt joint.',
  },
  offset: {
    label: 'Nozzle axis from the head’s centre',
    hint: 'Heads only; blank is 0 (a central nozzle).',
  },
  'nozzle.outsideDiameter': { label: 'Nozzle outside diameter' },
  'nozzle.thickness': { label: 'Nozzle wall thickness' },
  'nozzle.attachment': {
    label: 'Nozzle attachment',
    options: {
      'set-in': 'Set in (through the shell)',
      'set-on': 'Set on (abutting the shell)',
    },
  },
  'nozzle.projection': {
    label: 'Nozzle projection outside',
    hint: 'From the shell’s outer surface to the flange.',
  },
  'nozzle.inwardProjection': {
    label: 'Nozzle projection inside',
    hint: 'Beyond the shell’s inner surface; blank is flush.',
  },
  'nozzle.weldLeg': {
    label: 'Nozzle fillet weld leg, outside',
    hint: 'Blank: no weld area credited.',
  },
  'nozzle.inwardWeldLeg': { label: 'Nozzle fillet weld leg, inside' },
  'pad.outsideDiameter': { label: 'Pad outside diameter' },
  'pad.thickness': { label: 'Pad thickness' },
  'pad.weldLeg': { label: 'Pad fillet weld leg, outer edge' },
  'pad.material': {
    ...partMaterialWords('pad', 'Pad', false)['pad.material']!,
    hint: 'Blank: the shell’s material; without a pad, the material of the pad the sizing proposes.',
  },
};
