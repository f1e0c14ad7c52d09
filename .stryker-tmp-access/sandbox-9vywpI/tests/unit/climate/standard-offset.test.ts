// @ts-nocheck
import { describe, expect, it } from 'vitest';
import { standardOffsetMinutes } from '../../../shared/climate';

describe('standard time of a zone', () => {
  it('takes the offset without daylight saving, north and south of the equator', () => {
    // Offsets as published in the IANA time-zone database.
    expect(standardOffsetMinutes('Europe/Warsaw')).toBe(60);
    expect(standardOffsetMinutes('America/Phoenix')).toBe(-420);
    expect(standardOffsetMinutes('Australia/Sydney')).toBe(600);
    expect(standardOffsetMinutes('Asia/Kolkata')).toBe(330);
    expect(standardOffsetMinutes('UTC')).toBe(0);
  });
  it('reads a fixed offset as its own standard time', () => {
    expect(standardOffsetMinutes('UTC-07:00')).toBe(-420);
  });
});
