/**
 * Writes the synthetic sample weather: three years of hourly data for four invented sites with
 * different climates, each in a different layout and units, so the demo and the tests exercise
 * the climate importer. Deterministic: a seeded generator per site, no clock, no network.
 *
 *   npx tsx sample-weather/generate.ts
 *
 * The data are invented. Temperature is an annual cycle + a daily cycle + a slowly varying
 * weather anomaly; dew point sits below dry-bulb by a depression that widens in the afternoon;
 * station pressure follows the standard atmosphere for the elevation plus a weather anomaly.
 */
// @ts-nocheck

import { writeFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { wallClockReader } from '../shared/time-zone';
import type { SampleSite } from './sample-site';
import { seededRandom } from './seeded-random';

const folder = path.dirname(fileURLToPath(import.meta.url));
const YEARS = [2021, 2022, 2023];
const HOUR_MS = 3_600_000;

function gaussian(random: () => number): () => number {
  return () => {
    const u = Math.max(random(), 1e-12);
    return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * random());
  };
}

/** Saturation vapour pressure over water, hPa: Magnus form (Alduchov & Eskridge 1996); synthetic data only. */
function saturationHpa(tC: number): number {
  return 6.1094 * Math.exp((17.625 * tC) / (tC + 243.04));
}

/** Station pressure at an elevation, Pa: ASHRAE Handbook—Fundamentals 2017 ch. 1 eq. 3 (standard atmosphere). */
function standardPressurePa(elevationM: number): number {
  return 101325 * (1 - 2.25577e-5 * elevationM) ** 5.2559;
}

interface Climate {
  seed: number;
  longitude: number;
  elevationM: number;
  meanC: number;
  annualAmplitudeK: number;
  /** Day of year of the warmest day. */
  warmestDay: number;
  dailyAmplitudeK: number;
  anomalySigmaK: number;
  /** Dew-point depression at dawn and extra depression at the afternoon peak, K. */
  dawnDepressionK: number;
  afternoonDepressionK: number;
  /** When set, dew point follows its own seasonal cycle (dry climates) instead of the dry-bulb. */
  dewPoint?: { meanC: number; amplitudeK: number; warmestDay: number; sigmaK: number };
}

interface Hour {
  utcMs: number;
  dryBulbC: number;
  dewPointC: number;
  relativeHumidityPct: number;
  pressurePa: number;
}

function simulate(climate: Climate): Hour[] {
  const random = seededRandom(climate.seed);
  const normal = gaussian(random);
  const start = Date.UTC(YEARS[0], 0, 1) - 24 * HOUR_MS;
  const end = Date.UTC(YEARS[YEARS.length - 1] + 1, 0, 1) + 24 * HOUR_MS;
  const keep = Math.exp(-1 / 60); // weather anomalies decorrelate over some 2.5 days
  const spread = Math.sqrt(1 - keep * keep);
  let anomaly = 0;
  let dewAnomaly = 0;
  let pressureAnomaly = 0;
  let depressionNoise = 0;
  const hours: Hour[] = [];
  for (let t = start; t < end; t += HOUR_MS) {
    const dayOfYear = (t - Date.UTC(new Date(t).getUTCFullYear(), 0, 1)) / (24 * HOUR_MS);
    const solarHour = (((t / HOUR_MS + climate.longitude / 15) % 24) + 24) % 24;
    const season = Math.cos((2 * Math.PI * (dayOfYear - climate.warmestDay)) / 365.25);
    const daily = Math.cos((2 * Math.PI * (solarHour - 15)) / 24);
    anomaly = keep * anomaly + spread * climate.anomalySigmaK * normal();
    dewAnomaly = keep * dewAnomaly + spread * normal();
    pressureAnomaly = keep * pressureAnomaly + spread * 900 * normal();
    depressionNoise = 0.8 * depressionNoise + 0.6 * normal();
    const dryBulbC = climate.meanC + climate.annualAmplitudeK * season + climate.dailyAmplitudeK * daily + anomaly;
    const afternoon = (daily + 1) / 2;
    let dewPointC: number;
    if (climate.dewPoint) {
      const d = climate.dewPoint;
      const dewSeason = Math.cos((2 * Math.PI * (dayOfYear - d.warmestDay)) / 365.25);
      dewPointC = d.meanC + d.amplitudeK * dewSeason + d.sigmaK * dewAnomaly;
    } else {
      dewPointC = dryBulbC - climate.dawnDepressionK - climate.afternoonDepressionK * afternoon - Math.abs(depressionNoise);
    }
    // dew point never above dry-bulb: keep at least a small depression
    dewPointC = Math.min(dewPointC, dryBulbC - 0.3);
    const relativeHumidityPct = (100 * saturationHpa(dewPointC)) / saturationHpa(dryBulbC);
    const pressurePa = standardPressurePa(climate.elevationM) + pressureAnomaly;
    hours.push({ utcMs: t, dryBulbC, dewPointC, relativeHumidityPct, pressurePa });
  }
  return hours;
}

