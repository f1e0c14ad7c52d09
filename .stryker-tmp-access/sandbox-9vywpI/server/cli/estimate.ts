/**
 * `npm run --silent estimate -- --weather FILE.csv --scenario SCENARIO.json [--hourly OUT.csv] [--elevation M] [--load-profile FILE.csv]`
 *
 * Reads hourly weather through the climate importer, runs one scenario, prints one JSON summary on
 * stdout and, with --hourly, writes one CSV row per hour in file order. Errors go to stderr with a
 * non-zero exit: 2 for a usage or input mistake, 1 for anything else.
 */
// @ts-nocheck

import { closeSync, openSync, readFileSync, writeSync } from 'node:fs';
import path from 'node:path';
import { parseArgs } from 'node:util';
import { importClimateText } from '../../shared/climate';
import type { ColumnMappingOverride, ImportOptions, PressureUnit, QuantityColumn, TemperatureUnit } from '../../shared/climate/types';
import { hourlyCsvInput, hybridHourlyColumns, parseLoadProfileCsv, parseScenario, runScenario, writeHourlyCsv } from '../../shared/scenario';

const USAGE = `Usage: npm run --silent estimate -- --weather FILE.csv --scenario SCENARIO.json [options]

  --weather FILE        hourly weather: canonical CSV, any layout the importer recognises, or a
                        published format recognised without flags (EPW, header-block CSV,
                        fixed-width station records)
  --scenario FILE       scenario JSON (see sample-weather/scenarios/)
  --hourly FILE         also write one CSV row per hour (timestamps in UTC, file order)
  --elevation M         site elevation in metres (overrides the scenario's elevationM)
  --utc-offset-minutes N  local standard time offset for months and hours of day (default: the
                        offset the file's header gives (EPW, station line), else 0)
  --load-profile FILE   hourly IT load profile: 8760 fractions of the design load (0–1), one per hour of the
                        local standard-time year (replaces the scenario's energy.itLoadProfile)

Column mapping, when recognition needs help (COL is a header text or a 1-based column number):
  --time COL                    one ISO 8601 time column
  --dry-bulb COL[:C|F|K]
  --humidity KIND:COL[:UNIT]    KIND relative-humidity (% | fraction), dew-point / wet-bulb (C|F|K),
                                humidity-ratio (g/kg | kg/kg | gr/lb)
  --pressure COL[:Pa|hPa|kPa|inHg|psi] | none
  --delimiter comma|semicolon|tab   --decimal dot|comma
  --time-zone ZONE              IANA zone of timestamps written without offset (default UTC)
  --max-gap-hours N             longest gap filled by interpolation (default 6)
  --humidity-over-ice           the file gives RH or dew point below 0 °C over ice (default: over liquid
                                water at every temperature, WMO-No. 8); sub-zero values are converted
`;

class UsageError extends Error {}

type MappingOverride = Partial<ColumnMappingOverride>;

