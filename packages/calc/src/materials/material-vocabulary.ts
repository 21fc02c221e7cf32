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