const pad = (n: number, width = 2) => String(n).padStart(width, '0');
const fixed = (v: number, digits: number) => {
  const text = v.toFixed(digits);
  return /^-0\.?0*$/.test(text) ? text.slice(1) : text;
};
const toF = (c: number) => c * 1.8 + 32;
const toInHg = (pa: number) => pa / 3386.389;

interface SiteFile extends Omit<SampleSite, 'years' | 'synthetic'> {
  build: () => string;
}

function note(site: Omit<SiteFile, 'build'>, extra: string): string {
  return [
    `# SYNTHETIC DATA for demonstration only: invented site "${site.name}" (${site.climate}); not measured weather.`,
    `# Generated by sample-weather/generate.ts (seeded, deterministic). ${extra}`,
  ].join('\n');
}

const inYears = (h: Hour) => {
  const year = new Date(h.utcMs).getUTCFullYear();
  return year >= YEARS[0] && year <= YEARS[YEARS.length - 1];
};

const kelderwick: Omit<SiteFile, 'build'> = {
  id: 'kelderwick-point',
  name: 'Kelderwick Point',
  climate: 'mild maritime',
  latitude: 56.42,
  longitude: -6.87,
  elevationM: 14,
  timeZone: 'Europe/London',
  file: 'kelderwick-point.csv',
  importTimeZone: 'UTC',
  layout: 'canonical CSV: comma, ISO 8601 timestamps in UTC (Z), dry-bulb °C, relative humidity %, station pressure kPa',
};

const mesaAlta: Omit<SiteFile, 'build'> = {
  id: 'mesa-alta',
  name: 'Mesa Alta Ridge',
  climate: 'hot dry at altitude',
  latitude: 34.18,
  longitude: -110.62,
  elevationM: 1690,
  timeZone: 'America/Phoenix',
  file: 'mesa-alta-ridge.csv',
  importTimeZone: 'America/Phoenix',
  layout: 'comma, year/month/day/hour columns with hour 1–24 as hour ending in local standard time, °F, dew point °F, station pressure inHg',
};

const telukHijau: Omit<SiteFile, 'build'> = {
  id: 'teluk-hijau',
  name: 'Teluk Hijau',
  climate: 'hot humid',
  latitude: 2.74,
  longitude: 101.52,
  elevationM: 9,
  timeZone: 'Asia/Kuala_Lumpur',
  file: 'teluk-hijau.tsv',
  importTimeZone: 'UTC',
  layout: 'tab-delimited, ISO 8601 local times with offset +08:00, dry-bulb °C, relative humidity as a fraction, no pressure',
};

const zimnaDolina: Omit<SiteFile, 'build'> = {
  id: 'zimna-dolina',
  name: 'Zimna Dolina',
  climate: 'cold continental',
  latitude: 53.62,
  longitude: 23.41,
  elevationM: 158,
  timeZone: 'Europe/Warsaw',
  file: 'zimna-dolina.csv',
  importTimeZone: 'Europe/Warsaw',
  layout: 'semicolon, decimal comma, CRLF, date (DD.MM.YYYY) and time columns in local civil time with daylight saving, °C, RH %, pressure hPa',
};

