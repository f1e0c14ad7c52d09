/**
 * Whether a scenario's supply setpoint sits outside its inlet envelope at the site's elevation (maximum
 * dry-bulb derated for altitude, as the run derates it); for a hybrid, the air loop's supply. Such a point's every hour is an excursion, so its
 * hours per mode are not a result a design can use. Form, sweep page and run share this check.
 */
// @ts-nocheck

import { deratedDryBulbMaxC } from '../scenario/envelopes';
import { hallAirSystem } from '../scenario/hybrid';
import type { Scenario } from '../scenario/schema';

export interface SupplyOutsideEnvelope {
  side: 'above' | 'below';
  supplyAirC: number;
  /** The limit it crosses, °C: the derated maximum or the minimum dry-bulb. */
  limitC: number;
  /** The maximum was lowered for altitude. */
  derated: boolean;
}

export function supplyOutsideEnvelope(scenario: Pick<Scenario, 'system' | 'envelope'>, elevationM: number): SupplyOutsideEnvelope | null {
  const { envelope } = scenario;
  // A hybrid hall's supply air is its air loop's.
  const system = hallAirSystem(scenario.system);
  const maxC = deratedDryBulbMaxC(envelope.dryBulbMaxC, elevationM, envelope.altitudeDerating);
  if (system.supplyAirC > maxC) return { side: 'above', supplyAirC: system.supplyAirC, limitC: maxC, derated: maxC < envelope.dryBulbMaxC };
  if (system.supplyAirC < envelope.dryBulbMinC) return { side: 'below', supplyAirC: system.supplyAirC, limitC: envelope.dryBulbMinC, derated: false };
  return null;
}
