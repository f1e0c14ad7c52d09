// @ts-nocheck
import type { ClimateSummary } from '../../../../shared/climate-summary';
import { Panel } from '@/components/ui/panel';
import { formatQuantity, unitOf } from '@/lib/quantity';
import { useUnitSystem } from '@/lib/unit-system';
import { MONTH_SHORT } from '../../../../shared/calendar';

/** Monthly minimum, mean and maximum of dry-bulb and dew point over every year in the file. */
export function MonthlyTable({ summary }: { summary: ClimateSummary }) {
  const { unitSystem } = useUnitSystem();
  const t = (v: number) => formatQuantity('temperature', unitSystem, v, false);
  return (
    <Panel title={`Monthly dry-bulb and dew point (${unitOf('temperature', unitSystem)})`}>
      <div className="overflow-x-auto">
        <table className="num w-full text-right text-xs" data-testid="monthly-table">
          <caption className="pb-1 text-left font-sans text-ink-soft">Minimum, mean and maximum over every year in the file</caption>
          <thead>
            <tr className="font-sans text-ink-soft">
              <th rowSpan={2} scope="col" className="text-left font-medium">
                Month
              </th>
              <th colSpan={3} scope="colgroup" className="border-b border-rule px-2 font-medium">
                Dry-bulb
              </th>
              <th colSpan={3} scope="colgroup" className="border-b border-rule px-2 font-medium">
                Dew point
              </th>
              <th rowSpan={2} scope="col" className="px-2 font-medium">
                Hours
              </th>
            </tr>
            <tr className="border-b border-rule font-sans text-ink-faint">
              {['min', 'mean', 'max', 'min', 'mean', 'max'].map((h, k) => (
                <th key={k} scope="col" className="px-2 font-normal">
                  {h}
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {summary.monthly.dryBulbC.map((db, k) => {
              const dp = summary.monthly.dewPointC[k];
              return (
                <tr key={db.month} className="border-b border-rule/60">
                  <th scope="row" className="py-0.5 text-left font-sans font-normal">
                    {MONTH_SHORT[db.month - 1]}
                  </th>
                  <td className="px-2">{t(db.min)}</td>
                  <td className="px-2 font-semibold">{t(db.mean)}</td>
                  <td className="px-2">{t(db.max)}</td>
                  <td className="px-2">{t(dp.min)}</td>
                  <td className="px-2 font-semibold">{t(dp.mean)}</td>
                  <td className="px-2">{t(dp.max)}</td>
                  <td className="px-2 text-ink-soft">{db.hours.toLocaleString('en')}</td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
    </Panel>
  );
}
