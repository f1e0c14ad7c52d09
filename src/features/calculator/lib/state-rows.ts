import { formatQuantity } from '@/lib/quantity';
import type { UnitSystem } from '@/lib/unit-system';
import { KG_PER_POUND, METRES_PER_FOOT } from '../../../../shared/units';
import type { MoistAirState } from '../../../../shared/psychrometrics';

/** m³/kg per ft³/lb: 0.3048³ m³ / 0.45359237 kg, both exact (international yard and pound agreement, 1959). */
const M3_PER_KG_PER_FT3_PER_LB = METRES_PER_FOOT ** 3 / KG_PER_POUND;

const fixed = (v: number, digits: number) => v.toLocaleString('en', { minimumFractionDigits: digits, maximumFractionDigits: digits });

/** Every property of a state as label and text, in the person's unit system. */
export function stateRows(s: MoistAirState, system: UnitSystem): { label: string; value: string }[] {
  const ip = system === 'IP';
  return [
    { label: 'Pressure', value: formatQuantity('pressure', system, s.pressurePa) },
    { label: 'Dry-bulb', value: formatQuantity('temperature', system, s.dryBulbC) },
    { label: 'Wet-bulb (thermodynamic)', value: formatQuantity('temperature', system, s.wetBulbC) },
    { label: 'Dew point (over water)', value: formatQuantity('temperature', system, s.dewPointC) },
    {
      // A separate quantity: where the air saturates over ice. It exists only when the dew point is below about 0 °C.
      label: 'Frost point (over ice)',
      value: Number.isNaN(s.frostPointC) ? '— (only below 0 °C)' : formatQuantity('temperature', system, s.frostPointC),
    },
    { label: 'Relative humidity (over water)', value: `${fixed(s.rhPct, 1)} %` },
    { label: 'Humidity ratio', value: formatQuantity('humidityRatio', system, s.humidityRatio) },
    { label: 'Enthalpy', value: formatQuantity('enthalpy', system, s.enthalpyKJPerKg) },
    { label: 'Vapour pressure', value: formatQuantity('pressure', system, s.vapourPressurePa) },
    {
      label: 'Specific volume',
      value: ip ? `${fixed(s.specificVolumeM3PerKg / M3_PER_KG_PER_FT3_PER_LB, 3)} ft³/lb` : `${fixed(s.specificVolumeM3PerKg, 4)} m³/kg`,
    },
    {
      label: 'Density of the moist air',
      value: ip ? `${fixed(s.densityKgPerM3 * M3_PER_KG_PER_FT3_PER_LB, 4)} lb/ft³` : `${fixed(s.densityKgPerM3, 4)} kg/m³`,
    },
    { label: 'Degree of saturation', value: fixed(s.degreeOfSaturation, 4) },
    {
      label: 'Specific humidity',
      // Grains per pound: 7000 gr = 1 lb exactly.
      value: ip ? `${fixed(s.specificHumidity * 7000, 1)} gr/lb moist air` : `${fixed(s.specificHumidity * 1000, 3)} g/kg moist air`,
    },
  ];
}
