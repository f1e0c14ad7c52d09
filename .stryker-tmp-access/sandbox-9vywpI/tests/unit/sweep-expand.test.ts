// @ts-nocheck
import { describe, expect, it } from 'vitest';
import { axisValues, expandSweep, MAX_SWEEP_POINTS, rangeCount, sweepPointCount, sweepSpecSchema } from '../../shared/sweep';

describe('expanding a sweep into points', () => {
  it('runs a range from its start to its end, both included', () => {
    expect(axisValues({ input: 'system.supplyAirC', from: 18, to: 24, step: 1 })).toEqual([18, 19, 20, 21, 22, 23, 24]);
    // The end is kept only where a step lands on it.
    expect(axisValues({ input: 'system.supplyAirC', from: 18, to: 24, step: 4 })).toEqual([18, 22]);
    expect(axisValues({ input: 'energy.itLoadKw', from: 750, to: 750, step: 10 })).toEqual([750]);
  });

  it('keeps decimal steps free of binary noise and reaches the end', () => {
    // 0.1 + 2 × 0.1 is 0.30000000000000004 in binary floating point; the sweep says 0.3.
    expect(axisValues({ input: 'system.evaporativeEffectiveness', from: 0, to: 0.9, step: 0.1 })).toEqual([0, 0.1, 0.2, 0.3, 0.4, 0.5, 0.6, 0.7, 0.8, 0.9]);
    // 59 °F to 86 °F by 1 °F, typed in IP and sent in SI (15 °C to 30 °C by 5/9 K): 28 values, 30 °C last.
    const values = axisValues({ input: 'system.supplyAirC', from: 15, to: 30, step: 5 / 9 }) as number[];
    expect(values).toHaveLength(28);
    expect(values.at(-1)).toBe(30);
  });

  it('counts without building, and says 0 for what is not a range', () => {
    expect(rangeCount(18, 24, 1)).toBe(7);
    expect(rangeCount(24, 18, 1)).toBe(0);
    expect(rangeCount(18, 24, 0)).toBe(0);
    expect(rangeCount(18, 24, Number.NaN)).toBe(0);
    expect(rangeCount(0, 1e9, 1)).toBe(1e9 + 1);
    expect(() => axisValues({ input: 'energy.itLoadKw', from: 0, to: 1e9, step: 1 })).toThrow(RangeError);
    expect(() => axisValues({ input: 'system.approachK', from: 5, to: 2, step: 1 })).toThrow(/system.approachK/);
  });

  it('makes a grid with the first input outer and the second inner', () => {
    const points = expandSweep([
      { input: 'system.supplyAirC', from: 20, to: 22, step: 2 },
      { input: 'system.evaporativeEffectiveness', from: 0.5, to: 0.7, step: 0.1 },
    ]);
    expect(points).toEqual([
      { 'system.supplyAirC': 20, 'system.evaporativeEffectiveness': 0.5 },
      { 'system.supplyAirC': 20, 'system.evaporativeEffectiveness': 0.6 },
      { 'system.supplyAirC': 20, 'system.evaporativeEffectiveness': 0.7 },
      { 'system.supplyAirC': 22, 'system.evaporativeEffectiveness': 0.5 },
      { 'system.supplyAirC': 22, 'system.evaporativeEffectiveness': 0.6 },
      { 'system.supplyAirC': 22, 'system.evaporativeEffectiveness': 0.7 },
    ]);
    expect(expandSweep([{ input: 'envelope.presetId', presetIds: ['ashrae-2021-a1', 'ashrae-2021-a2'] }])).toEqual([
      { 'envelope.presetId': 'ashrae-2021-a1' },
      { 'envelope.presetId': 'ashrae-2021-a2' },
    ]);
  });

  it('caps a sweep at 200 points, grid or line', () => {
    expect(MAX_SWEEP_POINTS).toBe(200);
    const grid = [
      { input: 'system.supplyAirC', from: 15, to: 35, step: 1 },
      { input: 'system.evaporativeEffectiveness', from: 0, to: 0.9, step: 0.1 },
    ] as const;
    expect(sweepPointCount([...grid])).toBe(210);
    expect(() => expandSweep([...grid])).toThrow(/210 points, more than 200/);
  });
});

describe('the sweep request schema', () => {
  const base = { scenarioId: 1, climateFileId: 2 };

  it('accepts a range and a preset list', () => {
    const spec = sweepSpecSchema.parse({
      ...base,
      axes: [
        { input: 'system.supplyAirC', from: 18, to: 27, step: 1 },
        { input: 'envelope.presetId', presetIds: ['ashrae-2021-a1', 'ashrae-2021-a3'] },
      ],
    });
    expect(spec.axes[0]).toEqual({ input: 'system.supplyAirC', from: 18, to: 27, step: 1 });
    expect(spec.axes[1]).toEqual({ input: 'envelope.presetId', presetIds: ['ashrae-2021-a1', 'ashrae-2021-a3'] });
  });

  it('names the field and the value it refuses', () => {
    const issues = (body: unknown) => sweepSpecSchema.safeParse(body).error?.issues.map((i) => `${i.path.join('.')}: ${i.message}`) ?? [];
    expect(issues({ ...base, axes: [{ input: 'system.supplyAirC', from: 18, to: 27, step: 0 }] })).toEqual(['axes.0.step: step must be above 0, got 0']);
    expect(issues({ ...base, axes: [{ input: 'system.supplyAirC', from: 27, to: 18, step: 1 }] })).toEqual(['axes.0.to: to (18) must not be below from (27)']);
    expect(issues({ ...base, axes: [{ input: 'system.fanHeatK', from: 1, to: 2, step: 1 }] })[0]).toMatch(
      /^axes.0.input: input must be one of system.supplyAirC/,
    );
    expect(issues({ ...base, axes: [{ input: 'envelope.presetId', presetIds: ['class-z'] }] })[0]).toMatch(
      /^axes.0.presetIds.0: "class-z" is not an envelope preset/,
    );
    expect(issues({ ...base, axes: [{ input: 'energy.itLoadKw', from: 1, to: 1000, step: 1 }] })[0]).toBe(
      'axes.0.step: from 1 to 1000 by 1 gives 1000 values; at most 200',
    );
    expect(
      issues({
        ...base,
        axes: [
          { input: 'system.approachK', from: 1, to: 2, step: 1 },
          { input: 'system.approachK', from: 1, to: 2, step: 1 },
        ],
      }),
    ).toEqual(['axes.1.input: the two axes must be different inputs; both are system.approachK']);
    expect(issues({ ...base, axes: [] })).toEqual(['axes: axes must hold one input (a line) or two (a grid)']);
  });
});
