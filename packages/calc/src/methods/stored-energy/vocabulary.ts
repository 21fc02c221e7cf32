import type { Vocabulary } from '../../core/vocabulary';

export const storedEnergyVocabulary: Vocabulary = {
  volume: { label: 'Gas volume' },
  gas: {
    label: 'Gas',
    options: {
      air: 'Air',
      nitrogen: 'Nitrogen',
      oxygen: 'Oxygen',
      helium: 'Helium',
      argon: 'Argon',
      'carbon-dioxide': 'Carbon dioxide',
    },
  },
  heatCapacityRatio: { label: 'Heat capacity ratio γ = cp/cv' },
  energyLimit: { label: 'Energy limit' },
};
