// @ts-nocheck
import type { DetectedMapping, HumidityKind, ImportReport } from '../../../../shared/climate/types';
import { sendFile, uploadQuery, type UploadBody, type UploadParams, type UploadProgress } from './send-file';

export interface PreviewHour {
  timestampMs: number;
  dryBulbC: number | null;
  /** SI in the unit of humidityKind: %, °C or kg/kg. */
  humidity: number | null;
  pressurePa: number | null;
  /** 0 measured, 1 filled, 2 missing */
  flag: number;
}

export interface ClimatePreview {
  ok: boolean;
  mapping: DetectedMapping;
  report: ImportReport;
  humidityKind: HumidityKind | null;
  firstLines: string[];
  preview: PreviewHour[];
}

/** Imports the file on the server without storing it: the detected mapping, the report and the first hours. */
export const previewClimateFile = (projectId: number, siteId: number, file: UploadBody, params: UploadParams, onProgress?: (p: UploadProgress) => void) =>
  sendFile<ClimatePreview>(`/projects/${projectId}/sites/${siteId}/climate-files/preview?${uploadQuery(params)}`, file, onProgress);
