import {
  dewPointFromHumidityRatio,
  enthalpyKJPerKg,
  rhPctFromHumidityRatio,
  saturationHumidityRatio,
  wetBulbFromHumidityRatio,
  type ChartProjection,
} from '../../../shared/psychrometrics';
import { cellOf, REGION, REGION_KEYS, type CellHours, type OperatingRegionGrid, type RegionKey } from '../../../shared/scenario/operating-regions';
import { formatQuantity } from '@/lib/quantity';
import type { UnitSystem } from '@/lib/unit-system';
import { chartXYToState } from '../../lib/charts/region-layer';
import { regionNames, regionTintCss } from '../../lib/charts/region-words';

/** What lies under the pointer: the state, the design's region there, and the hour cell holding it. */
export interface HoverPoint {
  dryBulbC: number;
  humidityRatio: number;
  /** The pointed state's other properties at the chart's pressure (NaN where undefined, as for bone-dry air's dew point). */
  rhPct: number;
  wetBulbC: number;
  dewPointC: number;
  enthalpyKJPerKg: number;
  region: RegionKey | null;
  cell: {
    dryBulbFromC: number;
    dryBulbToC: number;
    humidityRatioFrom: number;
    humidityRatioTo: number;
    hours: number;
    /** Hours per region the run gave them (REGION_KEYS order), or null when the hours carry no modes. */
    byRegion: number[] | null;
  } | null;
  /** Pointer position within the chart's box, CSS pixels. */
  leftPx: number;
  topPx: number;
}

/**
 * The hover at one chart position (display units): null outside the plotting area or above saturation. Only
 * this one cell is looked up and put in words, so hovering costs the same for a year or thirty.
 */
export function hoverAt(input: {
  px: number;
  py: number;
  xDisplay: number;
  yDisplay: number;
  domains: { x: [number, number]; y: [number, number] };
  projection: ChartProjection;
  units: UnitSystem;
  regions: OperatingRegionGrid | null;
  cells: CellHours | null;
  pressurePa: number;
}): Omit<HoverPoint, 'leftPx' | 'topPx'> | null {
  const { xDisplay: x, yDisplay: y, domains, projection, units, regions, cells, pressurePa } = input;
  if (!(x >= domains.x[0] && x <= domains.x[1] && y >= domains.y[0] && y <= domains.y[1])) return null;
  const { dryBulbC, humidityRatio } = chartXYToState(x, y, projection, units);
  let saturated: number;
  try {
    saturated = saturationHumidityRatio(dryBulbC, pressurePa);
  } catch {
    return null;
  }
  if (!(humidityRatio >= 0 && humidityRatio <= saturated)) return null;
  let region: RegionKey | null = null;
  if (regions) {
    const k = cellOf(regions, dryBulbC, humidityRatio);
    const code = k < 0 ? REGION.none : regions.regions[k];
    region = code === REGION.none ? null : REGION_KEYS[code];
  }
  let cell: HoverPoint['cell'] = null;
  if (cells) {
    const k = cellOf(cells, dryBulbC, humidityRatio);
    if (k >= 0) {
      const i = k % cells.nx;
      const j = Math.floor(k / cells.nx);
      cell = {
        dryBulbFromC: cells.dryBulbMinC + i * cells.dryBulbStepC,
        dryBulbToC: cells.dryBulbMinC + (i + 1) * cells.dryBulbStepC,
        humidityRatioFrom: cells.humidityRatioMin + j * cells.humidityRatioStep,
        humidityRatioTo: cells.humidityRatioMin + (j + 1) * cells.humidityRatioStep,
        hours: cells.hours[k],
        byRegion: cells.regionHours ? Array.from(cells.regionHours.subarray(k * 5, k * 5 + 5)) : null,
      };
    }
  }
  const safe = (f: () => number) => {
    try {
      return f();
    } catch {
      return Number.NaN;
    }
  };
  return {
    dryBulbC,
    humidityRatio,
    rhPct: safe(() => rhPctFromHumidityRatio(dryBulbC, humidityRatio, pressurePa)),
    wetBulbC: safe(() => wetBulbFromHumidityRatio(dryBulbC, humidityRatio, pressurePa)),
    dewPointC: safe(() => dewPointFromHumidityRatio(humidityRatio, pressurePa)),
    enthalpyKJPerKg: enthalpyKJPerKg(dryBulbC, humidityRatio),
    region,
    cell,
  };
}

/** The hover card: the region's name and rule, then the cell's hours and how the run split them. */
export function ChartHover({ hover, rules, units }: { hover: HoverPoint; rules: Record<RegionKey, string | null> | null; units: UnitSystem }) {
  const t = (c: number) => formatQuantity('temperature', units, c, false);
  const w = (kg: number) => formatQuantity('humidityRatio', units, kg, false);
  const { cell } = hover;
  return (
    <div
      role="status"
      data-testid="chart-hover"
      className="pointer-events-none absolute z-10 w-72 rounded border border-rule bg-panel p-2 text-xs shadow-md"
      style={{
        left: Math.max(0, hover.leftPx + 14),
        top: Math.max(0, hover.topPx + 14),
        transform: hover.leftPx > 420 ? 'translateX(calc(-100% - 28px))' : undefined,
      }}
    >
      <p className="num text-ink-soft">
        {formatQuantity('temperature', units, hover.dryBulbC)} · {formatQuantity('humidityRatio', units, hover.humidityRatio)}
      </p>
      <p className="num text-ink-soft">
        RH {Number.isFinite(hover.rhPct) ? hover.rhPct.toFixed(0) : '–'} % · Wet-bulb {formatQuantity('temperature', units, hover.wetBulbC)} · Dew point{' '}
        {formatQuantity('temperature', units, hover.dewPointC)} · h {formatQuantity('enthalpy', units, hover.enthalpyKJPerKg)}
      </p>
      {hover.region && (
        <div className="mt-1" data-testid="hover-region">
          <p className="flex items-center gap-1.5 font-medium">
            <span aria-hidden className="inline-block size-2.5 rounded-sm border border-rule" style={{ background: regionTintCss(hover.region) }} />
            {regionNames[hover.region]}
          </p>
          {rules?.[hover.region] && <p className="mt-0.5 text-ink-soft">{rules[hover.region]}</p>}
        </div>
      )}
      {cell && (
        <div className="mt-1.5 border-t border-rule pt-1.5" data-testid="hover-cell">
          <p>
            <span className="num">
              {t(cell.dryBulbFromC)}–{formatQuantity('temperature', units, cell.dryBulbToC)}, {w(cell.humidityRatioFrom)}–
              {formatQuantity('humidityRatio', units, cell.humidityRatioTo)}
            </span>
            : <span className="num font-medium">{cell.hours.toLocaleString('en')} h</span>
          </p>
          {cell.byRegion && cell.hours > 0 && (
            <ul className="mt-0.5 space-y-0.5">
              {REGION_KEYS.map((key, code) =>
                cell.byRegion![code] > 0 ? (
                  <li key={key} className="flex justify-between gap-2">
                    <span>{regionNames[key]}</span>
                    <span className="num">{cell.byRegion![code].toLocaleString('en')} h</span>
                  </li>
                ) : null,
              )}
            </ul>
          )}
        </div>
      )}
    </div>
  );
}
