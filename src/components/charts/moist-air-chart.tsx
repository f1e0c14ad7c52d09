import { useCallback, useMemo, useRef, useState, type PointerEvent } from 'react';
import type { ChartProjection } from '../../../shared/psychrometrics';
import {
  binHours,
  cellOf,
  gridStates,
  hoursPerGridRegion,
  operatingRegionGrid,
  type CellHours,
  type DesignForRegions,
  type OperatingRegionGrid,
} from '../../../shared/scenario/operating-regions';
import { formatQuantity, toDisplay, unitOf } from '@/lib/quantity';
import { LocalUnitSystem, useUnitSystem, type UnitSystem } from '@/lib/unit-system';
import { ChartHover, hoverAt, type HoverPoint } from './chart-hover';
import { placeLabels, textWidthPx, type LabelBox, type LabelRequest } from '../../lib/charts/label-placement';
import {
  backgroundLines,
  chartWindowFor,
  envelopePolygon,
  stateToChartXY,
  type ChartHours,
  type ChartMarker,
  type DisplayLine,
  type EnvelopeLimitsInput,
} from '../../lib/charts/moist-air-data';
import { MoistAirTable } from './moist-air-table';
import { PlotFigure, type PlotModule } from './plot-figure';
import { chartXYToState, densityGridFor, paintLayer, regionGridFor } from '../../lib/charts/region-layer';
import { RegionTable } from './region-table';
import { densityInk, regionRules } from '../../lib/charts/region-words';
import { SegmentedSwitch } from './segmented-switch';

export interface MoistAirChartProps {
  pressurePa: number;
  /** Fixed projection; when omitted the chart shows its own switch. */
  projection?: ChartProjection;
  /** The hours as plain typed arrays (modes and compressor shares when they come from a run). */
  hours: ChartHours;
  /** The design whose operating regions are shaded (the scenario as run, or as it stands in the editor). */
  design?: DesignForRegions | null;
  envelopes?: Array<{ label: string; limits: EnvelopeLimitsInput }>;
  markers?: ChartMarker[];
  /** A narrow chart (the editor's preview): no projection switch, the region table below, no table of ranges. */
  compact?: boolean;
}

const envelopeInks = ['#1f3a4a', '#2f6f4e', '#8a5a12', '#5b4a8a'];
const lineStyle: Record<DisplayLine['kind'], { stroke: string; width: number; dash?: string }> = {
  saturation: { stroke: '#1f3a4a', width: 1.8 },
  'relative-humidity': { stroke: '#6f8c99', width: 0.7 },
  'wet-bulb': { stroke: '#97875d', width: 0.7, dash: '4,3' },
  enthalpy: { stroke: '#85789a', width: 0.7, dash: '1,3' },
  'specific-volume': { stroke: '#c0c6ca', width: 0.6 },
  isotherm: { stroke: '#c9ced1', width: 0.7 },
};
const labelInk: Partial<Record<DisplayLine['kind'], string>> = { 'relative-humidity': '#3f5965', 'wet-bulb': '#5e5131', enthalpy: '#51456a' };
const margins = { top: 16, right: 20, bottom: 40, left: 56 };

const projectionOptions = [
  { value: 'dry-bulb-humidity-ratio', label: 'Dry-bulb / humidity ratio' },
  { value: 'h-x', label: 'h–x diagram' },
] as const;
const unitOptions = [
  { value: 'SI', label: 'SI' },
  { value: 'IP', label: 'IP' },
] as const;

/**
 * The moist-air chart: the design's operating regions (the classifier on a grid), the hours as density in
 * neutral ink over them, saturation, RH, wet-bulb and enthalpy lines, envelopes and markers; a hover that
 * names the region and its rule and gives a cell's hours; and the table of regions beside it. Marks and
 * tooltips do not grow with the number of hours: the hours are binned, and only the hovered cell is put in words.
 */
export function MoistAirChart(props: MoistAirChartProps) {
  // The chart's own unit switch changes this chart only, never the person's setting (issue 17).
  return (
    <LocalUnitSystem>
      <MoistAirChartBody {...props} />
    </LocalUnitSystem>
  );
}

