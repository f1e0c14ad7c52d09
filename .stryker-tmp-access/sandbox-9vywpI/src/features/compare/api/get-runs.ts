// @ts-nocheck
export { useProjectRuns as useRuns, type RunListing } from '@/lib/project-runs';
