import type { DownloadLink } from '@/components/ui/download-menu';

/** The downloads of a comparison: its table, and each run's hourly results. */
export function comparisonDownloadLinks(
  summaryBase: string,
  query: string,
  hourly: Array<{ runId: number; href: string }>,
  units: 'SI' | 'IP' = 'SI',
): DownloadLink[] {
  const params = [query.replace(/^\?/, ''), units === 'IP' ? 'units=ip' : ''].filter(Boolean).join('&');
  const q = params ? `?${params}` : '';
  return [
    { label: 'Comparison table (CSV)', href: `${summaryBase}/summary.csv${q}`, note: `each figure per run, with its difference from the baseline, ${units}` },
    { label: 'Comparison (JSON)', href: `${summaryBase}/summary.json${q}`, note: `the report data and the table, ${units}` },
    ...hourly.map(({ runId, href }) => ({ label: `Run ${runId}: hourly results (CSV)`, href })),
  ];
}
