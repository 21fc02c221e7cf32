import type { Vocabulary } from '../../core/vocabulary';
import { MATERIAL_VOCABULARY } from '../../materials/material-vocabulary';

export const rectangularPlateVocabulary: Vocabulary = {
  ...MATERIAL_VOCABULARY,
  width: { label: 'Unsupported width' },
  height: { label: 'Unsupported height' },
  thickness: { label: 'Thickness' },
  edge: {
    label: 'Edge support',
    options: {
      'simply-supported': 'Simply supported on all four edges',
      clamped: 'Clamped on all four edges',
    },
  },
  deflectionLimit: { label: 'Centre deflection limit', hint: 'Adds a centre-deflection check.' },
};
