/**
 * The fan groups of a run's energy, each named for what it moves: the hall fans, and the heat-rejection fans of the
 * system (scavenger fans of an indirect exchanger, dry-cooler fans, cooling-tower fans). Run page, report and summary
 * CSV list the same groups with the same names.
 */
// @ts-nocheck

import type { EnergyTotals } from '../scenario/results';
import type { ScenarioSystem } from '../scenario/schema';

export interface FanGroup {
  key: 'hallFans' | 'rejectionFans' | 'allFans';
  label: string;
  kwh: number;
  /** Per 8,760 h of data; null without data. */
  annualKwh: number | null;
}

/** The heat-rejection fans' name for this system; null for a direct-air hall, which has none. */
export function rejectionFanLabel(system: Pick<ScenarioSystem, 'kind'> & { heatRejection?: string }): string | null {
  if (system.kind === 'indirect-air') return 'Scavenger fans';
  if (system.kind === 'water-side') return system.heatRejection === 'dry-cooler' ? 'Dry-cooler fans' : 'Cooling-tower fans';
  return null;
}

export function fanGroups(
  energy: EnergyTotals & { annual: EnergyTotals | null },
  system: Pick<ScenarioSystem, 'kind'> & { heatRejection?: string },
): FanGroup[] {
  const rejectionLabel = rejectionFanLabel(system);
  const annual = energy.annual;
  if (rejectionLabel === null) return [{ key: 'hallFans', label: 'Hall fans', kwh: energy.fanKwh, annualKwh: annual?.fanKwh ?? null }];
  // A run stored before the split holds both groups in one figure: say so rather than call it the hall fans.
  if (typeof energy.rejectionFanKwh !== 'number') {
    return [{ key: 'allFans', label: `Fans (hall and ${rejectionLabel.toLowerCase()} together)`, kwh: energy.fanKwh, annualKwh: annual?.fanKwh ?? null }];
  }
  const annualRejection = annual?.rejectionFanKwh;
  return [
    {
      key: 'hallFans',
      label: 'Hall fans',
      kwh: energy.fanKwh - energy.rejectionFanKwh,
      annualKwh: annual && typeof annualRejection === 'number' ? annual.fanKwh - annualRejection : null,
    },
    { key: 'rejectionFans', label: rejectionLabel, kwh: energy.rejectionFanKwh, annualKwh: typeof annualRejection === 'number' ? annualRejection : null },
  ];
}
