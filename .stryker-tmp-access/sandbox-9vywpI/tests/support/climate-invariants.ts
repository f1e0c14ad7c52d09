/** What every import result must satisfy, whatever the input: used by the importer's fuzz tests. */
// @ts-nocheck

import { expect } from 'vitest';
import type { ImportResult } from '../../shared/climate';

/** Checks the report and, for an accepted file, the series invariants (strictly hourly, flags consistent with the values). */
export function checkResult(result: ImportResult): void {
  expect(typeof result.ok).toBe('boolean');
  expect(result.report.ok).toBe(result.ok);
  expect(typeof result.report.summary).toBe('string');
  // the report and mapping travel as JSON
  expect(JSON.parse(JSON.stringify(result.report))).toEqual(result.report);
  // a crash inside the importer would show as this kind: it must not happen on any input
  expect(result.report.issues.filter((i) => i.kind === 'unexpected-failure')).toEqual([]);
  for (const issue of result.report.issues) expect(issue.message.length).toBeGreaterThan(0);
  if (!result.ok) {
    expect(result.series).toBeNull();
    expect(result.report.issues.some((i) => i.severity === 'error')).toBe(true);
    return;
  }
  const s = result.series!;
  const n = s.timestampsMs.length;
  expect(n).toBeGreaterThan(0);
  expect(s.dryBulbC.length).toBe(n);
  expect(s.humidity.values.length).toBe(n);
  expect(s.flags.length).toBe(n);
  for (let h = 1; h < n; h++) expect(s.timestampsMs[h] - s.timestampsMs[h - 1]).toBe(3_600_000);
  for (let h = 0; h < n; h++) {
    const present = Number.isFinite(s.dryBulbC[h]) && Number.isFinite(s.humidity.values[h]);
    expect(present).toBe(s.flags[h] !== 2);
  }
  expect(s.flags[0]).toBe(0);
  expect(s.flags[n - 1]).toBe(0);
}
