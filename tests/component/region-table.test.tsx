/**
 * The table of operating regions beside the moist-air chart: each region the design has, its rule with the
 * design's numbers in the reader's units, and the hours in it (counted from a real run of the engine).
 */
import { render, screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { RegionTable } from '@/components/charts/region-table';
import { regionRules } from '@/lib/charts/region-words';
import { binHours, designAtSite, runScenario } from '../../shared/scenario';
import { makeScenario, psy } from '../unit/scenario/fixtures';

/** Synthetic states (demo data): cool, mild, warm and dry, humid, very hot; one hour each, at sea level. */
const STATES: Array<[number, number]> = [
  [5, 0.004],
  [15, 0.008],
  [30, 0.005],
  [26, 0.016],
  [42, 0.014],
];

const NAMES = ['Free cooling', 'Free cooling, humidified', 'Adiabatic assist', 'Partial mechanical', 'Mechanical'] as const;

/** The table's body rows as a reader sees them: region name → its hours cell and the rule under the name. */
function rowsOf(): Record<string, { hours: string; text: string }> {
  const table = screen.getByRole('table', { name: /^Operating regions of the design and the hours in each/ });
  const out: Record<string, { hours: string; text: string }> = {};
  for (const row of within(table).getAllByRole('row').slice(1)) {
    const header = within(row).getByRole('rowheader');
    const name = NAMES.find((n) => within(header).queryByText(n) !== null)!;
    out[name] = { hours: within(row).getAllByRole('cell')[0].textContent!, text: header.textContent! };
  }
  return out;
}

describe('RegionTable', () => {
  it('lists the design’s regions with their rules and the hours the run put in each', () => {
    // Direct air, 24 °C supply, 12 K rise, 1 K of fan heat (fixtures), ε 0.8, the 2021 recommended envelope.
    const scenario = makeScenario('direct-air');
    const run = runScenario(scenario, {
      timestampsMs: Float64Array.from(STATES, (_, i) => Date.UTC(2024, 6, 1) + i * 3_600_000),
      dryBulbC: Float64Array.from(STATES, (s) => s[0]),
      humidity: { kind: 'humidity-ratio-kgkg', values: Float64Array.from(STATES, (s) => s[1]) },
      pressurePa: null,
    });
    const c = run.classification;
    const cells = binHours(
      {
        dryBulbC: STATES.map((s) => s[0]),
        humidityRatio: STATES.map((s) => s[1]),
        modes: c.modes,
        mechanicalFraction: c.mechanicalFraction,
        humidified: c.humidified,
      },
      { dryBulbMinC: -10, dryBulbStepC: 1, nx: 60, humidityRatioMin: 0, humidityRatioStep: 0.0005, ny: 60 },
    );
    const rules = regionRules(designAtSite(scenario, 0), 101_325, 'SI');
    render(<RegionTable rules={rules} hours={cells.totals} totalHours={STATES.length} countedBy="modes" />);
    const rows = rowsOf();
    // No 'humidified' hour here, but the design has the region (ε > 0): it is listed with 0 h.
    expect(Object.keys(rows)).toEqual([...NAMES]);
    // 5 °C and 15 °C are below the 23 °C off-coil temperature: free cooling.
    expect(rows['Free cooling'].hours).toBe('2 h');
    // The upper moisture limit is the lower of W at the 15 °C dew point and at 24 °C, 70 % RH (psychrolib, ASHRAE 2017 ch. 1 eq. 20, 22).
    const highGPerKg = (1000 * Math.min(psy.GetHumRatioFromTDewPoint(15, 101_325), psy.GetHumRatioFromRelHum(24, 0.7, 101_325))).toFixed(2);
    expect(rows['Free cooling'].text).toContain(`at most 23.0 °C (the 24.0 °C supply less 1.0 K of fan heat)`);
    expect(rows['Free cooling'].text).toContain(`up to ${highGPerKg} g/kg`);
    // 30 °C at 5 g/kg: wet-bulb (psychrolib) well below 23 °C, and along its wet-bulb line the air reaches 23 °C at
    // a humidity ratio under the upper limit: adiabatic assist.
    const wetBulb = psy.GetTWetBulbFromHumRatio(30, 0.005, 101_325);
    expect(30 - 0.8 * (30 - wetBulb)).toBeLessThan(23);
    expect(psy.GetHumRatioFromTWetBulb(23, wetBulb, 101_325) * 1000).toBeLessThan(Number(highGPerKg));
    expect(rows['Adiabatic assist'].hours).toBe('1 h');
    const counted = Object.values(rows).reduce((sum, r) => sum + Number(r.hours.replace(/\D/g, '')), 0);
    expect(counted).toBe(STATES.length);
    expect(screen.getByRole('table', { name: /, as the run classified them$/ })).toBeTruthy();
  });

  it('states the rules in IP with the same numbers', () => {
    const rules = regionRules(designAtSite(makeScenario('direct-air'), 0), 101_325, 'IP');
    render(<RegionTable rules={rules} hours={null} totalHours={0} countedBy="grid" />);
    // 23 °C = 73.4 °F; a 1 K difference is 1.8 °F, written Δ°F as every temperature difference is in IP.
    expect(rowsOf()['Free cooling'].text).toContain('at most 73.4 °F (the 75.2 °F supply less 1.8 Δ°F of fan heat)');
    expect(rowsOf()['Free cooling'].hours).toBe('…');
  });

  it('leaves out the regions a design cannot have: a cooling tower has no adiabatic stage of its own', () => {
    const scenario = makeScenario('water-side', { system: { heatRejection: 'cooling-tower', approachK: 4 } });
    const rules = regionRules(designAtSite(scenario, 0), 101_325, 'SI');
    render(<RegionTable rules={rules} hours={[10, 0, 0, 5, 1]} totalHours={16} countedBy="grid" />);
    expect(Object.keys(rowsOf())).toEqual(['Free cooling', 'Partial mechanical', 'Mechanical']);
    // 18 °C chilled water less a 4 K approach: free cooling up to a 14 °C wet-bulb; whole load on the chiller from 18 + 6 − 4 = 20 °C.
    expect(rowsOf()['Free cooling'].text).toContain('Outdoor wet-bulb at most 14.0 °C');
    expect(rowsOf()['Mechanical'].text).toContain('at 20.0 °C or above');
    expect(rowsOf()['Free cooling'].hours).toBe('10 h');
  });
});
