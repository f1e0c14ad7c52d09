/**
 * Reading a column header as a quantity name plus a unit: `Temp (F)`, `air temperature [°C]`,
 * `DryBulb_C`, `Dew Point (F)`, `RH %`, `Station Pressure (inHg)`, `pressure [hPa]`, `Pressure_Pa`.
 */
// @ts-nocheck

import type { HumidityRatioUnit, PressureUnit, Quantity, RelativeHumidityUnit, TemperatureUnit } from './types';

export type UnitFamily =
  | { family: 'temperature'; unit: TemperatureUnit }
  | { family: 'relative-humidity'; unit: RelativeHumidityUnit }
  | { family: 'humidity-ratio'; unit: HumidityRatioUnit }
  | { family: 'pressure'; unit: PressureUnit };

const UNIT_WORDS: Record<string, UnitFamily> = {};
function units(family: UnitFamily, ...words: string[]): void {
  for (const word of words) UNIT_WORDS[word] = family;
}
units({ family: 'temperature', unit: 'C' }, 'c', 'degc', 'celsius', 'degcelsius', 'degreesc', 'degreec', 'degreescelsius');
units({ family: 'temperature', unit: 'F' }, 'f', 'degf', 'fahrenheit', 'degfahrenheit', 'degreesf', 'degreef', 'degreesfahrenheit');
units({ family: 'temperature', unit: 'K' }, 'k', 'degk', 'kelvin');
units({ family: 'relative-humidity', unit: '%' }, '%', 'pct', 'percent', 'perc');
units({ family: 'relative-humidity', unit: 'fraction' }, 'fraction', 'frac', '01', '0to1');
units({ family: 'humidity-ratio', unit: 'g/kg' }, 'gkg', 'gperkg', 'gkgda', 'gkgdryair');
units({ family: 'humidity-ratio', unit: 'kg/kg' }, 'kgkg', 'kgperkg', 'kgkgda', 'kgkgdryair', 'lblb', 'lbperlb');
units({ family: 'humidity-ratio', unit: 'gr/lb' }, 'grlb', 'grainslb', 'grainsperlb', 'grperlb', 'grains', 'grainlb');
units({ family: 'pressure', unit: 'Pa' }, 'pa', 'pascal', 'pascals');
units({ family: 'pressure', unit: 'hPa' }, 'hpa', 'mbar', 'mb', 'millibar', 'millibars', 'hectopascal');
units({ family: 'pressure', unit: 'kPa' }, 'kpa', 'kilopascal');
units({ family: 'pressure', unit: 'inHg' }, 'inhg', 'inchhg', 'inchesofmercury', 'inchesmercury', 'inmercury');
units({ family: 'pressure', unit: 'psi' }, 'psi', 'psia', 'lbfin2');

export interface HeaderReading {
  /** Name words without the unit, joined without spaces: `drybulb`, `stationpressure`. */
  compact: string;
  unit: UnitFamily | null;
}

function words(text: string): string[] {
  return text.split(/[^a-z0-9%]+/).filter((w) => w !== '');
}

export function readHeader(header: string): HeaderReading {
  const plain = header
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .replace(/([a-z])([A-Z])/g, '$1 $2')
    .toLowerCase()
    .replace(/[°º\ufffd]/g, ' deg ')
    .replace(/%/g, ' % ');
  const bracket = /[([{]([^)\]}]*)[)\]}]/.exec(plain);
  const nameWords = words(bracket ? plain.replace(/[([{][^)\]}]*[)\]}]/g, ' ') : plain);
  let unit: UnitFamily | null = bracket ? (UNIT_WORDS[words(bracket[1]).join('')] ?? null) : null;
  if (!unit) {
    // the unit as the trailing word(s): longest match first, so `h pa` is hPa, not Pa
    for (let take = Math.min(3, nameWords.length - 1); take >= 1; take--) {
      const candidate = UNIT_WORDS[nameWords.slice(-take).join('')];
      if (candidate) {
        unit = candidate;
        nameWords.length -= take;
        break;
      }
    }
  }
  return { compact: nameWords.join(''), unit };
}

export type TimePart = 'datetime' | 'year' | 'month' | 'day' | 'hour' | 'minute' | 'date' | 'time';

