// @ts-nocheck
export { useProjectRuns, type RunListing, type RunStatus } from '@/lib/project-runs';
