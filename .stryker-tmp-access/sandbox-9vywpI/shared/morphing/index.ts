/**
 * Future-climate files by the morphing method of Belcher, Hacker and Powell (2005), "Constructing design
 * weather data for future climates", Building Services Engineering Research and Technology 26(1) 49–61.
 */
// @ts-nocheck

export { localCalendar, type LocalCalendar } from './local-days';
export { monthlyDayStatistics, MIN_HOURS_PER_DAY, type MonthlyDayStatistics } from './monthly-day-statistics';
export { shiftByMonth, stretchByMonth, shiftAndStretchByMonth, stretchFactors } from './operations';
export { specificHumidityOfHours, rhPctFromSpecificHumidity, type RhClampCounts } from './humidity';
export { morphClimate, type MorphClimateInput, type MorphedClimate, type MorphOutcome } from './morph-climate';
export { monthlyClimate, type MonthlyClimate, type MonthRow } from './monthly-comparison';
export {
  MONTH_NAMES,
  dryBulbMethods,
  humidityMethods,
  monthFactorSchema,
  changeFactorsSchema,
  projectionRequestSchema,
  describeFactorIssues,
  zeroFactors,
  type DryBulbMethod,
  type HumidityMethod,
  type MonthFactor,
  type ChangeFactors,
  type ProjectionRequest,
} from './factors';
export { parseFactorsCsv, type FactorsCsvResult } from './factors-csv';
export type { Derivation } from './derivation';

/** The method's source, as stored with every projection and shown on its page. */
export const MORPHING_CITATION =
  'Belcher, S. E., Hacker, J. N. and Powell, D. S. (2005). Constructing design weather data for future climates. Building Services Engineering Research and Technology 26(1), 49–61.';
