import { describe, expect, it } from 'vitest';
import { carpetBins, carpetSummary, HOURS_PER_DAY, LEAP_DAY_INDEX } from '../../../src/lib/charts/carpet-data';
import { carpetDayLabel } from '../../../src/lib/charts/chart-format';
import { utcOffsetLabel } from '../../../shared/time-zone';

const cellOf = (dayIndex: number, hour: number) => dayIndex * HOURS_PER_DAY + hour;

describe('carpet binning (day of year × hour of day)', () => {
  it('puts 1 March on day index 60 in leap and common years alike, and 29 February on 59', () => {
    const t = [Date.UTC(2023, 2, 1, 5), Date.UTC(2024, 2, 1, 5), Date.UTC(2024, 1, 29, 5)];
    const grid = carpetBins(t, [10, 14, 3], 'temperature');
    // 1 March 05:00 in 2023 and 2024: one cell, mean of 10 and 14.
    expect(grid.cells[cellOf(60, 5)]).toBe(12);
    expect(grid.counts[cellOf(60, 5)]).toBe(2);
    expect(grid.cells[cellOf(LEAP_DAY_INDEX, 5)]).toBe(3);
    expect(grid.years).toBe(2);
    expect(grid.leapDay).toBe(true);
  });

  it('shifts hours into the site’s standard time before binning', () => {
    // 31 Dec 23:30 UTC is 1 Jan 00:30 at UTC+01:00: day 0, hour 0.
    const grid = carpetBins([Date.UTC(2022, 11, 31, 23, 30)], [-4], 'temperature', 60);
    expect(grid.cells[cellOf(0, 0)]).toBe(-4);
    expect(grid.leapDay).toBe(false);
    const west = carpetBins([Date.UTC(2023, 0, 1, 3)], [1], 'temperature', -300);
    // 03:00 UTC at UTC−05:00 is 22:00 on 31 December (day index 365 on the leap calendar).
    expect(west.cells[cellOf(365, 22)]).toBe(1);
  });

  it('skips missing values for temperatures and keeps empty cells as NaN', () => {
    const grid = carpetBins([Date.UTC(2023, 5, 1, 0), Date.UTC(2023, 5, 1, 1)], [Number.NaN, 20], 'temperature');
    expect(Number.isNaN(grid.cells[cellOf(152, 0)])).toBe(true);
    expect(grid.cells[cellOf(152, 1)]).toBe(20);
  });

  it('takes the most frequent mode across years, and no data only when a cell has nothing else', () => {
    const hour = (y: number) => Date.UTC(y, 6, 10, 14);
    const grid = carpetBins([hour(2021), hour(2022), hour(2023), Date.UTC(2023, 6, 11, 14)], [2, 1, 2, 3], 'mode');
    const july10 = 182 + 9;
    expect(grid.cells[cellOf(july10, 14)]).toBe(2);
    expect(grid.cells[cellOf(july10 + 1, 14)]).toBe(3);
  });

  it('refuses arrays of different lengths, naming them', () => {
    expect(() => carpetBins([0, 1], [1], 'temperature')).toThrow(RangeError);
    expect(() => carpetBins([0, 1], [1], 'temperature')).toThrow(/values has 1 hours but timestampsMs has 2/);
  });

  it('summarises per month: means in 4-hour bands, or hours per mode', () => {
    const t = [Date.UTC(2023, 0, 5, 1), Date.UTC(2023, 0, 5, 2), Date.UTC(2023, 0, 5, 13)];
    const [jan] = carpetSummary(t, [2, 4, 9], 'temperature');
    expect(jan.month).toBe(1);
    expect(jan.values[0]).toBe(3);
    expect(jan.values[3]).toBe(9);
    const [modes] = carpetSummary(t, [0, 0, 2], 'mode');
    expect(modes.values).toEqual([2, 0, 1, 0]);
  });

  it('labels days and offsets', () => {
    expect(carpetDayLabel(61)).toBe('1 Mar');
    expect(carpetDayLabel(60)).toBe('29 Feb');
    expect(utcOffsetLabel(60)).toBe('UTC+01:00');
    expect(utcOffsetLabel(-330)).toBe('UTC−05:30');
  });
});
