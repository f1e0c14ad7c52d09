/** What a project stores against its limit (GET /api/projects/:projectId/storage), bytes. */
// @ts-nocheck

export interface ProjectStorage {
  /** Climate files: original bytes and hourly series. */
  climateFileBytes: number;
  /** Finished runs' hourly outcomes. */
  runBytes: number;
  /** Runs queued or running, counted at what they will store when done. */
  pendingRunBytes: number;
  /** Full issue lists of uploads (downloadable CSV). */
  issueListBytes: number;
  usedBytes: number;
  limitBytes: number;
}

/** MB of 1,000,000 bytes, as the limit (TRAMONTANE_PROJECT_STORAGE_MB) is given. */
export const BYTES_PER_MB = 1_000_000;
