import { Link } from 'react-router-dom';
import { downloadCsv } from '@/lib/download';
import { useUnitSystem } from '@/lib/unit-system';
import { csvRow } from '../../../../shared/csv';
import { ModeColumnHead, modeSpecKey } from '@/components/ui/mode-marks';
import { hoursOfSpec, hoursText, modeRowSpecs, subsetHours } from '../../../../shared/report/mode-subsets';
import type { SweepInputPath, SweepPoint, SweepRunStatus } from '../../../../shared/sweep';
import { formatSweepValue, sweepAxisTitle, sweepUnit } from '@/lib/sweep-value';
import { displayNumber } from '../lib/sweep-format';
import { formatMetric, metricTitle } from '@/lib/metric-text';
import { METRICS, metricUnit, metricValue, type MetricKey } from '../../../../shared/metrics';

const statusClass: Record<SweepRunStatus, string> = {
  queued: 'bg-mist text-ink-soft',
  running: 'bg-mist text-harbour',
  done: 'bg-[#e4efe8] text-signal-ok',
  failed: 'bg-[#fbeceb] text-signal-bad',
  cancelled: 'bg-paper text-ink-soft',
};

/** The mode columns (no-data hours left out), each followed by the hours that are part of it. */
const hourSpecs = modeRowSpecs.filter((spec) => spec.kind === 'subset' || spec.mode !== 'noData');

/** Every point with its run and results: the table beside the charts, and its CSV download in the person's units. */
export function SweepPointsTable({
  projectId,
  name,
  inputs,
  points,
}: {
  projectId: number;
  name: string;
  inputs: SweepInputPath[];
  points: readonly SweepPoint[];
}) {
  const { unitSystem } = useUnitSystem();
  // The download gives each figure in the metric list's unit and decimals, as the comparison and summary CSVs do.
  const csvUnit = (key: MetricKey) => metricUnit(METRICS[key], unitSystem).toLowerCase().replace(/\W+/g, '_');
  const csvValue = (key: MetricKey, si: number | null | undefined) => metricValue(METRICS[key], si, unitSystem);

  function download() {
    const head = csvRow([
      'point',
      ...inputs.map((p) => (sweepUnit(p, unitSystem) ? `${p} (${sweepUnit(p, unitSystem)})` : p)),
      'status',
      'free_h',
      'humidified_h',
      'adiabatic_h',
      'mechanical_h',
      'partial_mechanical_h',
      'no_data_h',
      'outside_envelope_h',
      'breaks_envelope',
      'partial_pue',
      `water_${csvUnit('waterTotal')}`,
      `water_humidification_${csvUnit('humidificationL')}`,
      `water_evaporative_cooling_${csvUnit('evaporativeCoolingL')}`,
      `peak_mechanical_load_${csvUnit('peak')}`,
      'run_id',
    ]);
    const rows = points.map((p, i) => {
      const r = p.results;
      return csvRow([
        i + 1,
        ...inputs.map((path) => {
          const v = p.values[path]!;
          return typeof v === 'number' ? Math.round(displayNumber(path, unitSystem, v) * 1e4) / 1e4 : v;
        }),
        p.status,
        r?.hours.free,
        r ? subsetHours(r.hours, 'humidified') : null,
        r?.hours.adiabatic,
        r?.hours.mechanical,
        r ? subsetHours(r.hours, 'partialMechanical') : null,
        r?.hours.noData,
        r?.excursionHours,
        r ? (r.breaksEnvelope ? 'yes' : 'no') : null,
        csvValue('ppue', r?.partialPue),
        csvValue('waterTotal', r?.waterL),
        csvValue('humidificationL', r?.humidificationL),
        csvValue('evaporativeCoolingL', r?.evaporativeCoolingL),
        csvValue('peak', r?.peakMechanicalLoadKw),
        p.runId,
      ]);
    });
    downloadCsv(`${name.replace(/[^\w.-]+/g, '-').slice(0, 80)}-${unitSystem.toLowerCase()}.csv`, [head, ...rows].join('\r\n') + '\r\n');
  }

  return (
    <div className="space-y-2">
      <div className="flex justify-end">
        <button type="button" onClick={download} className="rounded border border-rule px-2.5 py-1 text-xs hover:bg-mist">
          Download CSV ({unitSystem})
        </button>
      </div>
      <div className="overflow-x-auto">
        <table className="w-full text-right text-sm" data-testid="sweep-table">
          <thead>
            <tr className="border-b border-rule text-xs text-ink-soft">
              <th scope="col" className="py-1 text-left font-medium">
                Point
              </th>
              {inputs.map((p) => (
                <th key={p} scope="col" className="px-2 text-left font-medium">
                  {sweepAxisTitle(p, unitSystem)}
                </th>
              ))}
              <th scope="col" className="px-2 text-left font-medium">
                Status
              </th>
              {hourSpecs.map((spec) => (
                <ModeColumnHead key={modeSpecKey(spec)} spec={spec} className="px-2" />
              ))}
              <th scope="col" className="px-2 font-medium" title="Hours with data whose supply air lies outside the inlet envelope">
                {metricTitle(METRICS.excursions, unitSystem)}
              </th>
              {(['ppue', 'waterTotal', 'peak'] as const).map((key) => (
                <th key={key} scope="col" className="px-2 font-medium">
                  {metricTitle(METRICS[key], unitSystem)}
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {points.map((p, i) => (
              <tr
                key={p.runId}
                className={`border-b border-rule/60 ${p.results?.breaksEnvelope ? 'bg-[#fbeceb]/60' : ''}`}
                data-breaks-envelope={p.results?.breaksEnvelope ? 'yes' : undefined}
              >
                <td className="num py-1 text-left">
                  <Link to={`/projects/${projectId}/runs/${p.runId}`} className="text-harbour underline-offset-2 underline hover:decoration-2">
                    {i + 1} · run #{p.runId}
                  </Link>
                </td>
                {inputs.map((path) => (
                  <td key={path} className="num px-2 text-left">
                    {formatSweepValue(path, unitSystem, p.values[path]!)}
                  </td>
                ))}
                <td className="px-2 text-left">
                  <span className={`num rounded px-1.5 py-0.5 text-xs ${statusClass[p.status]}`} title={p.error ?? undefined}>
                    {p.status}
                  </span>
                  {p.results?.breaksEnvelope && (
                    <span
                      className="ml-1 rounded bg-[#fbeceb] px-1.5 py-0.5 text-xs text-signal-bad"
                      title="The supply setpoint is outside the derated inlet envelope: every hour is an excursion"
                    >
                      outside envelope
                    </span>
                  )}
                </td>
                {hourSpecs.map((spec) => (
                  <td key={modeSpecKey(spec)} className={`num px-2 ${spec.kind === 'subset' ? 'text-ink-soft' : ''}`}>
                    {p.results ? hoursText(hoursOfSpec(p.results.hours, spec)) : '–'}
                  </td>
                ))}
                <td className={`num px-2 ${p.results?.excursionHours ? 'text-signal-bad' : ''}`}>
                  {formatMetric('excursions', unitSystem, p.results?.excursionHours, { withUnit: false })}
                </td>
                <td className="num px-2">{formatMetric('ppue', unitSystem, p.results?.partialPue, { withUnit: false })}</td>
                <td className="num px-2">{formatMetric('waterTotal', unitSystem, p.results?.waterL, { withUnit: false })}</td>
                <td className="num px-2">{formatMetric('peak', unitSystem, p.results?.peakMechanicalLoadKw, { withUnit: false })}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}
