// @ts-nocheck
import { describe, expect, it } from 'vitest';
import { importClimateText, MAX_COLUMNS, MAX_LINE_CHARS } from '../../../shared/climate/import-climate-text';
import { scanLines } from '../../../shared/climate/delimited-text';

describe('lines and columns the importer refuses before parsing', () => {
  it('counts the lines and finds the longest one and its number, CRLF or LF, in one pass', () => {
    expect(scanLines('ab\r\nabcd\r\nabc')).toEqual({ lines: 3, longest: { length: 4, line: 2 } });
    expect(scanLines('a\nbb\n')).toEqual({ lines: 2, longest: { length: 2, line: 2 } });
    expect(scanLines('a\n\nb')).toEqual({ lines: 3, longest: { length: 1, line: 1 } });
    expect(scanLines('')).toEqual({ lines: 0, longest: { length: 0, line: 0 } });
  });

  it('refuses a header of hundreds of thousands of columns at once, naming the line and its length', () => {
    const header = Array.from({ length: 200_000 }, (_, i) => `c${i}`).join(',');
    const result = importClimateText(`# synthetic\n${header}\n2021-01-01T00:00Z,1\n`);
    expect(result.ok).toBe(false);
    const issue = result.report.issues.find((i) => i.kind === 'line-too-long');
    expect(issue?.line).toBe(2);
    expect(issue?.message).toBe(
      `Line 2 has ${header.length.toLocaleString('en')} characters; a weather file's lines are far shorter, and Tramontane reads lines of at most ${MAX_LINE_CHARS.toLocaleString('en')}.`,
    );
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
