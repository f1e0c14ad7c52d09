/** Moved to src/components/charts so the comparison report can draw the same chart. */
export { MonthlyComparisonChart } from '@/components/charts/monthly-comparison-chart';
