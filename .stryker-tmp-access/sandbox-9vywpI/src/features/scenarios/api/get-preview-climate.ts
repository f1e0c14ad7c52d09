// @ts-nocheck
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '@/lib/api-client';
import { chartSeries, type ClimateHoursJson } from '@/lib/climate-series';

/** The preview file's site elevation and hours, shaped for the moist-air chart (the same cache keys as the climate-file pages). */
export const getPreviewClimate = async (projectId: number, fileId: number) => {
  const [detail, hours] = await Promise.all([
    apiFetch<{ site: { elevationM: number } }>(`/projects/${projectId}/climate-files/${fileId}`),
    apiFetch<ClimateHoursJson>(`/projects/${projectId}/climate-files/${fileId}/hours`),
  ]);
  return { elevationM: detail.site.elevationM, series: chartSeries(hours, detail.site.elevationM) };
};

export const previewClimateQueryOptions = (projectId: number, fileId: number | null) =>
  queryOptions({
    queryKey: ['projects', projectId, 'climate-files', fileId, 'preview-series'],
    queryFn: () => getPreviewClimate(projectId, fileId!),
    enabled: fileId !== null,
    staleTime: Infinity,
    retry: false,
  });

export const usePreviewClimate = (projectId: number, fileId: number | null) => useQuery(previewClimateQueryOptions(projectId, fileId));
