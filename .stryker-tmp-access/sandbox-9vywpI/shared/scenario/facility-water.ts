/**
 * Facility-water classes of ASHRAE TC 9.9 for liquid-cooled IT: each class is the highest facility-water supply
 * temperature at the coolant distribution unit (CDU) the equipment of that class accepts. None of these figures could
 * be checked against the guideline's text while writing this module, so every class carries `recalledFromMemory: true`;
 * a reviewer with the book should check them and clear the flag. Liquid-cooled equipment sets its own coolant limits
 * (flow, pressure, temperature, water chemistry) from its maker, and they come before the class.
 */
// @ts-nocheck


export interface FacilityWaterClass {
  id: string;
  /** The class's name as the guideline writes it. */
  label: string;
  edition: string;
  /** Highest facility-water supply, °C; null for the open-ended class (W+). */
  supplyMaxC: number | null;
  /** Lowest facility-water supply the class sets, °C; null where the class sets none. */
  supplyMinC: number | null;
  /** The supply a preset fills in, °C: the upper limit, or for W+ an example above its lower bound. */
  presetSupplyC: number;
  recalledFromMemory: boolean;
  note: string;
}

const EDITION = 'ASHRAE TC 9.9 Thermal Guidelines for Data Processing Environments, 5th edition (2021), liquid-cooling classes';
const RECALLED = 'Recalled from memory, not checked against the guideline text.';

const upTo = (supplyMaxC: number): FacilityWaterClass => ({
  id: `ashrae-2021-w${supplyMaxC}`,
  label: `W${supplyMaxC}`,
  edition: EDITION,
  supplyMaxC,
  supplyMinC: null,
  presetSupplyC: supplyMaxC,
  recalledFromMemory: true,
  note: `Facility-water supply at the CDU up to ${supplyMaxC} °C. ${RECALLED}`,
});

export const FACILITY_WATER_CLASSES: readonly FacilityWaterClass[] = [
  upTo(17),
  upTo(27),
  upTo(32),
  upTo(40),
  upTo(45),
  {
    id: 'ashrae-2021-w-plus',
    label: 'W+',
    edition: EDITION,
    supplyMaxC: null,
    supplyMinC: 45,
    presetSupplyC: 50,
    recalledFromMemory: true,
    note: `Facility-water supply above 45 °C, no upper limit in the class; the preset's 50 °C is an example, set your own. ${RECALLED}`,
  },
];

export function findFacilityWaterClass(id: string): FacilityWaterClass | undefined {
  return FACILITY_WATER_CLASSES.find((c) => c.id === id);
}

/**
 * Whether a facility-water supply temperature, °C, lies within a class: at or below its maximum, and above its
 * minimum for the open-ended class (which starts where W45 ends).
 */
export function supplyFitsClass(supplyC: number, waterClass: FacilityWaterClass): boolean {
  if (waterClass.supplyMaxC !== null && supplyC > waterClass.supplyMaxC) return false;
  if (waterClass.supplyMinC !== null && !(supplyC > waterClass.supplyMinC)) return false;
  return true;
}
