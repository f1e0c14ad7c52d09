import { useCallback, useMemo } from 'react';
import { ModeLegend } from '@/components/charts/mode-legend';
import { PlotFigure, type PlotModule } from '@/components/charts/plot-figure';
import { useUnitSystem } from '@/lib/unit-system';
import { modeColours, modeLabels } from '../../../../shared/modes';
import {
  metricRows,
  sweepMetric,
  modeHoursRows,
  type SweepInputPath,
  type SweepMetric,
  type SweepPoint,
  type SweepValue,
  type ZeroMechanical,
} from '../../../../shared/sweep';
import { formatSweepValue, sweepAxisTitle } from '@/lib/sweep-value';
import { compactPresetLabel, displayNumber } from '../lib/sweep-format';
import { metricTitle, shownNumber } from '@/lib/metric-text';
import { modeColourScale, modeLabelOrder } from '@/lib/charts/mode-scale';

const plotStyle = { fontFamily: 'var(--font-sans)', fontSize: '12px' };
/** Marks a point whose supply setpoint breaks the envelope (the signal colour for a bad result). */
const ENVELOPE_BREAK = '#a8322d';

/**
 * The swept value on the x axis: a number in the person's units on a linear scale, or the preset's
 * label on a band (bars) or point (lines) scale.
 */
function useAxis(input: SweepInputPath, points: readonly SweepPoint[]) {
  const { unitSystem } = useUnitSystem();
  return useMemo(() => {
    const preset = input === 'envelope.presetId';
    // Presets carry long names; the ticks take a short form, the table beside the charts the full one.
    const x = (v: SweepValue) => (typeof v === 'number' ? displayNumber(input, unitSystem, v) : compactPresetLabel(formatSweepValue(input, unitSystem, v)));
    const labels = points.map((p) => x(p.values[input]!) as string);
    // Finished points whose supply setpoint breaks the envelope: marked in every chart.
    const breaking = points.filter((p) => p.results?.breaksEnvelope).map((p) => x(p.values[input]!));
    return { preset, x, labels, breaking, title: sweepAxisTitle(input, unitSystem), unitSystem };
  }, [input, points, unitSystem]);
}

/** Hours per mode against the swept value, stacked in the one mode palette, with the zero-mechanical point marked. */
function ModeHoursChart({ input, points, zero }: { input: SweepInputPath; points: readonly SweepPoint[]; zero: ZeroMechanical }) {
  const axis = useAxis(input, points);
  const rows = useMemo(() => modeHoursRows(points, input).map((r) => ({ ...r, x: axis.x(r.value), label: modeLabels[r.mode] })), [points, input, axis]);
  const zeroX = zero.kind === 'none' ? null : axis.x(zero.value);
  const render = useCallback(
    (Plot: PlotModule, widthPx: number) => {
      const marker =
        zeroX === null
          ? []
          : [
              Plot.ruleX([zeroX], { stroke: '#1d2327', strokeDasharray: '4,3', strokeWidth: 1.5 }),
              Plot.text([zeroX], {
                x: (d: SweepValue) => d,
                frameAnchor: 'top',
                dy: -14,
                text: () => (zero.kind === 'up-to' ? '◀ no mechanical hours' : 'no mechanical hours ▶'),
                textAnchor: zero.kind === 'up-to' ? 'end' : 'start',
                fill: '#1d2327',
              }),
            ];
      const outside = axis.breaking.length
        ? [
            Plot.ruleX(axis.breaking, { stroke: ENVELOPE_BREAK, strokeOpacity: 0.5, strokeWidth: 3 }),
            Plot.text([axis.breaking[0]], {
              x: (d: SweepValue) => d,
              frameAnchor: 'bottom',
              dy: -6,
              text: () => 'outside envelope',
              textAnchor: 'start',
              dx: 4,
              fill: ENVELOPE_BREAK,
              stroke: '#ffffff',
              strokeWidth: 3,
              paintOrder: 'stroke',
            }),
          ]
        : [];
      return Plot.plot({
        width: widthPx,
        height: 260,
        marginLeft: 60,
        marginTop: 28,
        marginBottom: 42,
        style: plotStyle,
        x: axis.preset
          ? { type: 'band', domain: axis.labels, label: axis.title, labelAnchor: 'center', labelArrow: 'none', labelOffset: 36, padding: 0.2 }
          : { label: axis.title, labelAnchor: 'center', labelArrow: 'none', labelOffset: 36 },
        y: { label: 'Hours over the file (h)', grid: true, labelArrow: 'up' },
        color: modeColourScale,
        marks: [
          axis.preset
            ? Plot.barY(rows, { x: 'x', y: 'hours', fill: 'label', order: modeLabelOrder, tip: true })
            : Plot.areaY(rows, { x: 'x', y: 'hours', fill: 'label', order: modeLabelOrder, curve: 'linear', tip: true }),
          Plot.ruleY([0]),
          ...outside,
          ...marker,
        ],
      });
    },
    [rows, axis, zeroX, zero.kind],
  );
  return (
    <div className="space-y-2">
      <ModeLegend />
      <PlotFigure render={render} label={`Hours per mode against ${axis.title}`} placeholderHeightPx={260} />
    </div>
  );
}

/** Least span of a ratio's axis (partial PUE): a sweep that moves it in the fifth decimal reads as flat, on ticks of 0.005. */
const MIN_RATIO_SPAN = 0.02;

