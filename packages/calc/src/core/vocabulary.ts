/**
 * The words of a method's inputs: the label a person reads for each field,
 * and for a choice the words for each option. A method owns its vocabulary
 * (`MethodDefinition.vocabulary`, beside its schema); the fields every
 * component shares are labelled here once. The web forms, the review page
 * and the sheet all take their labels from it.
 */
export interface FieldWords {
  /** The trade's name for the field, e.g. "Knuckle radius"; no "(optional)", forms add that. */
  readonly label: string;
  /** For a choice: the words for each value. */
  readonly options?: Readonly<Record<string, string>>;
  /** One sentence a form may show under the field. */
  readonly hint?: string;
}

/** Field words by generic path ("loadCases.*.internal", "externalPressure.knockdown"). */
export type Vocabulary = Readonly<Record<string, FieldWords>>;

/** Words for the fields every component has: its name, the site, the design basis and temperature, its load cases. */
export const COMMON_VOCABULARY: Vocabulary = {
  kind: { label: 'Kind of component' },
  name: { label: 'Name' },
  'site.altitude': {
    label: 'Site altitude',
    hint: 'Ambient pressure from the ISO 2533 standard atmosphere.',
  },
  'site.ambientPressure': { label: 'Site ambient pressure (absolute)' },
  'loadCases.*.name': { label: 'Name' },
  'loadCases.*.internal': { label: 'Pressure inside' },
  'loadCases.*.external': { label: 'Pressure outside' },
  'loadCases.*.differential': { label: 'Pressure difference' },
  'loadCases.*.direction': {
    label: 'Higher pressure',
    options: {
      'external-over': 'Outside (vacuum side in)',
      'internal-over': 'Inside (pressurised)',
    },
  },
  'loadCases.*.factor': { label: 'Load factor' },
  'loadCases.*.temperature': {
    label: 'Temperature of this case',
    hint: 'Where this case differs from the design temperature, e.g. a hot bake-out or a cold start.',
  },
  designTemperature: {
    label: 'Design temperature',
    hint: 'e.g. "150 degC"; blank: room temperature. Built-in metals are derated to it; polymers and glass are checked against their limits.',
  },
  'designBasis.allowableStress': {
    label: 'Allowable-stress basis',
    options: {
      'asme-viii-1': 'ASME VIII-1: min(tensile/3.5, 2/3·yield)',
      'en-13445-3': 'EN 13445-3: min(Rp0.2/1.5, Rm/2.4)',
    },
  },
  'designBasis.barometer': {
    label: 'Barometer designed for',
    options: { standard: 'Standard atmosphere', high: 'High barometer (105 kPa at sea level)' },
  },
};

/** The words of one field of a method: its own, then the shared ones. */
export function wordsFor(
  vocabulary: Vocabulary | undefined,
  genericPath: string,
): FieldWords | undefined {
  return vocabulary?.[genericPath] ?? COMMON_VOCABULARY[genericPath];
}
