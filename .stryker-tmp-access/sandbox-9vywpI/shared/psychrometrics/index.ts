/**
 * The psychrometric engine: moist-air properties by the equations of ASHRAE Handbook—Fundamentals
 * (2017) ch. 1, SI throughout (°C, Pa, kg/kg, kJ/kg dry air). Relative humidity, dew point and
 * saturation are over liquid water at every temperature (WMO-No. 8); ice only in the wet-bulb
 * equation's ice branch and the frost point (saturation.ts). The equations and their sources:
 * README.md, "How it works".
 */
// @ts-nocheck

export { saturationPressurePa, saturationPressureOverIcePa, dewPointFromVapourPressure, frostPointFromVapourPressure, boilingPointC } from './saturation';
export { rhOverWaterFromRhOverIce, dewPointFromFrostPoint } from './over-ice';
export { standardPressurePa, standardElevationM } from './atmosphere';
export { hourlyPressurePa } from './site-pressure';
export type { HourlyPressure, PressureSeries } from './site-pressure';
export {
  humidityRatioFromVapourPressure,
  vapourPressureFromHumidityRatio,
  saturationHumidityRatio,
  humidityRatioFromRh,
  rhPctFromHumidityRatio,
  humidityRatioFromDewPoint,
  dewPointFromHumidityRatio,
  frostPointFromHumidityRatio,
  degreeOfSaturation,
  specificHumidity,
} from './moisture';
export { humidityRatioFromWetBulb, wetBulbFromHumidityRatio, wetBulbRootsNearFreezing } from './wet-bulb';
export { enthalpyKJPerKg, dryBulbFromEnthalpy, humidityRatioFromEnthalpy } from './enthalpy';
export { specificVolumeM3PerKg, moistAirDensityKgPerM3 } from './volume';
export { bulkStates } from './bulk';
export type { HumidityKind, BulkStateInput, BulkState } from './bulk';
export { moistAirState, StateRequestError } from './state';
export type { MoistAirRequest, MoistAirState, StateRequestProblem } from './state';
export {
  mixAirStreams,
  sensibleHeatOrCool,
  evaporativeCooling,
  coolAndDehumidify,
  humidityRatioAtDewPointLimit,
  humidityRatioAtRhLimit,
  dryBulbAtRhLimit,
  maxHumidityRatioForLimits,
} from './processes';
export type { AirPoint, AirStream, MixedAir, SensibleResult, EvaporativeResult, CoilResult, MoistureLimits } from './processes';
export { projectPoint, saturationCurve, constantRhLine, constantWetBulbLine, constantEnthalpyLine, constantVolumeLine, chartGeometry } from './chart';
export type { ChartProjection, ChartPoint, ChartLine, ChartLineKind, ChartWindow, ChartGeometryRequest } from './chart';
