import type { ReportRun } from '../../../../shared/report/report-data';
import { usesEvaporativeWater } from '../../../../shared/scenario/hybrid';
import { formatMetric } from '@/lib/metric-text';

const fixed = (v: number, digits: number) => v.toLocaleString('en', { minimumFractionDigits: digits, maximumFractionDigits: digits });

// The report's figures as the metric list writes them (src/lib/metric-text.ts), so the report reads as the run page.
export const hours = (h: number) => formatMetric('totalHours', 'SI', h);
/** A share to 0.1 %, never rounded to 0 or 100 when some hours are (or are not) in it. */
export function share(part: number, whole: number): string {
  if (!(whole > 0)) return '0.0 %';
  const pct = (100 * part) / whole;
  if (part > 0 && pct < 0.05) return '< 0.1 %';
  if (part < whole && pct >= 99.95) return '> 99.9 %';
  return `${fixed(pct, 1)} %`;
}
/** Energy as read: MWh from 1 MWh up, kWh below (energyText). */
export const mwh = (kwh: number | null | undefined) => formatMetric('cooling', 'SI', kwh);
export const kw = (v: number) => formatMetric('peak', 'SI', v);
/** A ratio (pPUE, ERF) to 3 decimals. */
export const ratio = (v: number | null | undefined) => formatMetric('ppue', 'SI', v);
export const dateTime = (iso: string) => `${iso.slice(0, 16).replace('T', ' ')} UTC`;

const systemWords: Record<ReportRun['scenario']['system']['kind'], string> = {
  'direct-air': 'direct outdoor air',
  'indirect-air': 'an indirect air-to-air heat exchanger',
  'water-side': 'a water-side economiser',
  hybrid: 'a hybrid hall',
};

/** The cooling design in words: "direct outdoor air with an evaporative stage (ε 0.85)". */
export function systemInWords(run: ReportRun): string {
  const system = run.scenario.system;
  if (system.kind === 'hybrid') {
    const liquid = system.liquid;
    const share = Math.round(system.liquidShare * 100);
    return `a hybrid hall: ${share} % of the IT heat to facility water at ${liquid.chilledWaterSupplyC} °C on a ${liquid.heatRejection === 'cooling-tower' ? 'cooling tower' : 'dry cooler'}, ${100 - share} % to the hall air by ${systemInWords({ ...run, scenario: { ...run.scenario, system: system.air } })}`;
  }
  const s = system;
  let words = systemWords[s.kind];
  if (s.kind === 'water-side') words += s.heatRejection === 'cooling-tower' ? ' on a cooling tower' : ' on a dry cooler';
  if (s.evaporativeEffectiveness > 0) words += ` with an evaporative stage (effectiveness ${s.evaporativeEffectiveness})`;
  return words;
}

/** Whether any water is evaporated: an evaporative stage or a cooling tower. */
export function usesWater(run: ReportRun): boolean {
  return usesEvaporativeWater(run.scenario.system);
}

export const humidityWords: Record<string, string> = {
  'relative-humidity-pct': 'relative humidity',
  'dew-point-c': 'dew point',
  'wet-bulb-c': 'wet-bulb',
  'humidity-ratio-kgkg': 'humidity ratio',
};
