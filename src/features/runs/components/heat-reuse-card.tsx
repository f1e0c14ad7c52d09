import { MONTH_SHORT } from '../../../../shared/calendar';
import { Panel } from '@/components/ui/panel';
import { formatMegawattHours, formatQuantity } from '@/lib/quantity';
import { useUnitSystem } from '@/lib/unit-system';
import type { HeatReuseResults } from '../../../../shared/scenario/heat-reuse';

/** Heat a hybrid hall's liquid loop could offer a heating network: hours, heat per month, reused share and ERF. */
export function HeatReuseCard({ reuse }: { reuse: HeatReuseResults }) {
  const { unitSystem } = useUnitSystem();
  const temperature = (c: number) => formatQuantity('temperature', unitSystem, c);
  const peak = Math.max(...reuse.availableKwhByMonth, 1);
  const how =
    reuse.source === 'direct'
      ? `The facility-water return (${temperature(reuse.returnWaterC)}) reaches the ${temperature(reuse.thresholdC)} the network needs.`
      : reuse.source === 'heat-pump'
        ? `A heat pump lifts the ${temperature(reuse.returnWaterC)} return to ${temperature(reuse.thresholdC)} at a heating COP of ${reuse.heatPumpCop!.toFixed(2)} (lift model); its electricity counts in the data centre’s energy.`
        : `The facility-water return (${temperature(reuse.returnWaterC)}) is below the ${temperature(reuse.thresholdC)} the network needs and no heat pump is set: no heat is offered.`;
  return (
    <Panel title="Heat reuse">
      <div className="space-y-3" data-testid="heat-reuse">
        <p className="text-sm">{how}</p>
        <div className="grid grid-cols-2 gap-2 md:grid-cols-4">
          <Figure label="Hours available" value={`${reuse.availableHours.toLocaleString('en')} h`} />
          <Figure label="Heat available" value={formatMegawattHours(reuse.availableKwh)} />
          <Figure label={`Reused (${Math.round(reuse.reusedShare * 100)} % taken)`} value={formatMegawattHours(reuse.reusedKwh)} />
          <Figure label="ERF (ISO/IEC 30134-6)" value={reuse.erf === null ? '–' : reuse.erf.toFixed(3)} testId="erf" note="reused / data-centre energy" />
        </div>
        {reuse.availableKwh > 0 && (
          <table className="w-full text-sm">
            <caption className="pb-1 text-left text-xs text-ink-soft">Heat available per month</caption>
            <tbody>
              {reuse.availableKwhByMonth.map((kwh, m) => (
                <tr key={MONTH_SHORT[m]} className="border-b border-rule/60 last:border-0">
                  <th scope="row" className="w-12 py-0.5 text-left font-normal">
                    {MONTH_SHORT[m]}
                  </th>
                  <td className="py-0.5 pr-3">
                    <div className="h-2 rounded-sm bg-harbour/70" style={{ width: `${(100 * kwh) / peak}%` }} aria-hidden />
                  </td>
                  <td className="num w-24 py-0.5 text-right">{formatMegawattHours(kwh)}</td>
                  <td className="num w-20 py-0.5 text-right text-ink-soft">{reuse.availableHoursByMonth[m].toLocaleString('en')} h</td>
                </tr>
              ))}
            </tbody>
          </table>
        )}
        <p className="text-xs text-ink-soft">
          This is heat available at the loop’s return, not a contract with a heat customer: how much a network takes, and when, is for that agreement to settle.
        </p>
      </div>
    </Panel>
  );
}

function Figure({ label, value, note, testId }: { label: string; value: string; note?: string; testId?: string }) {
  return (
    <div className="rounded border border-rule bg-paper px-3 py-2">
      <p className="text-xs text-ink-soft">{label}</p>
      <p className="num text-lg font-semibold" data-testid={testId}>
        {value}
      </p>
      {note && <p className="text-xs text-ink-faint">{note}</p>}
    </div>
  );
}
