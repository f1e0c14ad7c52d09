// @ts-nocheck
import { SegmentedSwitch } from '@/components/charts/segmented-switch';
import { useUnitSystem, type UnitSystem } from '@/lib/unit-system';

const unitOptions: ReadonlyArray<{ value: UnitSystem; label: string }> = [
  { value: 'SI', label: 'SI' },
  { value: 'IP', label: 'IP' },
];

/** The SI/IP switch beside the page title (the same choice as in settings, remembered per person). */
export function UnitsSwitch() {
  const { unitSystem, setUnitSystem } = useUnitSystem();
  return <SegmentedSwitch<UnitSystem> label="Units" options={unitOptions} value={unitSystem} onChange={setUnitSystem} />;
}