function main(argv: string[]): number {
  const { values } = parseArgs({
    args: argv,
    options: {
      weather: { type: 'string' },
      scenario: { type: 'string' },
      hourly: { type: 'string' },
      elevation: { type: 'string' },
      'utc-offset-minutes': { type: 'string' },
      'load-profile': { type: 'string' },
      time: { type: 'string' },
      'dry-bulb': { type: 'string' },
      humidity: { type: 'string' },
      pressure: { type: 'string' },
      delimiter: { type: 'string' },
      decimal: { type: 'string' },
      'time-zone': { type: 'string' },
      'max-gap-hours': { type: 'string' },
      'humidity-over-ice': { type: 'boolean' },
      help: { type: 'boolean', short: 'h' },
    },
    strict: true,
    allowPositionals: false,
  });
  if (values.help) {
    process.stdout.write(USAGE);
    return 0;
  }
  if (!values.weather) throw new UsageError('--weather FILE is required.');
  if (!values.scenario) throw new UsageError('--scenario FILE is required.');

  const elevationM = values.elevation === undefined ? undefined : numberOption('--elevation', values.elevation, -500, 6000);
  const utcOffsetMinutes =
    values['utc-offset-minutes'] === undefined ? undefined : numberOption('--utc-offset-minutes', values['utc-offset-minutes'], -840, 840);

  const scenarioText = readText(values.scenario, '--scenario');
  let scenarioJson: unknown;
  try {
    scenarioJson = JSON.parse(scenarioText);
  } catch (error) {
    throw new UsageError(`${values.scenario}: not valid JSON (${(error as Error).message}).`);
  }
  const parsed = parseScenario(scenarioJson);
  if (!parsed.ok) throw new UsageError(`${values.scenario}: invalid scenario:\n  ${parsed.errors.join('\n  ')}`);
  if (values['load-profile']) {
    const file = values['load-profile'];
    const profile = parseLoadProfileCsv(readText(file, '--load-profile'));
    if (!profile.ok) throw new UsageError(`--load-profile ${file}: not a load profile:\n  ${profile.errors.join('\n  ')}`);
    parsed.scenario.energy.itLoadProfile = { kind: 'hourly-profile', name: path.basename(file), fractions: profile.fractions };
  }

  const options: ImportOptions = {};
  const mapping = mappingFromFlags(values);
  if (Object.keys(mapping).length > 0) options.mapping = mapping;
  if (values['time-zone']) options.timeZone = values['time-zone'];
  if (values['max-gap-hours'] !== undefined) options.maxGapHours = numberOption('--max-gap-hours', values['max-gap-hours'], 0, 8784);
  if (values['humidity-over-ice']) options.humidityOverIce = true;

  const imported = importClimateText(readText(values.weather, '--weather'), options);
  if (!imported.ok || !imported.series) {
    const errors = imported.report.issues.filter((issue) => issue.severity === 'error');
    const lines = errors.slice(0, 20).map((issue) => `  ${issue.line ? `line ${issue.line}: ` : ''}${issue.column ? `${issue.column}: ` : ''}${issue.message}`);
    throw new UsageError(`${values.weather}: ${imported.report.summary}${lines.length ? `\n${lines.join('\n')}` : ''}`);
  }
  const series = imported.series;
  const { report } = imported;
  // months and hours of day in the file's own standard time when its header gives one (EPW, station line)
  const headerOffsetHours = report.fileHeader?.utcOffsetHours ?? null;
  const offsetMinutes = utcOffsetMinutes ?? (headerOffsetHours === null ? undefined : Math.round(headerOffsetHours * 60));
  const run = runScenario(parsed.scenario, series, { elevationM, utcOffsetMinutes: offsetMinutes });

  if (values.hourly) {
    const fd = openOutput(values.hourly);
    try {
      writeHourlyCsv(hourlyCsvInput(series, run, utcOffsetMinutes ?? 0, hybridHourlyColumns(run)), (bytes) => writeAll(fd, bytes));
    } finally {
      closeSync(fd);
    }
  }

  const summary = {
    ...run.results,
    weather: {
      file: values.weather,
      importSummary: report.summary,
      importWarnings: report.issues.filter((issue) => issue.severity === 'warning').length,
      firstTimestamp: report.firstTimestamp,
      lastTimestamp: report.lastTimestamp,
      years: report.years,
      hours: report.counts.hours,
      filledHours: report.counts.filledHours,
      missingHours: report.counts.missingHours,
      timeLayout: report.timeLayout,
      humidityKind: series.humidity.kind,
      humidityOverIce: report.humidityOverIce,
      format: imported.mapping.format?.id ?? null,
      fileHeader: report.fileHeader ?? null,
      typicalYear: report.typicalYear ?? null,
    },
  };
  process.stdout.write(`${JSON.stringify(summary, null, 2)}\n`);
  return 0;
}

function readText(file: string, flag: string): string {
  try {
    return readFileSync(file, 'utf8');
  } catch (error) {
    throw new UsageError(`${flag} ${file}: cannot read (${(error as NodeJS.ErrnoException).code ?? (error as Error).message}).`);
  }
}

function openOutput(file: string): number {
  try {
    return openSync(file, 'w');
  } catch (error) {
    throw new UsageError(`--hourly ${file}: cannot write (${(error as NodeJS.ErrnoException).code ?? (error as Error).message}).`);
  }
}

function writeAll(fd: number, bytes: Uint8Array): void {
  let offset = 0;
  while (offset < bytes.length) offset += writeSync(fd, bytes, offset, bytes.length - offset);
}

function numberOption(flag: string, text: string, min: number, max: number): number {
  const value = Number(text);
  if (text.trim() === '' || !Number.isFinite(value) || value < min || value > max) {
    throw new UsageError(`${flag} must be a number from ${min} to ${max} (got "${text}").`);
  }
  return value;
}

