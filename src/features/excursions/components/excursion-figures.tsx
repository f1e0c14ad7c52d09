import type { ReactNode } from 'react';
import { formatQuantity, unitOf } from '@/lib/quantity';
import { useUnitSystem } from '@/lib/unit-system';
import { ModeSwatch } from '@/components/ui/mode-marks';
import { hoursOfMode, modeKeys, modeLabels } from '../../../../shared/modes';
import type { ExcursionsResponse } from '../api/get-excursions';
import { hoursText, percentText, siteTime } from '../lib/excursion-format';

function Figure({
  label,
  value,
  detail,
  tone,
  testId,
}: {
  label: string;
  value: ReactNode;
  detail?: ReactNode;
  tone?: 'ok' | 'warn' | 'bad';
  testId?: string;
}) {
  const ink = tone === 'bad' ? 'text-signal-bad' : tone === 'warn' ? 'text-signal-warn' : 'text-ink';
  return (
    <div className="rounded-md border border-rule bg-panel px-4 py-3 break-inside-avoid" data-testid={testId}>
      <p className="text-xs text-ink-soft">{label}</p>
      <p className={`num text-xl font-semibold ${ink}`}>{value}</p>
      {detail && <p className="mt-0.5 text-xs text-ink-soft">{detail}</p>}
    </div>
  );
}

/** The headline figures an operator takes to a change review. */
export function ExcursionFigures({ data }: { data: ExcursionsResponse }) {
  const { unitSystem } = useUnitSystem();
  const a = data.analysis;
  const offset = data.run.utcOffsetMinutes;
  const rateUnit = `${unitOf('temperatureDifference', unitSystem)}/h`;
  const rate = (k: number) => `${formatQuantity('temperatureDifference', unitSystem, k, false)} ${rateUnit}`;
  return (
    <div className="grid gap-3 sm:grid-cols-2 xl:grid-cols-4" data-testid="excursion-figures">
      <Figure
        label={`Inside the recommended range: ${data.proposal.recommended.label}`}
        value={`${hoursText(a.insideRecommendedHours)} h`}
        detail={`${percentText(a.insideRecommendedHours, a.dataHours)} of ${hoursText(a.dataHours)} hours with data`}
        tone="ok"
      />
      <Figure
        label={`Outside recommended, inside allowable: ${data.proposal.allowable.label}`}
        value={`${hoursText(a.outsideRecommendedHours)} h`}
        detail={`${percentText(a.outsideRecommendedHours, a.dataHours)} of hours with data`}
        tone={a.outsideRecommendedHours > 0 ? 'warn' : 'ok'}
        testId="outside-recommended"
      />
      <Figure
        label="Outside the allowable class"
        value={`${hoursText(a.outsideAllowableHours)} h`}
        detail={`${percentText(a.outsideAllowableHours, a.dataHours)} of hours with data`}
        tone={a.outsideAllowableHours > 0 ? 'bad' : 'ok'}
        testId="outside-allowable"
      />
      <Figure
        label="Longest consecutive excursion"
        value={`${hoursText(a.events.longestHours)} h`}
        detail={
          a.events.longestStartMs === null
            ? 'no hour outside the recommended range'
            : `from ${siteTime(a.events.longestStartMs, offset)}; longest outside the allowable class ${hoursText(a.allowableEvents.longestHours)} h`
        }
        tone={a.events.longestHours > 0 ? 'warn' : 'ok'}
        testId="longest-excursion"
      />
      <Figure
        label="Excursion events"
        value={hoursText(a.events.count)}
        detail={`${a.eventsPerYear === null ? '–' : a.eventsPerYear.toLocaleString('en', { maximumFractionDigits: 1 })} a year over ${a.yearsOfData.toLocaleString('en', { maximumFractionDigits: 2 })} years of data; ${hoursText(a.allowableEvents.count)} outside the allowable class`}
      />
      <Figure
        label={`Fastest hourly change of inlet dry-bulb (limit ${rate(data.reference.hourlyRateLimitK)})`}
        value={rate(a.rateOfChange.maxKPerHour)}
        detail={`${hoursText(a.rateOfChange.stepsAboveLimit)} of ${hoursText(a.rateOfChange.stepsChecked)} hour-to-hour steps above the limit${a.rateOfChange.maxAtMs !== null && a.rateOfChange.maxKPerHour > 0 ? `; fastest at ${siteTime(a.rateOfChange.maxAtMs, offset)}` : ''}`}
        tone={a.rateOfChange.stepsAboveLimit > 0 ? 'bad' : 'ok'}
        testId="rate-of-change"
      />
      <Figure
        label="Time-weighted X-factor (1.00 = held at 20 °C all year)"
        value={a.timeWeightedXFactor === null || !Number.isFinite(a.timeWeightedXFactor) ? '–' : a.timeWeightedXFactor.toFixed(3)}
        detail="relative failure rate of volume servers, ASHRAE TC 9.9 (2011) table recalled from memory"
        testId="x-factor"
      />
      <Figure
        label="IT inlet dry-bulb, lowest / mean / highest"
        value={`${formatQuantity('temperature', unitSystem, a.inletC.min, false)} / ${formatQuantity('temperature', unitSystem, a.inletC.mean, false)} / ${formatQuantity('temperature', unitSystem, a.inletC.max, false)}`}
        detail={unitOf('temperature', unitSystem)}
      />
    </div>
  );
}

