/**
 * Constants of the moist-air model. Each names its source; all are the values ASHRAE Handbook—
 * Fundamentals (2017) ch. 1 uses, so that results agree with the Handbook and with psychrolib.
 */
// @ts-nocheck


/** 0 °C in kelvin (exact, SI definition of the Celsius scale). */
export const KELVIN_OFFSET = 273.15;

/** Triple point of water, °C (exact by the former kelvin definition; ASHRAE 2017 ch. 1). Ice below, water above. */
export const TRIPLE_POINT_C = 0.01;

/** Freezing point used to choose the wet-bulb equation: ice (eq. 35) below, water (eq. 33) at or above. */
export const FREEZING_POINT_C = 0;

/** Ratio of molar masses of water vapour and dry air, 18.015268 / 28.966 (ASHRAE 2017 ch. 1 eq. 20). */
export const MOLAR_MASS_RATIO = 0.621945;

/** Gas constant of dry air, J/(kg·K) (ASHRAE 2017 ch. 1 eq. 1 context). */
export const GAS_CONSTANT_DRY_AIR = 287.042;

/** Ratio of molar masses dry air / water vapour, 1/0.621945 ≈ 1.607858 (ASHRAE 2017 ch. 1 eq. 28). */
export const VOLUME_VAPOUR_FACTOR = 1.607858;

/** Specific heat of dry air, kJ/(kg·K), as used in ASHRAE 2017 ch. 1 eq. 32. */
export const CP_DRY_AIR = 1.006;

/** Specific heat of water vapour, kJ/(kg·K), as used in ASHRAE 2017 ch. 1 eq. 32. */
export const CP_VAPOUR = 1.86;

/** Specific enthalpy of saturated vapour at 0 °C relative to liquid water at 0 °C, kJ/kg (ASHRAE 2017 ch. 1 eq. 32). */
export const LATENT_HEAT_0C = 2501;

/** Specific heat of liquid water, kJ/(kg·K), as used in ASHRAE 2017 ch. 1 eq. 33. */
export const CP_LIQUID_WATER = 4.186;

/** Validity range of the Hyland–Wexler saturation equations, °C (ASHRAE 2017 ch. 1). */
export const MIN_TEMPERATURE_C = -100;
export const MAX_TEMPERATURE_C = 200;

/** Barometric pressures the engine accepts, Pa (covers every inhabited elevation with margin). */
export const MIN_PRESSURE_PA = 10_000;
export const MAX_PRESSURE_PA = 120_000;

/** Sea-level standard atmosphere, Pa (ASHRAE 2017 ch. 1 eq. 3; exact by definition of the standard atmosphere). */
export const STANDARD_SEA_LEVEL_PRESSURE_PA = 101_325;
