import { engineNoteText } from '@/lib/engine-notes';
import { standardDay, utcOffsetLabel } from '../../../../shared/time-zone';
import { hallAirSystem } from '../../../../shared/scenario/hybrid';
import { MonthlyModeChart } from '@/components/charts/monthly-mode-chart';
import { Notice } from '@/components/ui/notice';
import { ResultCautions } from '@/components/ui/result-cautions';
import { formatQuantity } from '@/lib/quantity';
import { formatMetric } from '@/lib/metric-text';
import { METRICS } from '../../../../shared/metrics';
import { useUnitSystem } from '@/lib/unit-system';
import type { RunReportData } from '../../../../shared/report/report-data';
import { ClimateFacts, SiteFacts } from './climate-facts';
import { EnvelopeFacts } from './envelope-facts';
import { InputsTable } from './inputs-table';
import { LoopsSection } from './loops-section';
import { MethodSection, ModelLimits } from './method-section';
import { dateTime, hours, kw, ratio, share, systemInWords, usesWater } from '../lib/report-format';
import { ReportHourCharts } from './report-hour-charts';
import { ReportSection, ReportSheet, SubHeading } from './report-layout';
import { EnergyTable, ExcursionFacts, ModeHoursTable, MonthlyTable, WaterTable, YearTable } from './results-tables';
import { runDisplayName } from '@/lib/sweep-value';
import { subsetHours } from '../../../../shared/report/mode-subsets';

function Headline({ label, value, note }: { label: string; value: string; note?: string }) {
  return (
    <div className="rounded border border-rule px-3 py-2">
      <p className="text-xs text-ink-soft">{label}</p>
      <p className="num text-lg font-semibold">{value}</p>
      {note && <p className="text-xs text-ink-soft">{note}</p>}
    </div>
  );
}

/** "42.0 % · 310 h with humidification"; the share alone when the run's engine did not count the part. */
const withPart = (shareText: string, part: number | null, words: string) => (part === null ? shareText : `${shareText} · ${hours(part)} ${words}`);

