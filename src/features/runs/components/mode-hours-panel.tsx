import { Panel } from '@/components/ui/panel';
import { modeColours, modeKeys, modeLabels } from '../../../../shared/modes';
import type { ScenarioResults } from '../../../../shared/scenario/run';

const field = { free: 'free', adiabatic: 'adiabatic', mechanical: 'mechanical', no_data: 'noData' } as const;

const pct = (part: number, whole: number) => (whole > 0 ? ((100 * part) / whole).toFixed(1) : '0.0');

/** Hours per mode, total and share, with the longest runs and the envelope excursions. */
export function ModeHoursPanel({ results }: { results: ScenarioResults }) {
  const h = results.hours;
  return (
    <Panel title="Hours per mode">
      <div className="flex h-5 overflow-hidden rounded-sm" aria-hidden>
        {modeKeys.map((k) => (h[field[k]] > 0 ? <div key={k} style={{ width: `${(100 * h[field[k]]) / h.total}%`, background: modeColours[k] }} /> : null))}
      </div>
      <table className="mt-3 w-full text-sm" data-testid="mode-hours">
        <thead>
          <tr className="border-b border-rule text-xs text-ink-soft">
            <th scope="col" className="py-1 text-left font-medium">Mode</th>
            <th scope="col" className="py-1 text-right font-medium">Hours</th>
            <th scope="col" className="py-1 text-right font-medium">Share</th>
          </tr>
        </thead>
        <tbody>
          {modeKeys.map((k) => (
            <tr key={k} className="border-b border-rule/60">
              <th scope="row" className="py-1 text-left font-normal">
                <span className="mr-2 inline-block size-3 rounded-sm align-middle" style={{ background: modeColours[k] }} aria-hidden />
                {modeLabels[k]}
              </th>
              <td className="num py-1 text-right">{h[field[k]].toLocaleString('en')}</td>
              <td className="num py-1 text-right">{pct(h[field[k]], h.total)} %</td>
            </tr>
          ))}
          <tr>
            <th scope="row" className="py-1 text-left font-medium">All hours</th>
            <td className="num py-1 text-right font-medium">{h.total.toLocaleString('en')}</td>
            <td className="num py-1 text-right text-ink-soft">100.0 %</td>
          </tr>
        </tbody>
      </table>
      <dl className="mt-3 grid grid-cols-[1fr_auto] gap-x-4 gap-y-0.5 text-xs">
        <dt className="text-ink-soft">Longest run of mechanical hours</dt>
        <dd className="num text-right">{results.longestMechanicalRunHours.toLocaleString('en')} h</dd>
        <dt className="text-ink-soft">Hours outside the envelope</dt>
        <dd className="num text-right">{results.excursions.hours.toLocaleString('en')} h</dd>
        {results.excursions.lowHumidityHours > 0 && (
          <>
            <dt className="text-ink-soft">of which too dry (no humidification)</dt>
            <dd className="num text-right">{results.excursions.lowHumidityHours.toLocaleString('en')} h</dd>
          </>
        )}
        <dt className="text-ink-soft">Longest excursion</dt>
        <dd className="num text-right">{results.excursions.longestRunHours.toLocaleString('en')} h</dd>
      </dl>
    </Panel>
  );
}
