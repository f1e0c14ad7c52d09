/** A fixed UTC offset written the way the importer's zones take it (`UTC+05:30`, `UTC-07:00`), from minutes east of UTC. */
export function fixedOffsetZone(minutesEast: number): string {
  const abs = Math.abs(Math.round(minutesEast));
  return `UTC${minutesEast < 0 ? '-' : '+'}${String(Math.floor(abs / 60)).padStart(2, '0')}:${String(abs % 60).padStart(2, '0')}`;
}
