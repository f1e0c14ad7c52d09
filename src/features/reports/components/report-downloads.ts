import type { DownloadLink } from '@/components/ui/download-menu';

/** The downloads of a comparison: its table, and each run's hourly results. */
export function comparisonDownloadLinks(summaryBase: string, query: string, hourly: Array<{ runId: number; href: string }>): DownloadLink[] {
  return [
    { label: 'Comparison table (CSV)', href: `${summaryBase}/summary.csv${query}`, note: 'each figure per run, with its difference from the baseline' },
    { label: 'Comparison (JSON)', href: `${summaryBase}/summary.json${query}`, note: 'the report data and the table' },
    ...hourly.map(({ runId, href }) => ({ label: `Run ${runId}: hourly results (CSV)`, href })),
  ];
}
