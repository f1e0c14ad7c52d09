import { MonthlyComparisonChart } from '@/components/charts/monthly-comparison-chart';
import { MONTH_SHORT as monthShort } from '../../../../shared/calendar';
import { ResultCautions } from '@/components/ui/result-cautions';
import { useUnitSystem } from '@/lib/unit-system';
import { modeLabels } from '../../../../shared/modes';
import type { ComparisonReportData, ReportRun } from '../../../../shared/report/report-data';
import { compareRuns } from '../../../../shared/report/comparison';
import { formatMetric } from '@/lib/metric-text';
import { ClimateFacts, SiteFacts } from './climate-facts';
import { EnvelopeFacts } from './envelope-facts';
import { InputsTable } from './inputs-table';
import { MethodSection, ModelLimits } from './method-section';
import { dateTime, systemInWords, usesWater } from '../lib/report-format';
import { standardPeriod } from '../../../../shared/time-zone';
import { hallAirSystem } from '../../../../shared/scenario/hybrid';
import { ReportSection, ReportSheet, ReportTable, SubHeading } from './report-layout';
import { ModeShareBar } from '@/components/ui/mode-marks';
import { runDisplayName } from '@/lib/sweep-value';
import { Notice } from '@/components/ui/notice';
import { countsSubsets, hoursOfSpec, hoursText, mixedEngineNote, modeRowSpecs, NOT_COUNTED, notCountedShort } from '../../../../shared/report/mode-subsets';

/** The monthly table's figures per run: each mode with its 'of which' counts, no-data hours left out. */
const monthlySpecs = modeRowSpecs.filter((spec) => spec.kind === 'subset' || spec.mode !== 'noData');

const verdictInk = { better: 'text-signal-ok', worse: 'text-signal-bad', same: 'text-ink-soft', none: 'text-ink-soft' };

const runLabel = (run: ReportRun, baselineId: number) => `Run ${run.id}${run.id === baselineId ? ' (baseline)' : ''}`;

