/** Header wording and units as people write them (the examples listed in the climate-files issue and more). */
// @ts-nocheck

import { describe, expect, it } from 'vitest';
import { quantityOf, readHeader } from '../../../shared/climate/header-words';

describe('readHeader + quantityOf', () => {
  it.each([
    ['Temp (F)', 'dry-bulb', 'F'],
    ['air temperature [°C]', 'dry-bulb', 'C'],
    ['DryBulb_C', 'dry-bulb', 'C'],
    ['Dry-bulb temperature (K)', 'dry-bulb', 'K'],
    ['TEMPERATURE DEGF', 'dry-bulb', 'F'],
    ['Dew Point (F)', 'dew-point', 'F'],
    ['dewpoint_c', 'dew-point', 'C'],
    ['Wet Bulb [°C]', 'wet-bulb', 'C'],
    ['RH %', 'relative-humidity', '%'],
    ['Relative Humidity (fraction)', 'relative-humidity', 'fraction'],
    ['Humidity Ratio (gr/lb)', 'humidity-ratio', 'gr/lb'],
    ['humidity (g/kg)', 'humidity-ratio', 'g/kg'],
    ['W (lb/lb)', 'humidity-ratio', 'kg/kg'],
    ['Station Pressure (inHg)', 'pressure', 'inHg'],
    ['pressure [hPa]', 'pressure', 'hPa'],
    ['Pressure_Pa', 'pressure', 'Pa'],
    ['Baro (mbar)', 'pressure', 'hPa'],
    ['P (psi)', 'pressure', 'psi'],
    ['pressure_kpa', 'pressure', 'kPa'],
  ])('%s → %s in %s', (header, quantity, unit) => {
    const reading = readHeader(header);
    expect(quantityOf(reading)?.quantity).toBe(quantity);
    expect(reading.unit?.unit).toBe(unit);
  });

  it.each(['Sea Level Pressure (hPa)', 'Max Temp (C)', 'Soil temperature', 'Vapour pressure (hPa)', 'Wind speed (m/s)', 'hr'])(
    '%s is not taken as a quantity of the series',
    (header) => {
      expect(quantityOf(readHeader(header))).toBeNull();
    },
  );
});
