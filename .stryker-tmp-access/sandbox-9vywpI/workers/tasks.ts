/**
 * The tasks the pool runs, by name: `pool.run('<name>', input)` (workers/pool.ts).
 * Each is a thin wrapper over shared/.
 */
// @ts-nocheck

export { importClimate } from './import-climate';
export { summariseClimate } from './summarise-climate';
export { executeRun } from './execute-run';
export { morphClimate } from './morph-climate';
export { analyseExcursions } from './analyse-excursions';
export { formatHourly } from './format-hourly';
export { formatClimateSeries } from './format-climate-series';
export { hourColumns } from './hour-columns';
