// @ts-nocheck
import type { ReactNode } from 'react';
import type { DetectedMapping } from '../../../../shared/climate/types';
import { HumidityOverIceChoice } from './humidity-over-ice-choice';
import { defaultHumidityUnit, draftFromDetected, timeDraftFor, type HumidityDraft, type MappingDraft, type TimeDraft } from '../lib/mapping-draft';

const selectClass = 'rounded border border-rule bg-panel px-2 py-1 text-sm';

function confidenceWords(c: number | undefined): { text: string; tone: string } {
  if (c === undefined) return { text: 'set by you', tone: 'text-ink-soft' };
  const pct = `${Math.round(c * 100)} %`;
  if (c >= 0.9) return { text: `${pct} · recognised`, tone: 'text-signal-ok' };
  if (c >= 0.6) return { text: `${pct} · likely, check`, tone: 'text-signal-warn' };
  return { text: `${pct} · a guess, check`, tone: 'text-signal-bad' };
}

function ColumnSelect({
  id,
  name,
  headers,
  value,
  onChange,
  allowNone,
}: {
  id: string;
  /** What the column holds, as a screen reader announces the select (several share one row's label). */
  name?: string;
  headers: string[];
  value: number | null;
  onChange: (v: number | null) => void;
  allowNone?: string;
}) {
  return (
    <select
      id={id}
      aria-label={name}
      className={selectClass}
      value={value ?? ''}
      onChange={(e) => onChange(e.target.value === '' ? null : Number(e.target.value))}
    >
      {allowNone !== undefined && <option value="">{allowNone}</option>}
      {value === null && allowNone === undefined && <option value="">Choose a column…</option>}
      {headers.map((h, i) => (
        <option key={i} value={i}>
          {i + 1}: {h || '(no header)'}
        </option>
      ))}
    </select>
  );
}

/** confidence: the detector's 0…1; undefined once the person changed the part; null where no figure applies. */
function Row({
  label,
  htmlFor,
  confidence,
  reason,
  children,
}: {
  label: string;
  htmlFor: string;
  confidence?: number | null;
  reason?: string;
  children: ReactNode;
}) {
  const words = confidence === null ? null : confidenceWords(confidence);
  return (
    <div className="grid gap-2 border-b border-rule/60 py-2.5 md:grid-cols-[10rem_1fr_14rem] md:items-center">
      <label htmlFor={htmlFor} className="text-sm font-medium">
        {label}
      </label>
      <div className="flex flex-wrap items-center gap-2">{children}</div>
      <p className="text-xs">
        {words && <span className={`num font-semibold ${words.tone}`}>{words.text}</span>}
        {reason && <span className="block text-ink-soft">{reason}</span>}
      </p>
    </div>
  );
}

/**
 * The mapping step: the detected column for time, dry-bulb, humidity and pressure with its unit and
 * confidence; every choice can be changed. Changes stay in the draft until the file is read again.
 */
