// @ts-nocheck
import { Panel } from '@/components/ui/panel';
import { ModeShareBar, ModeSwatch } from '@/components/ui/mode-marks';
import { hoursOfMode, modeLabels } from '../../../../shared/modes';
import { countsSubsets, modeRowSpecs, NOT_COUNTED, notCountedNote, subsetHours } from '../../../../shared/report/mode-subsets';
import type { ScenarioResults } from '../../../../shared/scenario/run';

const pct = (part: number, whole: number) => (whole > 0 ? ((100 * part) / whole).toFixed(1) : '0.0');

/** Hours per mode, total and share (with the hours that are part of a mode indented under it), the longest runs and the envelope excursions. */
export function ModeHoursPanel({ results, engineVersion }: { results: ScenarioResults; engineVersion: string }) {
  const h = results.hours;
  const counted = countsSubsets(results);
  return (
    <Panel title="Hours per mode">
      <ModeShareBar hours={h} className="h-5" />
      <table className="mt-3 w-full text-sm" data-testid="mode-hours">
        <thead>
          <tr className="border-b border-rule text-xs text-ink-soft">
            <th scope="col" className="py-1 text-left font-medium">
              Mode
            </th>
            <th scope="col" className="py-1 text-right font-medium">
              Hours
            </th>
            <th scope="col" className="py-1 text-right font-medium">
              Share
            </th>
          </tr>
        </thead>
        <tbody>
          {modeRowSpecs.map((spec) => {
            if (spec.kind === 'mode') {
              const k = spec.mode;
              return (
                <tr key={k} className="border-b border-rule/60">
                  <th scope="row" className="py-1 text-left font-normal">
                    <ModeSwatch mode={k} />
                    {modeLabels[k]}
                  </th>
                  <td className="num py-1 text-right">{hoursOfMode(h, k).toLocaleString('en')}</td>
                  <td className="num py-1 text-right">{pct(hoursOfMode(h, k), h.total)} %</td>
                </tr>
              );
            }
            const n = subsetHours(h, spec.subset.key);
            return (
              <tr key={spec.subset.key} className="border-b border-rule/60 text-ink-soft" data-testid={`subset-${spec.subset.key}`}>
                <th scope="row" className="py-0.5 pl-5 text-left text-xs font-normal" title={spec.subset.description}>
                  {spec.subset.rowLabel}
                </th>
                <td className="num py-0.5 text-right text-xs">{n === null ? NOT_COUNTED : n.toLocaleString('en')}</td>
                <td className="num py-0.5 text-right text-xs">{n === null ? '' : `${pct(n, h.total)} %`}</td>
              </tr>
            );
          })}
          <tr>
            <th scope="row" className="py-1 text-left font-medium">
              All hours
            </th>
            <td className="num py-1 text-right font-medium">{h.total.toLocaleString('en')}</td>
            <td className="num py-1 text-right text-ink-soft">100.0 %</td>
          </tr>
        </tbody>
      </table>
      {!counted && (
        <p className="mt-1 text-xs text-ink-soft" data-testid="not-counted-note">
          {notCountedNote(engineVersion)}
        </p>
      )}
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
