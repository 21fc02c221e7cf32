/**
 * Unit definitions with exact factors to SI.
 *
 * Factors follow NIST SP 811 (2008) Appendix B. Where SP 811 prints a rounded
 * value but the unit has an exact defining relation (psi from the exact pound,
 * standard gravity and inch; torr = atm/760; conventional mmHg = 13.5951 g/cm³
 * × g0), the defining relation is used so that round trips are exact.
 */

/** Physical dimensions the engine knows about. */
export type Dimension =
  | 'pressure'
  | 'length'
  | 'force'
  | 'area'
  | 'volume'
  | 'energy'
  | 'temperature'
  | 'time'
  | 'mass'
  | 'density'
  | 'volumeFlow'
  | 'throughput'
  /** Force per unit length: a line load, an edge reaction (N/m). */
  | 'lineForce'
  /** Force times length: a moment, a flexural rigidity (N·m). */
  | 'moment'
  /** Second moment of area of a section (m^4): a stiffener's or a ring's I. */
  | 'secondMomentOfArea'
  | 'dimensionless';

export interface UnitDefinition {
  /** Canonical symbol, as printed in reports and accepted by the parser. */
  readonly symbol: string;
  readonly dimension: Dimension;
  /** SI value of one unit: si = value × factor + offset. */
  readonly factor: number;
  /** Additive offset to SI (temperatures only). */
  readonly offset: number;
  /** A person-readable name. */
  readonly name: string;
  /** Other spellings accepted by the parser (case-sensitive, see parser). */
  readonly aliases: readonly string[];
  /** Where the factor comes from. */
  readonly source: string;
}

/** Standard acceleration of gravity, m/s² (exact, CGPM 1901; NIST SP 811 B.8). */
export const STANDARD_GRAVITY = 9.80665;
/** International pound, kg (exact, 1959). */
export const POUND_MASS = 0.45359237;
/** International inch, m (exact, 1959). */
export const INCH = 0.0254;
/** International foot, m (exact). */
export const FOOT = 0.3048;
/** Standard atmosphere, Pa (exact, NIST SP 811 B.8). */
export const STANDARD_ATMOSPHERE = 101_325;
/** Pound-force, N (exact from the pound and g0). */
export const POUND_FORCE = POUND_MASS * STANDARD_GRAVITY;
/** Pound-force per square inch, Pa (exact from its definition). */
export const PSI = POUND_FORCE / (INCH * INCH);
/** Torr, Pa (exact by definition: atm/760). */
export const TORR = STANDARD_ATMOSPHERE / 760;
/** Conventional millimetre of mercury, Pa: 13.5951 g/cm³ × 1 mm × g0. */
export const MMHG_CONVENTIONAL = 13.5951 * STANDARD_GRAVITY;
/** Conventional inch of mercury, Pa: 13.5951 g/cm³ × 25.4 mm × g0. */
export const INHG_CONVENTIONAL = MMHG_CONVENTIONAL * 25.4;
/** Conventional inch of water, Pa: 1000 kg/m³ × 0.0254 m × g0. */
export const INH2O_CONVENTIONAL = 1000 * INCH * STANDARD_GRAVITY;
/** Conventional millimetre of water, Pa: 1000 kg/m³ × 1 mm × g0. */
export const MMH2O_CONVENTIONAL = STANDARD_GRAVITY;
/** Conventional energy of one kilogram of TNT, J (NIST SP 811 B.9 footnote: 1 ton TNT ≡ 4.184 GJ). */
export const TNT_ENERGY_PER_KG = 4.184e6;

const NIST = 'NIST SP 811 (2008) App. B.8/B.9';

function unit(
  symbol: string,
  dimension: Dimension,
  factor: number,
  name: string,
  aliases: readonly string[] = [],
  source: string = NIST,
  offset = 0,
): UnitDefinition {
  return { symbol, dimension, factor, offset, name, aliases, source };
}

/**
 * Every unit the engine accepts. The first unit of each dimension is its SI
 * base unit, the one reports use.
 */
