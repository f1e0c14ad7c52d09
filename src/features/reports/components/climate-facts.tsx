import { standardPeriod, utcOffsetLabel } from '../../../../shared/time-zone';
import { Notice } from '@/components/ui/notice';
import { formatQuantity } from '@/lib/quantity';
import type { UnitSystem } from '@/lib/unit-system';
import type { ReportRun } from '../../../../shared/report/report-data';
import { humidityReadingWords } from '../../../../shared/report/humidity-reading';
import { humidityWords } from '../lib/report-format';
import { Facts } from './report-layout';

/** Where the site is and which clock its months are on. */
export function SiteFacts({ run, unitSystem }: { run: ReportRun; unitSystem: UnitSystem }) {
  const s = run.site;
  return (
    <Facts
      testId="report-site"
      items={[
        ['Site', s.name],
        ['Elevation', <span className="num">{formatQuantity('elevation', unitSystem, s.elevationM)}</span>],
        [
          'Location',
          s.latitude !== null && s.longitude !== null ? (
            <span className="num">
              {s.latitude.toFixed(3)}°, {s.longitude.toFixed(3)}°
            </span>
          ) : (
            'not given'
          ),
        ],
        ['Time zone', `${s.timeZone}; months and hours of day on site standard time (${utcOffsetLabel(s.utcOffsetMinutes)})`],
      ]}
    />
  );
}

/** The climate file and what its import found: completeness, filled and missing hours, time basis. */
export function ClimateFacts({ run }: { run: ReportRun }) {
  const c = run.climate;
  const v = c.validation;
  const items: Array<[string, React.ReactNode]> = [
    ['Climate file', c.name],
    ['Uploaded as', c.fileName ?? 'the file has since been deleted from the project'],
    [
      'Period',
      <span className="num">
        {standardPeriod(c.firstHourMs, c.lastHourMs, run.site.utcOffsetMinutes)} ({c.hours.toLocaleString('en')} hours, site standard time)
      </span>,
    ],
    ['Humidity in the file', <span data-testid="humidity-reading">{humidityReadingWords(c.humidityOverIce)}</span>],
  ];
  if (v) {
    items.push(
      ['Calendar years', <span className="num">{run.results.hoursByYear.map((y) => y.year).join(', ')}</span>],
      [
        'Completeness',
        <span className="num" data-testid="completeness">
          {v.completenessPct.toFixed(1)} % of hours have data
        </span>,
      ],
      [
        'Hours',
        <span className="num">
          {v.measuredHours.toLocaleString('en')} measured · {v.filledHours.toLocaleString('en')} filled · {v.missingHours.toLocaleString('en')} missing
        </span>,
      ],
      [
        'Gaps',
        v.gaps === 0 ? (
          <span>
            none (gaps up to <span className="num">{v.maxGapFilledHours} h</span> would be filled by linear interpolation)
          </span>
        ) : (
          <span>
            <span className="num">{v.gaps.toLocaleString('en')}</span> gap{v.gaps === 1 ? '' : 's'}, the longest{' '}
            <span className="num">{v.longestGapHours} h</span>; gaps up to <span className="num">{v.maxGapFilledHours} h</span> filled by linear interpolation,
            longer ones left as no data
          </span>
        ),
      ],
      ['Time basis', `${v.timeLayout ?? 'time column'}; timestamps without an offset read as ${v.timeZone}; hours computed in UTC`],
      ['Step', v.stepMinutes ? `${v.stepMinutes} min in the file${v.stepMinutes < 60 ? ', averaged to hours' : ''}` : '–'],
      ['Humidity measure', humidityWords[v.humidityKind] ?? v.humidityKind],
      ['Pressure', v.hasStationPressure ? 'station pressure from the file' : 'standard atmosphere at the site elevation (ASHRAE 2017 ch. 1 eq. 3)'],
      ['Import check', `${v.summary}${v.warnings ? ` ${v.warnings} warning${v.warnings === 1 ? '' : 's'} listed at upload.` : ''}`],
    );
  }
  items.push(['SHA-256 of the upload', <span className="num break-all text-xs">{c.sha256}</span>]);
  return (
    <div className="space-y-2">
      {c.projection && (
        <Notice tone="warn" title="A projection, not measured weather">
          This file was derived from another by morphing{c.projection.method ? ` (${c.projection.method})` : ''}
          {c.projection.note ? `: ${c.projection.note}` : '.'}
        </Notice>
      )}
      <Facts testId="report-climate" items={items} />
      {!v && <p className="text-xs text-ink-soft">The validation summary left with the file; the run kept its name, period and checksum.</p>}
    </div>
  );
}
