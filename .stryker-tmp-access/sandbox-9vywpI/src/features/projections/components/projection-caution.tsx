// @ts-nocheck
import { Notice } from '@/components/ui/notice';

/** The caution shown wherever a projection is made or read. */
export function ProjectionCaution() {
  return (
    <Notice tone="warn" title="A projection, not a forecast">
      A projection re-shapes today's file by the monthly changes you give (Belcher, Hacker and Powell 2005 morphing): the weather sequence stays today's, only
      its monthly statistics move. Use it to compare designs under a what-if climate, alongside the results' own cautions; it says nothing about any particular
      future year.
    </Notice>
  );
}
