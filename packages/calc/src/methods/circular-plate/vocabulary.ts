import type { Vocabulary } from '../../core/vocabulary';
import { MATERIAL_VOCABULARY } from '../../materials/material-vocabulary';

export const circularPlateVocabulary: Vocabulary = {
  ...MATERIAL_VOCABULARY,
  diameter: {
    label: 'Span diameter (support or seal circle)',
    hint: 'Diameter of the support or seal circle.',
  },
  thickness: { label: 'Thickness' },
  edge: {
    label: 'Edge support',
    options: {
      clamped: 'Clamped (welded in, rigid flange)',
      'simply-supported': 'Simply supported (on a seal, free to rotate)',
    },
  },
  deflectionLimit: { label: 'Centre deflection limit', hint: 'Adds a centre-deflection check.' },
};