export const UNITS: readonly UnitDefinition[] = [
  // pressure and stress
  unit('Pa', 'pressure', 1, 'pascal', ['pascal'], 'SI'),
  unit('kPa', 'pressure', 1e3, 'kilopascal', [], 'SI prefix'),
  unit('MPa', 'pressure', 1e6, 'megapascal', ['N/mm2', 'N/mm^2', 'N/mm²'], 'SI prefix'),
  unit('GPa', 'pressure', 1e9, 'gigapascal', [], 'SI prefix'),
  unit('hPa', 'pressure', 1e2, 'hectopascal', [], 'SI prefix'),
  unit('bar', 'pressure', 1e5, 'bar', [], `${NIST} (exact)`),
  unit('mbar', 'pressure', 1e2, 'millibar', [], `${NIST} (exact)`),
  unit(
    'psi',
    'pressure',
    PSI,
    'pound-force per square inch',
    ['lbf/in2', 'lbf/in^2'],
    `${NIST}; exact from lb, g0 and inch`,
  ),
  unit(
    'ksi',
    'pressure',
    PSI * 1e3,
    'kip per square inch',
    [],
    `${NIST}; exact from lb, g0 and inch`,
  ),
  unit('atm', 'pressure', STANDARD_ATMOSPHERE, 'standard atmosphere', [], `${NIST} (exact)`),
  unit(
    'at',
    'pressure',
    STANDARD_GRAVITY * 1e4,
    'technical atmosphere (kgf/cm²)',
    ['kgf/cm2', 'kgf/cm^2', 'kgf/cm²'],
    `${NIST} (exact)`,
  ),
  unit('torr', 'pressure', TORR, 'torr', ['Torr'], `${NIST}; exact as atm/760`),
  unit(
    'mTorr',
    'pressure',
    TORR / 1000,
    'millitorr',
    ['mtorr', 'micron', 'microns'],
    `${NIST}; exact as atm/760000`,
  ),
  unit(
    'mmHg',
    'pressure',
    MMHG_CONVENTIONAL,
    'millimetre of mercury, conventional',
    [],
    `${NIST}; 13.5951 g/cm³ × g0`,
  ),
  unit(
    'inHg',
    'pressure',
    INHG_CONVENTIONAL,
    'inch of mercury, conventional',
    [],
    `${NIST}; 13.5951 g/cm³ × g0`,
  ),
  unit(
    'inH2O',
    'pressure',
    INH2O_CONVENTIONAL,
    'inch of water, conventional (1000 kg/m³)',
    ['inWC', 'in H2O'],
    `${NIST} (inch of water, conventional)`,
  ),
  unit(
    'inH2O_4C',
    'pressure',
    249.082,
    'inch of water at 39.2 °F (4 °C)',
    ['inH2O(4C)', 'inH2O(39.2F)'],
    `${NIST} (inch of water 39.2 °F)`,
  ),
  unit(
    'inH2O_68F',
    'pressure',
    INCH * STANDARD_GRAVITY * 998.2067,
    'inch of water at 68 °F (20 °C)',
    ['inH2O(68F)', 'inH2O(20C)'],
    'not in NIST SP 811: computed as 998.2067 kg/m³ (water at 20 °C, from memory) × g0 × 1 in',
  ),
  unit(
    'inH2O_60F',
    'pressure',
    248.84,
    'inch of water at 60 °F',
    ['inH2O(60F)'],
    `${NIST} (inch of water 60 °F)`,
  ),
  unit(
    'mmH2O',
    'pressure',
    MMH2O_CONVENTIONAL,
    'millimetre of water, conventional',
    ['mmWC', 'mm H2O'],
    `${NIST} (exact)`,
  ),
  unit(
    'ftH2O',
    'pressure',
    1000 * FOOT * STANDARD_GRAVITY,
    'foot of water, conventional',
    [],
    `${NIST} (foot of water, conventional)`,
  ),

  // length
  unit('m', 'length', 1, 'metre', ['meter', 'metre'], 'SI'),
  unit('mm', 'length', 1e-3, 'millimetre', [], 'SI prefix'),
  unit('cm', 'length', 1e-2, 'centimetre', [], 'SI prefix'),
  unit('in', 'length', INCH, 'inch', ['inch', 'inches', '"'], `${NIST} (exact)`),
  unit('ft', 'length', FOOT, 'foot', ['feet', "'"], `${NIST} (exact)`),
  unit('km', 'length', 1e3, 'kilometre', [], 'SI prefix'),

  // force
  unit('N', 'force', 1, 'newton', ['newton'], 'SI'),
  unit('kN', 'force', 1e3, 'kilonewton', [], 'SI prefix'),
  unit('MN', 'force', 1e6, 'meganewton', [], 'SI prefix'),
  unit('kgf', 'force', STANDARD_GRAVITY, 'kilogram-force', ['kp'], `${NIST} (exact)`),
  unit(
    'tf',
    'force',
    STANDARD_GRAVITY * 1e3,
    'tonne-force (metric)',
    ['tonne-force', 'tonnef'],
    `${NIST} (exact, 1000 kgf)`,
  ),
  unit('lbf', 'force', POUND_FORCE, 'pound-force', [], `${NIST}; exact from lb and g0`),
  unit(
    'kip',
    'force',
    POUND_FORCE * 1e3,
    'kip (1000 lbf)',
    ['kipf', 'klbf'],
    `${NIST}; exact from lb and g0`,
  ),

  // area
  unit('m2', 'area', 1, 'square metre', ['m^2', 'm²'], 'SI'),
  unit('mm2', 'area', 1e-6, 'square millimetre', ['mm^2', 'mm²'], 'SI prefix'),
  unit('cm2', 'area', 1e-4, 'square centimetre', ['cm^2', 'cm²'], 'SI prefix'),
  unit('in2', 'area', INCH * INCH, 'square inch', ['in^2', 'in²', 'sq in'], `${NIST} (exact)`),
  unit('ft2', 'area', FOOT * FOOT, 'square foot', ['ft^2', 'ft²', 'sq ft'], `${NIST} (exact)`),

  // volume
  unit('m3', 'volume', 1, 'cubic metre', ['m^3', 'm³'], 'SI'),
  unit(
    'L',
    'volume',
    1e-3,
    'litre',
    ['l', 'litre', 'liter', 'dm3', 'dm^3'],
    `${NIST} (exact, 1964)`,
  ),
  unit('mL', 'volume', 1e-6, 'millilitre', ['ml', 'cm3', 'cm^3', 'cc'], 'SI prefix'),
  unit('ft3', 'volume', FOOT ** 3, 'cubic foot', ['ft^3', 'ft³', 'cu ft'], `${NIST} (exact)`),
  unit('in3', 'volume', INCH ** 3, 'cubic inch', ['in^3', 'in³'], `${NIST} (exact)`),
  unit(
    'gal',
    'volume',
    231 * INCH ** 3,
    'US liquid gallon',
    ['gallon', 'USgal'],
    `${NIST} (exact, 231 in³)`,
  ),

  // energy
  unit('J', 'energy', 1, 'joule', ['joule'], 'SI'),
  unit('kJ', 'energy', 1e3, 'kilojoule', [], 'SI prefix'),
  unit('MJ', 'energy', 1e6, 'megajoule', [], 'SI prefix'),
  unit(
    'ft·lbf',
    'energy',
    FOOT * POUND_FORCE,
    'foot pound-force',
    ['ft*lbf', 'ftlbf', 'ft-lbf', 'ft.lbf'],
    `${NIST} (exact from ft, lb, g0)`,
  ),
  unit(
    'kgTNT',
    'energy',
    TNT_ENERGY_PER_KG,
    'kilogram of TNT (conventional)',
    ['kg TNT'],
    `${NIST} footnote: 1 ton TNT = 4.184e9 J (by convention)`,
  ),

  // temperature (affine)
  unit('K', 'temperature', 1, 'kelvin', ['kelvin'], 'SI'),
  unit(
    'degC',
    'temperature',
    1,
    'degree Celsius',
    ['°C', 'C', 'celsius'],
    `${NIST} (exact)`,
    273.15,
  ),
  unit(
    'degF',
    'temperature',
    5 / 9,
    'degree Fahrenheit',
    ['°F', 'F', 'fahrenheit'],
    `${NIST} (exact)`,
    273.15 - (32 * 5) / 9,
  ),
  unit('degR', 'temperature', 5 / 9, 'degree Rankine', ['°R', 'R', 'rankine'], `${NIST} (exact)`),

  // time
  unit('s', 'time', 1, 'second', ['sec', 'second', 'seconds'], 'SI'),
  unit('min', 'time', 60, 'minute', ['minute', 'minutes'], 'SI-accepted'),
  unit('h', 'time', 3600, 'hour', ['hr', 'hour', 'hours'], 'SI-accepted'),
  unit('ms', 'time', 1e-3, 'millisecond', [], 'SI prefix'),

  // mass
  unit('kg', 'mass', 1, 'kilogram', ['kilogram'], 'SI'),
  unit('g', 'mass', 1e-3, 'gram', ['gram'], 'SI prefix'),
  unit('t', 'mass', 1e3, 'tonne', ['tonne'], 'SI-accepted'),
  unit('lb', 'mass', POUND_MASS, 'pound (avoirdupois)', ['lbm', 'pound'], `${NIST} (exact)`),

  // density
  unit('kg/m3', 'density', 1, 'kilogram per cubic metre', ['kg/m^3', 'kg/m³'], 'SI'),
  unit(
    'g/cm3',
    'density',
    1e3,
    'gram per cubic centimetre',
    ['g/cm^3', 'g/cm³', 'g/cc'],
    'SI prefix',
  ),
  unit(
    'lb/in3',
    'density',
    POUND_MASS / INCH ** 3,
    'pound per cubic inch',
    ['lb/in^3', 'lb/in³'],
    `${NIST} (exact)`,
  ),
  unit(
    'lb/ft3',
    'density',
    POUND_MASS / FOOT ** 3,
    'pound per cubic foot',
    ['lb/ft^3', 'lb/ft³'],
    `${NIST} (exact)`,
  ),

  // volume flow (pump speed)
  unit('m3/s', 'volumeFlow', 1, 'cubic metre per second', ['m^3/s', 'm³/s'], 'SI'),
  unit('m3/h', 'volumeFlow', 1 / 3600, 'cubic metre per hour', ['m^3/h', 'm³/h'], 'SI-accepted'),
  unit('L/s', 'volumeFlow', 1e-3, 'litre per second', ['l/s'], `${NIST} (exact)`),
  unit('L/min', 'volumeFlow', 1e-3 / 60, 'litre per minute', ['l/min', 'lpm'], `${NIST} (exact)`),
  unit(
    'cfm',
    'volumeFlow',
    FOOT ** 3 / 60,
    'cubic foot per minute',
    ['ft3/min', 'ft^3/min'],
    `${NIST} (exact)`,
  ),

  // gas throughput (leak rate, gas load): pressure × volume per time
  unit(
    'Pa·m3/s',
    'throughput',
    1,
    'pascal cubic metre per second',
    ['Pa·m³/s', 'Pa*m3/s', 'Pa.m3/s', 'Pa m3/s'],
    'SI',
  ),
  unit(
    'mbar·L/s',
    'throughput',
    0.1,
    'millibar litre per second',
    ['mbar*L/s', 'mbar.L/s', 'mbar L/s', 'mbarL/s', 'mbar·l/s', 'mbar l/s'],
    `${NIST} (exact)`,
  ),
  unit(
    'torr·L/s',
    'throughput',
    TORR * 1e-3,
    'torr litre per second',
    ['torr*L/s', 'torr.L/s', 'torr L/s', 'Torr L/s', 'torr·l/s'],
    `${NIST}; exact as atm/760`,
  ),
  unit('Pa·L/s', 'throughput', 1e-3, 'pascal litre per second', ['Pa*L/s', 'Pa L/s'], 'SI'),

  // force per length (line load, edge reaction)
  unit('N/m', 'lineForce', 1, 'newton per metre', [], 'SI'),
  unit('N/mm', 'lineForce', 1e3, 'newton per millimetre', ['kN/m'], 'SI prefix'),
  unit(
    'lbf/in',
    'lineForce',
    POUND_FORCE / INCH,
    'pound-force per inch',
    [],
    `${NIST}; exact from lb, g0 and inch`,
  ),
  unit(
    'lbf/ft',
    'lineForce',
    POUND_FORCE / FOOT,
    'pound-force per foot',
    [],
    `${NIST}; exact from lb, g0 and foot`,
  ),

  // moment (and a plate's flexural rigidity, N·m)
  unit('N·m', 'moment', 1, 'newton metre', ['N*m', 'N.m'], 'SI'),
  unit('kN·m', 'moment', 1e3, 'kilonewton metre', ['kN*m', 'kN.m', 'kNm'], 'SI prefix'),
  unit(
    'lbf·in',
    'moment',
    POUND_FORCE * INCH,
    'pound-force inch',
    ['lbf*in', 'lbf.in', 'in·lbf', 'in*lbf'],
    `${NIST}; exact from lb, g0 and inch`,
  ),
  unit(
    'lbf·ft',
    'moment',
    POUND_FORCE * FOOT,
    'pound-force foot',
    ['lbf*ft', 'lbf.ft'],
    `${NIST}; exact from lb, g0 and foot`,
  ),

  // second moment of area (a section's I); section tables print cm^4 (EN) and in^4 (AISC)
  unit('m4', 'secondMomentOfArea', 1, 'metre to the fourth', ['m^4'], 'SI'),
  unit('cm4', 'secondMomentOfArea', 1e-8, 'centimetre to the fourth', ['cm^4'], 'SI prefix'),
  unit('mm4', 'secondMomentOfArea', 1e-12, 'millimetre to the fourth', ['mm^4'], 'SI prefix'),
  unit(
    'in4',
    'secondMomentOfArea',
    INCH ** 4,
    'inch to the fourth',
    ['in^4'],
    `${NIST} (exact from the inch)`,
  ),

  unit('1', 'dimensionless', 1, 'dimensionless', ['-', ''], 'SI'),
];

