/**
 * Elevated-temperature data of the built-in materials (Hoopline method notes
 * §l). Each property table is the published table as it stands (in the
 * source's own unit and temperature steps, °C); the engine takes the ratio of
 * the value at the design temperature, by linear interpolation between rows,
 * to the table's room-temperature row, and applies it to the built-in
 * room-temperature value. Each table names its source, and "from memory"
 * where it was recalled rather than read.
 */

/** A property the tables derate. */
export type TemperatureProperty = 'elasticModulus' | 'strength' | 'ultimateStrength';

export interface PropertyTable {
  /** The symbol in the trail: E, S_Y (yield), S_T (tensile), S_d (a design strength). */
  readonly symbol: 'E' | 'S_Y' | 'S_T' | 'S_d';
  /** Row temperatures, °C, rising; the first row is the room-temperature one. */
  readonly temperatures: readonly number[];
  /** The table's values at those temperatures, in `unit`. */
  readonly values: readonly number[];
  /** The unit the source tabulates in ('1' for a reduction factor). */
  readonly unit: 'GPa' | 'MPa' | '1';
  readonly source: string;
}

/** A limit of a material's temperature range, with what happens beyond it and why. */
export interface TemperatureLimit {
  /** °C. */
  readonly celsius: number;
  /** Beyond it the screening is outside validity, or it is a caution. */
  readonly severity: 'outside-validity' | 'caution';
  /** Warning code. */
  readonly code: string;
  /** What holds beyond the limit, in a sentence that follows "above/below <T> °C". */
  readonly reason: string;
}

/** What the engine knows of a built-in material at temperature. */
export interface MaterialTemperatureData {
  /** Derating tables; absent for materials taken at their room-temperature values (polymers, glass). */
  readonly tables?: Readonly<Partial<Record<TemperatureProperty, PropertyTable>>>;
  /** The hottest it is screened at within validity (the creep range, the end of the tables, a service limit). */
  readonly upper: TemperatureLimit;
  /** Where a second, lower limit brings a caution (e.g. aluminium's creep threshold, a polymer's softening). */
  readonly warmCaution?: TemperatureLimit;
  /** Below it, brittle behaviour matters: a caution. */
  readonly lower?: TemperatureLimit;
  /** Why the properties not derated stand at their room-temperature values. */
  readonly notDerated: string;
  /** A caution that holds at any temperature off room temperature (glass: thermal stresses). */
  readonly offRoom?: { readonly code: string; readonly message: string };
}

// ASME BPVC Section II Part D tables, as transcribed in SI in public code.
const ASME_TRANSCRIPTION =
  'as transcribed in SI in public code (an Abaqus material script defining ASME II-D materials; the TM-1 rows also in a FeenoX example citing II-D)';

/** ASME II-D Table TM-1, carbon steels with C <= 0.30 %, GPa. */
const TM1_CARBON_STEEL: PropertyTable = {
  symbol: 'E',
  temperatures: [25, 100, 150, 200, 250, 300, 350, 400, 450, 500, 550],
  values: [202, 198, 195, 192, 189, 185, 179, 171, 162, 151, 137],
  unit: 'GPa',
  source: `ASME BPVC II-D Table TM-1, carbon steels with C <= 0.30 %, ${ASME_TRANSCRIPTION}`,
};

/** ASME II-D Table TM-1, material group G (austenitic stainless steels), GPa. */
const TM1_GROUP_G: PropertyTable = {
  symbol: 'E',
  temperatures: [25, 100, 150, 200, 250, 300, 350, 400, 450, 500, 550, 600, 650, 700],
  values: [195, 189, 186, 183, 179, 176, 172, 169, 165, 160, 156, 151, 146, 140],
  unit: 'GPa',
  source: `ASME BPVC II-D Table TM-1, material group G (austenitic steels), ${ASME_TRANSCRIPTION}`,
};