function MoistAirChartBody({
  pressurePa,
  projection: fixedProjection,
  hours,
  design = null,
  envelopes = [],
  markers = [],
  compact = false,
}: MoistAirChartProps) {
  const { unitSystem, setUnitSystem, local } = useUnitSystem();
  const [chosenProjection, setProjection] = useState<ChartProjection>('dry-bulb-humidity-ratio');
  const projection = fixedProjection ?? chosenProjection;

  const { dryBulbC, humidityRatio } = hours;
  const fittedWindow = useMemo(
    () =>
      chartWindowFor(
        pressurePa,
        { dryBulbC, humidityRatio },
        envelopes.map((e) => e.limits),
        markers,
      ),
    [pressurePa, dryBulbC, humidityRatio, envelopes, markers],
  );
  // Kept by value: a new design with the same window must not redo the grid's wet-bulbs.
  const windowKey = JSON.stringify(fittedWindow);
  const window = useMemo(() => fittedWindow, [windowKey]); // eslint-disable-line react-hooks/exhaustive-deps
  const regionGrid = useMemo(() => regionGridFor(window, compact), [window, compact]);
  // The cell states (wet-bulb solves) depend on the window only; a setpoint change re-runs the classifier alone.
  const hasDesign = design !== null;
  const cellStates = useMemo(() => (hasDesign ? gridStates(regionGrid, pressurePa) : null), [hasDesign, regionGrid, pressurePa]);
  const regions = useMemo(() => (design && cellStates ? operatingRegionGrid(design, cellStates) : null), [design, cellStates]);
  const densityGrid = useMemo(() => densityGridFor(window, unitSystem), [window, unitSystem]);
  const cells = useMemo(() => (hours.dryBulbC.length ? binHours(hours, densityGrid) : null), [hours, densityGrid]);
  const hoursWithData = useMemo(() => {
    let n = 0;
    for (let i = 0; i < hours.dryBulbC.length; i++) if (hours.dryBulbC[i] === hours.dryBulbC[i] && hours.humidityRatio[i] === hours.humidityRatio[i]) n++;
    return n;
  }, [hours]);
  // Hours per region: as the run classified them when the hours carry modes, else by the region of their grid cell.
  const regionHours = useMemo(() => {
    if (!regions || !hours.dryBulbC.length) return null;
    if (cells?.totals) return cells.totals;
    return hoursPerGridRegion(binHours({ dryBulbC: hours.dryBulbC, humidityRatio: hours.humidityRatio }, regions), regions);
  }, [regions, cells, hours]);
  const rules = useMemo(() => (design ? regionRules(design, pressurePa, unitSystem) : null), [design, pressurePa, unitSystem]);

  const scales = useRef<{ x: { invert: (px: number) => number }; y: { invert: (px: number) => number }; svg: SVGSVGElement } | null>(null);
  const [hover, setHover] = useState<HoverPoint | null>(null);

  const render = useCallback(
    (Plot: PlotModule, widthPx: number) => {
      const system = unitSystem;
      const heightPx = Math.round(Math.max(compact ? 280 : 340, Math.min(620, widthPx * 0.62)));
      const m = { ...margins, right: projection === 'h-x' ? 56 : margins.right };
      const domains = chartDomains(window, projection, system);
      const toPx = (x: number, y: number) => ({
        px: m.left + ((x - domains.x[0]) / (domains.x[1] - domains.x[0])) * (widthPx - m.left - m.right),
        py: heightPx - m.bottom - ((y - domains.y[0]) / (domains.y[1] - domains.y[0])) * (heightPx - m.top - m.bottom),
      });
      const area: LabelBox = { left: m.left + 2, top: m.top + 2, right: widthPx - m.right - 2, bottom: heightPx - m.bottom - 2 };
      const tUnit = unitOf('temperature', system);
      const wUnit = `${unitOf('humidityRatio', system)} dry air`;

      const lines = backgroundLines(window, projection, system);
      const lineRows = lines.flatMap((line, z) => line.points.map((p) => ({ ...p, z, kind: line.kind })));
      const envelopeRows = envelopes.flatMap((envelope, k) => {
        const polygon = envelopePolygon(envelope.limits, window).map((s) => stateToChartXY(s.dryBulbC, s.humidityRatio, projection, system));
        return polygon.length ? [...polygon, polygon[0]].map((p) => ({ ...p, k, label: envelope.label })) : [];
      });
      const markerRows = markers.map((mk) => ({ ...stateToChartXY(mk.dryBulbC, mk.humidityRatio, projection, system), label: mk.label }));

      // Labels: markers and a lone envelope first (placed away from the hours), then wet-bulb, RH and enthalpy values.
      const hoursUnder = (box: LabelBox) => hoursUnderBox(box, cells, (px, py) => pxToState(px, py, domains, m, widthPx, heightPx, projection, system));
      const markerBoxes = markerRows.map((r) => {
        const { px, py } = toPx(r.x, r.y);
        return { left: px - 6, top: py - 6, right: px + 6, bottom: py + 6 };
      });
      const requests: Array<LabelRequest<{ text: string; fill: string; weight: number; size: number }>> = [];
      markerRows.forEach((r) => {
        const { px, py } = toPx(r.x, r.y);
        const w = textWidthPx(r.label, 12);
        requests.push({
          item: { text: r.label, fill: '#1d2327', weight: 600, size: 12 },
          x: px,
          y: py,
          widthPx: w,
          heightPx: 14,
          priority: 3,
          candidates: sideCandidates(w, 14),
        });
      });
      if (envelopes.length === 1 && envelopeRows.length) {
        // At the envelope's upper-left corner, or along its top edge.
        const corner = envelopeRows.reduce((a, b) =>
          toPx(b.x, b.y).py < toPx(a.x, a.y).py - 20 || (Math.abs(toPx(b.x, b.y).py - toPx(a.x, a.y).py) <= 20 && b.x < a.x) ? b : a,
        );
        const { px, py } = toPx(corner.x, corner.y);
        const w = textWidthPx(envelopes[0].label, 12);
        requests.push({
          item: { text: envelopes[0].label, fill: envelopeInks[0], weight: 600, size: 12 },
          x: px,
          y: py,
          widthPx: w,
          heightPx: 14,
          priority: 2,
          candidates: [
            [0, -18],
            [-w / 2, -18],
            [-w, -18],
            [4, 4],
            [-w - 4, 4],
          ],
        });
      }
      for (const line of lines) {
        if (!line.points.length) continue;
        const item = lineLabel(line, system);
        if (!item) continue;
        const p = line.kind === 'wet-bulb' ? line.points[0] : line.points[line.points.length - 1];
        const { px, py } = toPx(p.x, p.y);
        const w = textWidthPx(item, 10);
        const candidates: Array<[number, number]> =
          line.kind === 'wet-bulb'
            ? projection === 'h-x'
              ? [
                  [3, -6],
                  [3, -14],
                  [3, 2],
                ]
              : [
                  [-w - 4, -14],
                  [-w - 4, -4],
                  [-w - 10, -20],
                ]
            : line.kind === 'relative-humidity'
              ? [
                  [-w - 2, -12],
                  [-w - 2, 1],
                  [-w - 2, -24],
                  [2, -12],
                ]
              : [
                  [-w - 3, -12],
                  [-w - 3, 1],
                  [2, -12],
                ];
        requests.push({
          item: { text: item, fill: labelInk[line.kind] ?? '#4a545b', weight: 400, size: 10 },
          x: px,
          y: py,
          widthPx: w,
          heightPx: 12,
          priority: line.kind === 'wet-bulb' ? 1 : line.kind === 'relative-humidity' ? 0.5 : 0,
          candidates,
        });
      }
      const placed = placeLabels(requests, area, markerBoxes, (box) => hoursUnder(box));
      const labelRows = placed.map((l) => ({ ...l.item, left: l.box.left, top: l.box.top }));

      const figure = Plot.plot({
        width: widthPx,
        height: heightPx,
        marginTop: m.top,
        marginRight: m.right,
        marginLeft: m.left,
        marginBottom: m.bottom,
        style: { fontFamily: 'var(--font-sans)', fontSize: '12px', background: 'transparent' },
        x:
          projection === 'h-x'
            ? { domain: domains.x, label: `Humidity ratio (${wUnit}) →`, labelAnchor: 'right', grid: false }
            : { domain: domains.x, label: `Dry-bulb temperature (${tUnit}) →`, labelAnchor: 'right', grid: true },
        y:
          projection === 'h-x'
            ? { domain: domains.y, label: `↑ Dry-bulb temperature (${tUnit}), read along the isotherms`, grid: false }
            : { domain: domains.y, label: `↑ Humidity ratio (${wUnit})`, grid: true },
        marks: [
          // The dense layer: regions and hour density painted into one image under the lines.
          (_index, sc) => layerImage(sc as unknown as InvertibleScales, { widthPx, heightPx, m, projection, system, window, regions, cells }),
          Plot.frame({ stroke: '#dcdad2' }),
          ...(['isotherm', 'relative-humidity', 'wet-bulb', 'enthalpy', 'saturation'] as const).map((kind) =>
            Plot.line(
              lineRows.filter((r) => r.kind === kind),
              { x: 'x', y: 'y', z: 'z', stroke: lineStyle[kind].stroke, strokeWidth: lineStyle[kind].width, strokeDasharray: lineStyle[kind].dash, clip: true },
            ),
          ),
          Plot.line(envelopeRows, {
            x: 'x',
            y: 'y',
            z: 'k',
            stroke: (r: { k: number }) => envelopeInks[r.k % envelopeInks.length],
            strokeWidth: 1.8,
            clip: true,
          }),
          Plot.dot(markerRows, { x: 'x', y: 'y', r: 5, stroke: '#1d2327', strokeWidth: 2, fill: '#ffffff' }),
          // Placed labels, in pixels (their positions were chosen against each other and the hours).
          (() => labelLayer(labelRows)) as never,
        ],
      });
      const svg = (figure.tagName.toLowerCase() === 'svg' ? figure : figure.querySelector('svg')) as SVGSVGElement | null;
      if (svg) {
        scales.current = { x: figure.scale('x') as never, y: figure.scale('y') as never, svg };
        // Where the axes' domains sit, for tests and tools that point at a state: "x0 x1 y0 y1" display units → pixels.
        svg.dataset.domains = [...domains.x, ...domains.y].join(' ');
        svg.dataset.area = [m.left, widthPx - m.right, heightPx - m.bottom, m.top].join(' ');
      }
      return figure;
    },
    [cells, compact, envelopes, markers, projection, regions, unitSystem, window],
  );

  const onPointerMove = useCallback(
    (event: PointerEvent<HTMLDivElement>) => {
      const s = scales.current;
      if (!s || !s.svg.isConnected) return;
      const rect = s.svg.getBoundingClientRect();
      const scale = s.svg.width.baseVal.value / rect.width || 1;
      const px = (event.clientX - rect.left) * scale;
      const py = (event.clientY - rect.top) * scale;
      const next = hoverAt({
        px,
        py,
        xDisplay: s.x.invert(px),
        yDisplay: s.y.invert(py),
        domains: chartDomains(window, projection, unitSystem),
        projection,
        units: unitSystem,
        regions,
        cells,
        pressurePa,
      });
      setHover(
        next
          ? {
              ...next,
              leftPx: event.clientX - (event.currentTarget.getBoundingClientRect().left ?? 0),
              topPx: event.clientY - event.currentTarget.getBoundingClientRect().top,
            }
          : null,
      );
    },
    [cells, pressurePa, projection, regions, unitSystem, window],
  );

  const label =
    projection === 'h-x'
      ? `h–x diagram at ${formatQuantity('pressure', unitSystem, pressurePa)}${design ? ' with the design’s operating regions' : ''}${hours.dryBulbC.length ? ' and the density of hours' : ''}`
      : `Psychrometric chart (dry-bulb and humidity ratio) at ${formatQuantity('pressure', unitSystem, pressurePa)}${design ? ' with the design’s operating regions' : ''}${hours.dryBulbC.length ? ' and the density of hours' : ''}`;

  const figure = (
    <div className="relative" onPointerMove={onPointerMove} onPointerLeave={() => setHover(null)} data-testid="moist-air-figure">
      <PlotFigure render={render} label={label} placeholderHeightPx={compact ? 300 : 420} />
      {hover && <ChartHover hover={hover} rules={rules} units={unitSystem} />}
    </div>
  );
  return (
    <div className="space-y-2" data-testid="moist-air-chart">
      <div className="flex flex-wrap items-center gap-3">
        {!fixedProjection && !compact && <SegmentedSwitch label="Chart projection" options={projectionOptions} value={projection} onChange={setProjection} />}
        {!compact && (
          <SegmentedSwitch<UnitSystem> label={local ? 'Units of this chart' : 'Units'} options={unitOptions} value={unitSystem} onChange={setUnitSystem} />
        )}
        {!compact && local && <span className="text-xs text-ink-soft">(this chart only)</span>}
        <p className="num text-xs text-ink-soft">at {formatQuantity('pressure', unitSystem, pressurePa)}</p>
        {cells && <DensityKey maxHours={cells.maxHours} units={unitSystem} />}
        {envelopes.length > 0 && (
          <ul aria-label="Envelopes" className="flex flex-wrap gap-x-4 gap-y-1 text-xs text-ink-soft">
            {envelopes.map((e, k) => (
              <li key={k} className="flex items-center gap-1.5">
                <span aria-hidden className="inline-block h-0.5 w-4" style={{ background: envelopeInks[k % envelopeInks.length] }} />
                {e.label}
              </li>
            ))}
          </ul>
        )}
      </div>
      {design && rules && !compact ? (
        <div className="grid gap-4 xl:grid-cols-[minmax(0,1fr)_21rem]">
          {figure}
          <RegionTable rules={rules} hours={regionHours} totalHours={hoursWithData} countedBy={cells?.totals ? 'modes' : 'grid'} />
        </div>
      ) : (
        figure
      )}
      <p className="text-xs text-ink-soft">
        {design ? 'Shaded: where the design runs in each region, from its own rules on a fine grid at this pressure. ' : ''}
        {hours.dryBulbC.length ? 'Hours: ink by how many fall in each cell. ' : ''}
        Lines: saturation (bold), relative humidity every 10 %, wet-bulb (dashed), enthalpy (dotted)
        {projection === 'h-x' ? ', isotherms (grey, nearly level; 0 °C is exactly level)' : ''}.
        <span className="print:hidden">
          {' '}
          Point at the chart for {design ? 'a region’s rule, ' : ''}the state there{hours.dryBulbC.length ? ' and its cell’s hours' : ''}.
        </span>
      </p>
      {design && rules && compact && <RegionTable rules={rules} hours={regionHours} totalHours={hoursWithData} countedBy={cells?.totals ? 'modes' : 'grid'} />}
      {!compact && <MoistAirTable hours={hours} envelopes={envelopes} markers={markers} pressurePa={pressurePa} system={unitSystem} />}
    </div>
  );
}