export function MappingEditor({
  detected,
  firstDetected = detected,
  draft,
  onChange,
}: {
  /** The mapping of the latest reading (after any override). */
  detected: DetectedMapping;
  /** The mapping recognised without any override: a part that differs from it was set by the person. */
  firstDetected?: DetectedMapping;
  draft: MappingDraft;
  onChange: (next: MappingDraft) => void;
}) {
  const headers = detected.headers;
  const set = (patch: Partial<MappingDraft>) => onChange({ ...draft, ...patch });
  const edited = (part: keyof MappingDraft, detectedConfidence: number | undefined) =>
    JSON.stringify(draft[part]) === JSON.stringify(initialPart(firstDetected, part)) ? detectedConfidence : undefined;
  const time = draft.time;
  const setTime = (patch: Partial<TimeDraft>) => time && set({ time: { ...time, ...patch } as TimeDraft });

  return (
    <div data-testid="mapping-editor">
      <Row label="Time" htmlFor="map-time-layout" confidence={edited('time', detected.time?.confidence)} reason={detected.time?.description}>
        <select
          id="map-time-layout"
          className={selectClass}
          value={time?.layout ?? ''}
          onChange={(e) => set({ time: timeDraftFor(e.target.value as TimeDraft['layout']) })}
        >
          {!time && <option value="">Choose how time is written…</option>}
          <option value="iso">One date-and-time column</option>
          <option value="date-time">A date column and a time column</option>
          <option value="ymdh">Year, month, day and hour columns</option>
        </select>
        {time?.layout === 'iso' && (
          <ColumnSelect
            id="map-time-col"
            name="Timestamp column"
            headers={headers}
            value={time.column as number}
            onChange={(v) => setTime({ column: v ?? 0 })}
          />
        )}
        {time?.layout === 'date-time' && (
          <>
            <ColumnSelect
              id="map-date-col"
              name="Date column"
              headers={headers}
              value={time.dateColumn as number}
              onChange={(v) => setTime({ dateColumn: v ?? 0 })}
            />
            <ColumnSelect
              id="map-timeofday-col"
              name="Time-of-day column"
              headers={headers}
              value={time.timeColumn as number}
              onChange={(v) => setTime({ timeColumn: v ?? 0 })}
            />
            <select
              aria-label="Date order"
              className={selectClass}
              value={time.dateOrder ?? 'YMD'}
              onChange={(e) => setTime({ dateOrder: e.target.value as 'YMD' })}
            >
              <option value="YMD">year-month-day</option>
              <option value="DMY">day/month/year</option>
              <option value="MDY">month/day/year</option>
            </select>
          </>
        )}
        {time?.layout === 'ymdh' && (
          <>
            {(['year', 'month', 'day', 'hour'] as const).map((part) => (
              <span key={part} className="flex items-center gap-1 text-xs text-ink-soft">
                {part}
                <ColumnSelect
                  id={`map-${part}-col`}
                  name={`${part[0].toUpperCase()}${part.slice(1)} column`}
                  headers={headers}
                  value={time[part] as number}
                  onChange={(v) => setTime({ [part]: v ?? 0 })}
                />
              </span>
            ))}
            <select
              aria-label="Hour convention"
              className={selectClass}
              value={time.hourConvention ?? 'ending-1-24'}
              onChange={(e) => setTime({ hourConvention: e.target.value as 'ending-1-24' })}
            >
              <option value="ending-1-24">hours 1–24, hour ending</option>
              <option value="beginning-0-23">hours 0–23, hour beginning</option>
            </select>
          </>
        )}
      </Row>

      <Row label="Dry-bulb" htmlFor="map-drybulb-col" confidence={edited('dryBulb', detected.dryBulb?.confidence)} reason={detected.dryBulb?.reason}>
        <ColumnSelect
          id="map-drybulb-col"
          headers={headers}
          value={(draft.dryBulb?.column as number | null) ?? null}
          onChange={(v) => set({ dryBulb: v === null ? null : { column: v, unit: draft.dryBulb?.unit ?? 'C' } })}
        />
        <select
          aria-label="Dry-bulb unit"
          className={selectClass}
          value={draft.dryBulb?.unit ?? 'C'}
          disabled={!draft.dryBulb}
          onChange={(e) => draft.dryBulb && set({ dryBulb: { ...draft.dryBulb, unit: e.target.value as 'C' } })}
        >
          <option value="C">°C</option>
          <option value="F">°F</option>
          <option value="K">K</option>
        </select>
      </Row>

      <Row label="Humidity" htmlFor="map-humidity-col" confidence={edited('humidity', detected.humidity?.confidence)} reason={detected.humidity?.reason}>
        <ColumnSelect
          id="map-humidity-col"
          headers={headers}
          value={(draft.humidity?.column as number | null) ?? null}
          onChange={(v) =>
            set({ humidity: v === null ? null : ({ ...(draft.humidity ?? { quantity: 'relative-humidity', unit: '%' }), column: v } as HumidityDraft) })
          }
        />
        <select
          aria-label="Humidity measure"
          className={selectClass}
          value={draft.humidity?.quantity ?? 'relative-humidity'}
          disabled={!draft.humidity}
          onChange={(e) => {
            const quantity = e.target.value as HumidityDraft['quantity'];
            if (draft.humidity) set({ humidity: { column: draft.humidity.column, quantity, unit: defaultHumidityUnit[quantity] } as HumidityDraft });
          }}
        >
          <option value="relative-humidity">relative humidity</option>
          <option value="dew-point">dew point</option>
          <option value="wet-bulb">wet-bulb</option>
          <option value="humidity-ratio">humidity ratio</option>
        </select>
        <select
          aria-label="Humidity unit"
          className={selectClass}
          value={draft.humidity?.unit ?? '%'}
          disabled={!draft.humidity}
          onChange={(e) => draft.humidity && set({ humidity: { ...draft.humidity, unit: e.target.value } as HumidityDraft })}
        >
          {humidityUnits(draft.humidity?.quantity ?? 'relative-humidity').map(([value, text]) => (
            <option key={value} value={value}>
              {text}
            </option>
          ))}
        </select>
      </Row>

      <HumidityOverIceChoice draft={draft} onChange={onChange} />

      <Row
        label="Station pressure"
        htmlFor="map-pressure-col"
        // Nothing detected and nothing chosen: no figure, not "set by you".
        confidence={detected.pressure ? edited('pressure', detected.pressure.confidence) : draft.pressure ? undefined : null}
        reason={draft.pressure ? detected.pressure?.reason : "None: the site's elevation sets the pressure (standard atmosphere)."}
      >
        <ColumnSelect
          id="map-pressure-col"
          headers={headers}
          value={(draft.pressure?.column as number | null) ?? null}
          allowNone="none — use the site's elevation"
          onChange={(v) => set({ pressure: v === null ? null : { column: v, unit: draft.pressure?.unit ?? 'kPa' } })}
        />
        <select
          aria-label="Pressure unit"
          className={selectClass}
          value={draft.pressure?.unit ?? 'kPa'}
          disabled={!draft.pressure}
          onChange={(e) => draft.pressure && set({ pressure: { ...draft.pressure, unit: e.target.value as 'kPa' } })}
        >
          {['Pa', 'hPa', 'kPa', 'inHg', 'psi'].map((u) => (
            <option key={u} value={u}>
              {u === 'hPa' ? 'hPa (mbar)' : u}
            </option>
          ))}
        </select>
      </Row>

      <Row
        label="Text format"
        htmlFor="map-delimiter"
        confidence={null}
        reason={detected.headerLine ? `Header on line ${detected.headerLine}.` : 'No header row found.'}
      >
        <select id="map-delimiter" className={selectClass} value={draft.delimiter} onChange={(e) => set({ delimiter: e.target.value as ',' })}>
          <option value=",">comma separated</option>
          <option value=";">semicolon separated</option>
          <option value={'\t'}>tab separated</option>
        </select>
        <select
          aria-label="Decimal separator"
          className={selectClass}
          value={draft.decimalSeparator}
          onChange={(e) => set({ decimalSeparator: e.target.value as '.' })}
        >
          <option value=".">decimal point (1.5)</option>
          <option value=",">decimal comma (1,5)</option>
        </select>
      </Row>
    </div>
  );
}

function humidityUnits(quantity: HumidityDraft['quantity']): Array<[string, string]> {
  if (quantity === 'relative-humidity')
    return [
      ['%', '%'],
      ['fraction', 'fraction 0–1'],
    ];
  if (quantity === 'humidity-ratio')
    return [
      ['g/kg', 'g/kg'],
      ['kg/kg', 'kg/kg'],
      ['gr/lb', 'grains/lb'],
    ];
  return [
    ['C', '°C'],
    ['F', '°F'],
    ['K', 'K'],
  ];
}

const detectedDrafts = new WeakMap<DetectedMapping, MappingDraft>();

/** The detected value of one part of the draft, to tell whether the person has changed it. */
function initialPart(detected: DetectedMapping, part: keyof MappingDraft): unknown {
  let draft = detectedDrafts.get(detected);
  if (!draft) detectedDrafts.set(detected, (draft = draftFromDetected(detected)));
  return draft[part];
}
