import { formatQuantity } from '@/lib/quantity';
import { useUnitSystem } from '@/lib/unit-system';
import { modeColours, modeKeys, modeLabels } from '../../../../shared/modes';
import type { YearResults } from '../../../../shared/scenario/results';
import { hoursOfMode } from '../utils/monthly-hours';

/** Hours, cooling energy and water for each calendar year of a multi-year file: how much the answer moves year to year. */
export function YearTable({ years }: { years: YearResults[] }) {
  const { unitSystem } = useUnitSystem();
  return (
    <div className="overflow-x-auto">
      <table className="num w-full text-right text-xs" data-testid="year-table">
        <thead>
          <tr className="border-b border-rule text-ink-soft">
            <th scope="col" className="py-1 text-left font-sans font-medium">Year</th>
            {modeKeys.map((k) => (
              <th key={k} scope="col" className="px-2 py-1 font-sans font-medium">
                <span className="mr-1 inline-block size-2.5 rounded-sm" style={{ background: modeColours[k] }} aria-hidden />
                {modeLabels[k]} (h)
              </th>
            ))}
            <th scope="col" className="px-2 py-1 font-sans font-medium">Cooling energy (MWh)</th>
            <th scope="col" className="px-2 py-1 font-sans font-medium">Water</th>
          </tr>
        </thead>
        <tbody>
          {years.map((y) => (
            <tr key={y.year} className="border-b border-rule/60">
              <th scope="row" className="py-0.5 text-left font-normal">{y.year}</th>
              {modeKeys.map((k) => (
                <td key={k} className="px-2 py-0.5">{hoursOfMode(y, k).toLocaleString('en')}</td>
              ))}
              <td className="px-2 py-0.5">{(y.coolingKwh / 1000).toLocaleString('en', { minimumFractionDigits: 1, maximumFractionDigits: 1 })}</td>
              <td className="px-2 py-0.5">{formatQuantity('water', unitSystem, y.waterL)}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
