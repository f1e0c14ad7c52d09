import { useState } from 'react';
import { ChoiceCard } from '@/components/ui/choice-card';
import type { ItLoadProfile } from '../../../../shared/scenario/schema';
import { EXAMPLE_LOAD_PROFILE_NAME, exampleLoadProfile, parseLoadProfileCsv } from '../../../../shared/scenario/load-profile';
import { parseRampText, summariseLoadProfile } from '../lib/load-profile-summary';
import { loadProfileKinds } from '../lib/scenario-fields';

const pct = (f: number) => `${(100 * f).toLocaleString('en', { maximumFractionDigits: 1 })} %`;

/**
 * The IT load through the year: constant, a ramp by year, or an hourly profile uploaded as CSV (checked line by line;
 * a bad file is reported and nothing is kept) or the built-in example shape. Shows the chosen profile in brief.
 */
export function LoadProfileField({
  value,
  onChange,
  disabled,
  itLoadKw,
}: {
  value: ItLoadProfile;
  onChange: (profile: ItLoadProfile) => void;
  disabled: boolean;
  itLoadKw: number;
}) {
  const [rampText, setRampText] = useState(value.kind === 'yearly-ramp' ? value.fractions.join(', ') : '0.4, 0.6, 0.8, 1');
  const [rampErrors, setRampErrors] = useState<string[]>([]);
  const [fileReport, setFileReport] = useState<{ fileName: string; errors: string[] } | null>(null);

  function choose(kind: ItLoadProfile['kind']) {
    setFileReport(null);
    if (kind === 'constant') onChange({ kind: 'constant' });
    if (kind === 'yearly-ramp') applyRamp(rampText);
    // An hourly profile needs its values first: the example until a file is read.
    if (kind === 'hourly-profile' && value.kind !== 'hourly-profile')
      onChange({ kind: 'hourly-profile', name: EXAMPLE_LOAD_PROFILE_NAME, fractions: exampleLoadProfile() });
  }

  function applyRamp(text: string) {
    setRampText(text);
    const parsed = parseRampText(text);
    setRampErrors(parsed.ok ? [] : parsed.errors);
    if (parsed.ok) onChange({ kind: 'yearly-ramp', fractions: parsed.fractions });
  }

  async function readFile(file: File) {
    const parsed = parseLoadProfileCsv(await file.text());
    if (!parsed.ok) {
      setFileReport({ fileName: file.name, errors: parsed.errors });
      return;
    }
    setFileReport(null);
    onChange({ kind: 'hourly-profile', name: file.name.slice(0, 120), fractions: parsed.fractions });
  }

  return (
    <div className="space-y-2 border-b border-rule/60 pb-3" data-testid="load-profile">
      <fieldset>
        <legend className="text-sm">IT load through the year</legend>
        <div className="mt-1 grid gap-2 md:grid-cols-3">
          {loadProfileKinds.map((k) => (
            <ChoiceCard key={k.kind} selected={value.kind === k.kind} label={k.label} help={k.help} compact>
              <input
                type="radio"
                name="it-load-profile"
                checked={value.kind === k.kind}
                disabled={disabled}
                onChange={() => choose(k.kind)}
                className="mt-1 accent-harbour"
              />
            </ChoiceCard>
          ))}
        </div>
      </fieldset>

      {value.kind === 'yearly-ramp' && (
        <div className="space-y-1">
          <label htmlFor="load-ramp" className="block text-sm">
            Fraction of design load for each year, first year first
          </label>
          <input
            id="load-ramp"
            value={rampText}
            disabled={disabled}
            onChange={(e) => applyRamp(e.target.value)}
            aria-invalid={rampErrors.length ? true : undefined}
            className="num w-full max-w-xl rounded border border-rule bg-panel px-2 py-1 text-sm"
          />
          <p className="text-xs text-ink-soft">
            For example 0.4, 0.6, 0.8, 1: the file's first calendar year at 40 % of design, and so on; the last value holds for later years.
          </p>
          {rampErrors.length > 0 && <ErrorList title="This ramp was not taken" errors={rampErrors} />}
          {rampErrors.length === 0 && <RampBars fractions={value.fractions} itLoadKw={itLoadKw} />}
        </div>
      )}

      {value.kind === 'hourly-profile' && (
        <div className="space-y-2">
          <div className="flex flex-wrap items-center gap-2 text-sm">
            <label className={`rounded border border-rule bg-panel px-3 py-1 text-xs ${disabled ? 'opacity-60' : 'cursor-pointer hover:bg-mist'}`}>
              Upload a profile (CSV)…
              <input
                type="file"
                accept=".csv,.txt,text/csv,text/plain"
                disabled={disabled}
                className="sr-only"
                data-testid="load-profile-file"
                onChange={(e) => {
                  const file = e.target.files?.[0];
                  e.target.value = '';
                  if (file) void readFile(file);
                }}
              />
            </label>
            <button
              type="button"
              disabled={disabled}
              onClick={() => {
                setFileReport(null);
                onChange({ kind: 'hourly-profile', name: EXAMPLE_LOAD_PROFILE_NAME, fractions: exampleLoadProfile() });
              }}
              className="rounded border border-rule px-3 py-1 text-xs hover:bg-mist"
            >
              Use the example shape
            </button>
          </div>
          <p className="text-xs text-ink-soft">
            One value per line, 8,760 lines: the fraction of design IT load (0 to 1) for each hour of a 365-day year in the site's standard time, from 1 January
            00:00. A header line, and an hour column before the value, are allowed.
          </p>
          {fileReport && <ErrorList title={`${fileReport.fileName} was not taken; the profile below is unchanged`} errors={fileReport.errors} />}
          <ProfileSummary name={value.name} fractions={value.fractions} itLoadKw={itLoadKw} />
        </div>
      )}
    </div>
  );
}

