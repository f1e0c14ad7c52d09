// @ts-nocheck
import { MonthlyModeChart } from '@/components/charts/monthly-mode-chart';
import { LoopHoursTable } from '@/components/ui/loop-hours-table';
import { Panel } from '@/components/ui/panel';
import { formatQuantity } from '@/lib/quantity';
import { useUnitSystem } from '@/lib/unit-system';
import { findFacilityWaterClass } from '../../../../shared/scenario/facility-water';
import type { LoopResults, ScenarioResults } from '../../../../shared/scenario/run';

const mwh = (kwh: number) => `${(kwh / 1000).toLocaleString('en', { maximumFractionDigits: 1, minimumFractionDigits: 1 })} MWh`;

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
  const rows: { label: string; of: (l: LoopResults) => string; whole: string }[] = [
    { label: 'Share of IT heat', of: (l) => `${Math.round(l.share * 100)} %`, whole: '100 %' },
    { label: 'Cooling energy', of: (l) => mwh(l.energy.coolingKwh), whole: mwh(results.energy.coolingKwh) },
    { label: 'Compressors', of: (l) => mwh(l.energy.compressorKwh), whole: mwh(results.energy.compressorKwh) },
    { label: 'Fans', of: (l) => mwh(l.energy.fanKwh), whole: mwh(results.energy.fanKwh) },
    { label: 'Pumps', of: (l) => mwh(l.energy.pumpKwh), whole: mwh(results.energy.pumpKwh) },
    { label: 'Water', of: (l) => formatQuantity('water', unitSystem, l.water.totalL), whole: formatQuantity('water', unitSystem, results.water.totalL) },
    {
      label: 'Peak mechanical load',
      of: (l) => `${Math.round(l.peakMechanicalLoadKw).toLocaleString('en')} kW`,
      whole: `${Math.round(results.peakMechanicalLoadKw).toLocaleString('en')} kW`,
    },
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
