/**
 * Offset of a zone's standard time from UTC in minutes: the smaller of its offsets on 1 January and
 * 1 July of `year`, since daylight saving only ever adds. Throws RangeError for an unknown zone.
 */
export function standardOffsetMinutes(timeZone: string, year = 2023): number {
  const offsetAt = (ms: number) => {
    const parts = new Intl.DateTimeFormat('en-US', {
      timeZone,
      hourCycle: 'h23',
      year: 'numeric',
      month: 'numeric',
      day: 'numeric',
      hour: 'numeric',
      minute: 'numeric',
    }).formatToParts(ms);
    const get = (type: string) => Number(parts.find((p) => p.type === type)?.value);
    const asUtc = Date.UTC(get('year'), get('month') - 1, get('day'), get('hour'), get('minute'));
    return Math.round((asUtc - ms) / 60_000);
  };
  return Math.min(offsetAt(Date.UTC(year, 0, 1)), offsetAt(Date.UTC(year, 6, 1)));
}
