// @ts-nocheck
import { MONTH_NAMES, type ChangeFactors } from '../../../../shared/morphing';
import { toDisplay, unitOf } from '@/lib/quantity';
import { useUnitSystem } from '@/lib/unit-system';

const signed = (v: number, digits: number) => `${v > 0 ? '+' : v < 0 ? '−' : '±'}${Math.abs(v).toFixed(digits)}`;

/** The change factors a projection was made with, and the stretch α each month got from the parent's daily range. */
export function FactorsView({ factors, alphaByMonth }: { factors: ChangeFactors; alphaByMonth: number[] }) {
  const { unitSystem } = useUnitSystem();
  // The heading already says ΔT, so the unit is written without a second Δ.
  const dT = unitOf('temperatureDifference', unitSystem).replace('Δ', '');
  const stretch = factors.dryBulbMethod === 'shift-and-stretch';
  const humidityByStretch = factors.humidityMethod === 'stretch';
  const t = (k: number) => signed(toDisplay('temperatureDifference', unitSystem, k), 1);
  return (
    <table className="w-full text-right text-sm" data-testid="projection-factors">
      <caption className="pb-1 text-left text-xs text-ink-soft">
        Dry-bulb by {stretch ? 'shift and stretch' : 'shift'}; specific humidity by{' '}
        {humidityByStretch ? 'stretch (percent change)' : `shift (${unitOf('humidityRatio', unitSystem)})`}
      </caption>
      <thead>
        <tr className="border-b border-rule text-xs text-ink-soft">
          <th scope="col" className="py-1 text-left font-medium">
            Month
          </th>
          <th scope="col" className="px-2 font-medium">
            ΔT mean ({dT})
          </th>
          {stretch && (
            <th scope="col" className="px-2 font-medium">
              ΔT daily max ({dT})
            </th>
          )}
          {stretch && (
            <th scope="col" className="px-2 font-medium">
              ΔT daily min ({dT})
            </th>
          )}
          <th scope="col" className="px-2 font-medium">
            q change ({humidityByStretch ? '%' : unitOf('humidityRatio', unitSystem)})
          </th>
          {stretch && (
            <th scope="col" className="px-2 font-medium" title="α = (ΔTmax − ΔTmin) / (mean daily max − mean daily min of today's file)">
              Stretch α
            </th>
          )}
        </tr>
      </thead>
      <tbody>
        {factors.months.map((m, i) => (
          <tr key={MONTH_NAMES[i]} className="border-b border-rule/60">
            <th scope="row" className="py-0.5 text-left font-normal">
              {MONTH_NAMES[i]}
            </th>
            <td className="num px-2">{t(m.deltaMeanK)}</td>
            {stretch && <td className="num px-2">{t(m.deltaMaxK)}</td>}
            {stretch && <td className="num px-2">{t(m.deltaMinK)}</td>}
            <td className="num px-2">
              {humidityByStretch
                ? signed(m.humidityChangePct, 1)
                : signed(toDisplay('humidityRatio', unitSystem, m.humidityShiftGPerKg / 1000), unitSystem === 'SI' ? 2 : 1)}
            </td>
            {stretch && <td className="num px-2">{alphaByMonth[i].toFixed(3)}</td>}
          </tr>
        ))}
      </tbody>
    </table>
  );
}
