/** One invented site of the sample weather, as sites.json lists it. */
// @ts-nocheck

export interface SampleSite {
  id: string;
  name: string;
  climate: string;
  latitude: number;
  longitude: number;
  elevationM: number;
  timeZone: string;
  file: string;
  /** The importer's timeZone option for this file: the zone of its local times ('UTC' when stamps carry an offset). */
  importTimeZone: string;
  layout: string;
  years: number[];
  synthetic: true;
}
