import type { Vocabulary } from '../../core/vocabulary';

export const pumpDownVocabulary: Vocabulary = {
  volume: { label: 'Chamber volume' },
  pumpingSpeed: { label: 'Pumping speed at the pump', hint: 'e.g. "10 L/s", "4 cfm", "20 m3/h".' },
  conductance: { label: 'Line conductance' },
  startPressure: { label: 'Start pressure', hint: 'Absolute; blank is the site’s ambient.' },
  targetPressure: { label: 'Target pressure', hint: 'Absolute, e.g. "10 torr" or "1 mbar(a)".' },
  gasLoad: { label: 'Gas load: leaks and outgassing', hint: 'e.g. "1e-3 mbar·L/s".' },
  basePressure: { label: 'Pump base pressure' },
  targetTime: { label: 'Time limit', hint: 'Adds a check, e.g. "15 min".' },
  waterTemperature: {
    label: 'Liquid water temperature',
    hint: 'If the chamber holds water, e.g. "20 degC".',
  },
};
