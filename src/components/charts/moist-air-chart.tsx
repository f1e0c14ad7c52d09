import { useCallback, useMemo, useState } from 'react';
import { modeColours, modeKeys, modeLabels } from '../../../shared/modes';
import type { ChartProjection } from '../../../shared/psychrometrics';
import { formatQuantity, toDisplay, unitOf } from '@/lib/quantity';
import { LocalUnitSystem, useUnitSystem, type UnitSystem } from '@/lib/unit-system';
import { densityRamp } from './colour-ramps';
import { ModeLegend } from './mode-legend';
import {
  backgroundLines,
  chartWindowFor,
  densityBins,
  envelopePolygon,
  hourStates,
  hoursToChartXY,
  modeCodeAt,
  sampleIndex,
  stateToChartXY,
  type ChartHours,
  type ChartMarker,
  type DisplayLine,
  type EnvelopeLimitsInput,
} from './moist-air-data';
import { MoistAirTable } from './moist-air-table';
import { PlotFigure, type PlotModule } from './plot-figure';
import { SegmentedSwitch } from './segmented-switch';

export interface MoistAirChartProps {
  pressurePa: number;
  /** Fixed projection; when omitted the chart shows its own switch. */
  projection?: ChartProjection;
  hours: ChartHours;
  /** density for climate files; points coloured by mode for runs. */
  display: 'density' | 'points';
  envelopes?: Array<{ label: string; limits: EnvelopeLimitsInput }>;
  markers?: ChartMarker[];
}

/** Most points drawn (and hovered) at once; larger series are thinned to every k-th hour, and the caption says so. */
const maxDrawnHours = 30_000;
/** Painting order per mode code (0 free, 1 adiabatic, 2 mechanical, 3 no data): no data lowest, mechanical on top. */
const drawOrder = [1, 2, 3, 0];
const envelopeInks = ['#1f3a4a', '#2f6f4e', '#8a5a12', '#5b4a8a'];
const lineStyle: Record<DisplayLine['kind'], { stroke: string; width: number; dash?: string }> = {
  saturation: { stroke: '#1f3a4a', width: 1.8 },
  'relative-humidity': { stroke: '#8fa9b6', width: 0.8 },
  'wet-bulb': { stroke: '#b2a27c', width: 0.8, dash: '4,3' },
  enthalpy: { stroke: '#9c8fa8', width: 0.8, dash: '1,3' },
  'specific-volume': { stroke: '#c0c6ca', width: 0.6 },
  isotherm: { stroke: '#d2d6d8', width: 0.7 },
};

const projectionOptions = [
  { value: 'dry-bulb-humidity-ratio', label: 'Dry-bulb / humidity ratio' },
  { value: 'h-x', label: 'h–x diagram' },
] as const;
const unitOptions = [
  { value: 'SI', label: 'SI' },
  { value: 'IP', label: 'IP' },
] as const;

/**
 * One chart for moist air at a given pressure: saturation, RH, wet-bulb and enthalpy lines, envelope
 * polygons, hours as a density or as points coloured by mode, markers, and a table with the same figures.
 */
export function MoistAirChart(props: MoistAirChartProps) {
  // The chart's own unit switch changes this chart only, never the person's setting (issue 17).
  return (
    <LocalUnitSystem>
      <MoistAirChartBody {...props} />
    </LocalUnitSystem>
  );
}

