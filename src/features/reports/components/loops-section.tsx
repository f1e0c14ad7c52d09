import { LoopHoursTable } from '@/components/ui/loop-hours-table';
import { formatMegawattHours, formatQuantity } from '@/lib/quantity';
import type { UnitSystem } from '@/lib/unit-system';
import { MONTH_SHORT } from '../../../../shared/calendar';
import { METRICS } from '../../../../shared/metrics';
import type { ScenarioResults } from '../../../../shared/scenario/run';
import { hours, ratio } from '../lib/report-format';
import { SubHeading } from './report-layout';

/** A hybrid run's report section: each loop's hours, energy and water, and the heat reuse. */
export function LoopsSection({ results, unitSystem }: { results: ScenarioResults; unitSystem: UnitSystem }) {
  const loops = results.loops;
  if (!loops) return null;
  const { liquid, air } = loops;
  const reuse = results.heatReuse;
  const t = liquid.temperatures;
  const temperature = (c: number) => formatQuantity('temperature', unitSystem, c);
  return (
    <div className="space-y-3" data-testid="report-loops">
      <div className="keep-together space-y-2">
        <SubHeading>Liquid and air loops</SubHeading>
        {t && (
          <p className="text-sm">
            Facility water {temperature(t.facilitySupplyC)} supply, {temperature(t.facilityReturnC)} return; coolant {temperature(t.coolantSupplyC)} after the
            CDU.
          </p>
        )}
        <LoopHoursTable hall={results.hours} liquid={liquid.hours} air={air.hours} liquidShare={liquid.share} />
        <table className="w-full text-sm">
          <thead>
            <tr className="border-b border-rule text-left text-xs text-ink-soft">
              <th scope="col" className="py-1 font-normal">
                Per loop
              </th>
              <th scope="col" className="py-1 text-right font-normal">
                Liquid loop
              </th>
              <th scope="col" className="py-1 text-right font-normal">
                Air loop
              </th>
            </tr>
          </thead>
          <tbody>
            {[
              [METRICS.cooling.label, formatMegawattHours(liquid.energy.coolingKwh), formatMegawattHours(air.energy.coolingKwh)],
              [METRICS.compressor.label, formatMegawattHours(liquid.energy.compressorKwh), formatMegawattHours(air.energy.compressorKwh)],
              [METRICS.waterTotal.label, formatQuantity('water', unitSystem, liquid.water.totalL), formatQuantity('water', unitSystem, air.water.totalL)],
              [METRICS.longestMechanicalRun.label, hours(liquid.longestMechanicalRunHours), hours(air.longestMechanicalRunHours)],
            ].map(([label, l, a]) => (
              <tr key={label} className="border-b border-rule/60 last:border-0">
                <th scope="row" className="py-1 text-left font-normal">
                  {label}
                </th>
                <td className="num py-1 text-right">{l}</td>
                <td className="num py-1 text-right">{a}</td>
              </tr>
            ))}
          </tbody>
        </table>
        <p className="text-xs text-ink-soft">pPUE and WUE above are over the whole hall.</p>
      </div>
      {reuse && (
        <div className="keep-together space-y-2">
          <SubHeading>Heat reuse</SubHeading>
          <p className="text-sm">
            {reuse.availableHours.toLocaleString('en')} h with heat at {temperature(reuse.thresholdC)} or above
            {reuse.source === 'heat-pump' ? ` (heat pump, heating COP ${reuse.heatPumpCop!.toFixed(2)})` : ''}; {formatMegawattHours(reuse.availableKwh)}{' '}
            available, {formatMegawattHours(reuse.reusedKwh)} reused at a {Math.round(reuse.reusedShare * 100)} % take; ERF {ratio(reuse.erf)} (ISO/IEC
            30134-6).
          </p>
          <p className="num text-xs">{reuse.availableKwhByMonth.map((kwh, m) => `${MONTH_SHORT[m]} ${(kwh / 1000).toFixed(0)}`).join(' · ')} MWh</p>
          <p className="text-xs text-ink-soft">This is heat available at the return, not a contract with a heat customer.</p>
        </div>
      )}
    </div>
  );
}
