/**
 * The operating regions in words and colours: each region's name, its rule in plain words with the design's
 * own numbers in the person's units, and its tint (a light wash of its mode's colour from shared/modes.ts).
 */
import { modeColours } from '../../../shared/modes';
import { moistureTargets } from '../../../shared/scenario/classify';
import { hallSideEffectiveness } from '../../../shared/scenario/exchanger';
import { REGION_KEYS, type DesignForRegions, type RegionKey } from '../../../shared/scenario/operating-regions';
import { formatQuantity } from '@/lib/quantity';
import type { UnitSystem } from '@/lib/unit-system';

export const regionNames: Record<RegionKey, string> = {
  free: 'Free cooling',
  humidified: 'Free cooling, humidified',
  adiabatic: 'Adiabatic assist',
  partialMechanical: 'Partial mechanical',
  mechanical: 'Mechanical',
};

function rgbOf(hex: string): [number, number, number] {
  return [1, 3, 5].map((i) => parseInt(hex.slice(i, i + 2), 16)) as [number, number, number];
}

/** Wash strength of each region over white: the mode's colour at this opacity. Mechanical deepens when it carries the whole load. */
const washes: Record<RegionKey, [string, number]> = {
  free: [modeColours.free, 0.2],
  humidified: [modeColours.free, 0.1],
  adiabatic: [modeColours.adiabatic, 0.3],
  partialMechanical: [modeColours.mechanical, 0.12],
  mechanical: [modeColours.mechanical, 0.26],
};

/** Each region's tint as an opaque colour (the wash already laid over white), [r, g, b]. */
export const regionTints: Record<RegionKey, [number, number, number]> = Object.fromEntries(
  REGION_KEYS.map((key) => {
    const [hex, alpha] = washes[key];
    return [key, rgbOf(hex).map((c) => Math.round(255 + (c - 255) * alpha)) as [number, number, number]];
  }),
) as Record<RegionKey, [number, number, number]>;

export const regionTintCss = (key: RegionKey): string => `rgb(${regionTints[key].join(', ')})`;

/** The neutral ink hours are shaded in (the palette's ink, --color-ink). */
export const densityInk: [number, number, number] = rgbOf('#1d2327');

/**
 * Each region's rule in plain words with the design's numbers, or null where the design has no such region
 * (no evaporative stage, a tower's wet fill). The rules restate classify.ts; docs/method.md has the equations.
 */
export function regionRules(design: DesignForRegions, pressurePa: number, units: UnitSystem): Record<RegionKey, string | null> {
  const { system, limits, plant } = design;
  const t = (c: number) => formatQuantity('temperature', units, c);
  const dt = (k: number) => formatQuantity('temperatureDifference', units, k);
  const w = (kgPerKg: number) => formatQuantity('humidityRatio', units, kgPerKg);
  const eps = system.evaporativeEffectiveness;
  const epsText = `effectiveness ${eps.toFixed(2)}`;
  const returnC = system.supplyAirC + system.itDeltaTK;

  if (system.kind === 'direct-air') {
    const offCoilC = system.supplyAirC - plant.fanHeatK;
    const { highW, lowW } = moistureTargets(limits, system.supplyAirC, pressurePa);
    return {
      free: `Outdoor air at most ${t(offCoilC)} (the ${t(system.supplyAirC)} supply less ${dt(plant.fanHeatK)} of fan heat), humidity ratio ${eps > 0 ? `from ${w(lowW)} ` : ''}up to ${w(highW)}: outdoor air mixed with return air, no compressor.`,
      humidified:
        eps > 0 ? `Outdoor air at most ${t(offCoilC)} but drier than ${w(lowW)}: free cooling, with the evaporative media only adding moisture.` : null,
      adiabatic:
        eps > 0
          ? `Outdoor air above ${t(offCoilC)} that the evaporative stage (${epsText}) cools to ${t(offCoilC)} along its wet-bulb line, leaving at most ${w(highW)}.`
          : null,
      partialMechanical: `Outdoor air too warm${eps > 0 ? ' for the evaporative stage' : ''} or more humid than ${w(highW)}, but cheaper to cool than return air at ${t(returnC)}: the coil tops up outdoor air.`,
      mechanical: `Outdoor air that costs as much to cool as the return air at ${t(returnC)} or more: the hall recirculates and compressors carry the whole load.`,
    };
  }
  if (system.kind === 'indirect-air') {
    const hx = hallSideEffectiveness(system.heatExchangerEffectiveness, system.scavengerAirRatio);
    const neededC = returnC - (returnC + plant.fanHeatK - system.supplyAirC) / hx;
    return {
      free: `Outdoor air at most ${t(neededC)}, at any humidity: the exchanger alone (hall-side effectiveness ${hx.toFixed(2)}) brings return air at ${t(returnC)} to the ${t(system.supplyAirC)} supply after ${dt(plant.fanHeatK)} of fan heat.`,
      humidified: null,
      adiabatic: eps > 0 ? `Outdoor air above ${t(neededC)} that the wetted scavenger stage (${epsText}) cools to ${t(neededC)} or below.` : null,
      partialMechanical: `Scavenger air${eps > 0 ? ', wetted,' : ''} above ${t(neededC)} but below the return air at ${t(returnC)}: the exchanger carries part of the load, compressors the rest.`,
      mechanical: `Scavenger air${eps > 0 ? ', wetted,' : ''} at ${t(returnC)} or warmer: the exchanger is bypassed and compressors carry the whole load.`,
    };
  }
  if (system.kind === 'water-side') {
    const freeAtC = system.chilledWaterSupplyC - system.approachK;
    const fullAtC = system.chilledWaterSupplyC + system.chilledWaterDeltaTK - system.approachK;
    const water = `the ${t(system.chilledWaterSupplyC)} chilled-water supply less the ${dt(system.approachK)} approach`;
    if (system.heatRejection === 'cooling-tower') {
      const dry = `; below a ${t(system.freezeProtectionWetBulbC)} wet-bulb the tower runs dry and the dry-bulb counts`;
      return {
        free: `Outdoor wet-bulb at most ${t(freeAtC)} (${water}): the tower alone cools the water${dry}.`,
        humidified: null,
        adiabatic: null,
        partialMechanical: `Outdoor wet-bulb between ${t(freeAtC)} and ${t(fullAtC)}: the tower pre-cools the return water, the chiller finishes it.`,
        mechanical: `Outdoor wet-bulb at ${t(fullAtC)} or above (the ${t(system.chilledWaterSupplyC + system.chilledWaterDeltaTK)} return water less the approach): the chiller carries the whole load.`,
      };
    }
    const air = eps > 0 ? 'the air after wetting' : 'outdoor air';
    return {
      free: `Outdoor dry-bulb at most ${t(freeAtC)} (${water}): the dry cooler alone cools the water.`,
      humidified: null,
      adiabatic: eps > 0 ? `Outdoor dry-bulb above ${t(freeAtC)}, but wetted (${epsText}) to ${t(freeAtC)} or below.` : null,
      partialMechanical: `With ${air} between ${t(freeAtC)} and ${t(fullAtC)}: the cooler pre-cools the return water, the chiller finishes it.`,
      mechanical: `With ${air} at ${t(fullAtC)} or above: the chiller carries the whole load.`,
    };
  }
  const none = Object.fromEntries(REGION_KEYS.map((k) => [k, null])) as Record<RegionKey, string | null>;
  return { ...none, free: 'As the classifier decides for this kind of system.' };
}
