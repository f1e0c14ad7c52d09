import type { DetectedMapping, ImportReport } from '../../../../shared/climate/types';
import type { ClimateFileListing } from '@/lib/api/climate-files';
import { sendFile, uploadQuery, type UploadBody, type UploadParams, type UploadProgress } from './send-file';

/** The 422 answer's details when the importer refuses the file. */
export interface RejectedImportDetails {
  report: ImportReport;
  mapping: DetectedMapping;
}

/** Stores the file whole with its report, or rejects with a 422 whose details hold the report. */
export const uploadClimateFile = (projectId: number, siteId: number, file: UploadBody, params: UploadParams, onProgress?: (p: UploadProgress) => void) =>
  sendFile<{ climateFile: ClimateFileListing; report: ImportReport }>(
    `/projects/${projectId}/sites/${siteId}/climate-files?${uploadQuery(params)}`,
    file,
    onProgress,
  );
