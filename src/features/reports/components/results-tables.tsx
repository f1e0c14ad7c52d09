import { formatMetric } from '@/lib/metric-text';
import { METRICS } from '../../../../shared/metrics';
import type { UnitSystem } from '@/lib/unit-system';
import { MONTH_SHORT as monthShort } from '../../../../shared/calendar';
import { ModeShareBar, ModeSwatch, modeSpecKey } from '@/components/ui/mode-marks';
import { modeLabels } from '../../../../shared/modes';
import {
  countsSubsets,
  hoursOfSpec,
  hoursText,
  modeColumnLabel,
  modeRowSpecs,
  notCountedNote,
  notCountedShort,
  waterPartL,
  waterPartsShown,
  NOT_COUNTED,
} from '../../../../shared/report/mode-subsets';
import type { ModeHours, YearResults } from '../../../../shared/scenario/results';
import type { ScenarioResults } from '../../../../shared/scenario/run';
import type { ScenarioSystem } from '../../../../shared/scenario/schema';
import { fanGroups } from '../../../../shared/report/fan-groups';
import { PARTIAL_YEAR_MARK, partialYearsSentence, yearStatistics } from '../../../../shared/scenario/year-statistics';
import { hours, kw, mwh, ratio, share } from '../lib/report-format';
import { Facts, ReportTable } from './report-layout';

export function ModeHoursTable({ results, engineVersion }: { results: ScenarioResults; engineVersion: string }) {
  const h = results.hours;
  return (
    <div className="keep-together space-y-2">
      <ModeShareBar hours={h} />
      <ReportTable
        testId="report-mode-hours"
        head={['Mode', 'Hours', 'Share']}
        rows={[
          ...modeRowSpecs.map((spec) => {
            const n = hoursOfSpec(h, spec);
            if (spec.kind === 'mode')
              return {
                key: spec.mode,
                cells: [
                  <>
                    <ModeSwatch mode={spec.mode} />
                    {modeLabels[spec.mode]}
                  </>,
                  hoursText(n),
                  share(n ?? 0, h.total),
                ],
              };
            return {
              key: spec.subset.key,
              cells: [
                <span className="whitespace-nowrap pl-5 text-xs text-ink-soft">{spec.subset.rowLabel}</span>,
                <span className="text-xs text-ink-soft">{hoursText(n)}</span>,
                <span className="text-xs text-ink-soft">{n === null ? '' : share(n, h.total)}</span>,
              ],
            };
          }),
          { key: 'all', strong: true, cells: ['All hours', h.total.toLocaleString('en'), '100.0 %'] },
        ]}
      />
      {!countsSubsets(results) && (
        <p className="text-xs text-ink-soft" data-testid="report-not-counted">
          {notCountedNote(engineVersion)}
        </p>
      )}
    </div>
  );
}

export function ExcursionFacts({ results }: { results: ScenarioResults }) {
  const x = results.excursions;
  return (
    <Facts
      items={[
        ['Longest run of mechanical hours', <span className="num">{hours(results.longestMechanicalRunHours)}</span>],
        ['Hours outside the envelope', <span className="num">{hours(x.hours)}</span>],
        ['of which too dry (no humidification)', <span className="num">{hours(x.lowHumidityHours)}</span>],
        ['Longest excursion', <span className="num">{hours(x.longestRunHours)}</span>],
      ]}
    />
  );
}

export function MonthlyTable({ byMonth, engineVersion }: { byMonth: (ModeHours & { month: number })[]; engineVersion: string }) {
  return (
    <div className="space-y-1">
      <ReportTable
        testId="report-monthly"
        caption="Hours per mode for each calendar month"
        head={[
          'Month',
          ...modeRowSpecs.map((spec) => (
            <span key={modeSpecKey(spec)} className={spec.kind === 'subset' ? 'italic' : ''}>
              {modeColumnLabel(spec, modeLabels)}
            </span>
          )),
          'All (h)',
        ]}
        rows={byMonth.map((m) => ({
          key: String(m.month),
          cells: [monthShort[m.month - 1], ...modeRowSpecs.map((spec) => hoursText(hoursOfSpec(m, spec))), m.total.toLocaleString('en')],
        }))}
      />
      {byMonth.length > 0 && !countsSubsets({ hours: byMonth[0] }) && <p className="text-xs text-ink-soft">{notCountedShort(engineVersion)}</p>}
    </div>
  );
}