/** The density scale in words: the ink's lightest and darkest shades and the hours they stand for. */
function DensityKey({ maxHours, units }: { maxHours: number; units: UnitSystem }) {
  const [r, g, b] = densityInk;
  const cell = units === 'IP' ? '2 °F × 5 gr/lb' : '1 K × 0.5 g/kg';
  return (
    <p className="flex items-center gap-1.5 text-xs text-ink-soft" data-testid="density-key">
      Hours per {cell} cell:
      <span className="num">1</span>
      <span
        aria-hidden
        className="inline-block h-2.5 w-16 rounded-sm"
        style={{ background: `linear-gradient(to right, rgba(${r},${g},${b},0.12), rgba(${r},${g},${b},0.88))` }}
      />
      <span className="num">{maxHours.toLocaleString('en')}</span>
    </p>
  );
}

type Domains = ReturnType<typeof chartDomains>;

/** Axis domains in display units: the window, with the h–x ordinate covering the hottest isotherm's rise. */
export function chartDomains(window: ReturnType<typeof chartWindowFor>, projection: ChartProjection, system: UnitSystem) {
  const w = toDisplay('humidityRatio', system, window.humidityRatioMax);
  const t0 = toDisplay('temperature', system, window.dryBulbMinC);
  const t1 = toDisplay('temperature', system, window.dryBulbMaxC);
  if (projection === 'h-x') {
    const top = stateToChartXY(window.dryBulbMaxC, window.humidityRatioMax, projection, system).y;
    return { x: [0, w] as [number, number], y: [t0, Math.max(t1, top)] as [number, number] };
  }
  return { x: [t0, t1] as [number, number], y: [0, w] as [number, number] };
}