/** Hours per mode as run and under the proposal: what the change buys in free cooling. */
export function ModeChangeTable({ data }: { data: ExcursionsResponse }) {
  const asRun = data.run.hours;
  return (
    <table className="num w-full text-right text-xs" data-testid="mode-change-table">
      <thead>
        <tr className="border-b border-rule text-ink-soft">
          <th scope="col" className="py-1 text-left font-sans font-medium">
            Mode
          </th>
          <th scope="col" className="px-2 py-1 font-sans font-medium">
            As run (h)
          </th>
          <th scope="col" className="px-2 py-1 font-sans font-medium">
            Proposal (h)
          </th>
          <th scope="col" className="px-2 py-1 font-sans font-medium">
            Change (h)
          </th>
        </tr>
      </thead>
      <tbody>
        {modeKeys.map((k) => {
          const proposed = hoursOfMode(data.analysis.modes, k);
          const before = asRun ? hoursOfMode(asRun, k) : null;
          const change = before === null ? null : proposed - before;
          return (
            <tr key={k} className="border-b border-rule/60">
              <th scope="row" className="py-0.5 text-left font-sans font-normal">
                <ModeSwatch mode={k} className="mr-1.5 size-2.5" />
                {modeLabels[k]}
              </th>
              <td className="px-2 py-0.5">{before === null ? '–' : hoursText(before)}</td>
              <td className="px-2 py-0.5">{hoursText(proposed)}</td>
              <td className="px-2 py-0.5">{change === null ? '–' : `${change > 0 ? '+' : ''}${hoursText(change)}`}</td>
            </tr>
          );
        })}
      </tbody>
    </table>
  );
}

/** Why hours are outside each envelope; an hour can be both too warm and too dry, so rows may overlap. */
export function CauseTable({ data }: { data: ExcursionsResponse }) {
  const { recommended, allowable } = data.analysis.causes;
  const rows = [
    ['warm', 'Too warm (above the dry-bulb maximum)'],
    ['cold', 'Too cold (below the dry-bulb minimum)'],
    ['humid', 'Too humid (above the dew-point or RH maximum)'],
    ['dry', 'Too dry (below the dew-point or RH minimum)'],
  ] as const;
  return (
    <table className="num w-full text-right text-xs" data-testid="cause-table">
      <thead>
        <tr className="border-b border-rule text-ink-soft">
          <th scope="col" className="py-1 text-left font-sans font-medium">
            Cause
          </th>
          <th scope="col" className="px-2 py-1 font-sans font-medium">
            Outside recommended (h)
          </th>
          <th scope="col" className="px-2 py-1 font-sans font-medium">
            Outside allowable (h)
          </th>
        </tr>
      </thead>
      <tbody>
        {rows.map(([key, label]) => (
          <tr key={key} className="border-b border-rule/60">
            <th scope="row" className="py-0.5 text-left font-sans font-normal">
              {label}
            </th>
            <td className="px-2 py-0.5">{hoursText(recommended[key])}</td>
            <td className="px-2 py-0.5">{hoursText(allowable[key])}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
