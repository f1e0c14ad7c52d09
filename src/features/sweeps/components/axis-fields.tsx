import { useId, useState } from 'react';
import { useUnitSystem } from '@/lib/unit-system';
import type { Scenario } from '../../../../shared/scenario/schema';
import { ENVELOPE_PRESETS } from '../../../../shared/scenario/envelopes';
import { SWEEP_INPUT_PATHS, SWEEP_INPUTS, sweepInputRefusal, type SweepInputPath } from '../../../../shared/sweep';
import { sweepUnit } from '@/lib/sweep-value';
import { rangeFromSi, rangeToSi } from '../lib/sweep-format';

/** One axis as the form holds it: always SI, whatever the person types in. */
export interface AxisDraft {
  input: SweepInputPath;
  from: number;
  to: number;
  step: number;
  presetIds: string[];
}

const DEFAULT_PRESETS = ['ashrae-2021-recommended', 'ashrae-2021-a1', 'ashrae-2021-a2', 'ashrae-2021-a3', 'ashrae-2021-a4'];

/** A first axis for this input: its suggested range, or the common presets. */
export function draftFor(input: SweepInputPath): AxisDraft {
  const s = SWEEP_INPUTS[input].suggested ?? { from: 0, to: 0, step: 1 };
  return { input, ...s, presetIds: DEFAULT_PRESETS };
}

/** The inputs that change the hours of this scenario's system, in the order the form offers them. */
export const applicableInputs = (scenario: Scenario) => SWEEP_INPUT_PATHS.filter((p) => sweepInputRefusal(p, scenario.system) === null);

/** A number box in the person's units over an SI value; keeps the text as typed while it has focus. */
function RangeNumber({ label, value, onChange }: { label: string; value: number; onChange: (shown: number) => void }) {
  const id = useId();
  const [draft, setDraft] = useState<string | null>(null);
  return (
    <div className="flex flex-col gap-0.5">
      <label htmlFor={id} className="text-xs text-ink-soft">
        {label}
      </label>
      <input
        id={id}
        inputMode="decimal"
        className="num w-24 rounded border border-rule bg-panel px-2 py-1 text-right text-sm"
        value={draft ?? String(value)}
        onFocus={() => setDraft(String(value))}
        onChange={(e) => {
          setDraft(e.target.value);
          const n = Number(e.target.value.replace(',', '.'));
          onChange(e.target.value.trim() === '' ? Number.NaN : n);
        }}
        onBlur={() => setDraft(null)}
      />
    </div>
  );
}

/** Which input an axis varies and over what: from, to and step in the person's units, or a list of presets. */
export function AxisFields({
  legend,
  axis,
  scenario,
  taken,
  onChange,
}: {
  legend: string;
  axis: AxisDraft;
  scenario: Scenario;
  /** The other axis's input, not offered twice. */
  taken?: SweepInputPath;
  onChange: (next: AxisDraft) => void;
}) {
  const { unitSystem } = useUnitSystem();
  const selectId = useId();
  const offered = applicableInputs(scenario).filter((p) => p !== taken);
  const notOffered = SWEEP_INPUT_PATHS.filter((p) => sweepInputRefusal(p, scenario.system) !== null);
  const unit = sweepUnit(axis.input, unitSystem);
  const shown = rangeFromSi(axis.input, unitSystem, axis);
  const setShown = (key: 'from' | 'to' | 'step', v: number) => onChange({ ...axis, ...rangeToSi(axis.input, unitSystem, { ...shown, [key]: v }) });

  return (
    <fieldset className="space-y-2 rounded border border-rule p-3">
      <legend className="px-1 text-sm font-medium">{legend}</legend>
      <div className="flex flex-col gap-0.5">
        <label htmlFor={selectId} className="text-xs text-ink-soft">
          Input
        </label>
        <select
          id={selectId}
          value={axis.input}
          onChange={(e) => onChange(draftFor(e.target.value as SweepInputPath))}
          className="rounded border border-rule bg-panel px-2 py-1 text-sm"
        >
          {offered.map((p) => (
            <option key={p} value={p}>
              {SWEEP_INPUTS[p].label} · {p}
            </option>
          ))}
        </select>
      </div>
      {axis.input === 'envelope.presetId' ? (
        <fieldset>
          <legend className="text-xs text-ink-soft">Presets, in this order</legend>
          <ul className="mt-1 grid gap-x-4 gap-y-0.5 sm:grid-cols-2">
            {ENVELOPE_PRESETS.map((p) => (
              <li key={p.id}>
                <label className="flex items-baseline gap-2 text-sm">
                  <input
                    type="checkbox"
                    className="accent-harbour"
                    checked={axis.presetIds.includes(p.id)}
                    onChange={() =>
                      onChange({
                        ...axis,
                        presetIds: axis.presetIds.includes(p.id)
                          ? axis.presetIds.filter((id) => id !== p.id)
                          : ENVELOPE_PRESETS.map((q) => q.id).filter((id) => id === p.id || axis.presetIds.includes(id)),
                      })
                    }
                  />
                  {p.label}
                </label>
              </li>
            ))}
          </ul>
        </fieldset>
      ) : (
        <div className="flex flex-wrap items-end gap-3">
          <RangeNumber label={`From${unit ? ` (${unit})` : ''}`} value={shown.from} onChange={(v) => setShown('from', v)} />
          <RangeNumber label={`To${unit ? ` (${unit})` : ''}`} value={shown.to} onChange={(v) => setShown('to', v)} />
          <RangeNumber
            label={`Step${unit ? ` (${unit === '°C' ? 'K' : unit === '°F' ? 'Δ°F' : unit})` : ''}`}
            value={shown.step}
            onChange={(v) => setShown('step', v)}
          />
        </div>
      )}
      {notOffered.length > 0 && (
        <p className="text-xs text-ink-faint">
          Not offered for this {scenario.system.kind} scenario (they do not change its hours): {notOffered.map((p) => SWEEP_INPUTS[p].label).join(', ')}.
        </p>
      )}
    </fieldset>
  );
}
