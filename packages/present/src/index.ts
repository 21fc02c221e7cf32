/**
 * @hoopline/present: how a report is shown. Pure functions over the engine's
 * reports; the web app and the PDF sheet print every number and word through
 * them, so the screen and the signed sheet cannot disagree.
 */

export {
  FIXED_MAX,
  FIXED_MIN,
  NOT_A_NUMBER,
  THIN_SPACE,
  formatSignificant,
  roundingHalfUnit,
} from './numbers';
export type { NumberStyle } from './numbers';
export {
  UNIT_SYSTEMS,
  dimensionOfReportUnit,
  displayUnit,
  displayUnitSymbol,
  printed,
  unitBySymbol,
} from './display-units';
export type { DisplayDimension, DisplayUnit, UnitSystem } from './display-units';
export { show, showQuantity } from './quantity';
export type { QuantityStyle, ShownQuantity } from './quantity';
export { formatPercent } from './percent';
export { numberedSteps } from './steps';
export type { NumberedStep } from './steps';
export {
  DIRECTION_WORDS,
  ROLE_WORDS,
  SEVERITY_WORDS,
  STATUS_WORDS,
  VERDICT_WORDS,
  checkResultWord,
  kindName,
  statusWords,
} from './words';
export {
  VACUUM_BELOW,
  VACUUM_UNITS,
  loadCaseLine,
  readerOf,
  showPressure,
  showWordedValue,
  vacuumUnitOf,
  wordedText,
} from './reader-units';
export type { ReaderUnits, VacuumUnit } from './reader-units';
export {
  TRAIL_SIGNIFICANT,
  absolutePressureIds,
  ambientText,
  checkFigures,
  presentReport,
  stepFigures,
} from './report';
export type {
  PresentedCase,
  PresentedCheck,
  PresentedGoverning,
  PresentedReport,
  PresentedStep,
  PresentedWarning,
} from './report';
export {
  NO_VALUE,
  PACKAGE_WORDS,
  TABLE_CSV_HEADER,
  countersignedSince,
  engineNote,
  isoInstant,
  packageCode,
  packageStaleness,
  percentFigure,
  presentTableRow,
  supersededFor,
  tableCsvRecord,
} from './project-table';
export type { PresentedTableRow } from './project-table';
export { inputLabel, presentInputs } from './inputs';
export type { PresentedInput } from './inputs';
export { sketchOf } from './sketches/component-sketch';
export { TEXT_SIZE, fontOf, pointsOf, strokeOf, textWidth } from './sketches/scene';
export type { StrokeAttributes } from './sketches/scene';
export type { Role as SketchRole, Shape as SketchShape, Sketch } from './sketches/scene';
export { headProfile } from './sketches/geometry';
export type { HeadShape } from './sketches/geometry';
export { OWN_CHECKER_ROLE, membersNotice, nameList, whoManages } from './member-words';
export type { MemberManager, MembersNotice } from './member-words';
export { AUDIT_ACTION_LABELS, auditActionLabel, auditSegments, auditSentence } from './audit-words';
export type { AuditLink, AuditSegment, AuditWordsEvent } from './audit-words';
export { isoDateTime } from './dates';
export { commentPieces, stepsReferred } from './step-references';
export type { CommentPiece } from './step-references';
