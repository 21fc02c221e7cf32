import type { Vocabulary } from '../../core/vocabulary';
import { MATERIAL_VOCABULARY } from '../../materials/material-vocabulary';
import { sectionVocabulary } from '../../sections/section-schema';

/** Words for the external-pressure factors a cylinder and a head share. */
export const EXTERNAL_PRESSURE_VOCABULARY: Vocabulary = {
  'externalPressure.knockdown': {
    label: 'Buckling knock-down factor',
    hint: 'On the classical buckling pressure; blank uses the engine’s default.',
  },
  'externalPressure.designFactor': { label: 'Design factor on buckling and collapse' },
  'externalPressure.interaction': {
    label: 'Elastic–plastic interaction',
    options: { rankine: 'Rankine (1/p = 1/p_e + 1/p_y)', 'api-2rd': 'API STD 2RD form' },
  },
};

export const cylindricalShellVocabulary: Vocabulary = {
  ...MATERIAL_VOCABULARY,
  ...EXTERNAL_PRESSURE_VOCABULARY,
  diameter: { label: 'Shell diameter' },
  diameterBasis: {
    label: 'Diameter measured',
    options: { outside: 'On the outside', inside: 'On the inside' },
  },
  thickness: { label: 'Wall thickness' },
  length: {
    label: 'Unsupported length between rings or heads',
    hint: 'For a shell between dished heads add about 1/3 of each head’s depth.',
  },
  ends: {
    label: 'Ends',
    options: {
      closed: 'Closed (heads carry the pressure into the shell)',
      open: 'Open (no axial pressure load)',
    },
  },
  jointEfficiency: {
    label: 'Weld joint efficiency',
    hint: '0.35–1; blank is 1 (seamless or fully radiographed).',
  },
  ringSpacingFor: { label: 'Thinner wall to find a stiffening-ring spacing for' },
  ...sectionVocabulary('ringSection', 'Ring'),
  'ringSection.shape': {
    label: 'Stiffening-ring section',
    hint: 'Checked by ASME VIII-1 UG-29 at the spacing the thinner wall needs, or else at the length between rings.',
    options: {
      'flat-bar': 'Flat bar on edge',
      angle: 'Angle (one leg standing, the other a free flange)',
      channel: 'Channel (web standing, a flange on the shell)',
      rhs: 'Rectangular hollow section',
      properties: 'Properties entered directly',
    },
  },
};
