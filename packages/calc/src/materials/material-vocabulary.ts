import type { Vocabulary } from '../core/vocabulary';
import { MATERIALS } from './materials';

/** Words for a component's material and the fields that override its allowable stress. */
export const MATERIAL_VOCABULARY: Vocabulary = {
  material: {
    label: 'Material',
    options: Object.fromEntries(MATERIALS.map((m) => [m.id, m.name])),
  },
  'material.name': { label: 'Custom material' },
  'material.elasticModulus': { label: 'Elastic modulus E' },
  'material.poissonRatio': { label: 'Poisson’s ratio ν' },
  'material.strength': { label: 'Strength (yield, tensile or design value, as its basis says)' },
  'material.strengthBasis': {
    label: 'Strength basis',
    options: {
      yield: 'Yield strength',
      tensile: 'Short-term tensile strength',
      'design-value': 'Maker’s design strength',
    },
  },
  'material.ultimateStrength': { label: 'Ultimate tensile strength' },
  'material.density': { label: 'Density' },
  'material.brittle': { label: 'Brittle material' },
  'material.polymer': { label: 'Polymer (creeps under sustained load)' },
  'material.longTermModulus': { label: 'Long-term (creep) modulus' },
  'material.designFactor': { label: 'Material design factor' },
  'material.temperatureTable.*.temperature': {
    label: 'Temperature',
    hint: 'Above 20 °C, rising; the material’s own values are its 20 °C row.',
  },
  'material.temperatureTable.*.elasticModulus': { label: 'Elastic modulus E at the temperature' },
  'material.temperatureTable.*.strength': { label: 'Strength at the temperature' },
  'material.temperatureTable.*.ultimateStrength': {
    label: 'Ultimate tensile strength at the temperature',
  },
  allowableStress: {
    label: 'Allowable stress (given)',
    hint: 'A code allowable, e.g. "138 MPa"; wins over the design factor.',
  },
  designFactor: {
    label: 'Design factor on the material strength',
    hint: "On the material's strength; blank: the project's code basis for metals, the material's own factor otherwise.",
  },
  corrosionAllowance: { label: 'Corrosion allowance' },
};