const sites: SiteFile[] = [
  {
    ...kelderwick,
    build() {
      const hours = simulate({
        seed: 11,
        longitude: kelderwick.longitude,
        elevationM: kelderwick.elevationM,
        meanC: 9.4,
        annualAmplitudeK: 4.6,
        warmestDay: 215,
        dailyAmplitudeK: 2.2,
        anomalySigmaK: 2.2,
        dawnDepressionK: 0.8,
        afternoonDepressionK: 2.6,
      }).filter((h) => inYears(h));
      const lines = [note(kelderwick, 'Times are UTC.'), 'timestamp,dry_bulb_c,relative_humidity_pct,pressure_kpa'];
      for (const h of hours) {
        lines.push(
          `${new Date(h.utcMs).toISOString().slice(0, 16)}Z,${fixed(h.dryBulbC, 1)},${fixed(h.relativeHumidityPct, 1)},${fixed(h.pressurePa / 1000, 2)}`,
        );
      }
      return `${lines.join('\n')}\n`;
    },
  },
  {
    ...mesaAlta,
    build() {
      const hours = simulate({
        seed: 23,
        longitude: mesaAlta.longitude,
        elevationM: mesaAlta.elevationM,
        meanC: 15.5,
        annualAmplitudeK: 10.5,
        warmestDay: 185,
        dailyAmplitudeK: 8,
        anomalySigmaK: 2.5,
        dawnDepressionK: 0,
        afternoonDepressionK: 0,
        dewPoint: { meanC: -1.5, amplitudeK: 7.5, warmestDay: 215, sigmaK: 4 },
      });
      // local standard time, UTC−7 all year; hour h (1–24) ends at local midnight + h
      const lines = [
        note(mesaAlta, 'Local standard time (UTC-07:00), hour 1-24 = hour ending.'),
        'Year,Month,Day,Hour,Temp (F),Dew Point (F),Station Pressure (inHg)',
      ];
      for (const h of hours) {
        const ending = new Date(h.utcMs - 7 * HOUR_MS - HOUR_MS); // the hour this stamp ends, in local time
        const y = ending.getUTCFullYear();
        if (y < YEARS[0] || y > YEARS[YEARS.length - 1]) continue;
        const hourEnding = ending.getUTCHours() + 1;
        const dewCell = h.utcMs === Date.UTC(2022, 5, 14, 19) || h.utcMs === Date.UTC(2022, 5, 14, 20) ? 'M' : fixed(toF(h.dewPointC), 1);
        lines.push(
          `${y},${ending.getUTCMonth() + 1},${ending.getUTCDate()},${hourEnding},${fixed(toF(h.dryBulbC), 1)},${dewCell},${fixed(toInHg(h.pressurePa), 2)}`,
        );
      }
      return `${lines.join('\n')}\n`;
    },
  },
  {
    ...telukHijau,
    build() {
      const hours = simulate({
        seed: 37,
        longitude: telukHijau.longitude,
        elevationM: telukHijau.elevationM,
        meanC: 27.6,
        annualAmplitudeK: 0.6,
        warmestDay: 130,
        dailyAmplitudeK: 3.6,
        anomalySigmaK: 0.8,
        dawnDepressionK: 0.9,
        afternoonDepressionK: 6.2,
      });
      const lines = [note(telukHijau, 'Local time with offset +08:00.'), ['datetime', 'air temperature (C)', 'relative humidity (fraction)'].join('\t')];
      for (const h of hours) {
        const local = new Date(h.utcMs + 8 * HOUR_MS);
        const y = local.getUTCFullYear();
        if (y < YEARS[0] || y > YEARS[YEARS.length - 1]) continue;
        lines.push(`${local.toISOString().slice(0, 16)}+08:00\t${fixed(h.dryBulbC, 1)}\t${fixed(h.relativeHumidityPct / 100, 3)}`);
      }
      return `${lines.join('\n')}\n`;
    },
  },
  {
    ...zimnaDolina,
    build() {
      const clock = wallClockReader(zimnaDolina.timeZone);
      const hours = simulate({
        seed: 41,
        longitude: zimnaDolina.longitude,
        elevationM: zimnaDolina.elevationM,
        meanC: 7.2,
        annualAmplitudeK: 11.8,
        warmestDay: 200,
        dailyAmplitudeK: 4.2,
        anomalySigmaK: 3.6,
        dawnDepressionK: 0.6,
        afternoonDepressionK: 5.5,
      });
      const lines = [
        note(zimnaDolina, 'Local civil time (Europe/Warsaw, with daylight saving); a 4-hour logger outage in July 2022 is left in.'),
        'Date;Time;Air temperature [°C];Relative humidity [%];Pressure [hPa]',
      ];
      const outage = Date.UTC(2022, 6, 12, 9);
      for (const h of hours) {
        const w = clock(h.utcMs);
        if (w.year < YEARS[0] || w.year > YEARS[YEARS.length - 1]) continue;
        if (h.utcMs >= outage && h.utcMs < outage + 4 * HOUR_MS) continue;
        const comma = (v: number, digits: number) => fixed(v, digits).replace('.', ',');
        lines.push(
          `${pad(w.day)}.${pad(w.month)}.${w.year};${pad(w.hour)}:${pad(w.minute)};${comma(h.dryBulbC, 1)};${comma(h.relativeHumidityPct, 1)};${comma(h.pressurePa / 100, 1)}`,
        );
      }
      return `${lines.join('\r\n')}\r\n`;
    },
  },
];

/** Each sample file's name and text, and the sites.json that describes them (nothing written). */
export function buildSampleWeather(): { files: { file: string; text: string }[]; sitesJson: string } {
  const files: { file: string; text: string }[] = [];
  const descriptions = sites.map(({ build, ...site }) => {
    files.push({ file: site.file, text: build() });
    return { ...site, years: YEARS, synthetic: true };
  });
  const sitesJson = `${JSON.stringify({ note: 'Invented sites with synthetic weather, for demonstration only.', sites: descriptions }, null, 2)}\n`;
  return { files, sitesJson };
}

if (process.argv[1] && import.meta.url === pathToFileURL(path.resolve(process.argv[1])).href) {
  const { files, sitesJson } = buildSampleWeather();
  for (const { file, text } of files) {
    writeFileSync(path.join(folder, file), text);
    console.log(`${file}: ${(text.length / 1e6).toFixed(2)} MB`);
  }
  writeFileSync(path.join(folder, 'sites.json'), sitesJson);
}
