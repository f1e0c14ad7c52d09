/**
 * Chart labels placed without collisions (the RH labels against the wet-bulb labels, the envelope and setpoint
 * labels against the hours): boxes never overlap, stay in the plotting area, and prefer empty ground.
 */
import { describe, expect, it } from 'vitest';
import { placeLabels, type LabelBox, type LabelRequest } from '../../src/lib/charts/label-placement';

const area: LabelBox = { left: 0, top: 0, right: 400, bottom: 300 };
const overlap = (a: LabelBox, b: LabelBox) => a.left < b.right && b.left < a.right && a.top < b.bottom && b.top < a.bottom;
const request = (item: string, x: number, y: number, priority: number, candidates: Array<[number, number]>): LabelRequest<string> => ({
  item,
  x,
  y,
  widthPx: 30,
  heightPx: 12,
  priority,
  candidates,
});

describe('placeLabels', () => {
  it('moves a lower-priority label to its next position instead of covering one already placed', () => {
    // A wet-bulb label (priority 1) and an RH label (priority 0.5) whose first choices coincide.
    const placed = placeLabels(
      [
        request('60 %', 100, 100, 0.5, [
          [0, 0],
          [0, 14],
        ]),
        request('20', 100, 100, 1, [[0, 0]]),
      ],
      area,
    );
    const byItem = Object.fromEntries(placed.map((p) => [p.item, p.box]));
    expect(byItem['20']).toEqual({ left: 100, top: 100, right: 130, bottom: 112 });
    expect(byItem['60 %'].top).toBe(114);
    expect(overlap(byItem['20'], byItem['60 %'])).toBe(false);
  });

  it('leaves a label out when every position collides or leaves the area, and keeps off blocked marks', () => {
    const placed = placeLabels(
      [
        request('a', 390, 10, 1, [[0, 0]]),
        request('b', 50, 50, 1, [
          [0, 0],
          [40, 0],
        ]),
      ],
      area,
      [{ left: 45, top: 45, right: 85, bottom: 65 }],
    );
    expect(placed.map((p) => p.item)).toEqual(['b']);
    expect(placed[0].box.left).toBe(90);
  });

  it('takes the position with the fewest hours under it', () => {
    // Hours lie left of x = 200: a setpoint label there would cover data.
    const cost = (b: LabelBox) => (b.left < 200 ? 500 : 0);
    const placed = placeLabels(
      [
        request('Supply setpoint', 190, 100, 3, [
          [-40, 0],
          [10, 0],
        ]),
      ],
      area,
      [],
      cost,
    );
    expect(placed[0].box.left).toBe(200);
  });
});