/** Each calendar year on the site's standard time; a partial year is marked and named as on the run page. */
export function YearTable({ years, unitSystem, engineVersion }: { years: YearResults[]; unitSystem: UnitSystem; engineVersion: string }) {
  const { partialYears } = yearStatistics(years);
  const partial = new Set(partialYears.map((p) => p.year));
  const note = partialYearsSentence(partialYears);
  return (
    <div className="space-y-1">
      <ReportTable
        testId="report-years"
        caption="Hours, cooling energy and water for each calendar year (site standard time)"
        head={[
          'Year',
          ...modeRowSpecs.map((spec) => (
            <span key={modeSpecKey(spec)} className={spec.kind === 'subset' ? 'italic' : ''}>
              {modeColumnLabel(spec, modeLabels)}
            </span>
          )),
          METRICS.cooling.label,
          METRICS.waterTotal.label,
        ]}
        rows={years.map((y) => ({
          key: String(y.year),
          cells: [
            <>
              {y.year}
              {partial.has(y.year) && <span className="ml-1.5 rounded bg-mist px-1 text-[11px]">{PARTIAL_YEAR_MARK}</span>}
            </>,
            ...modeRowSpecs.map((spec) => hoursText(hoursOfSpec(y, spec))),
            mwh(y.coolingKwh),
            formatMetric('waterTotal', unitSystem, y.waterL),
          ],
        }))}
      />
      {years.length > 0 && !countsSubsets({ hours: years[0] }) && <p className="text-xs text-ink-soft">{notCountedShort(engineVersion)}</p>}
      {note && (
        <p className="text-xs text-ink-soft" data-testid="report-partial-years">
          {note}
        </p>
      )}
    </div>
  );
}

export function EnergyTable({ results, system }: { results: ScenarioResults; system: ScenarioSystem }) {
  const e = results.energy;
  const a = e.annual;
  const row = (key: string, label: string, kwh: number, annual: number | undefined, strong = false) => ({
    key,
    strong,
    cells: [label, mwh(kwh), mwh(annual), e.coolingKwh > 0 && key !== 'it' && key !== 'cooling' ? share(kwh, e.coolingKwh) : ''],
  });
  return (
    <div className="space-y-3">
      <ReportTable
        testId="report-energy"
        caption="Energy over the hours with data, and scaled to 8,760 hours"
        head={['Component', 'Over the file', 'Per 8,760 h', 'Share of cooling']}
        rows={[
          ...fanGroups(e, system).map((g) => row(g.key, g.label, g.kwh, g.annualKwh ?? undefined)),
          row('compressors', METRICS.compressor.label, e.compressorKwh, a?.compressorKwh),
          row('pumps', METRICS.pumps.label, e.pumpKwh, a?.pumpKwh),
          ...(typeof e.basinHeaterKwh === 'number' && e.basinHeaterKwh > 0
            ? [row('basin', METRICS.basinHeaters.label, e.basinHeaterKwh, a?.basinHeaterKwh)]
            : []),
          row('cooling', METRICS.cooling.label, e.coolingKwh, a?.coolingKwh, true),
          row('it', METRICS.it.label, e.itKwh, a?.itKwh),
        ]}
      />
      <Facts
        items={[
          [
            METRICS.ppue.label,
            <span className="num" data-testid="report-ppue">
              {ratio(e.partialPue)}
            </span>,
          ],
          [METRICS.peak.label, <span className="num">{kw(results.peakMechanicalLoadKw)} thermal</span>],
          [METRICS.peakCompressor.label, <span className="num">{kw(results.peakCompressorKw)} electric</span>],
        ]}
      />
    </div>
  );
}

export function WaterTable({ results, unitSystem, engineVersion }: { results: ScenarioResults; unitSystem: UnitSystem; engineVersion: string }) {
  const w = results.water;
  const water = (l: number | null) => formatMetric('waterTotal', unitSystem, l);
  const counted = countsSubsets(results);
  const parts = waterPartsShown(w, counted);
  const part = (key: (typeof parts)[number]['key']) => {
    const litres = waterPartL(w, key);
    return litres === null ? NOT_COUNTED : water(litres);
  };
  return (
    <div className="space-y-3">
      <ReportTable
        testId="report-water"
        head={['Water', 'Over the file']}
        rows={[
          { key: 'evaporated', cells: [METRICS.evaporated.label, water(w.evaporatedL)] },
          ...parts
            .filter((p) => p.ofEvaporated)
            .map((p) => ({
              key: p.key,
              cells: [<span className="pl-5 text-xs text-ink-soft">{p.rowLabel}</span>, <span className="text-xs text-ink-soft">{part(p.key)}</span>],
            })),
          { key: 'blowdown', cells: [METRICS.blowdown.label, water(w.blowdownL)] },
          ...parts.filter((p) => !p.ofEvaporated).map((p) => ({ key: p.key, cells: [p.rowLabel, part(p.key)] })),
          { key: 'total', strong: true, cells: [METRICS.waterTotal.label, water(w.totalL)] },
          { key: 'annual', cells: [METRICS.waterPerYear.label, water(w.annualL)] },
        ]}
      />
      {!counted && <p className="text-xs text-ink-soft">{notCountedShort(engineVersion)}</p>}
      <Facts
        items={[
          [
            METRICS.wue.label,
            <span className="num" data-testid="report-wue">
              {formatMetric('wue', unitSystem, w.wueLPerKwh)}
            </span>,
          ],
        ]}
      />
    </div>
  );
}
