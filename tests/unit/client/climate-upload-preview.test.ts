import { describe, expect, it } from 'vitest';
import type { DetectedMapping } from '../../../shared/climate/types';
import { draftFromDetected, overrideFromDraft, timeDraftFor } from '../../../src/features/climate-files/lib/mapping-draft';
import { previewColumns, previewRows } from '../../../src/features/climate-files/lib/preview-values';
import { chartSeries, toFloat64 } from '../../../src/lib/climate-series';
import { psychrolib } from '../psychrometrics/reference-psychrolib';

const hour = { timestampMs: Date.UTC(2023, 6, 1, 0), dryBulbC: 8.3, humidity: 88, pressurePa: 101_300, flag: 0 };

describe('the first hours of an upload in SI and in the person’s units', () => {
  it('shows SI and IP side by side', () => {
    const [row] = previewRows([hour], 'relative-humidity-pct', 'IP');
    expect(row.timeUtc).toBe('2023-07-01 00:00');
    // 8.3 °C × 1.8 + 32 = 46.94 °F (NIST SP 811 App. B, exact by definition).
    expect(row.values.dryBulb).toEqual({ si: '8.3', shown: '46.9' });
    expect(row.values.humidity).toEqual({ si: '88.0', shown: '88.0' });
    // 101 300 Pa / 3386.389 Pa per inHg = 29.914 inHg (NIST SP 811 App. B: 1 inHg (32 °F) = 3.386 389 kPa).
    expect(row.values.pressure).toEqual({ si: '101.30', shown: '29.91' });
    expect(row.flag).toBe('measured');
    // The site's clock: Warsaw keeps UTC+02:00 in July (EU summer time).
    expect(previewRows([hour], 'relative-humidity-pct', 'SI', 'Europe/Warsaw')[0].timeLocal).toBe('2023-07-01 02:00');
  });

  it('shows each humidity measure in its own unit', () => {
    // 0.0105 kg/kg = 10.5 g/kg = 73.5 gr/lb (7000 grains per pound, exact).
    const [w] = previewRows([{ ...hour, humidity: 0.0105 }], 'humidity-ratio-kgkg', 'IP');
    expect(w.values.humidity).toEqual({ si: '10.50', shown: '73.5' });
    // Dew point 10 °C = 50 °F.
    const [dp] = previewRows([{ ...hour, humidity: 10, flag: 1 }], 'dew-point-c', 'IP');
    expect(dp.values.humidity).toEqual({ si: '10.0', shown: '50.0' });
    expect(dp.flag).toBe('filled');
    const [missing] = previewRows([{ ...hour, dryBulbC: null, flag: 2 }], 'dew-point-c', 'SI');
    expect(missing.values.dryBulb).toEqual({ si: '–', shown: '–' });
  });

  it('names the columns and their units', () => {
    expect(previewColumns('wet-bulb-c', false, 'IP')).toEqual([
      { key: 'dryBulb', label: 'Dry-bulb', siUnit: '°C', shownUnit: '°F' },
      { key: 'humidity', label: 'Wet-bulb', siUnit: '°C', shownUnit: '°F' },
    ]);
    expect(previewColumns('humidity-ratio-kgkg', true, 'SI').map((c) => c.shownUnit)).toEqual(['°C', 'g/kg', 'kPa']);
  });
});

const detected: DetectedMapping = {
  delimiter: ';',
  decimalSeparator: ',',
  headerLine: 3,
  headers: ['Date', 'Time', 'Air temperature [°C]', 'Relative humidity [%]', 'Pressure [hPa]'],
  time: { layout: 'date-time', dateColumn: 0, timeColumn: 1, dateOrder: 'DMY', confidence: 0.95, description: 'date and time columns' },
  dryBulb: { quantity: 'dry-bulb', unit: 'C', column: 2, header: 'Air temperature [°C]', confidence: 0.9, reason: 'header' },
  humidity: { quantity: 'relative-humidity', unit: '%', column: 3, header: 'Relative humidity [%]', confidence: 0.95, reason: 'header' },
  pressure: { quantity: 'pressure', unit: 'hPa', column: 4, header: 'Pressure [hPa]', confidence: 0.95, reason: 'header' },
  confidence: 0.9,
};

describe('the mapping a person edits', () => {
  it('turns the detected mapping into an override the upload API accepts unchanged', () => {
    expect(overrideFromDraft(draftFromDetected(detected))).toEqual({
      delimiter: ';',
      decimalSeparator: ',',
      time: { layout: 'date-time', dateColumn: 0, timeColumn: 1, dateOrder: 'DMY' },
      dryBulb: { column: 2, unit: 'C' },
      humidity: { column: 3, quantity: 'relative-humidity', unit: '%' },
      pressure: { column: 4, unit: 'hPa' },
    });
  });

  it('carries a changed unit and a dropped pressure column, and leaves out parts not chosen', () => {
    const draft = { ...draftFromDetected(detected), dryBulb: { column: 2, unit: 'F' as const }, pressure: null, humidity: null };
    const override = overrideFromDraft(draft);
    expect(override.dryBulb).toEqual({ column: 2, unit: 'F' });
    expect(override.pressure).toBeNull();
    expect('humidity' in override).toBe(false);
  });

  it('offers every column of a new time layout', () => {
    expect(timeDraftFor('ymdh', 0)).toEqual({ layout: 'ymdh', year: 0, month: 1, day: 2, hour: 3, minute: null, hourConvention: 'ending-1-24' });
  });
});

describe('stored hours for the charts', () => {
  it('turns JSON nulls back into NaN and derives the humidity ratio at the file’s pressure or the site’s', () => {
    expect(Array.from(toFloat64([1, null]))).toEqual([1, Number.NaN]);
    const hours = {
      humidityKind: 'relative-humidity-pct' as const,
      timestampsMs: [0, 3_600_000],
      dryBulbC: [25, null],
      humidity: [50, 50],
      pressurePa: null,
      flags: [0, 2],
    };
    const atSite = chartSeries(hours, 1000);
    // psychrolib GetStandardAtmPressure(1000 m) and GetHumRatioFromRelHum(25 °C, 0.5).
    const p = psychrolib.GetStandardAtmPressure(1000);
    expect(atSite.humidityRatio[0]).toBeCloseTo(psychrolib.GetHumRatioFromRelHum(25, 0.5, p), 5);
    expect(Number.isNaN(atSite.humidityRatio[1])).toBe(true);
  });
});

describe('the preview on a site with a fixed-offset time zone', () => {
  it('shows the site clock instead of failing with "Invalid time zone specified"', () => {
    const rows = previewRows([hour], 'relative-humidity-pct', 'SI', 'UTC-07:00');
    // 2023-07-01 00:00 UTC at UTC−07:00 is 30 June 17:00.
    expect(rows[0].timeLocal).toBe('2023-06-30 17:00');
    expect(previewRows([hour], 'relative-humidity-pct', 'SI', 'UTC+05:30')[0].timeLocal).toBe('2023-07-01 05:30');
  });
});
