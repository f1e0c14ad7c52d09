import { MonthlyModeChart } from '@/components/charts/monthly-mode-chart';
import { LoopHoursTable } from '@/components/ui/loop-hours-table';
import { Panel } from '@/components/ui/panel';
import { formatQuantity } from '@/lib/quantity';
import { formatMetric } from '@/lib/metric-text';
import { METRICS } from '../../../../shared/metrics';
import { useUnitSystem } from '@/lib/unit-system';
import { findFacilityWaterClass } from '../../../../shared/scenario/facility-water';
import type { LoopResults, ScenarioResults } from '../../../../shared/scenario/run';

const mwh = (kwh: number) => formatMetric('cooling', 'SI', kwh);

const kindWords: Record<LoopResults['systemKind'], string> = {
  'direct-air': 'direct outdoor air',
  'indirect-air': 'indirect air-to-air',
  'water-side': 'water-side',
};

/**
 * A hybrid run's two loops side by side: hours per mode (and the hall's, the more demanding loop each hour),
 * months, energy and water per loop, with the facility-water temperatures.
 */
export function HybridLoopsPanel({ results, zoneLabel, engineVersion }: { results: ScenarioResults; zoneLabel: string; engineVersion: string }) {
  const { unitSystem } = useUnitSystem();
  const loops = results.loops;
  if (!loops) return null;
  const { liquid, air } = loops;
  const t = liquid.temperatures;
  const waterClass = t?.facilityWaterClassId ? findFacilityWaterClass(t.facilityWaterClassId) : undefined;
  const temperature = (c: number) => formatQuantity('temperature', unitSystem, c);
  const water = (litres: number) => formatMetric('waterTotal', unitSystem, litres);
  const kw = (v: number) => formatMetric('peak', unitSystem, v);
  const rows: { label: string; of: (l: LoopResults) => string; whole: string }[] = [
    { label: METRICS.loopShare.label, of: (l) => `${Math.round(l.share * 100)} %`, whole: '100 %' },
    { label: METRICS.cooling.label, of: (l) => mwh(l.energy.coolingKwh), whole: mwh(results.energy.coolingKwh) },
    { label: METRICS.compressor.label, of: (l) => mwh(l.energy.compressorKwh), whole: mwh(results.energy.compressorKwh) },
    { label: 'Fans', of: (l) => mwh(l.energy.fanKwh), whole: mwh(results.energy.fanKwh) },
    { label: METRICS.pumps.label, of: (l) => mwh(l.energy.pumpKwh), whole: mwh(results.energy.pumpKwh) },
    { label: METRICS.waterTotal.label, of: (l) => water(l.water.totalL), whole: water(results.water.totalL) },
    { label: METRICS.peak.label, of: (l) => kw(l.peakMechanicalLoadKw), whole: kw(results.peakMechanicalLoadKw) },
  ];
  return (
    <Panel title="Liquid and air loops">
      <div className="space-y-4" data-testid="hybrid-loops">
        {t && (
          <p className="text-sm text-ink-soft" data-testid="liquid-temperatures">
            Facility water {temperature(t.facilitySupplyC)} supply{waterClass ? ` (${waterClass.label}, recalled from memory)` : ' (custom)'},{' '}
            {temperature(t.facilityReturnC)} return; coolant to the cold plates {temperature(t.coolantSupplyC)} after the CDU. Air loop:{' '}
            {kindWords[air.systemKind]}.
          </p>
        )}
        <div className="grid gap-4 xl:grid-cols-2">
          <LoopHoursTable hall={results.hours} liquid={liquid.hours} air={air.hours} liquidShare={liquid.share} />
          <table className="w-full text-sm" data-testid="loop-energy">
            <caption className="pb-1 text-left text-xs text-ink-soft">
              Energy and water per loop over the hours with data; pPUE and WUE are over the whole hall
            </caption>
            <thead>
              <tr className="border-b border-rule text-left text-xs text-ink-soft">
                <th scope="col" className="py-1 font-normal">
                  Figure
                </th>
                <th scope="col" className="py-1 text-right font-normal">
                  Liquid loop
                </th>
                <th scope="col" className="py-1 text-right font-normal">
                  Air loop
                </th>
                <th scope="col" className="py-1 text-right font-normal">
                  Hall
                </th>
              </tr>
            </thead>
            <tbody>
              {rows.map((r) => (
                <tr key={r.label} className="border-b border-rule/60 last:border-0">
                  <th scope="row" className="py-1 text-left font-normal">
                    {r.label}
                  </th>
                  <td className="num py-1 text-right">{r.of(liquid)}</td>
                  <td className="num py-1 text-right">{r.of(air)}</td>
                  <td className="num py-1 text-right font-medium">{r.whole}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
        <div className="grid gap-4 xl:grid-cols-2">
          <section aria-label="Liquid loop by month">
            <h3 className="text-sm font-semibold">Liquid loop by month</h3>
            <MonthlyModeChart byMonth={liquid.hoursByMonth} zoneLabel={zoneLabel} withTable={false} engineVersion={engineVersion} />
          </section>
          <section aria-label="Air loop by month">
            <h3 className="text-sm font-semibold">Air loop by month</h3>
            <MonthlyModeChart byMonth={air.hoursByMonth} zoneLabel={zoneLabel} withTable={false} engineVersion={engineVersion} />
          </section>
        </div>
      </div>
    </Panel>
  );
}
