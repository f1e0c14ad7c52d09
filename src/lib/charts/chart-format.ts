/** Small helpers shared by the chart components: calendar labels of the carpet grid. */
import { MONTH_SHORT } from '../../../shared/calendar';

/** First day (1-based) of each month on the carpet's leap-year calendar. */
export const carpetMonthStartDays = [1, 32, 61, 92, 122, 153, 183, 214, 245, 275, 306, 336];

/** "14 Mar" for a 1-based day of the leap-year calendar. */
export function carpetDayLabel(day: number): string {
  let m = 11;
  while (m > 0 && carpetMonthStartDays[m] > day) m--;
  return `${day - carpetMonthStartDays[m] + 1} ${MONTH_SHORT[m]}`;
}
