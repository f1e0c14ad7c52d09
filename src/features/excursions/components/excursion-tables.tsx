import { formatQuantity, unitOf } from '@/lib/quantity';
import { useUnitSystem } from '@/lib/unit-system';
import type { ChosenEnvelope } from '../../../../shared/excursions/proposal-query';
import type { ExcursionsResponse } from '../api/get-excursions';
import { hoursText } from '../lib/excursion-format';

const binLabel = (b: { fromHours: number; toHours: number | null }) =>
  b.toHours === null ? `${b.fromHours} h or longer` : b.fromHours === b.toHours ? `${b.fromHours} h` : `${b.fromHours}–${b.toHours} h`;

/** Event durations as a table whose bars are the chart: readable as text, printable as it is. */
export function EventHistogram({ data }: { data: ExcursionsResponse }) {
  const counts = data.analysis.events.histogram;
  const most = Math.max(1, ...counts);
  if (data.analysis.events.count === 0)
    return <p className="text-sm text-ink-soft">No excursion events: every hour with data is inside the recommended range.</p>;
  return (
    <table className="w-full text-xs" data-testid="event-histogram">
      <caption className="sr-only">Number of excursion events by how long they lasted</caption>
      <thead>
        <tr className="border-b border-rule text-ink-soft">
          <th scope="col" className="w-36 py-1 text-left font-medium">
            Event lasted
          </th>
          <th scope="col" className="w-16 px-2 py-1 text-right font-medium">
            Events
          </th>
          <th scope="col" className="px-2 py-1 text-left font-medium">
            <span className="sr-only">Bar</span>
          </th>
        </tr>
      </thead>
      <tbody>
        {data.reference.durationBins.map((bin, i) => (
          <tr key={bin.fromHours} className="border-b border-rule/60">
            <th scope="row" className="py-0.5 text-left font-normal">
              {binLabel(bin)}
            </th>
            <td className="num px-2 py-0.5 text-right">{hoursText(counts[i])}</td>
            <td className="px-2 py-0.5">
              {counts[i] > 0 && (
                <div className="h-3 rounded-sm bg-harbour print:border print:border-ink" style={{ width: `${(100 * counts[i]) / most}%` }} aria-hidden />
              )}
            </td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}

/** The three envelopes as applied: dry-bulb maxima derated for the site's elevation, with their editions. */
export function EnvelopesApplied({ data }: { data: ExcursionsResponse }) {
  const { unitSystem } = useUnitSystem();
  const t = (c: number) => formatQuantity('temperature', unitSystem, c, false);
  const { applied } = data.analysis;
  const rows: [string, ChosenEnvelope, typeof applied.control][] = [
    ['Controls work to', data.proposal.control, applied.control],
    ['Recommended range', data.proposal.recommended, applied.recommended],
    ['Allowable class', data.proposal.allowable, applied.allowable],
  ];
  return (
    <div className="overflow-x-auto">
      <table className="w-full text-xs" data-testid="envelopes-applied">
        <thead>
          <tr className="border-b border-rule text-left text-ink-soft">
            <th scope="col" className="py-1 font-medium">
              Role
            </th>
            <th scope="col" className="px-2 py-1 font-medium">
              Envelope
            </th>
            <th scope="col" className="px-2 py-1 text-right font-medium">
              Dry-bulb ({unitOf('temperature', unitSystem)})
            </th>
            <th scope="col" className="px-2 py-1 text-right font-medium">
              Dew point ({unitOf('temperature', unitSystem)})
            </th>
            <th scope="col" className="px-2 py-1 text-right font-medium">
              RH (%)
            </th>
            <th scope="col" className="px-2 py-1 font-medium">
              Source
            </th>
          </tr>
        </thead>
        <tbody>
          {rows.map(([role, chosen, b]) => (
            <tr key={role} className="border-b border-rule/60 align-top">
              <th scope="row" className="py-0.5 text-left font-normal">
                {role}
              </th>
              <td className="px-2 py-0.5">{chosen.label}</td>
              <td className="num px-2 py-0.5 text-right">
                {t(b.dryBulbMinC)}–{t(b.dryBulbMaxC)}
                {b.dryBulbMaxC < chosen.limits.dryBulbMaxC && (
                  <span className="block text-[11px] text-ink-soft">max derated from {t(chosen.limits.dryBulbMaxC)}</span>
                )}
              </td>
              <td className="num px-2 py-0.5 text-right">
                {t(b.dewPointMinC)}–{t(b.dewPointMaxC)}
              </td>
              <td className="num px-2 py-0.5 text-right">
                {b.rhMinPct}–{b.rhMaxPct}
              </td>
              <td className="px-2 py-0.5 text-ink-soft">
                {chosen.edition ?? 'as stored with the run'}
                {chosen.recalledFromMemory && <span className="block">Limits recalled from memory, not checked against the guideline text.</span>}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

/** The X-factor table the weighting uses, with its source and the fact that it is recalled. */
export function XFactorTable({ data }: { data: ExcursionsResponse }) {
  const { unitSystem } = useUnitSystem();
  const table = data.reference.xFactorTable;
  return (
    <div className="space-y-2">
      <div className="overflow-x-auto">
        <table className="num w-full text-right text-xs" data-testid="x-factor-table">
          <tbody>
            <tr className="border-b border-rule">
              <th scope="row" className="py-1 pr-3 text-left font-sans font-medium text-ink-soft">
                Inlet dry-bulb
              </th>
              {table.map((p) => (
                <td key={p.dryBulbC} className="px-1.5 py-1">
                  {formatQuantity('temperature', unitSystem, p.dryBulbC)}
                </td>
              ))}
            </tr>
            <tr>
              <th scope="row" className="py-1 pr-3 text-left font-sans font-medium text-ink-soft">
                X-factor
              </th>
              {table.map((p) => (
                <td key={p.dryBulbC} className={`px-1.5 py-1 ${p.xFactor === 1 ? 'font-semibold' : ''}`}>
                  {p.xFactor.toFixed(2)}
                </td>
              ))}
            </tr>
          </tbody>
        </table>
      </div>
      <p className="text-xs text-ink-soft">
        Source: ASHRAE TC 9.9 (2011), "Thermal Guidelines for Data Processing Environments – Expanded Data Center Classes and Usage Guidance" (white paper),
        relative failure rate of volume servers against inlet dry-bulb, average values. <strong className="text-ink">Recalled from memory</strong>, not checked
        against the paper. Linear between the points; held at the end values below {formatQuantity('temperature', unitSystem, table[0].dryBulbC)} and above{' '}
        {formatQuantity('temperature', unitSystem, table[table.length - 1].dryBulbC)}. The time-weighted X-factor is the mean of the hourly values over the
        hours with data; below 1.00 means fewer failures than a hall held at 20 °C all year.
      </p>
    </div>
  );
}
