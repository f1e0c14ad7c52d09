/** Issue 17, defect 10: the five wording slips, each pinned to what the words must say. */
import { describe, expect, it } from 'vitest';
import { importClimateText } from '../../shared/climate';
import { describeOrder } from '../../shared/climate/recognise-columns';
import { yearStatisticsNote } from '../../shared/scenario/year-statistics';
import { rhBoundedNote } from '../../src/features/projections/lib/rh-bounded';

// Synthetic rows (not a station): slashed day-first dates, a day above 12 so the order is certain.
const slashed = [
  'Date,Time,Temp C,RH %',
  ...Array.from(
    { length: 30 },
    (_, i) => `${String(13 + Math.floor(i / 24)).padStart(2, '0')}/01/2023,${String(i % 24).padStart(2, '0')}:00,${5 + (i % 7)},${60 + (i % 5)}`,
  ),
].join('\n');

describe('the wording', () => {
  it('writes a date order with the separator the file uses: 13/01/2023 is day/month/year, not day.month.year', () => {
    expect(describeOrder('DMY', ['13/01/2023'])).toBe('day/month/year');
    expect(describeOrder('DMY', ['13.01.2023'])).toBe('day.month.year');
    expect(describeOrder('MDY', ['01/13/2023'])).toBe('month/day/year');
    const { report } = importClimateText(slashed, {});
    expect(report.timeLayout).toContain('day/month/year');
  });

  it('keeps "recognised" when the mapping sent back repeats what was recognised, and says "chosen by the user" only for a change', () => {
    const detected = importClimateText(slashed, {});
    expect(detected.ok).toBe(true);
    const time = detected.mapping.time!;
    if (time.layout !== 'date-time') throw new Error('expected a date and a time column');
    const same = importClimateText(slashed, {
      mapping: { time: { layout: 'date-time', dateColumn: time.dateColumn, timeColumn: time.timeColumn, dateOrder: time.dateOrder } },
    });
    expect(same.report.timeLayout).not.toContain('chosen by the user');
    expect(same.report.timeLayout).toBe(detected.report.timeLayout);
    const changed = importClimateText(slashed, {
      mapping: { time: { layout: 'date-time', dateColumn: time.dateColumn, timeColumn: time.timeColumn, dateOrder: 'MDY' } },
    });
    expect(changed.report.timeLayout).toContain('chosen by the user');
  });

  it('says no hour was held at an RH bound instead of "0 to 100 %, 0 to 0 %"', () => {
    expect(rhBoundedNote(0, 0)).toBe('none: every morphed hour stayed between 0 and 100 % RH');
    expect(rhBoundedNote(12, 0)).toBe('12 hours held at 100 %');
    expect(rhBoundedNote(1, 3)).toBe('1 hour held at 100 %, 3 hours held at 0 %');
  });

  it('calls the spread the range and the standard deviation by its name', () => {
    const note = yearStatisticsNote(3);
    expect(note).toContain('The spread is the range from the smallest to the largest year');
    expect(note).toContain('the standard deviation beside it is the sample one (divisor N − 1)');
    expect(note).not.toMatch(/spread is the sample standard deviation/i);
  });
});
