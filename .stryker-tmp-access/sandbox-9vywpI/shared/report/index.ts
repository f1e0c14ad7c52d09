/** Report data, summary tables and download formats shared by the server and the client. */
// @ts-nocheck

export * from './report-data';
export * from './summary-table';
export * from './inputs';
export * from './hourly-json';
export * from './mode-subsets';
export * from './hour-columns';
export * from './run-hour-columns';
export * from './fan-groups';
