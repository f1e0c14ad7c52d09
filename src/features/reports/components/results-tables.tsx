import { formatQuantity } from '@/lib/quantity';
import type { UnitSystem } from '@/lib/unit-system';
import { MONTH_SHORT as monthShort } from '../../../../shared/calendar';
import { hoursOfMode } from '../../../../shared/modes';
import { ModeShareBar, ModeSwatch } from '@/components/ui/mode-marks';
import { modeKeys, modeLabels } from '../../../../shared/modes';
import type { ModeHours, YearResults } from '../../../../shared/scenario/results';
import type { ScenarioResults } from '../../../../shared/scenario/run';
import { PARTIAL_YEAR_MARK, partialYearsSentence, yearStatistics } from '../../../../shared/scenario/year-statistics';
import { hours, kw, mwh, ratio, share } from './report-format';
import { Facts, ReportTable } from './report-layout';

export function ModeHoursTable({ results }: { results: ScenarioResults }) {
  const h = results.hours;
  return (
    <div className="keep-together space-y-2">
      <ModeShareBar hours={h} />
      <ReportTable
        testId="report-mode-hours"
        head={['Mode', 'Hours', 'Share']}
        rows={[
          ...modeKeys.map((k) => ({ key: k, cells: [<><ModeSwatch mode={k} />{modeLabels[k]}</>, hoursOfMode(h, k).toLocaleString('en'), share(hoursOfMode(h, k), h.total)] })),
          { key: 'all', strong: true, cells: ['All hours', h.total.toLocaleString('en'), '100.0 %'] },
        ]}
      />
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

export function MonthlyTable({ byMonth }: { byMonth: (ModeHours & { month: number })[] }) {
  return (
    <ReportTable
      testId="report-monthly"
      caption="Hours per mode for each calendar month"
      head={['Month', ...modeKeys.map((k) => `${modeLabels[k]} (h)`), 'All (h)']}
      rows={byMonth.map((m) => ({ key: String(m.month), cells: [monthShort[m.month - 1], ...modeKeys.map((k) => hoursOfMode(m, k).toLocaleString('en')), m.total.toLocaleString('en')] }))}
    />
  );
}

/** Each calendar year on the site's standard time; a partial year is marked and named as on the run page. */
export function YearTable({ years, unitSystem }: { years: YearResults[]; unitSystem: UnitSystem }) {
  const { partialYears } = yearStatistics(years);
  const partial = new Set(partialYears.map((p) => p.year));
  const note = partialYearsSentence(partialYears);
  return (
    <div className="space-y-1">
      <ReportTable
        testId="report-years"
        caption="Hours, cooling energy and water for each calendar year (site standard time)"
        head={['Year', ...modeKeys.map((k) => `${modeLabels[k]} (h)`), 'Cooling energy', 'Water']}
        rows={years.map((y) => ({
          key: String(y.year),
          cells: [
            <>
              {y.year}
              {partial.has(y.year) && <span className="ml-1.5 rounded bg-mist px-1 text-[11px]">{PARTIAL_YEAR_MARK}</span>}
            </>,
            ...modeKeys.map((k) => hoursOfMode(y, k).toLocaleString('en')),
            mwh(y.coolingKwh),
            formatQuantity('water', unitSystem, y.waterL),
          ],
        }))}
      />
      {note && <p className="text-xs text-ink-soft" data-testid="report-partial-years">{note}</p>}
    </div>
  );
}

export function EnergyTable({ results }: { results: ScenarioResults }) {
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
          row('fans', 'Hall fans', e.fanKwh, a?.fanKwh),
          row('compressors', 'Compressors', e.compressorKwh, a?.compressorKwh),
          row('pumps', 'Pumps', e.pumpKwh, a?.pumpKwh),
          row('cooling', 'Cooling total', e.coolingKwh, a?.coolingKwh, true),
          row('it', 'IT equipment', e.itKwh, a?.itKwh),
        ]}
      />
      <Facts
        items={[
          ['Partial PUE (cooling)', <span className="num" data-testid="report-ppue">{ratio(e.partialPue)}</span>],
          ['Peak mechanical load', <span className="num">{kw(results.peakMechanicalLoadKw)} thermal</span>],
          ['Peak compressor power', <span className="num">{kw(results.peakCompressorKw)} electric</span>],
        ]}
      />
    </div>
  );
}

export function WaterTable({ results, unitSystem }: { results: ScenarioResults; unitSystem: UnitSystem }) {
  const w = results.water;
  const water = (l: number | null) => formatQuantity('water', unitSystem, l);
  return (
    <div className="space-y-3">
      <ReportTable
        testId="report-water"
        head={['Water', 'Over the file']}
        rows={[
          { key: 'evaporated', cells: ['Evaporated', water(w.evaporatedL)] },
          { key: 'blowdown', cells: ['Blowdown', water(w.blowdownL)] },
          { key: 'total', strong: true, cells: ['Total', water(w.totalL)] },
          { key: 'annual', cells: ['Total per 8,760 h', water(w.annualL)] },
        ]}
      />
      <Facts items={[['WUE', <span className="num" data-testid="report-wue">{w.wueLPerKwh === null ? '–' : `${ratio(w.wueLPerKwh)} L/kWh`}</span>]]} />
    </div>
  );
}
