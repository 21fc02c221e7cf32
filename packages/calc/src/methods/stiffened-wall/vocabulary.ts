import type { Vocabulary } from '../../core/vocabulary';
import { MATERIAL_VOCABULARY } from '../../materials/material-vocabulary';
import { sectionVocabulary } from '../../sections/section-schema';

export const stiffenedWallVocabulary: Vocabulary = {
  ...MATERIAL_VOCABULARY,
  span: {
    label: 'Stiffener span',
    hint: 'Between the supports at the stiffener’s ends (frame, flanges or the next wall).',
  },
  spacing: {
    label: 'Stiffener spacing',
    hint: 'Centre to centre; the panel between two stiffeners is this wide.',
  },
  thickness: { label: 'Wall plate thickness' },
  panelEdge: {
    label: 'Plate held at the stiffeners',
    options: {
      clamped: 'Clamped (plate continuous over the stiffeners, or welded in)',
      'simply-supported': 'Simply supported (free to rotate at each stiffener)',
    },
  },
  stiffenerEnds: {
    label: 'Stiffener ends',
    options: {
      'simply-supported': 'Simply supported (free to rotate)',
      fixed: 'Fixed (welded or bolted to a stiff frame)',
    },
  },
  stiffenerSide: {
    label: 'Side of the wall the stiffeners are on',
    options: { outside: 'Outside of the wall', inside: 'Inside of the wall' },
  },
  ...sectionVocabulary('stiffener', 'Stiffener'),
  deflectionRatio: {
    label: 'Stiffener deflection limit: span over',
    hint: 'Blank is 360, a limit of span/360 (common practice, no source).',
  },
  panelDeflectionLimit: {
    label: 'Panel deflection limit',
    hint: 'Adds a check of the panel’s own deflection between stiffeners.',
  },
  corrosionAllowance: {
    label: 'Corrosion allowance on the plate',
    hint: 'Taken off the plate thickness for strength.',
  },
};