/** Row temperatures of ASME II-D Table Y-1 in SI, °C. */
const Y1_TEMPERATURES = [
  40, 65, 100, 125, 150, 175, 200, 225, 250, 275, 300, 325, 350, 375, 400, 425, 450, 475, 500, 525,
];
/** Row temperatures of ASME II-D Table U in SI, °C. */
const U_TEMPERATURES = [40, 100, 150, 200, 250, 300, 325, 350, 375, 400, 425, 450, 475, 500, 525];

/**
 * EN 1999-1-2 (fire design of aluminium structures) rows, °C: the modulus of
 * elasticity and the 0.2 % proof strength ratio of EN AW-6061 T6 for heating
 * up to 2 hours (from memory).
 */
const EN1999_TEMPERATURES = [20, 50, 100, 150, 200, 250, 300, 350];

/** The built-in materials' elevated-temperature data, by material id. */
export const TEMPERATURE_DATA: Readonly<Record<string, MaterialTemperatureData>> = {
  'carbon-steel': {
    tables: {
      elasticModulus: TM1_CARBON_STEEL,
      strength: {
        symbol: 'S_Y',
        temperatures: Y1_TEMPERATURES,
        values: [
          262, 246, 239, 235, 232, 228, 225, 221, 216, 210, 204, 199, 193, 187, 181, 176, 171, 167,
          162, 158,
        ],
        unit: 'MPa',
        source: `ASME BPVC II-D Table Y-1, SA-516 Grade 70, yield strength ${ASME_TRANSCRIPTION}`,
      },
      ultimateStrength: {
        symbol: 'S_T',
        temperatures: U_TEMPERATURES,
        values: [483, 483, 483, 483, 483, 483, 483, 483, 483, 476, 446, 411, 372, 332, 296],
        unit: 'MPa',
        source: `ASME BPVC II-D Table U, SA-516 Grade 70, tensile strength ${ASME_TRANSCRIPTION}`,
      },
    },
    upper: {
      celsius: 371,
      severity: 'outside-validity',
      code: 'creep-range',
      reason:
        'carbon steel of tensile strength above 414 MPa is in its creep range (371 °C, 700 °F: the threshold of API 579-1/ASME FFS-1 for a creep assessment, from memory): the code allowable is then set by time-dependent (creep) strength, which this screening does not consider, so its time-independent allowable flatters the wall',
    },
    lower: {
      celsius: -29,
      severity: 'caution',
      code: 'low-temperature-brittle',
      reason:
        'carbon steel plate loses its toughness: ASME VIII-1 exempts it from impact testing only down to −29 °C (−20 °F, UG-20(f)) and by thickness on the UCS-66 curves (from memory); brittle fracture is not screened here: check the minimum design metal temperature',
    },
    notDerated: 'Poisson’s ratio and density are taken at room temperature (they change little)',
  },
  'stainless-304': {
    tables: {
      elasticModulus: TM1_GROUP_G,
      strength: {
        symbol: 'S_Y',
        temperatures: Y1_TEMPERATURES,
        values: [
          207, 184, 170, 161, 154, 148, 144, 139, 135, 132, 129, 126, 123, 121, 118, 117, 114, 112,
          110, 108,
        ],
        unit: 'MPa',
        source: `ASME BPVC II-D Table Y-1, SA-240 Type 304 plate, yield strength ${ASME_TRANSCRIPTION}`,
      },
      ultimateStrength: {
        symbol: 'S_T',
        temperatures: U_TEMPERATURES,
        values: [517, 485, 456, 442, 437, 437, 437, 437, 437, 436, 433, 429, 422, 413, 402],
        unit: 'MPa',
        source: `ASME BPVC II-D Table U, SA-240 Type 304 plate, tensile strength ${ASME_TRANSCRIPTION}`,
      },
    },
    upper: austeniticCreep(),
    lower: austeniticCold(),
    notDerated:
      'Poisson’s ratio and density are taken at room temperature (they change little); the higher allowables ASME II-D permits austenitic steels where slight deformation is acceptable (0.9·S_Y·R_Y) are not taken (conservative)',
  },
  'stainless-316l': {
    tables: {
      elasticModulus: TM1_GROUP_G,
      strength: {
        symbol: 'S_Y',
        temperatures: Y1_TEMPERATURES,
        values: [
          172, 157, 145, 137, 131, 125, 121, 118, 114, 111, 109, 107, 105, 103, 101, 99.4, 97.5,
          95.7, 93.8, 92.0,
        ],
        unit: 'MPa',
        source: `ASME BPVC II-D Table Y-1, SA-240 Type 316L plate, yield strength ${ASME_TRANSCRIPTION}`,
      },
      ultimateStrength: {
        symbol: 'S_T',
        temperatures: U_TEMPERATURES,
        values: [483, 467, 441, 429, 426, 426, 425, 425, 424, 421, 417, 413, 406, 398, 387],
        unit: 'MPa',
        source: `ASME BPVC II-D Table U, SA-240 Type 316L plate, tensile strength ${ASME_TRANSCRIPTION}`,
      },
    },
    upper: austeniticCreep(),
    lower: austeniticCold(),
    notDerated:
      'Poisson’s ratio and density are taken at room temperature (they change little); the higher allowables ASME II-D permits austenitic steels where slight deformation is acceptable (0.9·S_Y·R_Y) are not taken (conservative)',
  },
  'aluminium-6061-t6': aluminium6061('the 6061-T6 factors are applied to the unwelded minimums'),
  'aluminium-6061-t6-welded': aluminium6061(
    'the 6061-T6 factors are applied to the as-welded minimums too: an annealed heat-affected zone loses less strength on heating than the T6 temper does, so this is conservative',
  ),
  'cast-acrylic': {
    upper: {
      celsius: 80,
      severity: 'outside-validity',
      code: 'above-service-limit',
      reason:
        'cast acrylic is above its continuous service limit (about 80 °C in acrylic sheet makers’ data; it softens towards its heat-deflection temperature of about 95–100 °C; from memory): its room-temperature strength and modulus do not hold there',
    },
    warmCaution: {
      celsius: 30,
      severity: 'caution',
      code: 'polymer-above-room-temperature',
      reason:
        'cast acrylic is screened at its room-temperature (23 °C) strength and modulus, which fall steeply as it warms (roughly a third lower by 60 °C, from memory); ASME PVHO-1 rates acrylic windows only up to 66 °C (150 °F, from memory): use the maker’s values at the design temperature',
    },
    lower: {
      celsius: -40,
      severity: 'caution',
      code: 'low-temperature-brittle',
      reason:
        'cast acrylic is below the lower service limit of acrylic sheet makers’ data (about −40 °C, from memory): brittle at any temperature, it is more notch-sensitive still in the cold',
    },
    notDerated:
      'not derated: no elevated-temperature table is known here for acrylic; its room-temperature properties stand, with a caution',
  },
  polycarbonate: {
    upper: {
      celsius: 115,
      severity: 'outside-validity',
      code: 'above-service-limit',
      reason:
        'polycarbonate is above its continuous service limit (about 115–120 °C in makers’ data, the glass transition near 145 °C; from memory): its room-temperature strength and modulus do not hold there',
    },
    warmCaution: {
      celsius: 30,
      severity: 'caution',
      code: 'polymer-above-room-temperature',
      reason:
        'polycarbonate is screened at its room-temperature (23 °C) strength and modulus, which fall as it warms, and it creeps faster under sustained load (from memory): use the maker’s values at the design temperature',
    },
    lower: {
      celsius: -40,
      severity: 'caution',
      code: 'low-temperature-brittle',
      reason:
        'polycarbonate is below the lower service limit of makers’ data (about −40 °C, from memory); notched and thick sections turn brittle at higher temperatures than thin ones',
    },
    notDerated:
      'not derated: no elevated-temperature table is known here for polycarbonate; its room-temperature properties stand, with a caution',
  },
  'borosilicate-3.3': {
    upper: {
      celsius: 280,
      severity: 'outside-validity',
      code: 'above-service-limit',
      reason:
        'borosilicate 3.3 is above the rating of thermally toughened borosilicate sight glasses (280 °C, DIN 7080, from memory), where their prestress relaxes; annealed 3.3 is worked up to about 500 °C short-term (maker’s data, from memory), but its design strength there is not known here',
    },
    offRoom: {
      code: 'glass-thermal-stress',
      message:
        'borosilicate 3.3 is screened at its room-temperature modulus and design strength (they change little below its strain point, about 510 °C; from memory); thermal stresses are not included: a temperature difference through or across the pane, or a sudden change (a cold gas back-fill onto a hot window), stresses it too, and about 100 K can use the whole design strength (E·α·ΔT/(1 − ν) with α = 3.3e-6 1/K, the coefficient ISO 3585 names the glass for)',
    },
    notDerated:
      'not derated: glass keeps its modulus and strength to near its strain point (from memory); its room-temperature values stand, with a caution on thermal stresses',
  },
};

