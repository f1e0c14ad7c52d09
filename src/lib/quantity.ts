import {
  celsiusToFahrenheit,
  enthalpySiToIpBtuPerLb,
  fahrenheitToCelsius,
  enthalpyIpToSiKJPerKg,
  kelvinDifferenceToFahrenheit,
  fahrenheitDifferenceToKelvin,
  kgPerKgToGrainsPerLb,
  grainsPerLbToKgPerKg,
  pascalToInHg,
  inHgToPascal,
  metreToFoot,
  footToMetre,
} from '../../shared/units';
import type { UnitSystem } from './unit-system';

/**
 * How each kind of quantity is shown in SI and in IP, and converted both ways. Values travel in SI
 * (°C, K, kg/kg, kJ/kg, Pa, m, L); only what is shown changes with the unit system.
 */
export type QuantityKind = 'temperature' | 'temperatureDifference' | 'humidityRatio' | 'enthalpy' | 'pressure' | 'elevation' | 'water';

interface Presentation {
  unit: string;
  digits: number;
  fromSi: (v: number) => number;
  toSi: (v: number) => number;
}

const US_GALLON_L = 3.785411784; // NIST SP 811 (2008), App. B: 1 US gallon = 3.785 411 784 L, exact.

const identity = (v: number) => v;

export const presentations: Record<QuantityKind, Record<UnitSystem, Presentation>> = {
  temperature: {
    SI: { unit: '°C', digits: 1, fromSi: identity, toSi: identity },
    IP: { unit: '°F', digits: 1, fromSi: celsiusToFahrenheit, toSi: fahrenheitToCelsius },
  },
  temperatureDifference: {
    SI: { unit: 'K', digits: 1, fromSi: identity, toSi: identity },
    // A difference reads as one: Δ°F, never a temperature's °F (issue 17).
    IP: { unit: 'Δ°F', digits: 1, fromSi: kelvinDifferenceToFahrenheit, toSi: fahrenheitDifferenceToKelvin },
  },
  humidityRatio: {
    SI: { unit: 'g/kg', digits: 2, fromSi: (w) => w * 1000, toSi: (g) => g / 1000 },
    IP: { unit: 'gr/lb', digits: 1, fromSi: kgPerKgToGrainsPerLb, toSi: grainsPerLbToKgPerKg },
  },
  enthalpy: {
    SI: { unit: 'kJ/kg', digits: 1, fromSi: identity, toSi: identity },
    IP: { unit: 'Btu/lb', digits: 2, fromSi: enthalpySiToIpBtuPerLb, toSi: enthalpyIpToSiKJPerKg },
  },
  pressure: {
    SI: { unit: 'kPa', digits: 2, fromSi: (p) => p / 1000, toSi: (k) => k * 1000 },
    IP: { unit: 'inHg', digits: 2, fromSi: pascalToInHg, toSi: inHgToPascal },
  },
  elevation: {
    SI: { unit: 'm', digits: 0, fromSi: identity, toSi: identity },
    IP: { unit: 'ft', digits: 0, fromSi: metreToFoot, toSi: footToMetre },
  },
  water: {
    SI: { unit: 'm³', digits: 2, fromSi: (l) => l / 1000, toSi: (m3) => m3 * 1000 },
    IP: { unit: 'US gal', digits: 0, fromSi: (l) => l / US_GALLON_L, toSi: (g) => g * US_GALLON_L },
  },
};

export function unitOf(kind: QuantityKind, system: UnitSystem): string {
  return presentations[kind][system].unit;
}

/** An SI value in the chosen system's unit, as a number. */
export function toDisplay(kind: QuantityKind, system: UnitSystem, siValue: number): number {
  return presentations[kind][system].fromSi(siValue);
}

/** A value typed in the chosen system's unit, back to SI. */
export function fromDisplay(kind: QuantityKind, system: UnitSystem, shown: number): number {
  return presentations[kind][system].toSi(shown);
}

const numberFormats = new Map<string, Intl.NumberFormat>();

/**
 * One Intl.NumberFormat per (decimals, locale), made on first use and kept: building a formatter is the
 * costly part of formatting (toLocaleString builds one on every call, ~40× slower over a year of hours).
 */
export function numberFormat(decimals: number, locale = 'en'): Intl.NumberFormat {
  const key = `${locale}|${decimals}`;
  let format = numberFormats.get(key);
  if (!format) {
    format = new Intl.NumberFormat(locale, { minimumFractionDigits: decimals, maximumFractionDigits: decimals });
    numberFormats.set(key, format);
  }
  return format;
}

/** Energy always in MWh with one decimal ("1,234.5 MWh"), where a table's column must not change scale from row to row. */
export function formatMegawattHours(kwh: number): string {
  return `${numberFormat(1).format(kwh / 1000)} MWh`;
}

/** A whole number with thousands separators ("262,800"), through the cached formatter. */
export function formatCount(value: number): string {
  return numberFormat(0).format(value);
}

/**
 * An energy in kWh as read: MWh with one decimal from 1 MWh up, kWh below it, so a small energy never reads "0.0 MWh".
 * `signed` writes + before a positive value (a difference).
 */
export function energyText(kwh: number | null | undefined, signed = false): string {
  if (kwh === null || kwh === undefined || !Number.isFinite(kwh)) return '–';
  const sign = signed && kwh > 0 ? '+' : '';
  if (Math.abs(kwh) < 1000) return `${sign}${kwh.toLocaleString('en', { maximumFractionDigits: Math.abs(kwh) < 10 ? 1 : 0 })} kWh`;
  return `${sign}${(kwh / 1000).toLocaleString('en', { minimumFractionDigits: 1, maximumFractionDigits: 1 })} MWh`;
}

/** 1 ton of refrigeration = 12,000 Btu/h = 3.516 852 842 kW (1 Btu_IT/h = 0.293 071 07 W; NIST SP 811, 2008, App. B). */
const KW_PER_TON_OF_REFRIGERATION = 3.516852842;
const KBTU_PER_HOUR_PER_KW = 1 / 0.29307107;

/** A cooling load: kW in SI; in IP also in tons of refrigeration and kBtu/h ("1,200 kW (341 tons of refrigeration, 4,095 kBtu/h)"). */
export function coolingLoadText(kw: number, system: UnitSystem): string {
  const whole = (v: number) => v.toLocaleString('en', { maximumFractionDigits: 0 });
  if (system === 'SI') return `${whole(kw)} kW`;
  return `${whole(kw)} kW (${whole(kw / KW_PER_TON_OF_REFRIGERATION)} tons of refrigeration, ${whole(kw * KBTU_PER_HOUR_PER_KW)} kBtu/h)`;
}

/** "21.4 °C" or "70.5 °F"; an en dash for a missing value. */
export function formatQuantity(kind: QuantityKind, system: UnitSystem, siValue: number | null | undefined, withUnit = true): string {
  if (siValue === null || siValue === undefined || !Number.isFinite(siValue)) return '–';
  const p = presentations[kind][system];
  const text = numberFormat(p.digits).format(p.fromSi(siValue));
  return withUnit ? `${text} ${p.unit}` : text;
}
