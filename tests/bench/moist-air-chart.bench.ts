/**
 * The moist-air chart's own work at 30 years (262,800 hours): binning the hours, the classifier on the region
 * grid (what a keystroke in the scenario editor costs once the grid's wet-bulbs are solved), and painting the
 * regions and density layer. The layer's cost must not follow the number of hours: painting with 30 years binned
 * is compared with painting 1 year in the same run (ratio near 1), while binning grows with the hours.
 */
import { binHours, designAtSite, gridStates, operatingRegionGrid, parseScenario, runScenario, findEnvelopePreset } from '../../shared/scenario';
import { chartWindowFor } from '../../src/lib/charts/moist-air-data';
import { densityGridFor, paintLayer, regionGridFor } from '../../src/lib/charts/region-layer';
import { syntheticSeries, type SyntheticClimate } from '../unit/scenario/synthetic-climate';
import type { BenchSuite } from './suite';

// Temperate synthetic climate (invented), as the other suites use.
const TEMPERATE: SyntheticClimate = { name: 'temperate (synthetic)', elevationM: 100, meanC: 12, seasonalK: 11, dailyK: 5, rhMean: 68, rhSpread: 30 };

const best = (runs: number, f: () => void): number => {
  let min = Infinity;
  for (let k = 0; k < runs; k++) {
    const start = performance.now();
    f();
    min = Math.min(min, performance.now() - start);
  }
  return min;
};

export const suite: BenchSuite = {
  name: 'moist-air-chart',
  async run({ log }) {
    const parsed = parseScenario({
      name: 'bench direct air',
      elevationM: 100,
      envelope: findEnvelopePreset('ashrae-2021-a1')!.limits,
      system: { kind: 'direct-air', supplyAirC: 24, itDeltaTK: 12, evaporativeEffectiveness: 0.8 },
      energy: { itLoadKw: 1000, mechanicalCop: 4 },
    });
    if (!parsed.ok) throw new Error(parsed.errors.join('; '));
    const series = syntheticSeries(TEMPERATE, { hours: 30 * 8760, seed: 7 });
    const run = runScenario(parsed.scenario, series, { elevationM: 100 });
    const hours30 = {
      dryBulbC: series.dryBulbC,
      humidityRatio: run.states.humidityRatio,
      modes: run.classification.modes,
      mechanicalFraction: run.classification.mechanicalFraction,
    };
    const hours1 = {
      dryBulbC: series.dryBulbC.subarray(0, 8760),
      humidityRatio: run.states.humidityRatio.subarray(0, 8760),
      modes: run.classification.modes.subarray(0, 8760),
    };
    const pressurePa = 101_325 * Math.pow(1 - 2.25577e-5 * 100, 5.2559);
    const window = chartWindowFor(pressurePa, hours30);
    const regionGrid = regionGridFor(window);
    const densityGrid = densityGridFor(window, 'SI');

    const bin30Ms = best(5, () => binHours(hours30, densityGrid));
    const bin1Ms = best(5, () => binHours(hours1, densityGrid));
    let states = gridStates(regionGrid, pressurePa);
    const gridStatesMs = best(3, () => (states = gridStates(regionGrid, pressurePa)));
    const design = designAtSite(parsed.scenario, 100);
    let regions = operatingRegionGrid(design, states);
    const classifyGridMs = best(5, () => (regions = operatingRegionGrid(design, states)));

    // A 1440 px page's chart: about 916 × 519 CSS pixels of plotting area, painted one pixel per CSS pixel.
    const [w, h] = [916, 519];
    const paint = (cells: ReturnType<typeof binHours>) => () =>
      paintLayer({
        widthPx: w,
        heightPx: h,
        xAt: (i) => window.dryBulbMinC + ((i + 0.5) / w) * (window.dryBulbMaxC - window.dryBulbMinC),
        yAt: (j) => 1000 * window.humidityRatioMax * (1 - (j + 0.5) / h),
        projection: 'dry-bulb-humidity-ratio',
        units: 'SI',
        window,
        regions,
        cells,
        gapPx: 1,
      });
    const paint30Ms = best(3, paint(binHours(hours30, densityGrid)));
    const paint1Ms = best(3, paint(binHours(hours1, densityGrid)));
    // Reference in the same run: writing the same number of pixels from a palette, nothing else (the floor of any painter).
    const pixels = new Uint32Array(w * h);
    const palette = Uint32Array.from({ length: 390 }, (_, k) => k);
    const floorMs = best(3, () => {
      for (let k = 0; k < pixels.length; k++) pixels[k] = palette[(k * 7) % 390];
    });
    log(
      `moist-air chart, 30 years: bin ${bin30Ms.toFixed(1)} ms (1 year ${bin1Ms.toFixed(1)}), grid wet-bulbs ${gridStatesMs.toFixed(0)} ms once, ` +
        `classifier on ${regionGrid.nx}×${regionGrid.ny} cells ${classifyGridMs.toFixed(1)} ms per change, paint ${paint30Ms.toFixed(0)} ms (1 year ${paint1Ms.toFixed(0)}, pixel-fill floor ${floorMs.toFixed(0)})`,
    );
    return {
      chartBin30yMs: Math.round(bin30Ms * 10) / 10,
      chartGridWetBulbsMs: Math.round(gridStatesMs),
      chartClassifyGridMs: Math.round(classifyGridMs * 10) / 10,
      chartPaint30yMs: Math.round(paint30Ms),
      chartPaintOverFloor: Math.round((paint30Ms / floorMs) * 10) / 10,
      // Near 1: the painted layer costs the same for 30 years as for 1.
      chartPaint30yOver1y: Math.round((paint30Ms / paint1Ms) * 100) / 100,
    };
  },
};