/** The printable report of one run: what was asked, from what, what came out, how, and with which cautions. */
export function RunReportDocument({ report, linkTitle, downloadBase }: { report: RunReportData; linkTitle?: string; downloadBase?: string }) {
  const { unitSystem } = useUnitSystem();
  const run = report.run;
  const r = run.results;
  const h = r.hours;
  return (
    <ReportSheet>
      <header className="space-y-1 border-b-2 border-harbour pb-3">
        <p className="text-xs uppercase tracking-wider text-ink-soft">Tramontane · cooling-hours report{linkTitle ? ` · ${linkTitle}` : ''}</p>
        <h1 className="text-2xl font-semibold text-ink" data-testid="report-title">
          {runDisplayName(run.scenario.name, run.sweepPoint, unitSystem)}
        </h1>
        <p className="text-sm text-ink-soft">
          {report.projectName} · run {run.id} · {run.site.name} · {run.climate.name} · generated {dateTime(report.generatedAt)} · units {unitSystem}
        </p>
        <p className="text-xs text-ink-soft" data-testid="report-engine">
          Made by <span className="num">{run.engineVersion}</span>
        </p>
      </header>

      <ReportSection id="job" title="1. The job">
        <p className="text-sm leading-relaxed">
          From {standardDay(run.climate.firstHourMs, run.site.utcOffsetMinutes)} to {standardDay(run.climate.lastHourMs, run.site.utcOffsetMinutes)} (site
          standard time), for how many hours can the IT halls at {run.site.name}, cooled by {systemInWords(run)}, run on outside air or water alone (free
          cooling), with evaporative help (adiabatic assist), or only with compressors (mechanical), keeping the IT inlet within {run.envelope.label}; and what
          does that mean in energy, water and peak mechanical load?
        </p>
        <div className="grid grid-cols-3 gap-2 print:grid-cols-3" data-testid="report-headline">
          <Headline label="Free cooling" value={hours(h.free)} note={withPart(share(h.free, h.total), subsetHours(h, 'humidified'), 'with humidification')} />
          <Headline label="Adiabatic assist" value={hours(h.adiabatic)} note={share(h.adiabatic, h.total)} />
          <Headline
            label="Mechanical"
            value={hours(h.mechanical)}
            note={withPart(share(h.mechanical, h.total), subsetHours(h, 'partialMechanical'), 'partly economised')}
          />
          <Headline label={METRICS.ppue.label} value={ratio(r.energy.partialPue)} note="(IT + cooling) / IT energy" />
          <Headline label={METRICS.wue.label} value={formatMetric('wue', unitSystem, r.water.wueLPerKwh)} note="site water per IT energy" />
          <Headline label="Peak mechanical load" value={kw(r.peakMechanicalLoadKw)} note="thermal" />
        </div>
        {r.warnings.length > 0 && (
          <Notice tone="warn" title="Notes from the engine">
            <ul className="list-disc pl-5">
              {r.warnings.map((w) => (
                <li key={w}>{engineNoteText(w, unitSystem)}</li>
              ))}
            </ul>
          </Notice>
        )}
      </ReportSection>

      <ReportSection id="site" title="2. Site and climate file">
        <SiteFacts run={run} unitSystem={unitSystem} />
        <ClimateFacts run={run} />
      </ReportSection>

      <ReportSection id="envelope" title="3. Inlet envelope">
        <EnvelopeFacts run={run} unitSystem={unitSystem} />
      </ReportSection>

      <ReportSection id="inputs" title="4. Scenario inputs">
        <p className="text-xs text-ink-soft">
          Exactly as run, each with its field name in the scenario JSON beneath. The run uses the site's elevation (
          {formatQuantity('elevation', unitSystem, run.site.elevationM)}) in place of the scenario's elevationM.
        </p>
        <InputsTable runs={[run]} unitSystem={unitSystem} />
      </ReportSection>

      <ReportSection id="results" title="5. Results" newPage>
        <div className="grid gap-6 md:grid-cols-[20rem_1fr] print:grid-cols-[18rem_1fr]">
          <div className="space-y-3">
            <SubHeading>Hours per mode</SubHeading>
            <ModeHoursTable results={r} engineVersion={run.engineVersion} />
          </div>
          <div className="space-y-3">
            <SubHeading>Runs and excursions</SubHeading>
            <ExcursionFacts results={r} />
          </div>
        </div>
        <SubHeading>By month</SubHeading>
        {/* Drawn no wider than a printed page, so print does not shrink its lettering. */}
        <div className="max-w-[45rem]">
          <MonthlyModeChart byMonth={r.hoursByMonth} zoneLabel={utcOffsetLabel(run.site.utcOffsetMinutes)} withTable={false} />
        </div>
        <MonthlyTable byMonth={r.hoursByMonth} engineVersion={run.engineVersion} />
        <div className="keep-together space-y-2">
          <SubHeading>By year</SubHeading>
          <YearTable years={r.hoursByYear} unitSystem={unitSystem} engineVersion={run.engineVersion} />
        </div>
        <div className="keep-together space-y-2">
          <SubHeading>Energy</SubHeading>
          <EnergyTable results={r} system={run.scenario.system} />
        </div>
        <div className="keep-together space-y-2">
          <SubHeading>Water</SubHeading>
          <WaterTable results={r} unitSystem={unitSystem} engineVersion={run.engineVersion} />
        </div>
        <LoopsSection results={r} unitSystem={unitSystem} />
      </ReportSection>

      {downloadBase && (
        <ReportSection id="hours" title="6. The hours on the charts" newPage>
          <ReportHourCharts run={run} downloadBase={downloadBase} />
        </ReportSection>
      )}

      <ReportSection id="method" title={`${downloadBase ? 7 : 6}. Method and sources`} newPage>
        <MethodSection runs={[run]} />
      </ReportSection>

      <ReportSection id="cautions" title={`${downloadBase ? 8 : 7}. Cautions`}>
        <ResultCautions systemKind={hallAirSystem(run.scenario.system).kind} evaporative={usesWater(run)} hybrid={run.scenario.system.kind === 'hybrid'} />
        <ModelLimits />
      </ReportSection>
    </ReportSheet>
  );
}
