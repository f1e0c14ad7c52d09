import { summariseSeries, type SeriesSummary } from '../shared/series-summary';

/** Piscina task: summarise one hourly column handed over as a Float64Array. */
export function summarise(values: Float64Array): SeriesSummary {
  return summariseSeries(values);
}
