/** Moved to src/components/ui so the report shows the same cautions. */
export { ResultCautions } from '@/components/ui/result-cautions';