/**
 * The value axis's domain where Plot's own would mislead: a count with one value throughout (no water at any point,
 * say) gets a domain of its own, not a zero-height one; a ratio that barely moves gets at least MIN_RATIO_SPAN around
 * its middle, so its ticks read 1.075, 1.080 rather than digits of the seventh decimal cut off at the margin.
 */
export function valueDomain(values: number[], fromZero: boolean): { domain?: [number, number] } {
  if (values.length === 0) return {};
  const lo = Math.min(...values);
  const hi = Math.max(...values);
  if (!fromZero) {
    if (hi - lo >= MIN_RATIO_SPAN) return {};
    const middle = (lo + hi) / 2;
    return { domain: [middle - MIN_RATIO_SPAN / 2, middle + MIN_RATIO_SPAN / 2] };
  }
  if (hi > lo) return {};
  return { domain: hi === 0 ? [0, 1] : [Math.min(0, hi), Math.abs(hi) * 1.1] };
}

/** A count that is part of a mode is drawn in its mode's colour. */
const modeOfMetric: Partial<Record<SweepMetric, keyof typeof modeColours>> = {
  free: 'free',
  humidified: 'free',
  adiabatic: 'adiabatic',
  mechanical: 'mechanical',
  partialMechanical: 'mechanical',
};

/**
 * One result against the swept value, as a line with a dot per finished point, on its own scale (a few
 * mechanical hours would vanish beside thousands of free-cooling ones). Hours per mode take the mode's colour.
 */
function MetricChart({ input, points, metric, zero }: { input: SweepInputPath; points: readonly SweepPoint[]; metric: SweepMetric; zero?: ZeroMechanical }) {
  const axis = useAxis(input, points);
  const rows = useMemo(
    () =>
      metricRows(points, input, metric).map((r) => ({
        x: axis.x(r.value),
        y: shownNumber(sweepMetric(metric), axis.unitSystem, r.metric),
        outside: points[r.index].results?.breaksEnvelope ? 'outside envelope' : 'inside envelope',
      })),
    [points, input, metric, axis],
  );
  const title = metricTitle(sweepMetric(metric), axis.unitSystem);
  const mode = modeOfMetric[metric];
  const colour = mode ? modeColours[mode] : '#1f3a4a';
  const zeroX = zero && zero.kind !== 'none' ? axis.x(zero.value) : null;
  const render = useCallback(
    (Plot: PlotModule, widthPx: number) =>
      Plot.plot({
        width: widthPx,
        height: 210,
        marginLeft: 60,
        marginTop: 24,
        marginBottom: 42,
        style: plotStyle,
        x: axis.preset
          ? { type: 'point', domain: axis.labels, label: axis.title, labelAnchor: 'center', labelArrow: 'none', labelOffset: 36, padding: 0.5 }
          : { label: axis.title, labelAnchor: 'center', labelArrow: 'none', labelOffset: 36, ticks: 6 },
        y: {
          label: title,
          grid: true,
          labelArrow: 'up',
          zero: metric !== 'partialPue',
          nice: true,
          ...valueDomain(
            rows.map((r) => r.y),
            metric !== 'partialPue',
          ),
        },
        marks: [
          zeroX === null ? null : Plot.ruleX([zeroX], { stroke: '#1d2327', strokeDasharray: '4,3' }),
          Plot.lineY(rows, { x: 'x', y: 'y', stroke: colour, strokeWidth: 1.75 }),
          Plot.dot(
            rows.filter((r) => r.outside === 'inside envelope'),
            { x: 'x', y: 'y', fill: colour, r: 3, tip: true },
          ),
          Plot.dot(
            rows.filter((r) => r.outside === 'outside envelope'),
            { x: 'x', y: 'y', symbol: 'times', stroke: ENVELOPE_BREAK, strokeWidth: 2, r: 4, tip: true, title: (r: { outside: string }) => r.outside },
          ),
        ],
      }),
    [rows, axis, title, metric, colour, zeroX],
  );
  return <PlotFigure render={render} label={`${title} against ${axis.title}`} placeholderHeightPx={210} />;
}

/**
 * The one-input sweep drawn: hours per mode stacked, then each mode's hours, partial PUE, water, peak
 * mechanical load and hours outside the envelope against the swept value, the zero-mechanical point marked
 * where there is one and the points that break the envelope marked in every chart.
 */
export function SweepLineCharts({ input, points, zero }: { input: SweepInputPath; points: readonly SweepPoint[]; zero: ZeroMechanical }) {
  return (
    <div className="space-y-4">
      <ModeHoursChart input={input} points={points} zero={zero} />
      <div className="grid gap-x-6 gap-y-2 lg:grid-cols-3">
        <MetricChart input={input} points={points} metric="mechanical" zero={zero} />
        <MetricChart input={input} points={points} metric="partialMechanical" />
        <MetricChart input={input} points={points} metric="adiabatic" />
        <MetricChart input={input} points={points} metric="free" />
        <MetricChart input={input} points={points} metric="humidified" />
        <MetricChart input={input} points={points} metric="partialPue" />
        <MetricChart input={input} points={points} metric="waterL" />
        <MetricChart input={input} points={points} metric="peakMechanicalLoadKw" />
        <MetricChart input={input} points={points} metric="excursionHours" />
      </div>
      {points.some((p) => p.results?.breaksEnvelope) && (
        <p className="text-xs text-ink-soft">
          <span className="font-semibold text-[#a8322d]">×</span> and the shaded lines mark points outside the inlet envelope (supply setpoint beyond the
          derated limits).
        </p>
      )}
    </div>
  );
}