function ErrorList({ title, errors }: { title: string; errors: string[] }) {
  return (
    <div role="alert" className="rounded border border-signal-bad/40 bg-[#fbeceb] px-3 py-2 text-xs" data-testid="load-profile-errors">
      <p className="font-semibold text-ink">{title}</p>
      <ul className="mt-1 list-disc pl-5 text-ink">
        {errors.map((e) => (
          <li key={e}>{e}</li>
        ))}
      </ul>
    </div>
  );
}

function RampBars({ fractions, itLoadKw }: { fractions: number[]; itLoadKw: number }) {
  return (
    <div className="flex items-end gap-1 pt-1" aria-label="Load by year" role="img">
      {fractions.map((f, i) => (
        <div key={i} className="flex w-12 flex-col items-center text-[11px] text-ink-soft">
          <div
            className="w-6 rounded-t-sm bg-harbour"
            style={{ height: `${Math.max(2, 48 * f)}px` }}
            title={`${pct(f)} · ${Math.round(f * itLoadKw).toLocaleString('en')} kW`}
          />
          <span className="num">{pct(f)}</span>
          <span>year {i + 1}</span>
        </div>
      ))}
    </div>
  );
}

/** Range and full-load hours, and the average week drawn as one line (the profile's first day at the left). */
function ProfileSummary({ name, fractions, itLoadKw }: { name: string; fractions: number[]; itLoadKw: number }) {
  const s = summariseLoadProfile(fractions);
  // The axis runs from a tenth below the lowest hour to design load, so a shallow daily swing still shows.
  const low = Math.max(0, Math.floor(s.minFraction * 10) / 10 - 0.1);
  const leftPx = 36;
  const widthPx = 372;
  const plotPx = widthPx - leftPx;
  const heightPx = 72;
  const y = (f: number) => heightPx - ((f - low) / (1 - low || 1)) * heightPx;
  const points = s.averageWeek.map((f, i) => `${leftPx + ((i + 0.5) * plotPx) / 168},${y(f)}`).join(' ');
  return (
    <div className="rounded border border-rule px-3 py-2 text-xs" data-testid="load-profile-summary">
      <p className="font-medium text-ink">{name}</p>
      <dl className="mt-1 grid grid-cols-[auto_1fr] gap-x-4 gap-y-0.5">
        <dt className="text-ink-soft">Mean</dt>
        <dd className="num">
          {pct(s.meanFraction)} of design ({Math.round(s.meanFraction * itLoadKw).toLocaleString('en')} kW)
        </dd>
        <dt className="text-ink-soft">Lowest · highest hour</dt>
        <dd className="num">
          {pct(s.minFraction)} · {pct(s.maxFraction)}
        </dd>
        <dt className="text-ink-soft">Full-load hours</dt>
        <dd className="num">{Math.round(s.fullLoadHours).toLocaleString('en')} h of 8,760</dd>
      </dl>
      <svg
        viewBox={`0 -6 ${widthPx} ${heightPx + 22}`}
        width={widthPx}
        height={heightPx + 22}
        className="mt-2 max-w-full text-ink-soft"
        role="img"
        aria-label="Average week of the profile"
      >
        <line x1={leftPx} x2={widthPx} y1={y(1)} y2={y(1)} stroke="currentColor" strokeDasharray="3,3" opacity={0.5} />
        <line x1={leftPx} x2={widthPx} y1={heightPx} y2={heightPx} stroke="currentColor" opacity={0.5} />
        <text x={leftPx - 4} y={y(1) + 3} fontSize={9} textAnchor="end" fill="currentColor">
          100 %
        </text>
        <text x={leftPx - 4} y={heightPx + 3} fontSize={9} textAnchor="end" fill="currentColor">
          {pct(low)}
        </text>
        <polyline points={points} fill="none" stroke="currentColor" strokeWidth={1.5} className="text-harbour" />
        {[1, 2, 3, 4, 5, 6, 7].map((d) => (
          <text key={d} x={leftPx + ((d - 1) * plotPx) / 7 + 2} y={heightPx + 12} fontSize={9} fill="currentColor">
            day {d}
          </text>
        ))}
      </svg>
      <p className="text-ink-soft">Average week over the year, as a share of design load (dashed: design load). Day 1 is 1 January.</p>
    </div>
  );
}
