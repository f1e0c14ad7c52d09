/**
 * How a climate file's relative humidity and dew point were read, in the words every view and download uses.
 * Tramontane computes and reports over liquid water at every temperature (WMO-No. 8 part I ch. 4); the import
 * option humidityOverIce reads a file that states them over ice below 0 °C and converts them.
 */
// @ts-nocheck

export function humidityReadingWords(humidityOverIce: boolean | null | undefined): string {
  if (humidityOverIce === true) return 'over ice below 0 °C, as the file gives it (converted to over liquid water at import)';
  if (humidityOverIce === false) return 'over liquid water at every temperature (WMO-No. 8), the default';
  return 'not recorded with this run';
}
