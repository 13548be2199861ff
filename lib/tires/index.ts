/**
 * Fourpatch tire computation core: pure functions, no framework, no clock.
 *
 * Contract for every caller:
 * - Dates are ISO calendar dates, strings `YYYY-MM-DD`, with no time zone.
 *   Every function that needs "today" takes it as `{ today: "YYYY-MM-DD" }`;
 *   nothing here reads the system clock.
 * - Lengths are millimetres and distances kilometres; convert 32nds of an
 *   inch with `thirtySecondsToMm` and miles before calling.
 * - Bad input never throws: functions return `{ ok: false, error, code }`,
 *   where `error` is a sentence a driver can read and `code` is for programs.
 *   Success is `{ ok: true, ... }`.
 * - Whatever judges a tire carries `caution` (CAUTION): the numbers are
 *   guidance; local law and a qualified technician decide.
 */
export { CAUTION, type Failure, type Result } from "./result";
export { isIsoDate, addMonths, addDays } from "./dates";
export {
  decodeDotCode,
  dotWeekStart,
  dotWeeksInYear,
  dotWeekOf,
  formatDotDateCode,
  type DotDecoded,
  type DotErrorCode,
  type DotLayout,
  type DotResult,
} from "./dot";
export {
  tireAge,
  ageCondition,
  worseCondition,
  AGE_THRESHOLDS,
  DEFAULT_PLAN_LEAD_MONTHS,
  SET_KINDS,
  CONDITION_ORDER,
  type AgeConditionInput,
  type AgeConditionOk,
  type AgeThresholds,
  type Condition,
  type SetKind,
  type TireAge,
} from "./age";
export {
  mmToThirtySeconds,
  thirtySecondsToMm,
  tireDepth,
  depthLimit,
  depthCondition,
  easterSunday,
  DEPTH_LIMITS,
  DEPTH_PLAN_MARGIN_MM,
  DEPTH_WATCH_MARGIN_MM,
  JURISDICTIONS,
  MM_PER_THIRTY_SECOND,
  unusualDepth,
  DEEPER_THAN_NEW_SLACK_MM,
  DEEPER_THAN_LAST_SLACK_MM,
  type DepthLimitOk,
  type DepthLimitRow,
  type Grooves,
  type Jurisdiction,
  type Season,
  type Tag,
} from "./depth";
export {
  projectWear,
  distancePerDay,
  leastSquares,
  MEASUREMENT_TOLERANCE_MM,
  TYPICAL_WEAR_MM_PER_KM,
  type Confidence,
  type OdometerEntry,
  type ProjectWearOptions,
  type WearProjection,
  type WearReading,
} from "./wear";
export {
  wearPattern,
  patternAdvice,
  axlePattern,
  AXLE_DIFFERENCE_THRESHOLD_MM,
  UNEVEN_WEAR_THRESHOLD_MM,
  PATTERN_SOURCE,
  type AxlePatternOk,
  type AxleTire,
  type Position,
  type WearPatternKind,
  type WearPatternOk,
} from "./patterns";
export {
  parseTireSize,
  formatTireSize,
  overallDiameter,
  checkFit,
  DIAMETER_TOLERANCE,
  type Construction,
  type Diameter,
  type FitCheck,
  type FitStatus,
  type FlotationTireSize,
  type MetricPrefix,
  type MetricTireSize,
  type SizeErrorCode,
  type TireSize,
} from "./size";
export { loadIndexKg, speedSymbolKmh, LOAD_INDEX_KG, SPEED_SYMBOLS, type SpeedSymbolRow } from "./load-index";
export { validateVin, vinCheckDigit, type VinErrorCode, type VinOk } from "./vin";
export {
  computeReminders,
  seasonalSwapDate,
  reminderId,
  DEFAULT_REMINDER_SETTINGS,
  type LogbookInput,
  type ReminderItem,
  type ReminderKind,
  type ReminderSettings,
  type ReminderSeverity,
  type RemindersOk,
  type SetInput,
  type SetState,
  type Skipped,
  type TireInput,
  type TreadCheckInput,
  type VehicleInput,
} from "./reminders";
export { coinDepth, coinLabel, COIN_RESULTS, COIN_SOURCE, type CoinResult } from "./coin";
