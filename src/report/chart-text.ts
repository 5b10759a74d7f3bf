/**
 * Text sizes and placement for the chart: every label's box is estimated from its character
 * count (an average glyph width of 0.56 em, a box from 0.8 em above to 0.2 em below the
 * baseline: wider than most sans-serif faces, so a label that fits here fits on screen), and
 * labels inside the plot take the first spot that overlaps nothing placed before.
 *
 * @module
 * @internal
 */

/** Average glyph width, in em. */
export const EM_WIDTH = 0.56;
/** Box above the baseline, in em. */
export const ASCENT = 0.8;
/** Box below the baseline, in em. */
export const DESCENT = 0.2;

/** A rectangle [x0, y0, x1, y1] in SVG user units. @internal */
export interface Box {
  readonly x0: number;
  readonly y0: number;
  readonly x1: number;
  readonly y1: number;
}

/** Estimated width of a text at a font size (px). */
export function textWidth(text: string, size: number): number {
  return Array.from(text).length * EM_WIDTH * size;
}

/** The box of a text whose baseline starts at (x, y) (anchor start). */
export function textBox(text: string, x: number, y: number, size: number): Box {
  return { x0: x, y0: y - ASCENT * size, x1: x + textWidth(text, size), y1: y + DESCENT * size };
}

export const overlaps = (a: Box, b: Box): boolean =>
  a.x0 < b.x1 && b.x0 < a.x1 && a.y0 < b.y1 && b.y0 < a.y1;

export const inside = (b: Box, area: Box): boolean =>
  b.x0 >= area.x0 && b.x1 <= area.x1 && b.y0 >= area.y0 && b.y1 <= area.y1;

/**
 * Splits text into lines of at most `chars` characters at spaces (a longer word is cut at
 * `chars`, never shortened with an ellipsis: every character is kept).
 */
export function wrapText(text: string, chars: number): string[] {
  const room = Math.max(4, Math.floor(chars));
  const lines: string[] = [];
  let line = '';
  for (const word of text.split(/\s+/).filter((w) => w !== '')) {
    let rest = Array.from(word);
    while (rest.length > 0) {
      const piece = rest.join('');
      const sep = line === '' ? '' : ' ';
      if (Array.from(line).length + sep.length + rest.length <= room) {
        line += sep + piece;
        rest = [];
      } else if (line !== '') {
        lines.push(line);
        line = '';
      } else {
        lines.push(rest.slice(0, room).join(''));
        rest = rest.slice(room);
      }
    }
  }
  if (line !== '' || lines.length === 0) lines.push(line);
  return lines;
}

/** Where a label's text starts (baseline, anchor start) and whether it needs a leader line. */
export interface Placement {
  readonly x: number;
  readonly y: number;
  readonly box: Box;
  readonly leader: boolean;
}

const DIRECTIONS: readonly (readonly [number, number])[] = [
  [1, -1],
  [1, 1],
  [-1, -1],
  [-1, 1],
  [1, 0],
  [-1, 0],
  [0, -1],
  [0, 1],
];
const RADII = [7, 16, 28, 42, 60];

/**
 * A spot for a short label beside a marker at (mx, my): tries eight directions at growing
 * distances and takes the first box inside `area` that overlaps no box in `taken`; undefined
 * when there is none.
 */
export function placeNear(
  text: string,
  size: number,
  mx: number,
  my: number,
  area: Box,
  taken: readonly Box[],
): Placement | undefined {
  const w = textWidth(text, size);
  const h = (ASCENT + DESCENT) * size;
  for (const r of RADII) {
    for (const [dx, dy] of DIRECTIONS) {
      const cx = mx + dx * (r + w / 2);
      const cy = my + dy * (r + h / 2);
      const x = cx - w / 2;
      const y = cy + h / 2 - DESCENT * size;
      const box = textBox(text, x, y, size);
      if (inside(box, area) && !taken.some((t) => overlaps(t, box))) {
        return { x, y, box, leader: r > 16 };
      }
    }
  }
  return undefined;
}
