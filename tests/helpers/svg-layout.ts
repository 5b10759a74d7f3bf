/**
 * Measures the text of an SVG chart from the SVG itself, independently of the renderer: an
 * average glyph width of 0.56 em and a box from 0.8 em above to 0.2 em below the baseline
 * (wider than most sans-serif faces, so a label that fits this box fits on screen), with the
 * element's own or inherited font size, its text-anchor, its dy and a translate/rotate(+-90)
 * transform. Shared by the layout tests of every chart.
 */
import { XMLParser } from 'fast-xml-parser';
import { expect } from 'vitest';

export interface Box {
  x0: number;
  y0: number;
  x1: number;
  y1: number;
}
export interface TextItem {
  text: string;
  cls: string;
  box: Box;
}

type Node = Record<string, unknown>;

const parser = new XMLParser({
  preserveOrder: true,
  ignoreAttributes: false,
  attributeNamePrefix: '',
  processEntities: true,
  htmlEntities: true,
});

function attrsOf(node: Node): Record<string, string> {
  return (node[':@'] as Record<string, string> | undefined) ?? {};
}
function tagOf(node: Node): string | undefined {
  return Object.keys(node).find((k) => k !== ':@');
}
function textContent(children: unknown): string {
  if (!Array.isArray(children)) return '';
  return children
    .map((c: Node) => {
      const t = tagOf(c);
      if (t === '#text') return String(c['#text']);
      if (t === 'title') return '';
      return textContent(t === undefined ? [] : c[t]);
    })
    .join('');
}

/** Every text element's box, and the SVG size and plot areas. */
export function measure(svg: string): {
  width: number;
  height: number;
  plots: Box[];
  texts: TextItem[];
} {
  const doc = parser.parse(svg) as Node[];
  const root = doc.find((n) => tagOf(n) === 'svg') as Node;
  const rootAttrs = attrsOf(root);
  const width = Number(rootAttrs['width']);
  const height = Number(rootAttrs['height']);
  const plots: Box[] = [];
  const texts: TextItem[] = [];
  const walk = (nodes: Node[], inherited: Record<string, string>): void => {
    for (const n of nodes) {
      const tag = tagOf(n);
      if (tag === undefined || tag === '#text') continue;
      const a = attrsOf(n);
      if (a['transform'] !== undefined && tag !== 'text') {
        // Groups with a transform hold swatches only; text there would need its offset.
        expect(textContent(n[tag]), `text inside a transformed <${tag}>`).toBe('');
      }
      const style = { ...inherited, ...a };
      if (tag === 'rect' && (a['class'] ?? '') === 'plot-area') {
        const x = Number(a['x']);
        const y = Number(a['y']);
        plots.push({ x0: x, y0: y, x1: x + Number(a['width']), y1: y + Number(a['height']) });
      }
      if (tag === 'text') {
        const content = textContent(n[tag]);
        const size = Number(style['font-size'] ?? 16);
        const w = Array.from(content).length * 0.56 * size;
        const anchor = style['text-anchor'] ?? 'start';
        const shift = anchor === 'middle' ? w / 2 : anchor === 'end' ? w : 0;
        const dy =
          a['dy'] === undefined
            ? 0
            : a['dy'].endsWith('em')
              ? Number.parseFloat(a['dy']) * size
              : Number(a['dy']);
        const lx = Number(a['x'] ?? 0) - shift;
        const ly = Number(a['y'] ?? 0) + dy;
        const local: Box = { x0: lx, y0: ly - 0.8 * size, x1: lx + w, y1: ly + 0.2 * size };
        let box = local;
        if (a['transform'] !== undefined) {
          const t = /translate\(([-\d.]+),\s*([-\d.]+)\)(?:\s*rotate\(([-\d.]+)\))?/.exec(
            a['transform'],
          );
          expect(t, a['transform']).not.toBeNull();
          const tx = Number(t?.[1]);
          const ty = Number(t?.[2]);
          const angle = Number(t?.[3] ?? 0);
          const corners = [
            [local.x0, local.y0],
            [local.x1, local.y0],
            [local.x0, local.y1],
            [local.x1, local.y1],
          ].map(([px = 0, py = 0]) => {
            if (angle === 90) return [tx - py, ty + px];
            if (angle === -90) return [tx + py, ty - px];
            expect(angle, 'only quarter turns are measured').toBe(0);
            return [tx + px, ty + py];
          });
          const xs = corners.map((c) => c[0] ?? 0);
          const ys = corners.map((c) => c[1] ?? 0);
          box = {
            x0: Math.min(...xs),
            y0: Math.min(...ys),
            x1: Math.max(...xs),
            y1: Math.max(...ys),
          };
        }
        texts.push({ text: content, cls: a['class'] ?? '', box });
        continue;
      }
      const children = n[tag];
      if (Array.isArray(children)) walk(children as Node[], style);
    }
  };
  walk(root['svg'] as Node[], rootAttrs);
  return { width, height, plots, texts };
}

export const overlap = (a: Box, b: Box): boolean =>
  a.x0 < b.x1 - 1e-6 && b.x0 < a.x1 - 1e-6 && a.y0 < b.y1 - 1e-6 && b.y0 < a.y1 - 1e-6;
export const within = (b: Box, o: Box): boolean =>
  b.x0 >= o.x0 - 1e-6 && b.x1 <= o.x1 + 1e-6 && b.y0 >= o.y0 - 1e-6 && b.y1 <= o.y1 + 1e-6;

/** The problems of one chart: overlaps, boxes outside, labels cut short. */
export function problems(svg: string): string[] {
  const { width, height, plots, texts } = measure(svg);
  const found: string[] = [];
  const page: Box = { x0: 0, y0: 0, x1: width, y1: height };
  texts.forEach((t, i) => {
    if (t.text.includes('\u2026')) found.push(`cut short: "${t.text}"`);
    if (!within(t.box, page))
      found.push(`outside the drawing: "${t.text}" ${JSON.stringify(t.box)}`);
    if (t.cls === 'point-label' || t.cls === 'speed-label') {
      if (!plots.some((p) => within(t.box, p))) found.push(`outside the plot: "${t.text}"`);
    }
    for (let j = i + 1; j < texts.length; j++) {
      const u = texts[j];
      if (u !== undefined && overlap(t.box, u.box)) found.push(`"${t.text}" overlaps "${u.text}"`);
    }
  });
  return found;
}
