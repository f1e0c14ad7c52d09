/** Where a run's air pressure came from, in words: the climate file's station pressure or the standard atmosphere. */
// @ts-nocheck

import type { ScenarioResults } from '../scenario/run';

export function pressureSourceWords(site: ScenarioResults['site']): string {
  if (site.pressureSource === 'elevation') return 'standard atmosphere at the site elevation (the climate file has no station pressure)';
  return site.pressureFilledHours > 0
    ? `station pressure from the climate file; ${site.pressureFilledHours.toLocaleString('en')} hours without it from the standard atmosphere at the site elevation`
    : 'station pressure from the climate file';
}
