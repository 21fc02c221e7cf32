import type { Vocabulary } from '../../core/vocabulary';

export const storedEnergyVocabulary: Vocabulary = {
  volume: { label: 'Gas volume', hint: 'e.g. "50 L", "1.2 m3", "2 ft3".' },
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
  heatCapacityRatio: {
    label: 'Heat capacity ratio γ = cp/cv',
    hint: 'Blank uses the gas’s own value.',
  },
  energyLimit: { label: 'Energy limit', hint: 'Adds a check, e.g. "100 kJ".' },
};
