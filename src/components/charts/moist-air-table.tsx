import { useMemo, useState } from 'react';
import { modeKeys, modeLabels } from '../../../shared/modes';
import { formatCount, formatQuantity, unitOf } from '@/lib/quantity';
import type { UnitSystem } from '@/lib/unit-system';
import { hoursInside, modeCodeAt, type ChartHours, type ChartMarker, type EnvelopeLimitsInput, hourStates } from '../../lib/charts/moist-air-data';

/** The text alternative of the moist-air chart: ranges of every quantity, hours per envelope and mode, the markers. */
export function MoistAirTable({
  hours,
  envelopes,
  markers,
  pressurePa,
  system,
}: {
  hours: ChartHours;
  envelopes: Array<{ label: string; limits: EnvelopeLimitsInput }>;
  markers: ChartMarker[];
  pressurePa: number;
  system: UnitSystem;
}) {
  // Each hour's full state is computed only once the table is opened (a 30-year series is 262,800 wet-bulb solves).
  const [open, setOpen] = useState(false);
  const stats = useMemo(() => {
    if (!open) return null;
    const states = hourStates(hours, pressurePa);
    const range = (a: ArrayLike<number>) => {
      let min = Infinity;
      let max = -Infinity;
      let sum = 0;
      let n = 0;
      for (let i = 0; i < a.length; i++) {
        const v = a[i];
        if (v !== v) continue;
        if (v < min) min = v;
        if (v > max) max = v;
        sum += v;
        n++;
      }
      return n ? { min, max, mean: sum / n, n } : { min: NaN, max: NaN, mean: NaN, n };
    };
    const modeHours = [0, 0, 0, 0];
    if (hours.modes) for (let i = 0; i < hours.modes.length; i++) modeHours[modeCodeAt(hours.modes, i)]++;
    return {
      dryBulb: range(hours.dryBulbC),
      humidityRatio: range(states.humidityRatio),
      dewPoint: range(states.dewPointC),
      wetBulb: range(states.wetBulbC),
      enthalpy: range(states.enthalpyKJPerKg),
      inside: envelopes.map((e) => hoursInside(hours, pressurePa, e.limits)),
      modeHours,
    };
  }, [open, hours, pressurePa, envelopes]);
  const total = hours.dryBulbC.length;
  const summary = <summary className="cursor-pointer text-ink-soft">Table of the same figures</summary>;
  if (!stats) {
    return (
      <details className="text-sm" onToggle={(e) => setOpen(e.currentTarget.open)}>
        {summary}
      </details>
    );
  }
  const rows: Array<[string, 'temperature' | 'humidityRatio' | 'enthalpy', { min: number; mean: number; max: number }]> = [
    ['Dry-bulb', 'temperature', stats.dryBulb],
    ['Humidity ratio', 'humidityRatio', stats.humidityRatio],
    ['Dew point', 'temperature', stats.dewPoint],
    ['Wet-bulb', 'temperature', stats.wetBulb],
    ['Enthalpy', 'enthalpy', stats.enthalpy],
  ];
  const cell = 'px-2 py-0.5 text-right';
  return (
    <details className="text-sm" open onToggle={(e) => setOpen(e.currentTarget.open)}>
      {summary}
      <div className="mt-2 grid gap-4 lg:grid-cols-2">
        <table className="num w-full text-xs">
          <caption className="pb-1 text-left font-sans text-ink-soft">
            {formatCount(stats.dryBulb.n)} of {formatCount(total)} hours with data, at {formatQuantity('pressure', system, pressurePa)}
          </caption>
          <thead>
            <tr className="border-b border-rule font-sans text-ink-soft">
              <th scope="col" className="py-1 text-left font-medium">
                Quantity
              </th>
              <th scope="col" className={cell}>
                Min
              </th>
              <th scope="col" className={cell}>
                Mean
              </th>
              <th scope="col" className={cell}>
                Max
              </th>
            </tr>
          </thead>
          <tbody>
            {rows.map(([name, kind, s]) => (
              <tr key={name} className="border-b border-rule/60">
                <th scope="row" className="py-0.5 text-left font-sans font-normal">
                  {name} ({unitOf(kind, system)})
                </th>
                <td className={cell}>{formatQuantity(kind, system, s.min, false)}</td>
                <td className={cell}>{formatQuantity(kind, system, s.mean, false)}</td>
                <td className={cell}>{formatQuantity(kind, system, s.max, false)}</td>
              </tr>
            ))}
          </tbody>
        </table>
        {(envelopes.length > 0 || hours.modes || markers.length > 0) && (
          <table className="num w-full text-xs">
            <caption className="pb-1 text-left font-sans text-ink-soft">
              {[envelopes.length ? 'Hours inside each envelope' : '', hours.modes ? 'Hours per mode' : '', markers.length ? 'Marked states' : '']
                .filter(Boolean)
                .join(' · ')}
            </caption>
            <tbody>
              {envelopes.map((e, k) => (
                <tr key={`e${k}`} className="border-b border-rule/60">
                  <th scope="row" className="py-0.5 text-left font-sans font-normal">
                    Inside {e.label}
                  </th>
                  <td className={cell}>{formatCount(stats.inside[k].inside)} h</td>
                  <td className={cell}>{stats.inside[k].withData ? ((100 * stats.inside[k].inside) / stats.inside[k].withData).toFixed(1) : '–'} %</td>
                </tr>
              ))}
              {hours.modes &&
                modeKeys.map((key, code) => (
                  <tr key={key} className="border-b border-rule/60">
                    <th scope="row" className="py-0.5 text-left font-sans font-normal">
                      {modeLabels[key]}
                    </th>
                    <td className={cell}>{formatCount(stats.modeHours[code])} h</td>
                    <td className={cell}>{total ? ((100 * stats.modeHours[code]) / total).toFixed(1) : '–'} %</td>
                  </tr>
                ))}
              {markers.map((m) => (
                <tr key={m.label} className="border-b border-rule/60">
                  <th scope="row" className="py-0.5 text-left font-sans font-normal">
                    {m.label}
                  </th>
                  <td className={cell}>{formatQuantity('temperature', system, m.dryBulbC)}</td>
                  <td className={cell}>{formatQuantity('humidityRatio', system, m.humidityRatio)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        )}
      </div>
    </details>
  );
}