/** The text each background line carries: RH at its far end, wet-bulb where it leaves saturation, enthalpy at its dry end. */
function lineLabel(line: DisplayLine, system: UnitSystem): string | null {
  if (line.kind === 'relative-humidity') return `${line.value} %`;
  if (line.kind === 'wet-bulb') return formatQuantity('temperature', system, line.value, false).replace(/\.0$/, '');
  if (line.kind === 'enthalpy') return `h ${formatQuantity('enthalpy', system, line.value, false).replace(/\.0+$/, '')}`;
  return null;
}

/** Label positions around a point mark: right, left, above, below, and the diagonals. */
function sideCandidates(w: number, h: number): Array<[number, number]> {
  return [
    [9, -h / 2],
    [-w - 9, -h / 2],
    [-w / 2, -h - 8],
    [-w / 2, 8],
    [9, -h - 6],
    [-w - 9, -h - 6],
    [9, 6],
    [-w - 9, 6],
  ];
}

/** The moist-air state at a pixel of the figure, from the axis domains and margins (for placing labels). */
function pxToState(px: number, py: number, d: Domains, m: typeof margins, widthPx: number, heightPx: number, projection: ChartProjection, system: UnitSystem) {
  const x = d.x[0] + ((px - m.left) / (widthPx - m.left - m.right)) * (d.x[1] - d.x[0]);
  const y = d.y[0] + ((heightPx - m.bottom - py) / (heightPx - m.top - m.bottom)) * (d.y[1] - d.y[0]);
  return chartXYToState(x, y, projection, system);
}

