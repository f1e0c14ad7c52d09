// @ts-nocheck
import { describe, expect, it } from 'vitest';
import { importClimateText, joinClimateFiles, type FileImport } from '../../../shared/climate';

const H = 3_600_000;

/** Synthetic hourly CSV text (demo data, not a station) from `startMs` for `hours` hours. */
function csv(
  startMs: number,
  hours: number,
  header = 'timestamp,dry_bulb_c,relative_humidity_pct',
  value = (h: number) => 10 + (h % 24) / 2,
  humidity = 70,
): string {
  const lines = [header];
  for (let h = 0; h < hours; h++) lines.push(`${new Date(startMs + h * H).toISOString().slice(0, 16)}Z,${value(h)},${humidity}`);
  return `${lines.join('\n')}\n`;
}

function file(fileName: string, text: string): FileImport {
  return { fileName, bytes: text.length, sha256: 'x'.repeat(64), result: importClimateText(text) };
}

describe('several files joined into one series', () => {
  it('joins yearly files in time order, whatever order they come in, and lists each', () => {
    const y = (year: number) => file(`${year}.csv`, csv(Date.UTC(year, 0, 1), year === 2020 ? 8784 : 8760));
    const joined = joinClimateFiles([y(2021), y(2019), y(2020)], 6);
    expect(joined.ok).toBe(true);
    // 8760 + 8784 (leap 2020) + 8760 hours, Gregorian calendar
    expect(joined.series!.timestampsMs.length).toBe(26_304);
    expect(joined.report.files.map((f) => f.fileName)).toEqual(['2019.csv', '2020.csv', '2021.csv']);
    expect(joined.report.files.map((f) => f.hours)).toEqual([8760, 8784, 8760]);
    expect(joined.report.files[0]).toMatchObject({ firstLine: 2, lastLine: 8761 });
    expect(joined.report.years).toEqual([2019, 2020, 2021]);
    expect(joined.report.counts).toMatchObject({ hours: 26_304, measuredHours: 26_304, missingHours: 0 });
    const t = joined.series!.timestampsMs;
    for (let i = 1; i < t.length; i++) if (t[i] - t[i - 1] !== H) throw new Error(`step at ${i}`);
  });

  it('fills a short gap between files and names both files and lines', () => {
    const a = file(
      'jan.csv',
      csv(Date.UTC(2021, 0, 1), 24, undefined, () => 10),
    );
    const b = file(
      'feb.csv',
      csv(Date.UTC(2021, 0, 1, 27), 24, undefined, () => 13),
    );
    const joined = joinClimateFiles([a, b], 6);
    expect(joined.ok).toBe(true);
    const gap = joined.report.issues.find((i) => i.kind === 'files-gap')!;
    expect(gap).toMatchObject({ file: 'feb.csv', line: 2 });
    expect(gap.message).toContain('3 hours between jan.csv');
    expect(gap.message).toContain('line 25');
    // linear between 10 °C (hour 23) and 13 °C (hour 27): 10.75, 11.5, 12.25 … as 4 steps of 0.75 K
    expect(Array.from(joined.series!.dryBulbC.subarray(23, 28))).toEqual([10, 10.75, 11.5, 12.25, 13]);
    expect(Array.from(joined.series!.flags.subarray(24, 27))).toEqual([1, 1, 1]);
    expect(joined.report.counts.filledHours).toBe(3);
    // a longer gap stays missing
    const far = joinClimateFiles([a, file('mar.csv', csv(Date.UTC(2021, 0, 3), 24))], 6);
    expect(far.report.counts.missingHours).toBe(24);
    expect(far.report.issues.find((i) => i.kind === 'files-gap')!.message).toContain('stay missing');
  });

  it('keeps the earlier file where two overlap, and refuses a file that repeats another whole', () => {
    const a = file('a.csv', csv(Date.UTC(2021, 0, 1), 48));
    const b = file(
      'b.csv',
      csv(Date.UTC(2021, 0, 2, 22), 24, undefined, () => 29),
    );
    const joined = joinClimateFiles([a, b], 6);
    expect(joined.ok).toBe(true);
    const overlap = joined.report.issues.find((i) => i.kind === 'files-overlap')!;
    expect(overlap).toMatchObject({ severity: 'warning', file: 'b.csv', line: 2 });
    expect(overlap.message).toContain('b.csv lines 2–3');
    expect(overlap.message).toContain('repeat 2 hours of a.csv (from line 48) with different values');
    expect(joined.series!.dryBulbC[47]).toBe(10 + 23 / 2);
    expect(joined.series!.dryBulbC[48]).toBe(29);
    const twice = joinClimateFiles([a, file('a-copy.csv', csv(Date.UTC(2021, 0, 1), 48))], 6);
    expect(twice.ok).toBe(false);
    expect(twice.series).toBeNull();
    expect(twice.report.summary).toContain('a-copy.csv holds only hours that a.csv already holds');
  });

  it('refuses a set whose files are laid out differently, naming the file', () => {
    const a = file('2020.csv', csv(Date.UTC(2020, 0, 1), 48));
    const b = file('2021.csv', csv(Date.UTC(2021, 0, 1), 48, 'timestamp,dry_bulb_c,dew_point_c', undefined, 5));
    const joined = joinClimateFiles([a, b], 6);
    expect(joined.ok).toBe(false);
    const issue = joined.report.issues.find((i) => i.kind === 'files-layout-differs')!;
    expect(issue).toMatchObject({ file: '2021.csv', line: 1 });
    expect(issue.message).toContain('humidity: dew-point column 3 in C instead of relative-humidity column 3 in %');
  });

  it('refuses the set when one file cannot be imported, naming it', () => {
    const joined = joinClimateFiles([file('good.csv', csv(Date.UTC(2021, 0, 1), 24)), file('bad.csv', 'not,a,weather\nfile,at,all\n')], 6);
    expect(joined.ok).toBe(false);
    expect(joined.report.issues.some((i) => i.file === 'bad.csv' && i.severity === 'error')).toBe(true);
    expect(joined.report.files.find((f) => f.fileName === 'bad.csv')).toMatchObject({ ok: false });
  });
});
