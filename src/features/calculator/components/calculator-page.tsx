import { useMemo, useState } from 'react';
import { MoistAirChart } from '@/components/charts/moist-air-chart';
import { Panel } from '@/components/ui/panel';
import { unitOf } from '@/lib/quantity';
import { useUnitSystem } from '@/lib/unit-system';
import { propertyInputs, solveState, type CalculatorInput, type PropertyKey } from '../lib/state-request';
import { stateRows } from '../lib/state-rows';

const noHours = { dryBulbC: [], humidityRatio: [] };

const problemTitle: Record<string, string> = {
  'under-determined': 'Not enough to fix the state',
  'over-determined': 'More than the state allows',
  'unsupported-pair': 'This pair is not supported',
  supersaturated: 'Beyond saturation',
  'out-of-range': 'A value is out of range',
};

/** /calculator — any two properties (or one, for saturated air) at a pressure or elevation give the full state. */
export function CalculatorPage() {
  const { unitSystem } = useUnitSystem();
  const [input, setInput] = useState<CalculatorInput>({
    basis: 'elevation',
    basisText: '0',
    properties: { dryBulbC: unitSystem === 'IP' ? '86' : '30', rhPct: '50' },
    saturated: false,
  });
  const [previousSystem, setPreviousSystem] = useState(unitSystem);
  if (previousSystem !== unitSystem) {
    // Typed values are in the old units; start again from a blank state rather than reinterpret them.
    setPreviousSystem(unitSystem);
    setInput((i) => ({ ...i, basisText: i.basis === 'elevation' ? '0' : '', properties: {} }));
  }
  const outcome = useMemo(() => solveState(input, unitSystem), [input, unitSystem]);
  const markers = useMemo(
    () => (outcome.ok ? [{ label: 'This state', dryBulbC: outcome.state.dryBulbC, humidityRatio: outcome.state.humidityRatio }] : []),
    [outcome],
  );
  const filled = propertyInputs.filter((p) => (input.properties[p.key] ?? '').trim() !== '').length;
  const setProperty = (key: PropertyKey, text: string) => setInput((i) => ({ ...i, properties: { ...i.properties, [key]: text } }));
  const unitFor = (kind: (typeof propertyInputs)[number]['kind']) => (kind === 'percent' ? '%' : unitOf(kind, unitSystem));

  return (
    <div className="space-y-4">
      <header>
        <h1 className="text-xl font-semibold">Air-state calculator</h1>
        <p className="text-sm text-ink-soft">
          Fill any two properties at a pressure or elevation — or one, for saturated air — and read the rest. Same engine as the runs (ASHRAE
          Handbook—Fundamentals 2017, ch. 1). Relative humidity and dew point are over liquid water at every temperature, as weather data give them (WMO-No. 8);
          the frost point is over ice.
        </p>
      </header>
      <div className="grid gap-4 xl:grid-cols-[26rem_minmax(0,1fr)]">
        <div className="space-y-4">
          <Panel title="Given">
            <fieldset className="flex gap-4 text-sm">
              <legend className="sr-only">Pressure from</legend>
              {(['elevation', 'pressure'] as const).map((b) => (
                <label key={b} className="flex items-center gap-1.5">
                  <input
                    type="radio"
                    name="basis"
                    className="accent-harbour"
                    checked={input.basis === b}
                    onChange={() => setInput((i) => ({ ...i, basis: b, basisText: '' }))}
                  />
                  {b === 'elevation' ? 'Elevation' : 'Barometric pressure'}
                </label>
              ))}
            </fieldset>
            <label className="mt-2 grid grid-cols-[9rem_minmax(0,1fr)_3.5rem] items-center gap-2 text-sm">
              <span>{input.basis === 'elevation' ? 'Elevation' : 'Pressure'}</span>
              <input
                value={input.basisText}
                inputMode="decimal"
                onChange={(e) => setInput((i) => ({ ...i, basisText: e.target.value }))}
                className="num w-full min-w-0 rounded border border-rule bg-panel px-2 py-1 text-right"
              />
              <span className="text-xs text-ink-soft">{unitOf(input.basis === 'elevation' ? 'elevation' : 'pressure', unitSystem)}</span>
            </label>
            <div className="mt-3 border-t border-rule pt-3">
              {propertyInputs.map((p) => (
                <label key={p.key} className="grid grid-cols-[9rem_minmax(0,1fr)_3.5rem] items-center gap-2 py-1 text-sm">
                  <span>{p.label}</span>
                  <input
                    value={input.properties[p.key] ?? ''}
                    inputMode="decimal"
                    onChange={(e) => setProperty(p.key, e.target.value)}
                    aria-label={`${p.label} (${unitFor(p.kind)})`}
                    className="num w-full min-w-0 rounded border border-rule bg-panel px-2 py-1 text-right"
                  />
                  <span className="text-xs text-ink-soft">{unitFor(p.kind)}</span>
                </label>
              ))}
              <label className="mt-2 flex items-center gap-2 text-sm">
                <input
                  type="checkbox"
                  className="accent-harbour"
                  checked={input.saturated}
                  onChange={(e) => setInput((i) => ({ ...i, saturated: e.target.checked }))}
                />
                Saturated air (on the saturation curve over liquid water: one property is enough)
              </label>
              <div className="mt-3 flex items-center justify-between text-xs text-ink-soft">
                <span>
                  {filled} of {input.saturated ? 1 : 2} properties filled
                </span>
                <button
                  type="button"
                  className="rounded border border-rule px-2 py-0.5 hover:bg-mist"
                  onClick={() => setInput((i) => ({ ...i, properties: {}, saturated: false }))}
                >
                  Clear properties
                </button>
              </div>
            </div>
          </Panel>
          <Panel title="State">
            {outcome.ok ? (
              <table className="w-full text-sm" data-testid="calculated-state">
                <tbody>
                  {stateRows(outcome.state, unitSystem).map((r) => (
                    <tr key={r.label} className="border-b border-rule/60 last:border-0">
                      <th scope="row" className="py-1 text-left font-normal text-ink-soft">
                        {r.label}
                      </th>
                      <td className="num py-1 text-right">{r.value}</td>
                    </tr>
                  ))}
                </tbody>
              </table>
            ) : (
              <div role="alert" className="rounded border border-signal-warn/40 bg-[#fbf3e4] px-3 py-2 text-sm" data-testid="calculator-refusal">
                <p className="font-semibold">{problemTitle[outcome.problem ?? ''] ?? 'Check the inputs'}</p>
                <p className="num mt-1 text-xs">{outcome.message}</p>
              </div>
            )}
          </Panel>
        </div>
        <Panel title="On the moist-air chart">
          {outcome.ok ? (
            <MoistAirChart pressurePa={outcome.state.pressurePa} hours={noHours} markers={markers} />
          ) : (
            <p className="text-sm text-ink-soft">The point appears here once the inputs fix one state.</p>
          )}
        </Panel>
      </div>
    </div>
  );
}
