/**
 * Plain names of the scenario inputs, by their path in the scenario JSON: one wording for the scenario
 * editor, reports and downloads.
 */
export const INPUT_LABELS: Readonly<Record<string, string>> = {
  elevationM: 'Site elevation',
  'system.supplyAirC': 'Supply air setpoint',
  'system.itDeltaTK': 'Rise across the IT',
  'system.fanHeatK': 'Fan heat',
  'system.evaporativeEffectiveness': 'Evaporative effectiveness',
  'system.heatExchangerEffectiveness': 'Exchanger effectiveness',
  'system.scavengerAirRatio': 'Scavenger air ratio',
  'system.chilledWaterSupplyC': 'Chilled-water supply',
  'system.chilledWaterDeltaTK': 'Chilled-water rise',
  'system.approachK': 'Approach',
  'system.dryCoolerAirRiseK': 'Dry-cooler air rise',
  'envelope.dryBulbMinC': 'Dry-bulb, lowest',
  'envelope.dryBulbMaxC': 'Dry-bulb, highest',
  'envelope.dewPointMinC': 'Dew point, lowest',
  'envelope.dewPointMaxC': 'Dew point, highest',
  'envelope.rhMinPct': 'Relative humidity, lowest',
  'envelope.rhMaxPct': 'Relative humidity, highest',
  'energy.itLoadKw': 'IT load',
  'energy.mechanicalCop': 'Compressor COP',
  'energy.copSlopePerK': 'COP change with outdoor temperature',
  'energy.copReferenceC': 'COP reference temperature',
  'energy.copMin': 'Lowest COP',
  'energy.fanPowerFraction': 'Hall fan power',
  'energy.pumpPowerFraction': 'Pump power',
  'energy.heatRejectionFanFraction': 'Heat-rejection fan power',
  'energy.blowdownRatio': 'Blowdown ratio',
  'energy.towerEvaporationShare': 'Tower heat by evaporation',
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
