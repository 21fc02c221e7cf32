import type { Vocabulary } from '../../core/vocabulary';

export const pumpDownVocabulary: Vocabulary = {
  volume: { label: 'Chamber volume' },
  pumpingSpeed: { label: 'Pumping speed at the pump' },
  conductance: { label: 'Line conductance' },
  startPressure: { label: 'Start pressure' },
  targetPressure: { label: 'Target pressure' },
  gasLoad: { label: 'Gas load: leaks and outgassing' },
  basePressure: { label: 'Pump base pressure' },
  targetTime: { label: 'Time limit' },
  waterTemperature: { label: 'Liquid water temperature' },
};