function MoistAirChartBody({ pressurePa, projection: fixedProjection, hours, display, envelopes = [], markers = [] }: MoistAirChartProps) {
  const { unitSystem, setUnitSystem, local } = useUnitSystem();
  const [chosenProjection, setProjection] = useState<ChartProjection>('dry-bulb-humidity-ratio');
  const projection = fixedProjection ?? chosenProjection;

  const states = useMemo(() => hourStates(hours, pressurePa), [hours, pressurePa]);
  const window = useMemo(
    () => chartWindowFor(pressurePa, hours, envelopes.map((e) => e.limits), markers),
    [pressurePa, hours, envelopes, markers],
  );
  const sample = useMemo(() => sampleIndex(hours.dryBulbC.length, maxDrawnHours), [hours]);

  const render = useCallback(
    (Plot: PlotModule, widthPx: number) => {
      const system = unitSystem;
      const xy = hoursToChartXY(hours, projection, system);
      const lines = backgroundLines(window, projection, system);
      const domains = chartDomains(window, projection, system);
      const tUnit = unitOf('temperature', system);
      const wUnit = `${unitOf('humidityRatio', system)} dry air`;
      const drawn = Array.from(sample.index).filter((i) => xy.x[i] === xy.x[i]);
      // Draw the common free-cooling hours first and the rarer adiabatic and mechanical hours over them.
      if (display === 'points' && hours.modes) drawn.sort((a, b) => drawOrder[modeCodeAt(hours.modes, a)] - drawOrder[modeCodeAt(hours.modes, b)]);

      const lineRows = lines.flatMap((line, z) => line.points.map((p) => ({ ...p, z, kind: line.kind })));
      const labels = lineLabels(lines, system, projection);
      const envelopeRows = envelopes.flatMap((envelope, k) => {
        const polygon = envelopePolygon(envelope.limits, window).map((s) => stateToChartXY(s.dryBulbC, s.humidityRatio, projection, system));
        return polygon.length ? [...polygon, polygon[0]].map((p) => ({ ...p, k, label: envelope.label })) : [];
      });
      const envelopeTags = envelopes.map((_, k) => envelopeRows.find((r) => r.k === k)).filter((r) => r !== undefined);
      const markerRows = markers.map((m) => ({ ...stateToChartXY(m.dryBulbC, m.humidityRatio, projection, system), label: m.label }));
      const density =
        display === 'density' ? densityBins(xy.x, xy.y, domains.x, domains.y, 64, 44).cells : [];

      const title = (i: number) => hourText(i, hours, states, system);
      return Plot.plot({
        width: widthPx,
        height: Math.round(Math.max(340, Math.min(620, widthPx * 0.6))),
        marginRight: projection === 'h-x' ? 56 : 20,
        marginLeft: 56,
        marginBottom: 40,
        style: { fontFamily: 'var(--font-sans)', fontSize: '12px' },
        x:
          projection === 'h-x'
            ? { domain: domains.x, label: `Humidity ratio (${wUnit}) →`, labelAnchor: 'right', grid: false }
            : { domain: domains.x, label: `Dry-bulb temperature (${tUnit}) →`, labelAnchor: 'right', grid: true },
        y:
          projection === 'h-x'
            ? { domain: domains.y, label: `↑ Dry-bulb temperature (${tUnit}), read along the isotherms`, grid: false }
            : { domain: domains.y, label: `↑ Humidity ratio (${wUnit})`, grid: true },
        color: display === 'density' ? { type: 'sqrt', interpolate: densityRamp, legend: true, label: 'Hours per cell' } : undefined,
        marks: [
          Plot.frame({ stroke: '#dcdad2' }),
          ...(['isotherm', 'relative-humidity', 'wet-bulb', 'enthalpy', 'saturation'] as const).map((kind) =>
            Plot.line(
              lineRows.filter((r) => r.kind === kind),
              { x: 'x', y: 'y', z: 'z', stroke: lineStyle[kind].stroke, strokeWidth: lineStyle[kind].width, strokeDasharray: lineStyle[kind].dash, clip: true },
            ),
          ),
          Plot.text(labels.filter((l) => l.anchor !== 'end'), { x: 'x', y: 'y', text: 'text', fill: 'fill', fontSize: 10, textAnchor: 'start', dx: 3, clip: true }),
          Plot.text(labels.filter((l) => l.anchor === 'end'), { x: 'x', y: 'y', text: 'text', fill: 'fill', fontSize: 10, textAnchor: 'end', dx: -4, dy: -4, clip: true }),
          display === 'density'
            ? Plot.rect(density, { x1: 'x1', x2: 'x2', y1: 'y1', y2: 'y2', fill: 'hours', clip: true })
            : Plot.dot(drawn, {
                x: (i: number) => xy.x[i],
                y: (i: number) => xy.y[i],
                // Few hours (a short run) read better as larger dots.
                r: drawn.length < 3000 ? 3 : 1.7,
                fill: (i: number) => modeColours[modeKeys[modeCodeAt(hours.modes, i)]],
                fillOpacity: 0.75,
                clip: true,
              }),
          Plot.line(envelopeRows, {
            x: 'x',
            y: 'y',
            z: 'k',
            stroke: (r: { k: number }) => envelopeInks[r.k % envelopeInks.length],
            strokeWidth: 1.8,
            clip: true,
          }),
          // A lone envelope is named at its upper-left corner; several are named in the legend above, as their corners often meet.
          Plot.text(envelopeTags.length === 1 ? envelopeTags : [], {
            x: 'x',
            y: 'y',
            text: 'label',
            fill: envelopeInks[0],
            fontWeight: 600,
            textAnchor: 'start',
            dy: -8,
            stroke: '#ffffff',
            strokeWidth: 3,
            paintOrder: 'stroke',
          }),
          Plot.dot(markerRows, { x: 'x', y: 'y', r: 5, stroke: '#1d2327', strokeWidth: 2, fill: '#ffffff' }),
          Plot.text(markerRows, { x: 'x', y: 'y', text: 'label', dx: 9, textAnchor: 'start', fontWeight: 600, fill: '#1d2327', stroke: '#ffffff', strokeWidth: 3, paintOrder: 'stroke' }),
          Plot.tip(drawn, Plot.pointer({ x: (i: number) => xy.x[i], y: (i: number) => xy.y[i], title, maxRadius: 24 })),
        ],
      });
    },
    [display, envelopes, hours, markers, projection, sample, states, unitSystem, window],
  );

  const label =
    projection === 'h-x'
      ? `h–x diagram at ${formatQuantity('pressure', unitSystem, pressurePa)} with ${display === 'density' ? 'the density of hours' : 'hours coloured by mode'}`
      : `Psychrometric chart (dry-bulb and humidity ratio) at ${formatQuantity('pressure', unitSystem, pressurePa)} with ${display === 'density' ? 'the density of hours' : 'hours coloured by mode'}`;

  return (
    <div className="space-y-2" data-testid="moist-air-chart">
      <div className="flex flex-wrap items-center gap-3">
        {!fixedProjection && <SegmentedSwitch label="Chart projection" options={projectionOptions} value={projection} onChange={setProjection} />}
        <SegmentedSwitch<UnitSystem> label={local ? 'Units of this chart' : 'Units'} options={unitOptions} value={unitSystem} onChange={setUnitSystem} />
        {local && <span className="text-xs text-ink-soft">(this chart only)</span>}
        <p className="num text-xs text-ink-soft">at {formatQuantity('pressure', unitSystem, pressurePa)}</p>
        {display === 'points' && hours.modes && <ModeLegend />}
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
      <PlotFigure render={render} label={label} placeholderHeightPx={420} />
      <p className="text-xs text-ink-soft">
        Lines: saturation (bold), relative humidity every 10 %, wet-bulb (dashed), enthalpy (dotted)
        {projection === 'h-x' ? ', isotherms (grey, nearly level; 0 °C is exactly level)' : ''}.
        {sample.stride > 1 && ` Every ${sample.stride}th hour is drawn; the table counts all hours.`}
      </p>
      <MoistAirTable hours={hours} states={states} envelopes={envelopes} markers={markers} pressurePa={pressurePa} system={unitSystem} />
    </div>
  );
}


