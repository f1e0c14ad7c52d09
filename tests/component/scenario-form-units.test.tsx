import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { useForm } from 'react-hook-form';
import { afterEach, describe, expect, it } from 'vitest';
import { UnitSystemProvider } from '@/lib/unit-system';
import { QuantityField } from '@/features/scenarios/components/quantity-field';
import { fieldFromDisplay, fieldToDisplay, inputText, parseInputText, rangeText } from '@/features/scenarios/lib/field-units';
import { energyFields, fieldsFor, inWords, systemFields } from '@/features/scenarios/lib/scenario-fields';

const supply = systemFields.find((f) => f.path === 'system.supplyAirC')!;

describe('scenario inputs in SI and IP', () => {
  it('converts temperatures, differences and per-kelvin slopes exactly', () => {
    // °F = 1.8·°C + 32 and ΔF = 1.8·ΔK exactly (NIST SP 811, 2008, §B.9).
    expect(fieldToDisplay('temperature', 'IP', 25)).toBeCloseTo(77, 12);
    expect(fieldFromDisplay('temperature', 'IP', 59)).toBeCloseTo(15, 12);
    expect(fieldToDisplay('temperatureDifference', 'IP', 12)).toBeCloseTo(21.6, 12);
    // A COP change of −0.09 per K is −0.05 per °F (a kelvin is 1.8 °F).
    expect(fieldToDisplay('perKelvin', 'IP', -0.09)).toBeCloseTo(-0.05, 12);
    expect(fieldFromDisplay('perKelvin', 'IP', -0.05)).toBeCloseTo(-0.09, 12);
    // Shares of IT load are shown in per cent and kept as fractions.
    expect(fieldToDisplay('shareAsPercent', 'SI', 0.04)).toBeCloseTo(4, 12);
    expect(parseInputText('shareAsPercent', 'IP', '4')).toBeCloseTo(0.04, 12);
    // International foot = 0.3048 m exactly (1959 agreement): 120 m = 393.7 ft.
    expect(inputText('elevation', 'IP', 120, 1)).toBe('393.7');
  });

  it('shows the allowed range in the chosen units, from the shared schema', () => {
    expect(rangeText(supply.unit, 'SI', supply.min, supply.max)).toBe('5 to 45 °C');
    expect(rangeText(supply.unit, 'IP', supply.min, supply.max)).toBe('41 to 113 °F');
    const rise = systemFields.find((f) => f.path === 'system.itDeltaTK')!;
    expect(rangeText(rise.unit, 'IP', rise.min, rise.max)).toBe('1.8 to 72 Δ°F');
    // −500…6000 m is −1,640.4…19,685.0 ft; shown as a person would type it.
    expect(rangeText('elevation', 'IP', -500, 6000)).toBe('-1,640 to 19,685 ft');
  });

  it('reads unreadable or empty text as NaN, so the schema names the field', () => {
    expect(parseInputText('temperature', 'SI', '')).toBeNaN();
    expect(parseInputText('temperature', 'SI', '2x')).toBeNaN();
    expect(parseInputText('temperature', 'SI', '21,5')).toBe(21.5);
  });

  it('puts the schema’s cross-field messages in the editor’s words', () => {
    expect(inWords('dryBulbMinC must be below dryBulbMaxC')).toBe('“Dry-bulb, lowest” must be below “dry-bulb, highest”.');
    expect(inWords('chilledWaterSupplyC must be below supplyAirC')).toBe('“Chilled-water supply” must be below “supply air setpoint”.');
  });

  it('offers only the fields of the chosen system kind', () => {
    expect(fieldsFor(systemFields, 'direct-air').map((f) => f.path)).not.toContain('system.approachK');
    expect(fieldsFor(systemFields, 'water-side').map((f) => f.path)).toContain('system.approachK');
    // Engine 2.0.0: the tower's evaporation share is retired; drift and basin heaters only matter to a tower.
    expect(fieldsFor(energyFields, 'direct-air').map((f) => f.path)).not.toContain('energy.towerDriftFraction');
    expect(fieldsFor(energyFields, 'water-side', 'dry-cooler').map((f) => f.path)).not.toContain('energy.towerDriftFraction');
    expect(fieldsFor(energyFields, 'water-side', 'cooling-tower').map((f) => f.path)).toEqual(
      expect.arrayContaining(['energy.towerDriftFraction', 'energy.basinHeaterFraction']),
    );
    expect(fieldsFor(systemFields, 'water-side', 'cooling-tower').map((f) => f.path)).toContain('system.freezeProtectionWetBulbC');
    expect(fieldsFor(systemFields, 'water-side', 'dry-cooler').map((f) => f.path)).not.toContain('system.freezeProtectionWetBulbC');
    // Retired inputs are no longer offered.
    const all = [...systemFields, ...energyFields].map((f) => f.path);
    for (const retired of [
      'system.fanHeatK',
      'energy.copSlopePerK',
      'energy.copReferenceC',
      'energy.copMin',
      'energy.blowdownRatio',
      'energy.towerEvaporationShare',
    ]) {
      expect(all).not.toContain(retired);
    }
  });
});

describe('a quantity field in a form', () => {
  let values: () => { system: { supplyAirC: number } };

  function Harness() {
    const form = useForm<{ system: { supplyAirC: number } }>({ defaultValues: { system: { supplyAirC: 24 } } });
    values = form.getValues;
    return <QuantityField control={form.control} field={supply} />;
  }

  afterEach(() => localStorage.clear());

  it('shows the SI value in °F and stores what is typed in °F as °C', async () => {
    localStorage.setItem('tramontane.unitSystem', 'IP');
    render(
      <UnitSystemProvider>
        <Harness />
      </UnitSystemProvider>,
    );
    const input = screen.getByRole<HTMLInputElement>('textbox', { name: supply.label });
    // 24 °C = 75.2 °F.
    expect(input.value).toBe('75.2');
    expect(screen.getByText('41 to 113 °F')).toBeTruthy();
    const user = userEvent.setup();
    await user.clear(input);
    await user.type(input, '64.4');
    // 64.4 °F = 18 °C.
    expect(values().system.supplyAirC).toBeCloseTo(18, 12);
    // While typing, the box keeps the text as typed, even a trailing point.
    await user.type(input, '{Backspace}');
    expect(input.value).toBe('64.');
  });
});