/** The printable report of a comparison: the runs side by side against the baseline, with what each was run on. */
export function ComparisonReportDocument({ report, linkTitle }: { report: ComparisonReportData; linkTitle?: string }) {
  const { unitSystem } = useUnitSystem();
  const { runs, baselineId } = report;
  const rows = compareRuns(runs, baselineId);
  const mixedEngines = mixedEngineNote(runs);
  // Runs on the same file show its validation once.
  const files = runs.filter((run, i) => runs.findIndex((other) => other.climate.sha256 === run.climate.sha256 && other.site.name === run.site.name) === i);
  // Runs with the same envelope as applied (limits and site derating) show it once.
  const envelopeKey = (run: ReportRun) =>
    JSON.stringify([run.envelope.label, run.scenario.envelope, run.results.envelope, hallAirSystem(run.scenario.system).supplyAirC]);
  const envelopes = runs
    .filter((run, i) => runs.findIndex((other) => envelopeKey(other) === envelopeKey(run)) === i)
    .map((run) => ({ run, runIds: runs.filter((other) => envelopeKey(other) === envelopeKey(run)).map((r) => r.id) }));
  return (
    <ReportSheet>
      <header className="space-y-1 border-b-2 border-harbour pb-3">
        <p className="text-xs uppercase tracking-wider text-ink-soft">Tramontane · comparison report{linkTitle ? ` · ${linkTitle}` : ''}</p>
        <h1 className="text-2xl font-semibold text-ink" data-testid="report-title">
          {runs.length} runs compared against run {baselineId}
        </h1>
        <p className="text-sm text-ink-soft">
          {report.projectName} · generated {dateTime(report.generatedAt)} · units {unitSystem}
        </p>
      </header>
      {mixedEngines && (
        <Notice tone="warn" title="Different engine versions">
          <span data-testid="report-mixed-engines">{mixedEngines}</span>
        </Notice>
      )}

      <ReportSection id="job" title="1. The job">
        <p className="text-sm leading-relaxed">
          How do these cooling designs compare in hours of free cooling, adiabatic assist and mechanical cooling, and in energy, water and peak mechanical load,
          against the baseline run {baselineId}?
        </p>
        <ReportTable
          text
          testId="report-runs"
          head={['Run', 'Scenario', 'Cooling design', 'Site · climate file', 'Envelope', 'Engine']}
          rows={runs.map((run) => ({
            key: String(run.id),
            cells: [
              runLabel(run, baselineId),
              runDisplayName(run.scenario.name, run.sweepPoint, unitSystem),
              <span className="text-xs">{systemInWords(run)}</span>,
              <span className="text-xs">
                {run.site.name} · {run.climate.name} ({standardPeriod(run.climate.firstHourMs, run.climate.lastHourMs, run.site.utcOffsetMinutes)})
              </span>,
              <span className="text-xs">{run.envelope.label}</span>,
              <span className="num text-xs">{run.engineVersion}</span>,
            ],
          }))}
        />
      </ReportSection>

      <ReportSection id="compared" title="2. Side by side">
        <table className="w-full text-sm" data-testid="report-comparison">
          <thead>
            <tr className="border-b border-rule align-bottom text-xs text-ink-soft">
              <th scope="col" className="py-1 pr-2 text-left font-medium">
                Figure
              </th>
              {runs.map((run) => (
                <th key={run.id} scope="col" className="px-2 py-1 text-right font-medium">
                  <span className="block text-ink">{runLabel(run, baselineId)}</span>
                  <span className="block font-normal">{runDisplayName(run.scenario.name, run.sweepPoint, unitSystem)}</span>
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            <tr className="border-b border-rule/60">
              <th scope="row" className="py-1 pr-2 text-left font-normal">
                Share of hours
              </th>
              {runs.map((run) => (
                <td key={run.id} className="px-2 py-1">
                  <ModeShareBar hours={run.results.hours} />
                </td>
              ))}
            </tr>
            {rows.map(({ metric, cells }) => (
              <tr key={metric.key} className={`border-b border-rule/60 ${metric.part ? 'text-xs text-ink-soft' : ''}`}>
                <th scope="row" className={`py-0.5 pr-2 text-left font-normal ${metric.part ? 'pl-5' : ''}`}>
                  {metric.label}
                </th>
                {cells.map((cell) => (
                  <td key={cell.runId} className="num whitespace-nowrap px-2 py-0.5 text-right">
                    {cell.value === null && metric.notInOldRuns ? NOT_COUNTED : formatMetric(metric, unitSystem, cell.value)}
                    {cell.difference !== null && (
                      <span className={`ml-2 inline-block min-w-24 text-xs ${verdictInk[cell.verdict]}`}>
                        {formatMetric(metric, unitSystem, cell.difference, { signed: true })}
                      </span>
                    )}
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
        {runs
          .filter((run) => !countsSubsets(run.results))
          .map((run) => (
            <p key={run.id} className="text-xs text-ink-soft">
              Run {run.id}: {notCountedShort(run.engineVersion)}
            </p>
          ))}
        <p className="text-xs text-ink-soft">
          Differences are against the baseline; green where the figure improves, red where it worsens. Energy and water are scaled to 8,760 hours of data so
          files of different lengths compare.
        </p>
      </ReportSection>

      <ReportSection id="monthly" title="3. By month" newPage>
        <div className="max-w-[45rem]">
          <MonthlyComparisonChart series={runs.map((run) => ({ runId: run.id, hoursByMonth: run.results.hoursByMonth }))} withTable={false} />
        </div>
        <ReportTable
          testId="report-monthly-comparison"
          caption={`Hours per month: ${monthlySpecs.map((spec) => (spec.kind === 'mode' ? modeLabels[spec.mode].toLowerCase() : spec.subset.columnLabel)).join(' / ')}`}
          head={['Month', ...runs.map((run) => `Run ${run.id}`)]}
          rows={monthShort.map((name, i) => ({
            key: name,
            cells: [
              name,
              ...runs.map((run) => {
                const m = run.results.hoursByMonth.find((row) => row.month === i + 1);
                return m ? monthlySpecs.map((spec) => hoursText(hoursOfSpec(m, spec))).join(' / ') : '–';
              }),
            ],
          }))}
        />
      </ReportSection>

      <ReportSection id="sites" title="4. Sites and climate files">
        {files.map((run) => (
          <div key={run.id} className="space-y-2">
            <SubHeading>
              {run.site.name} · {run.climate.name} (runs{' '}
              {runs
                .filter((r) => r.climate.sha256 === run.climate.sha256 && r.site.name === run.site.name)
                .map((r) => r.id)
                .join(', ')}
              )
            </SubHeading>
            <SiteFacts run={run} unitSystem={unitSystem} />
            <ClimateFacts run={run} />
          </div>
        ))}
      </ReportSection>

      <ReportSection id="envelopes" title="5. Inlet envelopes">
        {envelopes.map(({ run, runIds }) => (
          <div key={run.id} className="keep-together space-y-1">
            <SubHeading>{runIds.length === 1 ? runLabel(run, baselineId) : `Runs ${runIds.join(', ')}`}</SubHeading>
            <EnvelopeFacts run={run} unitSystem={unitSystem} />
          </div>
        ))}
      </ReportSection>

      <ReportSection id="inputs" title="6. Scenario inputs" newPage>
        <p className="text-xs text-ink-soft">Exactly as run, each with its field name in the scenario JSON beneath; rows where the runs differ are marked.</p>
        <InputsTable runs={runs} unitSystem={unitSystem} />
      </ReportSection>

      <ReportSection id="method" title="7. Method and sources" newPage>
        <MethodSection runs={runs} />
      </ReportSection>

      <ReportSection id="cautions" title="8. Cautions">
        <ResultCautions
          systemKind={runs.some((r) => hallAirSystem(r.scenario.system).kind === 'direct-air') ? 'direct-air' : hallAirSystem(runs[0].scenario.system).kind}
          evaporative={runs.some(usesWater)}
          hybrid={runs.some((r) => r.scenario.system.kind === 'hybrid')}
        />
        <ModelLimits />
      </ReportSection>
    </ReportSheet>
  );
}
