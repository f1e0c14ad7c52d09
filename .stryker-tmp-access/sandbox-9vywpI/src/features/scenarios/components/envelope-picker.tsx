// @ts-nocheck
import { useId } from 'react';
import type { EnvelopeLimits } from '../../../../shared/scenario/envelopes';
import type { Scenario } from '../../../../shared/scenario/schema';
import { useEnvelopeChoices } from '../api/get-envelope-choices';

const limitKeys = ['dryBulbMinC', 'dryBulbMaxC', 'dewPointMinC', 'dewPointMaxC', 'rhMinPct', 'rhMaxPct'] as const;

function sameLimits(a: EnvelopeLimits, b: EnvelopeLimits): boolean {
  return limitKeys.every((k) => a[k] === b[k]);
}

/**
 * Fills the envelope's limits from a published preset or one of the project's own envelopes. The
 * limits stay editable below it; once edited they no longer match and the picker says "custom".
 */
export function EnvelopePicker({
  projectId,
  value,
  onPick,
  disabled,
}: {
  projectId: number;
  value: Scenario['envelope'];
  onPick: (envelope: Scenario['envelope']) => void;
  disabled?: boolean;
}) {
  const id = useId();
  const choices = useEnvelopeChoices(projectId);
  const presets = choices.data?.presets ?? [];
  const own = choices.data?.envelopes ?? [];
  const preset = presets.find((p) => p.id === value.presetId && sameLimits(p.limits, value));
  const ownMatch = preset ? undefined : own.find((e) => sameLimits(e.limits, value));
  const selected = preset ? `preset:${preset.id}` : ownMatch ? `own:${ownMatch.id}` : 'custom';

  return (
    <div className="space-y-2">
      <div className="flex items-center gap-3">
        <label htmlFor={id} className="text-sm font-medium">
          Start from
        </label>
        <select
          id={id}
          disabled={disabled || choices.isPending}
          value={selected}
          onChange={(e) => {
            const [source, key] = e.target.value.split(':');
            if (source === 'preset') {
              const p = presets.find((x) => x.id === key)!;
              onPick({ ...p.limits, presetId: p.id });
            } else if (source === 'own') {
              const env = own.find((x) => String(x.id) === key)!;
              onPick({ ...env.limits, presetId: undefined });
            }
          }}
          className="min-w-72 rounded border border-rule bg-panel px-2 py-1 text-sm disabled:bg-paper disabled:text-ink-soft"
        >
          <option value="custom">Custom limits (typed below)</option>
          <optgroup label="Published (ASHRAE TC 9.9)">
            {presets.map((p) => (
              <option key={p.id} value={`preset:${p.id}`}>
                {p.label}
              </option>
            ))}
          </optgroup>
          {own.length > 0 && (
            <optgroup label="This project's envelopes">
              {own.map((e) => (
                <option key={e.id} value={`own:${e.id}`}>
                  {e.name}
                </option>
              ))}
            </optgroup>
          )}
        </select>
      </div>
      {choices.isError && <p className="text-xs text-signal-bad">Envelopes could not be loaded: {choices.error.message}</p>}
      {preset && (
        <p className="text-xs text-ink-soft">
          {preset.edition}.{preset.recalledFromMemory && ' Limits recalled from memory, not yet checked against the guideline text.'}
          {preset.limits.altitudeDerating &&
            ` Maximum dry-bulb lowered 1 K per ${preset.limits.altitudeDerating.metresPerKelvin} m above ${preset.limits.altitudeDerating.aboveElevationM} m.`}
        </p>
      )}
      {ownMatch && <p className="text-xs text-ink-soft">Project envelope{ownMatch.note ? `: ${ownMatch.note}` : '.'}</p>}
    </div>
  );
}
