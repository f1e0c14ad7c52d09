/** Moved to src/components/charts so the report can draw the same chart. */
export { hoursOfMode, monthlyModeRows, monthShort, type MonthModeHours } from '@/components/charts/monthly-mode-rows';
