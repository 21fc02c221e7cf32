/**
 * @hoopline/calc: the screening engine. Pure functions over plain data; every
 * public export is listed here, and what is not listed is private.
 */

// Engine identity
export { ENGINE_NAME, ENGINE_VERSION } from './version';

// Units, pressures, standard atmosphere
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
export {
  AtmosphereError,
  ambientPressureAtAltitude,
  geopotentialFromGeometric,
  standardAtmosphere,
  standardAtmosphereAtGeopotential,
} from './units/atmosphere';
export type { StandardAtmospherePoint } from './units/atmosphere';

// Reports, cautions, errors
export type {
  CaseReport,
  Caution,
  Check,
  Governing,
  Output,
  PressureDirection,
  ResolvedLoadCase,
  Step,
  ValidityWarning,
  Verdict,
  WarningQuantity,
  WarningSeverity,
} from './core/report';
export type { Worded } from './core/worded';
export { CAUTIONS } from './core/cautions';
export type { CautionCode } from './core/cautions';
export { CalcInputError, issuesFromZod } from './core/errors';
export type { InputIssue } from './core/errors';
export { formatNumber } from './core/format';
export { describeFields, fieldAt } from './core/describe';
export { COMMON_VOCABULARY, wordsFor } from './core/vocabulary';
export type { FieldWords, Vocabulary } from './core/vocabulary';
export type { FieldDescription } from './core/describe';
export { fieldMetaOf } from './core/fields';
export type { FieldMeta } from './core/fields';

// Inputs shared by every component
export { loadCaseSchema, loadCasesSchema, siteSchema } from './core/load-cases';
export type { LoadCaseInput, SiteInput } from './core/load-cases';
export {
  ALLOWABLE_BASES,
  BAROMETERS,
  HIGH_BAROMETER_PRESSURE,
  HIGH_BAROMETER_RATIO,
  designBasisSchema,
} from './core/design-basis';
export type { AllowableBasis, Barometer, DesignBasisInput } from './core/design-basis';
export {
  MAX_DESIGN_TEMPERATURE,
  MIN_DESIGN_TEMPERATURE,
  ROOM_TEMPERATURE,
  designTemperatureField,
} from './core/temperature';
export type { TemperatureContext } from './core/temperature';
export type { MethodDefinition, SweepParameter } from './core/method';

// Materials
export {
  MATERIALS,
  codeAllowableStress,
  customMaterialSchema,
  findMaterial,
  isCodeMaterial,
  materialSchema,
} from './materials/materials';
export type { Material, MaterialInput, StrengthBasis, ValueBasis } from './materials/materials';
export { TEMPERATURE_DATA } from './materials/temperature-tables';
export type {
  MaterialTemperatureData,
  PropertyTable,
  TemperatureLimit,
} from './materials/temperature-tables';
export type { MaterialAtTemperature, DeratedProperty } from './materials/at-temperature';

// Methods and their input schemas
export { flatAreaLoad, flatAreaLoadSchema } from './methods/flat-area-load/flat-area-load';
export type { FlatAreaLoadInput } from './methods/flat-area-load/flat-area-load';
export { circularPlate, circularPlateSchema } from './methods/circular-plate/circular-plate';
export type { CircularPlateInput } from './methods/circular-plate/circular-plate';
export {
  rectangularPlate,
  rectangularPlateSchema,
} from './methods/rectangular-plate/rectangular-plate';
export type { RectangularPlateInput } from './methods/rectangular-plate/rectangular-plate';
export {
  DEFAULT_DEFLECTION_RATIO,
  stiffenedWall,
  stiffenedWallSchema,
} from './methods/stiffened-wall/stiffened-wall';
export type { StiffenedWallInput } from './methods/stiffened-wall/stiffened-wall';
export {
  EXTERNAL_PRESSURE_DEFAULTS,
  cylindricalShell,
  cylindricalShellSchema,
} from './methods/cylindrical-shell/cylindrical-shell';
export type { CylindricalShellInput } from './methods/cylindrical-shell/cylindrical-shell';
export {
  DEFAULT_BUCKLING_DESIGN_FACTOR,
  DEFAULT_KNOCKDOWN,
  classicalSphereBucklingPressure,
  sphereOrHead,
  torisphericalHeadVolume,
  sphereOrHeadSchema,
  zoellyCoefficient,
} from './methods/sphere-or-head/sphere-or-head';
export type { HeadShape, SphereOrHeadInput } from './methods/sphere-or-head/sphere-or-head';
export { opening, openingSchema } from './methods/opening/opening';
export type { OpeningInput, OpeningShellShape } from './methods/opening/opening';
export { GASES, storedEnergy, storedEnergySchema } from './methods/stored-energy/stored-energy';
export type { StoredEnergyGas, StoredEnergyInput } from './methods/stored-energy/stored-energy';
export {
  pumpDown,
  pumpDownCurve,
  pumpDownSchema,
  pumpDownTime,
} from './methods/pump-down/pump-down';
export type {
  PumpDownInput,
  PumpDownParameters,
  PumpDownPoint,
} from './methods/pump-down/pump-down';

// Physical properties
export {
  IF97_SATURATION_MAX_TEMPERATURE,
  IF97_SATURATION_MIN_TEMPERATURE,
  WaterVapourRangeError,
  saturationPressureBuck,
  saturationPressureIf97,
} from './physics/water-vapour';

// Screening
export {
  COMPONENT_KINDS,
  METHODS,
  computeReport,
  computeResult,
  findMethod,
  parseComponent,
  screen,
  screenMany,
} from './screen';
export type { ParsedComponent, ScreenOutcome } from './screen';
export type { ComponentKind, EngineMethod, InputsOf, KindReport, Report } from './methods';

// Stiffener and ring sections
export { sectionSchema } from './sections/section-schema';
export type { SectionInput } from './sections/section-schema';
export { sectionProperties, withPlate } from './sections/section-properties';
export type {
  CompositeSection,
  SectionProperties,
  SectionShape,
  SectionShapeName,
} from './sections/section-properties';

// Thickness and spacing sweeps
export { SWEEP_DEFAULT_POINTS, SWEEP_MAX_POINTS, sweepSpacing, sweepThickness } from './sweep';
export type {
  SpacingSweepResult,
  SweepCase,
  SweepOptions,
  SweepPoint,
  SweepResult,
  SweepValidityRange,
} from './sweep';
export { isOutsideValidityWarning, reportOutsideValidity } from './core/validity';

// Batch screening from CSV
export { CHECKS_CSV_COLUMNS, casesToCsv, checksToCsv, csvField, readCsvCases } from './batch/csv';
export type { CsvCase } from './batch/csv';
