// @ts-nocheck
import { importClimateText, type ImportOptions, type ImportResult } from '../shared/climate';

/** Piscina task: parse, map, validate and repair one uploaded climate file off the main thread. */
export function importClimate(input: { text: string; options: ImportOptions }): ImportResult {
  return importClimateText(input.text, input.options);
}
