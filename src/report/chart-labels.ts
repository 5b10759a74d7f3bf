/**
 * Greedy placement of the operating-point labels so that they do not cover each other or the
 * markers: each label tries four spots around its marker, in a fixed order, and takes the first
 * one that stays inside the plot and overlaps nothing placed before. Deterministic.
 *
 * @module
 * @internal
 */

/** A marker at (x, y) with a label of estimated width `width` (px). @internal */
export interface LabelAnchor {
  readonly x: number;
  readonly y: number;
  readonly width: number;
}

/** Where a label's text goes: baseline start (or end) point. @internal */
export interface LabelPlacement {
  readonly x: number;
  readonly y: number;
  readonly anchor: 'start' | 'end';
}

interface Box {
  readonly x0: number;
  readonly y0: number;
  readonly x1: number;
  readonly y1: number;
}

const overlaps = (a: Box, b: Box): boolean =>
  a.x0 < b.x1 && b.x0 < a.x1 && a.y0 < b.y1 && b.y0 < a.y1;

/** Label height above its baseline and below it (px), for 11 px text. */
const ASCENT = 10;
const DESCENT = 3;
const MARKER = 6;

/**
 * Chooses a spot for every label. `bounds` is the plot area [left, top, right, bottom].
 * @internal
 */
export function placeLabels(
  anchors: readonly LabelAnchor[],
  bounds: readonly [number, number, number, number],
): LabelPlacement[] {
  const [left, top, right, bottom] = bounds;
  const taken: Box[] = anchors.map((a) => ({
    x0: a.x - MARKER,
    y0: a.y - MARKER,
    x1: a.x + MARKER,
    y1: a.y + MARKER,
  }));
  return anchors.map((a) => {
    const spots: LabelPlacement[] = [
      { x: a.x + 8, y: a.y - 8, anchor: 'start' },
      { x: a.x + 8, y: a.y + 16, anchor: 'start' },
      { x: a.x - 8, y: a.y - 8, anchor: 'end' },
      { x: a.x - 8, y: a.y + 16, anchor: 'end' },
    ];
    const boxOf = (s: LabelPlacement): Box => {
      const x0 = s.anchor === 'start' ? s.x : s.x - a.width;
      return { x0, y0: s.y - ASCENT, x1: x0 + a.width, y1: s.y + DESCENT };
    };
    const inside = (b: Box): boolean =>
      b.x0 >= left && b.x1 <= right && b.y0 >= top && b.y1 <= bottom;
    const free = spots.find((s) => {
      const b = boxOf(s);
      return inside(b) && !taken.some((t) => overlaps(t, b));
    });
    const chosen = free ?? spots.find((s) => inside(boxOf(s))) ?? (spots[0] as LabelPlacement);
    taken.push(boxOf(chosen));
    return chosen;
  });
}
