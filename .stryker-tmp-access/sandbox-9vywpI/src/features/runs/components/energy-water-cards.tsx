// @ts-nocheck
import { Panel } from '@/components/ui/panel';
import { coolingLoadText, energyText, formatQuantity } from '@/lib/quantity';
import { useUnitSystem } from '@/lib/unit-system';
import { countsSubsets, NOT_COUNTED, notCountedShort, waterPartL, waterPartsShown } from '../../../../shared/report/mode-subsets';
import type { ScenarioResults } from '../../../../shared/scenario/run';
import type { ScenarioSystem } from '../../../../shared/scenario/schema';
import { fanGroups } from '../../../../shared/report/fan-groups';

const mwh = (kwh: number) => energyText(kwh);
const kw = (v: number) => `${v.toLocaleString('en', { maximumFractionDigits: 0 })} kW`;

function Figure({ label, value, note, testId }: { label: string; value: string; note?: string; testId?: string }) {
  return (
    <div className="rounded border border-rule bg-paper px-3 py-2">
      <p className="text-xs text-ink-soft">{label}</p>
      <p className="num text-xl font-semibold" data-testid={testId}>
        {value}
      </p>
      {note && <p className="text-xs text-ink-faint">{note}</p>}
    </div>
  );
}

/** Partial PUE, WUE, peak mechanical load and the energy and water behind them. */
export function EnergyWaterCards({ results, engineVersion, system }: { results: ScenarioResults; engineVersion: string; system: ScenarioSystem }) {
  const { unitSystem } = useUnitSystem();
  const e = results.energy;
  const w = results.water;
  const counted = countsSubsets(results);
  const parts = waterPartsShown(w, counted);
  const rows = [
    ...fanGroups(e, system).map((g) => ({ label: g.label, kwh: g.kwh })),
    { label: 'Compressors', kwh: e.compressorKwh },
    { label: 'Pumps', kwh: e.pumpKwh },
    // Only towers in freeze protection use them; runs before engine 2.0.0 have no such figure.
    ...(typeof e.basinHeaterKwh === 'number' && e.basinHeaterKwh > 0 ? [{ label: 'Basin heaters', kwh: e.basinHeaterKwh }] : []),
  ];
  return (
    <div className="grid gap-4 lg:grid-cols-2">
      <Panel title="Energy">
        <div className="grid grid-cols-2 gap-2 2xl:grid-cols-3">
          <Figure label="Partial PUE (cooling)" value={e.partialPue?.toFixed(3) ?? '–'} note="(IT + cooling) / IT energy" testId="ppue" />
          <Figure
            label="Peak mechanical load"
            value={kw(results.peakMechanicalLoadKw)}
            note={`${unitSystem === 'IP' ? `${coolingLoadText(results.peakMechanicalLoadKw, 'IP').replace(/^[^(]*\(|\)$/g, '')}; ` : ''}compressors peak ${kw(results.peakCompressorKw)} electric`}
            testId="peak-load"
          />
          <Figure label="Cooling energy" value={mwh(e.coolingKwh)} note={e.annual ? `${mwh(e.annual.coolingKwh)} per 8,760 h` : undefined} />
        </div>
        <table className="mt-3 w-full text-sm">
          <caption className="pb-1 text-left text-xs text-ink-soft">Energy by component over the hours with data</caption>
          <tbody>
            {rows.map((r) => (
              <tr key={r.label} className="border-b border-rule/60">
                <th scope="row" className="py-1 text-left font-normal">
                  {r.label}
                </th>
                <td className="num py-1 text-right">{mwh(r.kwh)}</td>
                <td className="num w-20 py-1 text-right text-ink-soft">{e.coolingKwh > 0 ? ((100 * r.kwh) / e.coolingKwh).toFixed(1) : '0.0'} %</td>
              </tr>
            ))}
            <tr className="border-b border-rule/60">
              <th scope="row" className="py-1 text-left font-medium">
                Cooling total
              </th>
              <td className="num py-1 text-right font-medium">{mwh(e.coolingKwh)}</td>
              <td />
            </tr>
            <tr>
              <th scope="row" className="py-1 text-left font-normal text-ink-soft">
                IT equipment
              </th>
              <td className="num py-1 text-right text-ink-soft">{mwh(e.itKwh)}</td>
              <td />
            </tr>
          </tbody>
        </table>
      </Panel>
      <Panel title="Water">
        <div className="grid grid-cols-2 gap-2">
          <Figure
            label="WUE"
            value={w.wueLPerKwh === null ? '–' : `${w.wueLPerKwh.toFixed(3)} L/kWh`}
            note="site water per IT energy (ISO/IEC 30134-9)"
            testId="wue"
          />
          <Figure
            label="Water use"
            value={formatQuantity('water', unitSystem, w.totalL)}
            note={w.annualL !== null ? `${formatQuantity('water', unitSystem, w.annualL)} per 8,760 h` : undefined}
          />
        </div>
        <table className="mt-3 w-full text-sm">
          <tbody>
            <tr className="border-b border-rule/60">
              <th scope="row" className="py-1 text-left font-normal">
                Evaporated
              </th>
              <td className="num py-1 text-right">{formatQuantity('water', unitSystem, w.evaporatedL)}</td>
            </tr>
            {parts
              .filter((p) => p.ofEvaporated)
              .map((p) => {
                const litres = waterPartL(w, p.key);
                return (
                  <tr key={p.key} className="border-b border-rule/60 text-ink-soft" data-testid={`water-${p.key}`}>
                    <th scope="row" className="py-0.5 pl-5 text-left text-xs font-normal">
                      {p.rowLabel}
                    </th>
                    <td className="num py-0.5 text-right text-xs">{litres === null ? NOT_COUNTED : formatQuantity('water', unitSystem, litres)}</td>
                  </tr>
                );
              })}
            <tr className="border-b border-rule/60">
              <th scope="row" className="py-1 text-left font-normal">
                Blowdown
              </th>
              <td className="num py-1 text-right">{formatQuantity('water', unitSystem, w.blowdownL)}</td>
            </tr>
            {parts
              .filter((p) => !p.ofEvaporated)
              .map((p) => (
                <tr key={p.key} className="border-b border-rule/60" data-testid={`water-${p.key}`}>
                  <th scope="row" className="py-1 text-left font-normal">
                    {p.rowLabel}
                  </th>
                  <td className="num py-1 text-right">{formatQuantity('water', unitSystem, waterPartL(w, p.key))}</td>
                </tr>
              ))}
            <tr>
              <th scope="row" className="py-1 text-left font-medium">
                Total
              </th>
              <td className="num py-1 text-right font-medium">{formatQuantity('water', unitSystem, w.totalL)}</td>
            </tr>
          </tbody>
        </table>
        {!counted && <p className="mt-1 text-xs text-ink-soft">{notCountedShort(engineVersion)}</p>}
      </Panel>
    </div>
  );
}
