import { useMemo, useState } from 'react';
import { MoistAirChart } from '@/components/charts/moist-air-chart';
import { classifyHours } from '../../../../shared/scenario/classify';
import { designAtSite } from '../../../../shared/scenario/run';
import { scenarioSchema, type Scenario } from '../../../../shared/scenario/schema';
import { usePreviewClimate } from '../api/get-preview-climate';
import type { ScenarioFormValues } from '../lib/scenario-form';
import { useDebouncedValue } from '../lib/use-debounced-value';

/**
 * The scenario's operating regions on the moist-air chart as it stands in the form, over the preview file's
 * hours. Computed in the browser from the shared classifier a moment after each keystroke (the grid's wet-bulbs
 * are solved once per file; a change of setpoint re-runs only the classifier), so the boundaries follow the
 * fields. While a field is invalid the last valid design stays, faded.
 */
export function DesignChartPreview({ projectId, climateFileId, values }: { projectId: number; climateFileId: number | null; values: ScenarioFormValues }) {
  const climate = usePreviewClimate(projectId, climateFileId);
  const settledJson = useDebouncedValue(JSON.stringify(values), 150);
  const parsed = useMemo(() => scenarioSchema.safeParse(JSON.parse(settledJson)), [settledJson]);
  const lastValid = useLastValid(parsed.success ? parsed.data : null);
  const elevationM = climate.data?.elevationM;
  const design = useMemo(() => (lastValid && elevationM !== undefined ? designAtSite(lastValid, elevationM) : null), [lastValid, elevationM]);
  const series = climate.data?.series;
  // Every hour of the file classified by the design as it stands (the engine's classifier at each hour's own
  // pressure), so the table and the hover count hours as a run would.
  const hours = useMemo(() => {
    if (!series || !design) return null;
    const c = classifyHours(design.system, design.limits, series, design.plant);
    return {
      dryBulbC: series.dryBulbC,
      humidityRatio: series.humidityRatio,
      modes: c.modes,
      mechanicalFraction: c.mechanicalFraction,
      humidified: c.humidified,
    };
  }, [series, design]);
  const envelopes = useMemo(() => (design ? [{ label: 'Envelope', limits: design.limits }] : []), [design]);
  const markers = useMemo(() => [] as never[], []);

  if (climate.isError) return <p className="text-xs text-signal-bad">The chart's climate file could not be read: {climate.error.message}</p>;
  if (!hours || !series || !design) return <div role="progressbar" className="h-72 animate-pulse rounded bg-mist" aria-label="Loading the moist-air chart" />;
  return (
    <div className={parsed.success ? '' : 'opacity-50'} data-testid="design-chart-preview" aria-disabled={!parsed.success || undefined}>
      {!parsed.success && <p className="mb-1 text-xs text-signal-warn">Showing the last valid design until every field is valid.</p>}
      <MoistAirChart
        pressurePa={series.chartPressurePa}
        hours={hours}
        design={design}
        envelopes={envelopes}
        markers={markers}
        compact
        projection="dry-bulb-humidity-ratio"
      />
    </div>
  );
}

/** The value, or while it is null the last non-null one (state adjusted during render, as React's docs show). */
function useLastValid(value: Scenario | null): Scenario | null {
  const [last, setLast] = useState(value);
  if (value && value !== last) setLast(value);
  return value ?? last;
}
