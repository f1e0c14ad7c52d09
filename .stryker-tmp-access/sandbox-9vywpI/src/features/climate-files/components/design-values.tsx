// @ts-nocheck
import type { DesignConditions } from '../../../../shared/climate-summary';
import { Panel } from '@/components/ui/panel';
import { formatQuantity, unitOf } from '@/lib/quantity';
import { useUnitSystem } from '@/lib/unit-system';

/** Design conditions from this file by the cumulative-frequency method, labelled as such. */
export function DesignValues({ design }: { design: DesignConditions }) {
  const { unitSystem } = useUnitSystem();
  const t = (v: number) => formatQuantity('temperature', unitSystem, v, false);
  const cell = 'px-2 py-0.5';
  return (
    <Panel title={`Design values (${unitOf('temperature', unitSystem)})`}>
      <p className="mb-2 rounded border border-signal-warn/40 bg-[#fbf3e4] px-3 py-1.5 text-xs" data-testid="design-label">
        Computed from this file, not published station values. Cumulative-frequency method (ASHRAE Handbook—Fundamentals ch. 14) over the{' '}
        <span className="num">{design.hoursUsed.toLocaleString('en')}</span> hours with data; coincident means over hours within ±{design.coincidenceBandK} K.
      </p>
      <table className="num w-full text-right text-xs">
        <thead>
          <tr className="border-b border-rule font-sans text-ink-soft">
            <th scope="col" className="text-left font-medium">
              Exceeded
            </th>
            <th scope="col" className={cell}>
              Dry-bulb
            </th>
            <th scope="col" className={cell}>
              mean coinc. wet-bulb
            </th>
            <th scope="col" className={cell}>
              Wet-bulb
            </th>
            <th scope="col" className={cell}>
              mean coinc. dry-bulb
            </th>
          </tr>
        </thead>
        <tbody>
          {design.dryBulb.map((db, k) => {
            const wb = design.wetBulb[k];
            return (
              <tr key={db.exceedPct} className="border-b border-rule/60">
                <th scope="row" className="py-0.5 text-left font-sans font-normal">
                  {db.exceedPct} % of hours
                </th>
                <td className={`${cell} font-semibold`}>{t(db.valueC)}</td>
                <td className={cell}>{t(db.meanCoincidentC)}</td>
                <td className={`${cell} font-semibold`}>{wb ? t(wb.valueC) : '–'}</td>
                <td className={cell}>{wb ? t(wb.meanCoincidentC) : '–'}</td>
              </tr>
            );
          })}
        </tbody>
      </table>
      {design.dewPoint && (
        <p className="mt-3 text-sm">
          Dew point exceeded {design.dewPoint.exceedPct} % of hours:{' '}
          <span className="num font-semibold">{formatQuantity('temperature', unitSystem, design.dewPoint.valueC)}</span>, humidity ratio{' '}
          <span className="num font-semibold">{formatQuantity('humidityRatio', unitSystem, design.dewPoint.humidityRatioKgPerKg)}</span>, mean coincident
          dry-bulb <span className="num">{formatQuantity('temperature', unitSystem, design.dewPoint.meanCoincidentDryBulbC)}</span>.
        </p>
      )}
    </Panel>
  );
}
