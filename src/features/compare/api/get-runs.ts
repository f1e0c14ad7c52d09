export { useProjectRuns as useRuns, type RunListing } from '@/lib/api/runs';
