/**
 * Units: branded number types that carry a quantity's unit, and SI ↔ IP converters.
 * The engine computes in SI (°C, Pa, kg/kg, kJ/kg dry air); these convert at the edges for the IP
 * toggle (°F, grains/lb or lb/lb, Btu/lb, inHg) and for pressures quoted in kPa, hPa or psi.
 * Every factor names its source; all but the IP enthalpy datum are exact by definition.
 * Converters accept any number (a branded value is a number) and return the branded target type.
 */
// @ts-nocheck


declare const unitBrand: unique symbol;
/** A number known to be in unit U. Brand a raw number with the constructor of its type, e.g. `celsius(21)`. */
export type Quantity<U extends string> = number & { readonly [unitBrand]: U };

export type Celsius = Quantity<'°C'>;
export type Fahrenheit = Quantity<'°F'>;
export type Kelvin = Quantity<'K'>;
export type KelvinDifference = Quantity<'ΔK'>;
export type FahrenheitDifference = Quantity<'Δ°F'>;
export type Pascal = Quantity<'Pa'>;
export type KiloPascal = Quantity<'kPa'>;
export type HectoPascal = Quantity<'hPa'>;
export type Psi = Quantity<'psi'>;
export type InchOfMercury = Quantity<'inHg'>;
export type KgPerKg = Quantity<'kg/kg'>;
export type GramsPerKg = Quantity<'g/kg'>;
export type LbPerLb = Quantity<'lb/lb'>;
export type GrainsPerLb = Quantity<'gr/lb'>;
export type KJPerKg = Quantity<'kJ/kg'>;
export type BtuPerLb = Quantity<'Btu/lb'>;
export type Metre = Quantity<'m'>;
export type Foot = Quantity<'ft'>;
export type Percent = Quantity<'%'>;

export const celsius = (value: number): Celsius => value as Celsius;
export const fahrenheit = (value: number): Fahrenheit => value as Fahrenheit;
export const kelvin = (value: number): Kelvin => value as Kelvin;
export const pascal = (value: number): Pascal => value as Pascal;
export const kgPerKg = (value: number): KgPerKg => value as KgPerKg;
export const kJPerKg = (value: number): KJPerKg => value as KJPerKg;
export const metre = (value: number): Metre => value as Metre;
export const percent = (value: number): Percent => value as Percent;

/** 0 °C = 273.15 K exactly (SI Brochure, 9th ed., definition of the Celsius temperature). */
export const KELVIN_AT_0C = 273.15;
/** °F = 1.8·°C + 32 exactly (NIST SP 811, 2008, §B.9). */
export const FAHRENHEIT_PER_KELVIN = 1.8;
export const FAHRENHEIT_AT_0C = 32;
/** International foot = 0.3048 m exactly (international yard and pound agreement, 1959). */
export const METRES_PER_FOOT = 0.3048;
/** Avoirdupois pound = 0.45359237 kg exactly (international yard and pound agreement, 1959). */
export const KG_PER_POUND = 0.45359237;
/** 1 lb = 7000 grains exactly (the grain is defined as 64.79891 mg = 1/7000 lb). */
export const GRAINS_PER_POUND = 7000;
/** Standard gravity 9.80665 m/s² exactly (3rd CGPM, 1901). */
export const STANDARD_GRAVITY = 9.80665;
/** Pound-force = 0.45359237 kg × 9.80665 m/s² = 4.4482216152605 N exactly. */
export const NEWTONS_PER_POUND_FORCE = KG_PER_POUND * STANDARD_GRAVITY;
/** psi = lbf / in², in = 0.0254 m exactly: 6894.757293168… Pa (NIST SP 811, 2008, App. B). */
export const PASCALS_PER_PSI = NEWTONS_PER_POUND_FORCE / (0.0254 * 0.0254);
/** Conventional millimetre of mercury = 133.322387415 Pa exactly (13.5951 g/cm³ × 9.80665 m/s² × 1 mm; NIST SP 811, 2008, App. B). */
export const PASCALS_PER_MM_HG = 133.322387415;
/** Conventional inch of mercury = 25.4 conventional mmHg = 3386.38864… Pa. */
export const PASCALS_PER_IN_HG = 25.4 * PASCALS_PER_MM_HG;
/** International Table Btu per pound = 2.326 kJ/kg exactly (NIST SP 811, 2008, App. B: Btu_IT/lb = 2326 J/kg). */
export const KJ_PER_KG_PER_BTU_PER_LB = 2.326;
/**
 * Datum shift for moist-air enthalpy in IP units: ASHRAE's IP equation h = 0.240·t + W·(1061 + 0.444·t)
 * takes dry air at 0 °F as zero, the SI equation dry air at 0 °C; both take liquid water at 0 °C (32 °F).
 * Dry air at 32 °F holds 0.240 × 32 = 7.68 Btu/lb (ASHRAE Handbook—Fundamentals 2017 ch. 1 eq. 32 IP form).
 */