const AMBIGUOUS: UnitDefinition = unit('?', 'dimensionless', Number.NaN, 'ambiguous');
const BY_SYMBOL = new Map<string, UnitDefinition>();
const BY_ALIAS_LOWER = new Map<string, UnitDefinition>();
for (const u of UNITS) {
  BY_SYMBOL.set(u.symbol, u);
  for (const a of u.aliases) BY_SYMBOL.set(a, u);
}
for (const u of UNITS) {
  for (const name of [u.symbol, ...u.aliases]) {
    const lower = name.toLowerCase();
    // Case-insensitive fallback only where it is unambiguous (mbar vs Mbar, mm vs Mm are the trap).
    if (!BY_ALIAS_LOWER.has(lower)) BY_ALIAS_LOWER.set(lower, u);
    else if (BY_ALIAS_LOWER.get(lower) !== u) BY_ALIAS_LOWER.set(lower, AMBIGUOUS);
  }
}

/** The SI unit symbol for each dimension (the one reports print). */
export const SI_UNIT: Readonly<Record<Dimension, string>> = {
  pressure: 'Pa',
  length: 'm',
  force: 'N',
  area: 'm2',
  volume: 'm3',
  energy: 'J',
  temperature: 'K',
  time: 's',
  mass: 'kg',
  density: 'kg/m3',
  volumeFlow: 'm3/s',
  throughput: 'Pa·m3/s',
  lineForce: 'N/m',
  moment: 'N·m',
  secondMomentOfArea: 'm4',
  dimensionless: '1',
};

