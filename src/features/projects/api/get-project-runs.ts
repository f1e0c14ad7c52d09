export { useProjectRuns, type RunListing, type RunStatus } from '@/lib/api/runs';
