import { ApiError, refusal, safeJson } from '@/lib/api-client';
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

/** What an upload sends: one file as the raw body, or several files read as one climate file. */
export type UploadBody = Blob | File[];

/** Bytes of the files of an upload, for the progress bar before the browser knows the encoded size. */
export function uploadBytes(body: UploadBody): number {
  return Array.isArray(body) ? body.reduce((sum, f) => sum + f.size, 0) : body.size;
}

/**
 * Posts the upload with XMLHttpRequest, whose upload events give real progress over the whole body
 * (fetch has none): one file as the raw body, several as multipart/form-data (one `files` part each).
 * Answers like apiFetch: the parsed JSON, or an ApiError in the server's one error shape.
 */
export function sendFile<T>(path: string, upload: UploadBody, onProgress?: (p: UploadProgress) => void, signal?: AbortSignal): Promise<T> {
  const several = Array.isArray(upload) && upload.length > 1;
  const file = Array.isArray(upload) ? (several ? null : upload[0]) : upload;
  const size = uploadBytes(upload);
  return new Promise<T>((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open('POST', `/api${path}`);
    // a FormData body sets its own multipart content type with the boundary
    if (!several) xhr.setRequestHeader('content-type', 'text/csv');
    xhr.setRequestHeader('x-tramontane-request', '1');
    xhr.withCredentials = true;
    xhr.upload.onprogress = (e) => onProgress?.({ sentBytes: e.loaded, totalBytes: e.lengthComputable ? e.total : size, phase: 'sending' });
    xhr.upload.onload = () => onProgress?.({ sentBytes: size, totalBytes: size, phase: 'processing' });
    xhr.onerror = () => reject(new ApiError(0, 'network', 'The upload did not reach the server. Check the connection and try again.'));
    xhr.onabort = () => reject(new ApiError(0, 'aborted', 'The upload was cancelled.'));
    xhr.onload = () => {
      const body = xhr.responseText ? safeJson(xhr.responseText) : undefined;
      if (xhr.status >= 200 && xhr.status < 300) return resolve(body as T);
      reject(refusal(xhr.status, body));
    };
    signal?.addEventListener('abort', () => xhr.abort());
    if (several) {
      const form = new FormData();
      for (const part of upload as File[]) form.append('files', part, part.name);
      xhr.send(form);
    } else xhr.send(file);
  });
}
