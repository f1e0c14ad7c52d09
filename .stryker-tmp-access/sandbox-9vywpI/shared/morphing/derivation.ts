// @ts-nocheck
import type { ChangeFactors } from './factors';
import type { MonthlyClimate } from './monthly-comparison';

/** How a projection was made, as stored in climate_files.derivationJson and answered by the projections API. */
export interface Derivation {
  kind: 'projection';
  method: string;
  citation: string;
  note: string;
  /** Humidity is morphed through specific humidity, kg/kg of moist air, then back to RH. */
  humidityQuantity: 'specific humidity';
  parent: { id: number; name: string; sha256: string; hours: number };
  source: string | null;
  factors: ChangeFactors;
  /** Site-local months on the site's standard time. */
  utcOffsetMinutes: number;
  alphaByMonth: number[];
  clampedHighHours: number;
  clampedLowHours: number;
  lostHours: number;
  comparison: { parent: MonthlyClimate; projection: MonthlyClimate };
}