/** A header text, or a 1-based column number turned into the importer's 0-based index. */
function columnRef(text: string, flag: string): number | string {
  if (text === '') throw new UsageError(`${flag}: the column is empty.`);
  if (/^\d+$/.test(text)) {
    const index = Number(text) - 1;
    if (index < 0) throw new UsageError(`${flag}: column numbers start at 1 (got ${text}).`);
    return index;
  }
  return text;
}

/** Splits "a:b:c" from the right for the unit, so a header text may itself hold colons. */
function splitUnit<U extends string>(text: string, units: readonly U[]): { column: string; unit: U | null } {
  const at = text.lastIndexOf(':');
  if (at > 0 && (units as readonly string[]).includes(text.slice(at + 1))) {
    return { column: text.slice(0, at), unit: text.slice(at + 1) as U };
  }
  return { column: text, unit: null };
}

const TEMPERATURE_UNITS = ['C', 'F', 'K'] as const satisfies readonly TemperatureUnit[];
const PRESSURE_UNITS = ['Pa', 'hPa', 'kPa', 'inHg', 'psi'] as const satisfies readonly PressureUnit[];
const HUMIDITY_UNITS = {
  'relative-humidity': ['%', 'fraction'],
  'dew-point': TEMPERATURE_UNITS,
  'wet-bulb': TEMPERATURE_UNITS,
  'humidity-ratio': ['g/kg', 'kg/kg', 'gr/lb'],
} as const;
type HumidityQuantity = keyof typeof HUMIDITY_UNITS;

function mappingFromFlags(values: Record<string, string | boolean | undefined>): MappingOverride {
  const mapping: MappingOverride = {};
  const text = (name: string): string | undefined => values[name] as string | undefined;

  const delimiter = text('delimiter');
  if (delimiter !== undefined) {
    const chosen = ({ comma: ',', semicolon: ';', tab: '\t' } as const)[delimiter as 'comma' | 'semicolon' | 'tab'];
    if (!chosen) throw new UsageError(`--delimiter must be comma, semicolon or tab (got "${delimiter}").`);
    mapping.delimiter = chosen;
  }
  const decimal = text('decimal');
  if (decimal !== undefined) {
    const chosen = ({ dot: '.', comma: ',' } as const)[decimal as 'dot' | 'comma'];
    if (!chosen) throw new UsageError(`--decimal must be dot or comma (got "${decimal}").`);
    mapping.decimalSeparator = chosen;
  }
  const time = text('time');
  if (time !== undefined) mapping.time = { layout: 'iso', column: columnRef(time, '--time') };

  const dryBulb = text('dry-bulb');
  if (dryBulb !== undefined) {
    const { column, unit } = splitUnit(dryBulb, TEMPERATURE_UNITS);
    mapping.dryBulb = { column: columnRef(column, '--dry-bulb'), unit: unit ?? 'C' };
  }

  const humidity = text('humidity');
  if (humidity !== undefined) {
    const at = humidity.indexOf(':');
    const quantity = humidity.slice(0, at) as HumidityQuantity;
    if (at < 0 || !(quantity in HUMIDITY_UNITS)) {
      throw new UsageError(`--humidity must be KIND:COL[:UNIT] with KIND one of ${Object.keys(HUMIDITY_UNITS).join(', ')} (got "${humidity}").`);
    }
    const units = HUMIDITY_UNITS[quantity];
    const { column, unit } = splitUnit<string>(humidity.slice(at + 1), units);
    mapping.humidity = {
      column: columnRef(column, '--humidity'),
      ...({ quantity, unit: unit ?? units[0] } as Exclude<QuantityColumn, { quantity: 'dry-bulb' | 'pressure' }>),
    };
  }

  const pressure = text('pressure');
  if (pressure !== undefined) {
    if (pressure === 'none') mapping.pressure = null;
    else {
      const { column, unit } = splitUnit(pressure, PRESSURE_UNITS);
      mapping.pressure = { column: columnRef(column, '--pressure'), unit: unit ?? 'kPa' };
    }
  }
  return mapping;
}

try {
  process.exitCode = main(process.argv.slice(2));
} catch (error) {
  const usage = error instanceof UsageError || (error as NodeJS.ErrnoException).code?.startsWith('ERR_PARSE_ARGS');
  process.stderr.write(`estimate: ${(error as Error).message}\n`);
  if (usage && !(error instanceof UsageError)) process.stderr.write(`\n${USAGE}`);
  process.exitCode = usage ? 2 : 1;
}
