/**
 * Plain names of the scenario inputs, by their path in the scenario JSON: one wording for the scenario
 * editor, reports and downloads.
 */
// @ts-nocheck

export const INPUT_LABELS: Readonly<Record<string, string>> = {
  elevationM: 'Site elevation',
  'system.supplyAirC': 'Supply air setpoint',
  'system.itDeltaTK': 'Rise across the IT',
  'system.evaporativeEffectiveness': 'Evaporative effectiveness',
  'system.heatExchangerEffectiveness': 'Exchanger effectiveness',
  'system.scavengerAirRatio': 'Scavenger air ratio',
  'system.chilledWaterSupplyC': 'Chilled-water supply',
  'system.chilledWaterDeltaTK': 'Chilled-water rise',
  'system.approachK': 'Approach',
  'system.dryCoolerAirRiseK': 'Dry-cooler air rise',
  'system.freezeProtectionWetBulbC': 'Tower freeze-protection wet-bulb',
  'envelope.dryBulbMinC': 'Dry-bulb, lowest',
  'envelope.dryBulbMaxC': 'Dry-bulb, highest',
  'envelope.dewPointMinC': 'Dew point, lowest',
  'envelope.dewPointMaxC': 'Dew point, highest',
  'envelope.rhMinPct': 'Relative humidity, lowest',
  'envelope.rhMaxPct': 'Relative humidity, highest',
  'energy.itLoadKw': 'IT load',
  'energy.itLoadProfile': 'IT load through the year',
  'energy.itLoadProfile.kind': 'IT load through the year',
  'energy.itLoadProfile.name': 'IT load profile',
  'energy.itLoadProfile.fractions': 'IT load, shares of design',
  'energy.mechanicalCop': 'Rated compressor COP',
  'energy.evaporatorApproachK': 'Evaporator approach',
  'energy.condenserApproachK': 'Condenser approach',
  'energy.compressorMinTurndown': 'Compressor minimum turndown',
  'energy.fanPowerFraction': 'Hall fan power',
  'energy.fanMinSpeedFraction': 'Hall fan minimum speed',
  'energy.pumpPowerFraction': 'Pump power',
  'energy.pumpMinSpeedFraction': 'Pump minimum speed',
  'energy.heatRejectionFanFraction': 'Heat-rejection fan power',
  'energy.cyclesOfConcentration': 'Cycles of concentration',
  'energy.towerDriftFraction': 'Tower drift',
  'energy.basinHeaterFraction': 'Basin-heater power',
  'system.liquidShare': 'Share of IT heat to liquid',
  'system.liquid.chilledWaterSupplyC': 'Facility-water supply',
  'system.liquid.chilledWaterDeltaTK': 'Facility-water rise',
  'system.liquid.approachK': 'Approach',
  'system.liquid.cduApproachK': 'CDU approach',
  'system.liquid.evaporativeEffectiveness': 'Dry-cooler evaporative effectiveness',
  'system.liquid.dryCoolerAirRiseK': 'Dry-cooler air rise',
  'system.liquid.freezeProtectionWetBulbC': 'Tower freeze-protection wet-bulb',
  'system.liquid.heatRejection': 'Heat rejection of the liquid loop',
  'system.liquid.facilityWaterClassId': 'Facility-water class',
  'system.air.kind': 'Air-loop system kind',
  'system.heatReuse.thresholdC': 'Heat-reuse temperature',
  'system.heatReuse.reusedShare': 'Share of available heat reused',
  'system.heatReuse.heatPump': 'Heat pump lifts the return',
  // Retired inputs, still named so the inputs of runs made by engine 1.0.0 read as they were.
  'system.fanHeatK': 'Fan heat (retired)',
  'energy.copSlopePerK': 'COP change with outdoor temperature (retired)',
  'energy.copReferenceC': 'COP reference temperature (retired)',
  'energy.copMin': 'Lowest COP (retired)',
  'energy.blowdownRatio': 'Blowdown ratio (retired)',
  'energy.towerEvaporationShare': 'Tower heat by evaporation (retired)',
  name: 'Scenario name',
  'system.kind': 'System kind',
  'system.heatRejection': 'Heat rejection',
  'envelope.presetId': 'Envelope preset',
  'envelope.altitudeDerating.aboveElevationM': 'Dry-bulb derating starts above',
  'envelope.altitudeDerating.metresPerKelvin': 'Dry-bulb derating, metres per kelvin',
};

/** The plain name of an input, or its path when it has none. */
export function inputLabel(path: string): string {
  return INPUT_LABELS[path] ?? path;
}