export const IP_ENTHALPY_DATUM_BTU_PER_LB = 0.24 * 32;

// Temperature
export const celsiusToFahrenheit = (tC: number): Fahrenheit => (tC * FAHRENHEIT_PER_KELVIN + FAHRENHEIT_AT_0C) as Fahrenheit;
export const fahrenheitToCelsius = (tF: number): Celsius => ((tF - FAHRENHEIT_AT_0C) / FAHRENHEIT_PER_KELVIN) as Celsius;
export const celsiusToKelvin = (tC: number): Kelvin => (tC + KELVIN_AT_0C) as Kelvin;
export const kelvinToCelsius = (tK: number): Celsius => (tK - KELVIN_AT_0C) as Celsius;
/** A temperature difference (approach, range, rise): 1 K = 1.8 °F, no offset. */
export const kelvinDifferenceToFahrenheit = (dK: number): FahrenheitDifference => (dK * FAHRENHEIT_PER_KELVIN) as FahrenheitDifference;
export const fahrenheitDifferenceToKelvin = (dF: number): KelvinDifference => (dF / FAHRENHEIT_PER_KELVIN) as KelvinDifference;

// Pressure
export const pascalToKiloPascal = (p: number): KiloPascal => (p / 1000) as KiloPascal;
export const kiloPascalToPascal = (p: number): Pascal => (p * 1000) as Pascal;
export const pascalToHectoPascal = (p: number): HectoPascal => (p / 100) as HectoPascal;
export const hectoPascalToPascal = (p: number): Pascal => (p * 100) as Pascal;
export const pascalToPsi = (p: number): Psi => (p / PASCALS_PER_PSI) as Psi;
export const psiToPascal = (p: number): Pascal => (p * PASCALS_PER_PSI) as Pascal;
export const pascalToInHg = (p: number): InchOfMercury => (p / PASCALS_PER_IN_HG) as InchOfMercury;
export const inHgToPascal = (p: number): Pascal => (p * PASCALS_PER_IN_HG) as Pascal;

// Humidity ratio (a mass ratio, so kg/kg and lb/lb are the same number)
export const kgPerKgToLbPerLb = (w: number): LbPerLb => w as LbPerLb;
export const lbPerLbToKgPerKg = (w: number): KgPerKg => w as KgPerKg;
export const kgPerKgToGramsPerKg = (w: number): GramsPerKg => (w * 1000) as GramsPerKg;
export const gramsPerKgToKgPerKg = (w: number): KgPerKg => (w / 1000) as KgPerKg;
export const kgPerKgToGrainsPerLb = (w: number): GrainsPerLb => (w * GRAINS_PER_POUND) as GrainsPerLb;
export const grainsPerLbToKgPerKg = (w: number): KgPerKg => (w / GRAINS_PER_POUND) as KgPerKg;

// Specific energy
/** An energy per mass (a coil load, an enthalpy difference): 1 Btu/lb = 2.326 kJ/kg exactly. */
export const kJPerKgToBtuPerLb = (e: number): BtuPerLb => (e / KJ_PER_KG_PER_BTU_PER_LB) as BtuPerLb;
export const btuPerLbToKJPerKg = (e: number): KJPerKg => (e * KJ_PER_KG_PER_BTU_PER_LB) as KJPerKg;
/**
 * Moist-air enthalpy from the SI datum (dry air at 0 °C) to the IP datum (dry air at 0 °F), so the
 * number matches ASHRAE's IP charts and tables. Agrees with the IP equation to within 0.04 Btu/lb over
 * −40…60 °C (the SI and IP dry-air specific heats, 1.006 kJ/(kg·K) and 0.240 Btu/(lb·°F), differ by 0.1 %).
 */
export const enthalpySiToIpBtuPerLb = (hKJPerKg: number): BtuPerLb => (hKJPerKg / KJ_PER_KG_PER_BTU_PER_LB + IP_ENTHALPY_DATUM_BTU_PER_LB) as BtuPerLb;
export const enthalpyIpToSiKJPerKg = (hBtuPerLb: number): KJPerKg => ((hBtuPerLb - IP_ENTHALPY_DATUM_BTU_PER_LB) * KJ_PER_KG_PER_BTU_PER_LB) as KJPerKg;

// Length (site elevation)
export const metreToFoot = (m: number): Foot => (m / METRES_PER_FOOT) as Foot;
export const footToMetre = (ft: number): Metre => (ft * METRES_PER_FOOT) as Metre;
