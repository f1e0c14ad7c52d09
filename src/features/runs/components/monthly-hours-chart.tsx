/** Moved to src/components/charts so the report can draw the same chart. */
export { MonthlyModeChart as MonthlyHoursChart } from '@/components/charts/monthly-mode-chart';