/** Axis domains in display units: the window, with the h–x ordinate covering the hottest isotherm's rise. */
function chartDomains(window: ReturnType<typeof chartWindowFor>, projection: ChartProjection, system: UnitSystem) {
  const w = toDisplay('humidityRatio', system, window.humidityRatioMax);
  const t0 = toDisplay('temperature', system, window.dryBulbMinC);
  const t1 = toDisplay('temperature', system, window.dryBulbMaxC);
  if (projection === 'h-x') {
    const top = stateToChartXY(window.dryBulbMaxC, window.humidityRatioMax, projection, system).y;
    return { x: [0, w] as [number, number], y: [t0, Math.max(t1, top)] as [number, number] };
  }
  return { x: [t0, t1] as [number, number], y: [0, w] as [number, number] };
}

/** Where each background line carries its value: RH at its far end, wet-bulb and enthalpy where they leave saturation. */
function lineLabels(lines: DisplayLine[], system: UnitSystem, projection: ChartProjection) {
  const out: Array<{ x: number; y: number; text: string; fill: string; anchor?: 'start' | 'end' }> = [];
  for (const line of lines) {
    if (!line.points.length) continue;
    if (line.kind === 'relative-humidity') {
      const p = line.points[line.points.length - 1];
      out.push({ ...p, text: `${line.value} %`, fill: '#4f6a77' });
    } else if (line.kind === 'wet-bulb') {
      // On the saturation curve, on its supersaturated side, where no hour is drawn.
      out.push({ ...line.points[0], text: formatQuantity('temperature', system, line.value, false).replace(/\.0$/, ''), fill: '#6d5f3a', anchor: projection === 'h-x' ? 'start' : 'end' });
    } else if (line.kind === 'enthalpy') {
      // At the line's dry end (the foot of the chart or its far edge).
      const p = line.points[line.points.length - 1];
      out.push({ ...p, text: `h ${formatQuantity('enthalpy', system, line.value, false).replace(/\.0+$/, '')}`, fill: '#5d5068', anchor: 'end' });
    }
  }
  return out;
}

/** The hour's full state in words, for the hover tip. */
function hourText(i: number, hours: ChartHours, states: ReturnType<typeof hourStates>, system: UnitSystem): string {
  const rows = [
    `Dry-bulb ${formatQuantity('temperature', system, hours.dryBulbC[i])}`,
    `Humidity ratio ${formatQuantity('humidityRatio', system, hours.humidityRatio[i])}`,
    `Relative humidity ${Number.isFinite(states.rhPct[i]) ? states.rhPct[i].toFixed(0) : '–'} %`,
    `Dew point ${formatQuantity('temperature', system, states.dewPointC[i])}`,
    `Wet-bulb ${formatQuantity('temperature', system, states.wetBulbC[i])}`,
    `Enthalpy ${formatQuantity('enthalpy', system, states.enthalpyKJPerKg[i])}`,
  ];
  if (hours.modes) rows.push(`Mode ${modeLabels[modeKeys[modeCodeAt(hours.modes, i)]]}`);
  return rows.join('\n');
}
