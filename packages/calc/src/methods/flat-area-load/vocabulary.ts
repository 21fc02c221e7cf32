import type { Vocabulary } from '../../core/vocabulary';

export const flatAreaLoadVocabulary: Vocabulary = {
  'outline.shape': {
    label: 'Shape of the seal line',
    options: { circle: 'Circle', rectangle: 'Rectangle' },
  },
  'outline.sealDiameter': {
    label: 'Seal-line diameter',
    hint: 'Mean diameter of the gasket or O-ring, not the visible opening.',
  },
  'outline.sealWidth': { label: 'Seal-line width' },
  'outline.sealHeight': { label: 'Seal-line height' },
  seating: {
    label: 'Closure seated',
    options: {
      outside: 'Outside the opening (a door on the face)',
      inside: 'Inside the opening (a cover seated from within)',
    },
  },
  fastenerCount: { label: 'Number of latches or bolts' },
  fastenerCapacity: {
    label: 'Working load of one fastener',
    hint: 'Adds a fastener check, e.g. "2 kN" or "450 lbf".',
  },
};