/** Hours in the density cells under a label box, sampled on a 4-pixel lattice (labels prefer empty ground). */
function hoursUnderBox(box: LabelBox, cells: CellHours | null, stateAt: (px: number, py: number) => { dryBulbC: number; humidityRatio: number }): number {
  if (!cells) return 0;
  let sum = 0;
  for (let py = box.top; py <= box.bottom; py += 4) {
    for (let px = box.left; px <= box.right; px += 4) {
      const s = stateAt(px, py);
      const k = cellOf(cells, s.dryBulbC, s.humidityRatio);
      if (k >= 0) sum += cells.hours[k];
    }
  }
  return sum;
}

/** Plot's x and y scale functions as a render function receives them (d3 linear scales). */
interface InvertibleScales {
  x: { invert: (px: number) => number };
  y: { invert: (px: number) => number };
}

interface LayerArgs {
  widthPx: number;
  heightPx: number;
  m: typeof margins;
  projection: ChartProjection;
  system: UnitSystem;
  window: ReturnType<typeof chartWindowFor>;
  regions: OperatingRegionGrid | null;
  cells: CellHours | null;
}

/** The regions and density painted on a canvas, one pixel per CSS pixel, as one SVG image drawn without smoothing. */
function layerImage(sc: InvertibleScales, a: LayerArgs): SVGElement {
  const ns = 'http://www.w3.org/2000/svg';
  const image = document.createElementNS(ns, 'image');
  const plotW = a.widthPx - a.m.left - a.m.right;
  const plotH = a.heightPx - a.m.top - a.m.bottom;
  // One canvas pixel per CSS pixel: the cells are many pixels wide, and this keeps a repaint cheap (npm run bench).
  const w = Math.round(plotW);
  const h = Math.round(plotH);
  const canvas = document.createElement('canvas');
  canvas.width = w;
  canvas.height = h;
  const context = canvas.getContext('2d');
  if (!context || (!a.regions && !a.cells)) return image;
  const pixels = paintLayer({
    widthPx: w,
    heightPx: h,
    xAt: (i) => sc.x.invert(a.m.left + i + 0.5),
    yAt: (j) => sc.y.invert(a.m.top + j + 0.5),
    projection: a.projection,
    units: a.system,
    window: a.window,
    regions: a.regions,
    cells: a.cells,
    gapPx: 1,
  });
  context.putImageData(new ImageData(pixels as unknown as Uint8ClampedArray<ArrayBuffer>, w, h), 0, 0);
  image.setAttribute('href', canvas.toDataURL('image/png'));
  image.setAttribute('x', String(a.m.left));
  image.setAttribute('y', String(a.m.top));
  image.setAttribute('width', String(plotW));
  image.setAttribute('height', String(plotH));
  image.setAttribute('preserveAspectRatio', 'none');
  image.setAttribute('image-rendering', 'pixelated');
  image.style.imageRendering = 'pixelated';
  image.setAttribute('aria-hidden', 'true');
  return image;
}

/** The placed labels as SVG text with a white halo, positioned in pixels. */
function labelLayer(rows: Array<{ text: string; fill: string; weight: number; size: number; left: number; top: number }>): SVGElement {
  const ns = 'http://www.w3.org/2000/svg';
  const g = document.createElementNS(ns, 'g');
  g.setAttribute('aria-hidden', 'true');
  for (const r of rows) {
    const t = document.createElementNS(ns, 'text');
    t.textContent = r.text;
    t.setAttribute('x', String(r.left + 1));
    t.setAttribute('y', String(r.top + r.size));
    t.setAttribute('font-size', String(r.size));
    t.setAttribute('text-anchor', 'start');
    t.setAttribute('font-weight', String(r.weight));
    t.setAttribute('fill', r.fill);
    t.setAttribute('stroke', '#ffffff');
    t.setAttribute('stroke-width', r.size > 10 ? '3' : '2.5');
    t.setAttribute('paint-order', 'stroke');
    t.setAttribute('stroke-linejoin', 'round');
    t.setAttribute('data-label', r.text);
    g.append(t);
  }
  return g;
}
