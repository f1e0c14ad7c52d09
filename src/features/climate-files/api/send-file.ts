import { ApiError } from '@/lib/api-client';
import type { MappingOverride, TimeBasis } from '../../../../shared/schemas/climate-file';

export interface UploadParams {
  fileName: string;
  name?: string;
  maxGapHours: number;
  timeBasis: TimeBasis;
  mapping?: MappingOverride;
  /** The file states RH or dew point below 0 °C over ice (import option; default over liquid water). */
  humidityOverIce?: boolean;
}

/** Upload progress: bytes sent of the total; `phase` turns to 'processing' once the body is sent and the server reads it. */
export interface UploadProgress {
  sentBytes: number;
  totalBytes: number;
  phase: 'sending' | 'processing';
}

export function uploadQuery(params: UploadParams): string {
  const query = new URLSearchParams({ fileName: params.fileName, maxGapHours: String(params.maxGapHours), timeBasis: params.timeBasis });
  if (params.name) query.set('name', params.name);
  if (params.mapping && Object.keys(params.mapping).length) query.set('mapping', JSON.stringify(params.mapping));
  if (params.humidityOverIce) query.set('humidityOverIce', 'true');
  return query.toString();
}

/**
 * Posts the raw file as the request body with XMLHttpRequest, whose upload events give real
 * progress (fetch has none), and answers like apiFetch: the parsed JSON, or an ApiError in the
 * server's one error shape.
 */
export function sendFile<T>(path: string, file: Blob, onProgress?: (p: UploadProgress) => void, signal?: AbortSignal): Promise<T> {
  return new Promise<T>((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open('POST', `/api${path}`);
    xhr.setRequestHeader('content-type', 'text/csv');
    xhr.setRequestHeader('x-tramontane-request', '1');
    xhr.withCredentials = true;
    xhr.upload.onprogress = (e) => onProgress?.({ sentBytes: e.loaded, totalBytes: e.lengthComputable ? e.total : file.size, phase: 'sending' });
    xhr.upload.onload = () => onProgress?.({ sentBytes: file.size, totalBytes: file.size, phase: 'processing' });
    xhr.onerror = () => reject(new ApiError(0, 'network', 'The upload did not reach the server. Check the connection and try again.'));
    xhr.onabort = () => reject(new ApiError(0, 'aborted', 'The upload was cancelled.'));
    xhr.onload = () => {
      let body: unknown;
      try {
        body = xhr.responseText ? JSON.parse(xhr.responseText) : undefined;
      } catch {
        body = undefined;
      }
      if (xhr.status >= 200 && xhr.status < 300) return resolve(body as T);
      const error = (body as { error?: { code?: string; message?: string; details?: unknown } } | undefined)?.error;
      reject(new ApiError(xhr.status, error?.code ?? 'http_error', error?.message ?? `The server answered ${xhr.status}.`, error?.details));
    };
    signal?.addEventListener('abort', () => xhr.abort());
    xhr.send(file);
  });
}
