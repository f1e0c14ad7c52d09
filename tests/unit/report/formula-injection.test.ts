import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { csvCell, csvRow } from '../../../shared/csv';
import { fileSlug } from '../../../server/reports/downloads';

/**
 * OWASP "CSV Injection" guidance: a cell that starts with = + - @, a tab or a carriage return is run by
 * spreadsheets as a formula; prefixing it with an apostrophe makes it text. Plain numbers stay numbers.
 */
describe('csvCell neutralises what a spreadsheet would run', () => {
  it.each([
    ['=1+2', "'=1+2"],
    ['+SUM(A1:A9)', "'+SUM(A1:A9)"],
    ['-2+3', "'-2+3"],
    ['@SUM(A1)', "'@SUM(A1)"],
    ['\tTAB', "'\tTAB"],
    ['\r=CR', `"'\r=CR"`],
    ['=HYPERLINK("http://bad.example","x")', `"'=HYPERLINK(""http://bad.example"",""x"")"`],
    ["=cmd|' /C calc'!A0", "'=cmd|' /C calc'!A0"],
  ])('%j → %j', (text, cell) => {
    expect(csvCell(text)).toBe(cell);
  });

  it('leaves numbers, negative ones and numeric text as numbers', () => {
    expect(csvCell(-12.5)).toBe('-12.5');
    expect(csvCell('-12.5')).toBe('-12.5');
    expect(csvCell('+3')).toBe("'+3"); // not plain number syntax, so neutralised
    expect(csvCell(1e21)).toBe('1e+21');
    expect(csvCell(Number.NaN)).toBe('');
    expect(csvCell(null)).toBe('');
    expect(csvRow(['Free cooling', 'h', 6012])).toBe('Free cooling,h,6012');
  });

  it('never lets any text start a cell with a formula character (property)', () => {
    fc.assert(
      fc.property(fc.string(), (text) => {
        const cell = csvCell(text);
        const unquoted = cell.startsWith('"') ? cell.slice(1) : cell;
        const plainNumber = /^-?\d+(\.\d+)?(e[+-]?\d+)?$/i.test(text);
        return plainNumber || !/^[=+\-@\t\r]/.test(unquoted);
      }),
    );
  });
});

describe('download file names', () => {
  it('are lower-case ASCII words with hyphens, whatever the scenario is called', () => {
    expect(fileSlug('Direct air, 24 °C supply')).toBe('direct-air-24-c-supply');
    expect(fileSlug('=HYPERLINK("http://bad.example")')).toBe('hyperlink-http-bad-example');
    expect(fileSlug('Kühlung über Außenluft')).toBe('kuhlung-uber-aussenluft');
    expect(fileSlug('../../etc/passwd')).toBe('etc-passwd');
    expect(fileSlug('***')).toBe('report');
    expect(fileSlug('x'.repeat(100))).toHaveLength(60);
  });
});
