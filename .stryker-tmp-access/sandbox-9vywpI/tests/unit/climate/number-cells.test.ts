/** Number cells: the character-code fast path equals Number() (ECMAScript's own conversion) on plain decimals. */
// @ts-nocheck

import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { classifyUnreadableCell, parseNumberCell, sniffDecimalSeparator } from '../../../shared/climate/number-cells';

describe('parseNumberCell', () => {
  it('equals Number() on random plain decimals, with a point or a comma', () => {
    const decimal = fc
      .tuple(fc.constantFrom('', '-', '+'), fc.stringMatching(/^\d{0,9}$/), fc.boolean(), fc.stringMatching(/^\d{0,7}$/))
      .filter(([, whole, point, fraction]) => whole.length + (point ? fraction.length : 0) > 0);
    fc.assert(
      fc.property(decimal, ([sign, whole, point, fraction]) => {
        const text = `${sign}${whole}${point ? '.' : ''}${point ? fraction : ''}`;
        const expected = Number(text);
        if ([-999, -9999, 9999, -99999, 99999].includes(expected)) return;
        expect(Object.is(parseNumberCell(text, false), expected)).toBe(true);
        expect(Object.is(parseNumberCell(text.replace('.', ','), true), expected)).toBe(true);
      }),
      { numRuns: 3000 },
    );
  });

  it.each([
    ['12.5', false, 12.5],
    [' 12.5 ', false, 12.5],
    ['12,5', true, 12.5],
    ['1e3', false, 1000],
    ['1.5e-2', false, 0.015],
    // Past 2^53 the text reads as the nearest double, which is …568 (IEEE 754 round-to-nearest-even).
    ['12345678901234567', false, 12345678901234568],
    ['', false, NaN],
    ['   ', false, NaN],
    ['-', false, NaN],
    ['.', false, NaN],
    ['0x1f', false, NaN],
    ['Infinity', false, NaN],
    ['NA', false, NaN],
    ['-9999', false, NaN],
    ['9999.0', false, NaN],
    ['12.5.1', false, NaN],
    ['12,5', false, NaN],
  ])('%j (decimal comma %s) → %s', (cell, comma, expected) => {
    expect(parseNumberCell(cell, comma)).toBe(expected);
  });

  it('tells a missing-value marker from an unreadable cell', () => {
    expect(classifyUnreadableCell(' N/A ', false)).toBe('missing-marker');
    expect(classifyUnreadableCell('-9999', false)).toBe('missing-marker');
    expect(classifyUnreadableCell('12..5', false)).toBe('unreadable');
  });

  it('sniffs a decimal comma only when comma decimals outnumber point decimals', () => {
    expect(sniffDecimalSeparator([['01.01.2021', '-3,5', '85,2']])).toBe(',');
    expect(sniffDecimalSeparator([['2021-01-01', '-3.5', '85']])).toBe('.');
  });
});