function austeniticCreep(): TemperatureLimit {
  return {
    celsius: 510,
    severity: 'outside-validity',
    code: 'creep-range',
    reason:
      'austenitic stainless steel is in its creep range (510 °C, 950 °F: the threshold of API 579-1/ASME FFS-1 for a creep assessment of Type 304 and 316, from memory): the code allowable is then set by time-dependent (creep) strength, which this screening does not consider, so its time-independent allowable flatters the wall',
  };
}

function austeniticCold(): TemperatureLimit {
  return {
    celsius: -196,
    severity: 'caution',
    code: 'low-temperature-brittle',
    reason:
      'austenitic stainless steel needs impact testing below −196 °C (−320 °F) by ASME VIII-1 UHA-51 (from memory), and welds need it at higher temperatures: check the minimum design metal temperature',
  };
}

function aluminium6061(note: string): MaterialTemperatureData {
  return {
    tables: {
      elasticModulus: {
        symbol: 'E',
        temperatures: EN1999_TEMPERATURES,
        values: [70.0, 69.3, 67.9, 65.1, 60.2, 54.6, 47.6, 37.8],
        unit: 'GPa',
        source:
          'EN 1999-1-2, modulus of elasticity of aluminium alloys at elevated temperature (from memory)',
      },
      strength: {
        symbol: 'S_Y',
        temperatures: EN1999_TEMPERATURES.filter((t) => t !== 50),
        values: [1.0, 0.95, 0.91, 0.79, 0.55, 0.31, 0.1],
        unit: '1',
        source: `EN 1999-1-2 Table 1, 0.2 % proof strength ratio k_0,θ of EN AW-6061 T6 for heating up to 2 hours (from memory); ${note}`,
      },
      ultimateStrength: {
        symbol: 'S_T',
        temperatures: EN1999_TEMPERATURES.filter((t) => t !== 50),
        values: [1.0, 0.95, 0.91, 0.79, 0.55, 0.31, 0.1],
        unit: '1',
        source: `EN 1999-1-2 Table 1, the 0.2 % proof strength ratio of EN AW-6061 T6 (from memory), applied to the tensile strength too: the standard gives no tensile ratio (an assumption, no source); ${note}`,
      },
    },
    upper: {
      celsius: 200,
      severity: 'outside-validity',
      code: 'above-temperature-range',
      reason:
        'aluminium 6061-T6 is above the range ASME VIII-1 lists it for (up to 204 °C, 400 °F, from memory): the T6 temper overages and loses its strength with time at temperature',
    },
    warmCaution: {
      celsius: 65,
      severity: 'caution',
      code: 'aluminium-exposure',
      reason:
        'aluminium alloys creep under sustained load (API 579-1/ASME FFS-1 asks for a creep assessment above 65 °C, 150 °F, from memory), and the EN 1999-1-2 factors used here are for heating up to 2 hours: long exposure lowers a T6 temper’s strength further; ask for the code’s allowable at the design temperature',
    },
    notDerated: 'Poisson’s ratio and density are taken at room temperature (they change little)',
  };
}
