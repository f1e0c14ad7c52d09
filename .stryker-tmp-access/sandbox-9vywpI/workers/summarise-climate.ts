// @ts-nocheck
import type { ClimateSeries } from '../shared/climate';
import { summariseClimate as summarise, type ClimateSummary } from '../shared/climate-summary';

/** Piscina task: coverage, monthly statistics and design conditions of one stored climate file. */
export function summariseClimate(input: { series: ClimateSeries; elevationM: number }): ClimateSummary {
  return summarise(input.series, input.elevationM);
}
