import type { FieldErrors, UseFormRegister } from 'react-hook-form';
import { MONTH_NAMES, type DryBulbMethod, type HumidityMethod } from '../../../../shared/morphing';
import { unitOf } from '@/lib/quantity';
import { useUnitSystem } from '@/lib/unit-system';
import { inDisplayUnits, type FactorFormValues, type FactorKey } from '../lib/factor-form';

/** The twelve-month table of change factors as typed, in the person's unit system; columns the method does not use are read-only. */
export function FactorTableEditor({
  register,
  errors,
  dryBulbMethod,
  humidityMethod,
}: {
  register: UseFormRegister<FactorFormValues>;
  errors: FieldErrors<FactorFormValues>;
  dryBulbMethod: DryBulbMethod;
  humidityMethod: HumidityMethod;
}) {
  const { unitSystem } = useUnitSystem();
  // The heading already says ΔT, so the unit is written without a second Δ.
  const dT = unitOf('temperatureDifference', unitSystem).replace('Δ', '');
  const humidityKey: FactorKey = humidityMethod === 'stretch' ? 'humidityChangePct' : 'humidityShiftGPerKg';
  const humidityUnit = humidityMethod === 'stretch' ? '% of q' : unitOf('humidityRatio', unitSystem);
  const columns: { key: FactorKey; label: string; unit: string; used: boolean }[] = [
    { key: 'deltaMeanK', label: 'ΔT mean', unit: dT, used: true },
    { key: 'deltaMaxK', label: 'ΔT daily max', unit: dT, used: dryBulbMethod === 'shift-and-stretch' },
    { key: 'deltaMinK', label: 'ΔT daily min', unit: dT, used: dryBulbMethod === 'shift-and-stretch' },
    { key: humidityKey, label: humidityMethod === 'stretch' ? 'Specific humidity change' : 'Specific humidity shift', unit: humidityUnit, used: true },
  ];
  const rowErrors = errors.factors?.months;
  return (
    <table className="w-full max-w-3xl text-sm" data-testid="factor-table">
      <thead>
        <tr className="border-b border-rule text-xs text-ink-soft">
          <th scope="col" className="py-1 text-left font-medium">
            Month
          </th>
          {columns.map((c) => (
            <th key={c.key} scope="col" className={`px-2 text-right font-medium ${c.used ? '' : 'text-ink-faint'}`}>
              {c.label} <span className="font-normal">({c.unit})</span>
            </th>
          ))}
        </tr>
      </thead>
      <tbody>
        {MONTH_NAMES.map((month, m) => (
          <tr key={month} className="border-b border-rule/60">
            <th scope="row" className="py-0.5 text-left font-normal">
              {month}
            </th>
            {columns.map((c) => {
              const error = (rowErrors as unknown as Record<number, Partial<Record<FactorKey, { message?: string }>>> | undefined)?.[m]?.[c.key]?.message;
              return (
                <td key={c.key} className="px-2 py-0.5 text-right">
                  <input
                    {...register(`factors.months.${m}.${c.key}`)}
                    inputMode="decimal"
                    readOnly={!c.used}
                    tabIndex={c.used ? undefined : -1}
                    aria-disabled={c.used ? undefined : true}
                    aria-label={`${month}, ${c.label} (${c.unit})`}
                    aria-invalid={error ? true : undefined}
                    title={error ? inDisplayUnits(error, unitSystem) : undefined}
                    className={`num w-24 rounded border bg-panel px-2 py-0.5 text-right read-only:bg-paper read-only:text-ink-faint ${error ? 'border-signal-bad' : 'border-rule'}`}
                  />
                </td>
              );
            })}
          </tr>
        ))}
      </tbody>
    </table>
  );
}
