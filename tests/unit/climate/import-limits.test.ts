import { describe, expect, it } from 'vitest';
import { importClimateText, MAX_COLUMNS, MAX_LINE_CHARS } from '../../../shared/climate/import-climate-text';
import { longestLine } from '../../../shared/climate/delimited-text';

describe('lines and columns the importer refuses before parsing', () => {
  it('finds the longest line and its number, CRLF or LF', () => {
    expect(longestLine('ab\r\nabcd\r\nabc')).toEqual({ length: 4, line: 2 });
    expect(longestLine('a\nbb\n')).toEqual({ length: 2, line: 2 });
  });

  it('refuses a header of hundreds of thousands of columns at once, naming the line and its length', () => {
    const header = Array.from({ length: 200_000 }, (_, i) => `c${i}`).join(',');
    const result = importClimateText(`# synthetic\n${header}\n2021-01-01T00:00Z,1\n`);
    expect(result.ok).toBe(false);
    const issue = result.report.issues.find((i) => i.kind === 'line-too-long');
    expect(issue?.line).toBe(2);
    expect(issue?.message).toBe(`Line 2 has ${header.length.toLocaleString('en')} characters; a weather file's lines are far shorter, and Tramontane reads lines of at most ${MAX_LINE_CHARS.toLocaleString('en')}.`);
  });

  it(`refuses more than ${MAX_COLUMNS} columns, naming the header's line`, () => {
    const extra = Array.from({ length: MAX_COLUMNS }, (_, i) => `x${i}`);
    const text = `timestamp,dry_bulb_c,relative_humidity_pct,${extra.join(',')}\n2021-01-01T00:00Z,5,60,${extra.map(() => '0').join(',')}\n`;
    const result = importClimateText(text);
    expect(result.ok).toBe(false);
    expect(result.report.issues.find((i) => i.kind === 'too-many-columns')?.message).toBe(
      `The header on line 1 has ${MAX_COLUMNS + 3} columns; Tramontane reads files of at most ${MAX_COLUMNS}. Keep the time, dry-bulb, humidity and pressure columns.`,
    );
  });

  it('still reads a file at the limits', () => {
    const extra = Array.from({ length: MAX_COLUMNS - 3 }, (_, i) => `x${i}`);
    const text = `timestamp,dry_bulb_c,relative_humidity_pct,${extra.join(',')}\n2021-01-01T00:00Z,5,60,${extra.map(() => '0').join(',')}\n2021-01-01T01:00Z,6,60,${extra.map(() => '0').join(',')}\n`;
    expect(importClimateText(text).ok).toBe(true);
  });
});
