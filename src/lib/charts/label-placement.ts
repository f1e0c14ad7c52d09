/**
 * Chart labels that do not collide: each label has candidate positions (offsets from its anchor, in pixels);
 * labels are placed in priority order at the first candidate that overlaps no label already placed, stays in
 * the plotting area and, where a cost is given (hours under the label), the cheapest one. A label with no free
 * candidate is left out (its line or mark keeps its meaning through the legend and the table).
 */

export interface LabelBox {
  left: number;
  top: number;
  right: number;
  bottom: number;
}

export interface LabelRequest<T> {
  item: T;
  /** Anchor in pixels. */
  x: number;
  y: number;
  /** Text size in pixels. */
  widthPx: number;
  heightPx: number;
  /** Candidate offsets of the label's top-left corner from the anchor, in order of preference. */
  candidates: ReadonlyArray<readonly [number, number]>;
  /** Higher places first. */
  priority: number;
}

export interface PlacedLabel<T> {
  item: T;
  box: LabelBox;
}

/** Approximate width of a label in the chart's 10–12 px sans face: 0.6 em per character and a little room. */
export function textWidthPx(text: string, fontPx: number): number {
  return Math.ceil(text.length * fontPx * 0.6) + 4;
}

const overlaps = (a: LabelBox, b: LabelBox): boolean => a.left < b.right && b.left < a.right && a.top < b.bottom && b.top < a.bottom;

/**
 * Places labels without overlap inside `area`; `blocked` are boxes no label may cover (markers, other marks),
 * `cost` scores a box (for example the hours under it) and ties are broken by the candidates' order.
 */
export function placeLabels<T>(
  requests: ReadonlyArray<LabelRequest<T>>,
  area: LabelBox,
  blocked: ReadonlyArray<LabelBox> = [],
  cost?: (box: LabelBox) => number,
): PlacedLabel<T>[] {
  const placed: PlacedLabel<T>[] = [];
  const taken: LabelBox[] = [...blocked];
  const order = requests.map((r, k) => ({ r, k })).sort((a, b) => b.r.priority - a.r.priority || a.k - b.k);
  for (const { r } of order) {
    let best: LabelBox | null = null;
    let bestCost = Infinity;
    for (const [dx, dy] of r.candidates) {
      const box = { left: r.x + dx, top: r.y + dy, right: r.x + dx + r.widthPx, bottom: r.y + dy + r.heightPx };
      if (box.left < area.left || box.right > area.right || box.top < area.top || box.bottom > area.bottom) continue;
      if (taken.some((t) => overlaps(t, box))) continue;
      const c = cost ? cost(box) : 0;
      if (c < bestCost) {
        best = box;
        bestCost = c;
        if (c === 0) break;
      }
    }
    if (best) {
      placed.push({ item: r.item, box: best });
      taken.push(best);
    }
  }
  return placed;
}