/**
 * Looks a unit up by symbol or alias. Exact spelling first; then a
 * case-insensitive match where that is unambiguous ("PSI", "Bar", "TORR").
 */
export function findUnit(symbol: string): UnitDefinition | undefined {
  const exact = BY_SYMBOL.get(symbol);
  if (exact) return exact;
  const loose = BY_ALIAS_LOWER.get(symbol.toLowerCase());
  return loose === AMBIGUOUS ? undefined : loose;
}

/** Every unit of one dimension, SI unit first. */
export function unitsOf(dimension: Dimension): readonly UnitDefinition[] {
  return UNITS.filter((u) => u.dimension === dimension);
}

/** Converts a value in `from` to SI. */
export function toSi(value: number, from: UnitDefinition | string): number {
  const u = typeof from === 'string' ? requireUnit(from) : from;
  return value * u.factor + u.offset;
}

/** Converts an SI value to `to`. */
export function fromSi(si: number, to: UnitDefinition | string): number {
  const u = typeof to === 'string' ? requireUnit(to) : to;
  return (si - u.offset) / u.factor;
}

/** Converts between two units of the same dimension. */
export function convert(value: number, from: string, to: string): number {
  const a = requireUnit(from);
  const b = requireUnit(to);
  if (a.dimension !== b.dimension) {
    throw new UnitError(
      `cannot convert ${a.dimension} (${a.symbol}) to ${b.dimension} (${b.symbol})`,
    );
  }
  return fromSi(toSi(value, a), b);
}

export class UnitError extends Error {
  override readonly name = 'UnitError';
}

function requireUnit(symbol: string): UnitDefinition {
  const u = findUnit(symbol);
  if (!u) throw new UnitError(`unknown unit "${symbol}"`);
  return u;
}
