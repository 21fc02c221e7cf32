import type { Vocabulary } from '../../core/vocabulary';
import { MATERIAL_VOCABULARY } from '../../materials/material-vocabulary';
import { EXTERNAL_PRESSURE_VOCABULARY } from '../cylindrical-shell/vocabulary';

export const sphereOrHeadVocabulary: Vocabulary = {
  ...MATERIAL_VOCABULARY,
  ...EXTERNAL_PRESSURE_VOCABULARY,
  shape: {
    label: 'Shape',
    options: {
      sphere: 'Sphere',
      hemispherical: 'Hemispherical head',
      'ellipsoidal-2-1': '2:1 ellipsoidal head',
      torispherical: 'Torispherical head',
    },
  },
  diameter: { label: 'Head or sphere diameter' },
  diameterBasis: {
    label: 'Diameter measured',
    options: { outside: 'On the outside', inside: 'On the inside' },
  },
  thickness: { label: 'Wall thickness' },
  crownRadius: { label: 'Crown radius' },
  knuckleRadius: { label: 'Knuckle radius' },
  jointEfficiency: { label: 'Weld joint efficiency' },
};