const TIME_NAMES: [RegExp, TimePart][] = [
  [/^(timestamp|datetime|datetimeutc|datetimelocal|timestamputc|isotime|obstime|observationtime|validtime|ts|utc|dateandtime)$/, 'datetime'],
  [/^(year|yr|yyyy|years)$/, 'year'],
  [/^(month|mo|mon|mm|mth)$/, 'month'],
  [/^(day|dy|dd|dom|dayofmonth)$/, 'day'],
  [/^(hour|hr|hh|he|hourending|hourbeginning|hourofday|hours)$/, 'hour'],
  [/^(minute|min|mi|minutes)$/, 'minute'],
  [/^(date|day|datum|localdate|dateutc|obsdate)$/, 'date'],
  [/^(time|localtime|timeutc|clock|hhmm|timeofday|obstime)$/, 'time'],
];

export function timePartOf(reading: HeaderReading): TimePart | null {
  for (const [pattern, part] of TIME_NAMES) if (pattern.test(reading.compact)) return part;
  return null;
}

/** Exact header names of the command-line CSV; recognised with confidence 1. */
export const CANONICAL_HEADERS: Record<string, { quantity: Quantity | 'timestamp'; unit: UnitFamily['unit'] | null }> = {
  timestamp: { quantity: 'timestamp', unit: null },
  dry_bulb_c: { quantity: 'dry-bulb', unit: 'C' },
  relative_humidity_pct: { quantity: 'relative-humidity', unit: '%' },
  dew_point_c: { quantity: 'dew-point', unit: 'C' },
  wet_bulb_c: { quantity: 'wet-bulb', unit: 'C' },
  humidity_ratio_gkg: { quantity: 'humidity-ratio', unit: 'g/kg' },
  pressure_kpa: { quantity: 'pressure', unit: 'kPa' },
};

const QUANTITY_NAMES: [RegExp, Quantity, number][] = [
  [/dewpoint|dewpt|taupunkt|pointderosee|puntoderocio/, 'dew-point', 0.95],
  [/^(tdp|td|dp|dpt|tdew|dew)$/, 'dew-point', 0.85],
  [/wetbulb/, 'wet-bulb', 0.95],
  [/^(twb|wb|wbt)$/, 'wet-bulb', 0.85],
  [/drybulb/, 'dry-bulb', 0.95],
  [/^(tdb|db|dbt|ta|tair|t|tamb|oat|tout|tdry)$/, 'dry-bulb', 0.85],
  [/relativehumidity|relhum|relhumidity/, 'relative-humidity', 0.95],
  [/^(rh|humidity|hum|relh|rhum)$/, 'relative-humidity', 0.9],
  [/feuchte|humidite|humedad|umidita/, 'relative-humidity', 0.8],
  [/humidityratio|mixingratio|moisturecontent|humratio/, 'humidity-ratio', 0.95],
  [/^(w|mr|hr)$/, 'humidity-ratio', 0.5],
  [/sealevel|slp|msl|vapou?r|partial|altimeter|qnh/, 'pressure', 0],
  [/pressure|baro|press/, 'pressure', 0.95],
  [/druck|pression|presion/, 'pressure', 0.85],
  [/^(p|pres|patm|pstn|stnp|psta|ps|pstation)$/, 'pressure', 0.85],
  [/dew|wet|soil|water|sea|min|max|feel|apparent|globe|radiant|sky|ground|surface|deep|index/, 'dry-bulb', 0],
  [/temperature|temp|tair|airt/, 'dry-bulb', 0.9],
];

/** The quantity a header names and how sure the name is (0 for names that must not be taken). */
export function quantityOf(reading: HeaderReading): { quantity: Quantity; strength: number } | null {
  for (const [pattern, quantity, strength] of QUANTITY_NAMES) {
    if (pattern.test(reading.compact)) {
      // a weak humidity-ratio name (w, hr) counts only with a humidity-ratio unit
      if (strength === 0.5 && reading.unit?.family !== 'humidity-ratio') continue;
      if (strength === 0) return null;
      if (quantity === 'relative-humidity' && reading.unit?.family === 'humidity-ratio') {
        return { quantity: 'humidity-ratio', strength };
      }
      return { quantity, strength };
    }
  }
  return null;
}

/** The unit family a quantity's cells must be written in. */
export function familyOf(quantity: Quantity): UnitFamily['family'] {
  if (quantity === 'dry-bulb' || quantity === 'dew-point' || quantity === 'wet-bulb') return 'temperature';
  return quantity;
}
