/**
 * @hoopline/calc: the screening engine. Pure functions over plain data; every
 * public export is listed here.
 */
export {
  UNITS,
  SI_UNIT,
  STANDARD_ATMOSPHERE,
  STANDARD_GRAVITY,
  TNT_ENERGY_PER_KG,
  UnitError,
  convert,
  findUnit,
  fromSi,
  toSi,
  unitsOf,
} from './units/units';
export type { Dimension, UnitDefinition } from './units/units';
export {
  PressureError,
  absolute,
  absoluteToGauge,
  differential,
  differentialBetween,
  gauge,
  gaugeToAbsolute,
} from './units/pressure';
export type {
  AbsolutePressure,
  AnyPressure,
  DifferentialPressure,
  GaugePressure,
  PressureReference,
} from './units/pressure';
export { QuantityParseError, parseQuantity } from './units/parse';
export type { ParseOptions, Quantity } from './units/parse';
export { ENGINE_NAME, ENGINE_VERSION } from './version';
