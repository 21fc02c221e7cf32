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
  crownRadius: { label: 'Crown radius', hint: 'Blank: the outside diameter.' },
  knuckleRadius: { label: 'Knuckle radius', hint: 'Blank: 6 % of the crown radius.' },
  jointEfficiency: {
    label: 'Weld joint efficiency',
    hint: '0.35–1; blank is 1 (seamless or fully radiographed).',
  },
};
