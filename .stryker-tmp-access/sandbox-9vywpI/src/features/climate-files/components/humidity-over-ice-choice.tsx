// @ts-nocheck
import type { MappingDraft } from '../lib/mapping-draft';

/**
 * The mapping step's choice of how the file's humidity is stated below 0 °C: over liquid water (the default,
 * as weather services report it, WMO-No. 8) or over ice. Only relative humidity and dew point depend on it.
 */
export function HumidityOverIceChoice({ draft, onChange }: { draft: MappingDraft; onChange: (next: MappingDraft) => void }) {
  const quantity = draft.humidity?.quantity;
  const applies = quantity === undefined || quantity === 'relative-humidity' || quantity === 'dew-point';
  return (
    <div className="grid gap-2 border-b border-rule/60 py-2.5 md:grid-cols-[10rem_1fr_14rem] md:items-center" data-testid="humidity-over-ice">
      <span className="text-sm font-medium">Humidity below 0 °C</span>
      <label className="flex items-center gap-2 text-sm">
        <input
          id="map-humidity-over-ice"
          type="checkbox"
          className="accent-harbour"
          checked={draft.humidityOverIce}
          disabled={!applies}
          onChange={(e) => onChange({ ...draft, humidityOverIce: e.target.checked })}
        />
        The file gives {quantity === 'dew-point' ? 'the dew point (a frost point)' : 'relative humidity'} over ice below 0 °C
      </label>
      <p className="text-xs text-ink-soft">
        {applies
          ? 'Leave unticked unless the file says so: weather data state humidity over liquid water at every temperature (WMO-No. 8). Ticked, sub-zero values are converted to over water on import.'
          : 'A wet-bulb or humidity ratio does not depend on this.'}
      </p>
    </div>
  );
}
