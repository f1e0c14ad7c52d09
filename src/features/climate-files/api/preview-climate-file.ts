import { sendFile, uploadQuery, type UploadBody, type UploadParams, type UploadProgress } from './send-file';
import type { ClimatePreview } from '../../../../shared/schemas/api/climate-files';
export type { ClimatePreview } from '../../../../shared/schemas/api/climate-files';

/** One of the first hours a preview shows. */
export type PreviewHour = ClimatePreview['preview'][number];

/** Imports the file on the server without storing it: the detected mapping, the report and the first hours. */
export const previewClimateFile = (projectId: number, siteId: number, file: UploadBody, params: UploadParams, onProgress?: (p: UploadProgress) => void) =>
  sendFile<ClimatePreview>(`/projects/${projectId}/sites/${siteId}/climate-files/preview?${uploadQuery(params)}`, file, onProgress);
