// @ts-nocheck
import { formatQuantity } from '@/lib/quantity';
import type { UnitSystem } from '@/lib/unit-system';
import type { ReportRun } from '../../../../shared/report/report-data';
import { Facts } from './report-layout';

/** The inlet envelope, its source and edition, and the limits as applied at the site. */
export function EnvelopeFacts({ run, unitSystem }: { run: ReportRun; unitSystem: UnitSystem }) {
  const e = run.scenario.envelope;
  const applied = run.results.envelope;
  const t = (c: number) => formatQuantity('temperature', unitSystem, c);
  const derated = applied.dryBulbMaxC < e.dryBulbMaxC - 1e-9;
  return (
    <div className="space-y-2">
      <Facts
        testId="report-envelope"
        items={[
          ['Envelope', run.envelope.label],
          ['Source', run.envelope.edition ?? 'a custom envelope of this project'],
          // The preset's own note repeats the limits in SI; the report states them below in the reader's units.
          ...(run.envelope.recalledFromMemory
            ? ([['Note', 'Limits and derating recalled from memory, not checked against the guideline text.']] as Array<[string, string]>)
            : []),
          [
            'Dry-bulb',
            <span className="num">
              {t(e.dryBulbMinC)} to {t(e.dryBulbMaxC)}
            </span>,
          ],
          ...(derated
            ? ([['Highest dry-bulb at the site', <span className="num">{t(applied.dryBulbMaxC)} (derated for altitude)</span>]] as Array<
                [string, React.ReactNode]
              >)
            : []),
          [
            'Dew point',
            <span className="num">
              {t(e.dewPointMinC)} to {t(e.dewPointMaxC)}
            </span>,
          ],
          [
            'Relative humidity',
            <span className="num">
              {e.rhMinPct} % to {e.rhMaxPct} %
            </span>,
          ],
          [
            'Supply moisture limits',
            <span className="num">
              {formatQuantity('humidityRatio', unitSystem, applied.lowHumidityRatioGPerKg / 1000)} to{' '}
              {formatQuantity('humidityRatio', unitSystem, applied.highHumidityRatioGPerKg / 1000)} at the supply setpoint
            </span>,
          ],
        ]}
      />
    </div>
  );
}
