import fc from 'fast-check';
import { XMLParser, XMLValidator } from 'fast-xml-parser';
import { describe, expect, it } from 'vitest';
import {
  type ChartOptions,
  type ChartSeries,
  type ChartSpec,
  renderChart,
} from '../../src/report/index';
import { expectAbsolute, expectHeadflowError } from '../helpers/expect';

// --- a parsed view of the SVG: every element with its attributes, text and ancestors' classes

/** Attributes by name; `class` and `d` are named so that they read as properties. */
interface Attributes {
  readonly [name: string]: string | undefined;
  readonly class?: string;
  readonly d?: string;
}

interface Element {
  readonly tag: string;
  readonly attrs: Attributes;
  readonly text: string;
  readonly within: readonly string[];
}

type Node = Record<string, unknown>;

const parser = new XMLParser({
  ignoreAttributes: false,
  attributeNamePrefix: '',
  preserveOrder: true,
  trimValues: false,
  parseTagValue: false,
});

/** Character references are left as written by the parser; decode the numeric ones here. */
const decode = (s: string): string =>
  s.replace(/&#(\d+);/g, (_, d: string) => String.fromCodePoint(Number(d)));

function elements(svg: string): Element[] {
  const out: Element[] = [];
  const walk = (nodes: readonly Node[], within: readonly string[]): void => {
    for (const node of nodes) {
      const tag = Object.keys(node).find((k) => k !== ':@');
      if (tag === undefined || tag === '#text' || tag === '?xml') continue;
      const raw = (node[':@'] ?? {}) as Record<string, string>;
      const attrs: Attributes = Object.fromEntries(
        Object.entries(raw).map(([k, v]) => [k, decode(String(v))]),
      );
      const children = node[tag] as Node[];
      const text = decode(
        children
          .filter((c) => '#text' in c)
          .map((c) => String(c['#text']))
          .join(''),
      );
      out.push({ tag, attrs, text, within });
      walk(children, attrs.class ? [...within, attrs.class] : within);
    }
  };
  walk(parser.parse(svg) as Node[], []);
  return out;
}

const byClass = (els: readonly Element[], cls: string): Element[] =>
  els.filter((e) => (e.attrs.class ?? '').split(' ').includes(cls));

const num = (e: Element, attr: string): number => Number(e.attrs[attr]);

/** Tick labels of an axis group and their pixel position along the axis. */
function ticks(els: readonly Element[], axis: string, along: 'x' | 'y'): [number, number][] {
  return els
    .filter((e) => e.tag === 'text' && e.within.includes(`axis ${axis}`) && !e.attrs.class)
    .map((e) => [Number(e.text.replace('\u2212', '-')), num(e, along)] as [number, number]);
}

/** Pixel position of `value` on an axis, interpolated between its first and last ticks. */
function pixelAt(tickList: readonly [number, number][], value: number): number {
  const [a, b] = [tickList[0], tickList.at(-1)];
  if (a === undefined || b === undefined) throw new Error('an axis needs two ticks');
  return a[1] + ((value - a[0]) * (b[1] - a[1])) / (b[0] - a[0]);
}

/** The vertices of a path made of M/L commands. */
function vertices(d: string): [number, number][] {
  return [...d.matchAll(/[ML](-?[\d.]+),(-?[\d.]+)/g)].map((m) => [Number(m[1]), Number(m[2])]);
}

/** y of a polyline at x, by linear interpolation between its vertices. */
function yOnPath(d: string, x: number): number {
  const v = vertices(d);
  for (let i = 1; i < v.length; i++) {
    const [x0, y0] = v[i - 1] ?? [0, 0];
    const [x1, y1] = v[i] ?? [0, 0];
    if (x >= x0 && x <= x1) return y0 + ((x - x0) * (y1 - y0)) / (x1 - x0);
  }
  throw new Error(`x = ${x} is outside the path`);
}

// --- an invented sample: an orchard booster with two candidate pumps and two cases

const FLOWS = [0, 0.005, 0.01, 0.015, 0.02, 0.025, 0.03, 0.035, 0.04];
const curve = (name: string, f: (q: number) => number): ChartSeries => ({
  name,
  points: FLOWS.map((flow) => ({ flow, value: f(flow) })),
});

const sample: ChartSpec = {
  title: 'Orchard booster: candidates A and B',
  units: { flow: 'L/s', head: 'm' },
  pumpCurves: [
    curve('candidate A, 2900 rpm', (q) => 55 - 20000 * q * q),
    curve('candidate B, 1450 rpm', (q) => 48 - 100 * q - 12000 * q * q),
    curve('candidate A, 2400 rpm', (q) => 37.7 - 20000 * q * q),
  ],
  systemCurves: [
    curve('high reservoir, new pipe', (q) => 12 + 15000 * q * q),
    curve('low reservoir, aged pipe', (q) => 18 + 19000 * q * q),
  ],
  operatingPoints: [
    { name: 'A / high', flow: 0.03505, head: 30.43 },
    { name: 'A / low', flow: 0.0308, head: 36.03 },
    { name: 'B / high', flow: 0.03471, head: 30.07 },
    { name: 'B / low', flow: 0.02954, head: 34.58 },
  ],
  preferredRegions: [
    { name: 'candidate A', minFlow: 0.021, maxFlow: 0.0345 },
    { name: 'candidate B', minFlow: 0.0196, maxFlow: 0.0322 },
  ],
  efficiencyCurves: [
    curve('candidate A', (q) => Math.max(0, 0.78 * (1 - ((q - 0.03) / 0.03) ** 2))),
    curve('candidate B', (q) => Math.max(0, 0.74 * (1 - ((q - 0.028) / 0.028) ** 2))),
  ],
  npshRequired: [
    curve('candidate A', (q) => 2 + 3000 * q * q),
    curve('candidate B', (q) => 1.5 + 3500 * q * q),
  ],
  npshAvailable: [
    curve('high reservoir', (q) => 9 - 2000 * q * q),
    curve('low reservoir', (q) => 6 - 2500 * q * q),
  ],
};

const line2 = (name: string, a: number, b: number): ChartSeries => ({
  name,
  points: [
    { flow: 0, value: a },
    { flow: 0.01, value: b },
  ],
});

const minimal: ChartSpec = {
  title: 'one pump',
  units: { flow: 'm3/h', head: 'm' },
  pumpCurves: [line2('P', 20, 10)],
  systemCurves: [],
  operatingPoints: [],
  preferredRegions: [],
  efficiencyCurves: [],
  npshRequired: [],
};

type Mutable<T> = { -readonly [K in keyof T]: T[K] };
/** A copy of the sample with one part changed, for the bad-input cases. */
const withPart = (part: Partial<Mutable<ChartSpec>>): ChartSpec => ({ ...sample, ...part });
const badPoint = (value: number, flow = 0.01): ChartSeries => ({
  name: 'bad',
  points: [
    { flow: 0, value: 1 },
    { flow: 0.005, value: 1 },
    { flow: 0.008, value: 1 },
    { flow, value },
  ],
});

describe('renderChart: special values and bad input', () => {
  it('names the path of a non-finite value', () => {
    for (const v of [Number.NaN, Number.POSITIVE_INFINITY, Number.NEGATIVE_INFINITY]) {
      const pumps = [line2('ok', 10, 5), badPoint(v)];
      const err = expectHeadflowError(
        () => renderChart(withPart({ pumpCurves: pumps })),
        'INVALID_ARGUMENT',
      );
      expect(err.parameter).toBe('pumpCurves[1].points[3].value');
      expect(err.message).toContain('pumpCurves[1].points[3].value');
    }
    const err = expectHeadflowError(
      () => renderChart(withPart({ systemCurves: [badPoint(1, Number.NaN)] })),
      'INVALID_ARGUMENT',
    );
    expect(err.parameter).toBe('systemCurves[0].points[3].flow');
  });

  it('refuses negative flows in series, markers and bands', () => {
    const cases: [Partial<Mutable<ChartSpec>>, string][] = [
      [{ npshRequired: [badPoint(1, -0.001)] }, 'npshRequired[0].points[3].flow'],
      [{ operatingPoints: [{ name: 'x', flow: -1, head: 10 }] }, 'operatingPoints[0].flow'],
      [
        { preferredRegions: [{ name: 'x', minFlow: -1, maxFlow: 1 }] },
        'preferredRegions[0].minFlow',
      ],
    ];
    for (const [part, path] of cases) {
      const err = expectHeadflowError(() => renderChart(withPart(part)), 'INVALID_ARGUMENT');
      expect(err.parameter).toBe(path);
    }
  });

  it('refuses a band that ends before it starts, and a marker without a finite head', () => {
    const band = { name: 'x', minFlow: 0.02, maxFlow: 0.01 };
    let err = expectHeadflowError(
      () => renderChart(withPart({ preferredRegions: [band] })),
      'INVALID_ARGUMENT',
    );
    expect(err.parameter).toBe('preferredRegions[0].maxFlow');
    err = expectHeadflowError(
      () => renderChart(withPart({ operatingPoints: [{ name: 'x', flow: 0, head: Number.NaN }] })),
      'INVALID_ARGUMENT',
    );
    expect(err.parameter).toBe('operatingPoints[0].head');
  });

  it('refuses efficiencies outside 0..1; draws negative NPSH (a report can hold them)', () => {
    for (const v of [-0.01, 1.01, 78]) {
      const err = expectHeadflowError(
        () => renderChart(withPart({ efficiencyCurves: [badPoint(v)] })),
        'INVALID_ARGUMENT',
      );
      expect(err.parameter).toBe('efficiencyCurves[0].points[3].value');
    }
    // NPSH required sampled from a fitted curve can dip below zero near zero flow: a report
    // that holds such a sample must still chart, so it is drawn as it is, not refused.
    expect(() => renderChart(withPart({ npshRequired: [badPoint(-0.5)] }))).not.toThrow();
    // NPSH available may be negative (a suction that cannot feed the pump): drawn, not refused.
    expect(() => renderChart(withPart({ npshAvailable: [badPoint(-2)] }))).not.toThrow();
  });

  it('refuses series with fewer than two points', () => {
    for (const points of [[], [{ flow: 0.01, value: 10 }]]) {
      const err = expectHeadflowError(
        () => renderChart(withPart({ systemCurves: [{ name: 'short', points }] })),
        'INVALID_ARGUMENT',
      );
      expect(err.parameter).toBe('systemCurves[0].points');
      expect(err.allowed).toBe('at least 2 points');
    }
  });

  it('refuses a spec without any curve', () => {
    const empty: ChartSpec = {
      ...minimal,
      pumpCurves: [],
      operatingPoints: [{ name: 'alone', flow: 0.01, head: 10 }],
    };
    const err = expectHeadflowError(() => renderChart(empty), 'INVALID_ARGUMENT');
    expect(err.parameter).toBe('spec');
  });

  it('refuses a width or height that is not > 0', () => {
    const sizes: [ChartOptions, string][] = [
      [{ width: 0 }, 'options.width'],
      [{ width: -800 }, 'options.width'],
      [{ width: Number.NaN }, 'options.width'],
      [{ height: 0 }, 'options.height'],
      [{ height: Number.POSITIVE_INFINITY }, 'options.height'],
    ];
    for (const [options, path] of sizes) {
      const err = expectHeadflowError(() => renderChart(minimal, options), 'INVALID_ARGUMENT');
      expect(err.parameter).toBe(path);
    }
  });

  it('refuses unknown units and units of the wrong dimension', () => {
    const units = (flow: string, head: string) =>
      ({ ...minimal, units: { flow, head } }) as unknown as ChartSpec;
    expect(
      expectHeadflowError(() => renderChart(units('gpm', 'm')), 'UNKNOWN_UNIT').parameter,
    ).toBe('units.flow');
    expect(
      expectHeadflowError(() => renderChart(units('L/s', 'L/s')), 'WRONG_DIMENSION').parameter,
    ).toBe('units.head');
  });

  it('refuses malformed input from untyped callers', () => {
    const cast = (v: unknown) => v as ChartSpec;
    const cases: [unknown, string][] = [
      [null, 'spec'],
      [{ ...minimal, title: 3 }, 'title'],
      [{ ...minimal, units: undefined }, 'units'],
      [{ ...minimal, systemCurves: undefined }, 'systemCurves'],
      [{ ...minimal, operatingPoints: 'none' }, 'operatingPoints'],
      [{ ...minimal, preferredRegions: {} }, 'preferredRegions'],
      [{ ...minimal, pumpCurves: [{ name: 7, points: [] }] }, 'pumpCurves[0].name'],
      [{ ...minimal, pumpCurves: [{ name: 'x', points: null }] }, 'pumpCurves[0].points'],
    ];
    for (const [spec, path] of cases) {
      const err = expectHeadflowError(() => renderChart(cast(spec)), 'INVALID_ARGUMENT');
      expect(err.parameter).toBe(path);
    }
  });

  it('draws a chart whose flows are all zero without NaN', () => {
    const spec: ChartSpec = {
      ...minimal,
      pumpCurves: [
        {
          name: 'shut-off',
          points: [
            { flow: 0, value: 0 },
            { flow: 0, value: 0 },
          ],
        },
      ],
    };
    const svg = renderChart(spec);
    expect(XMLValidator.validate(svg)).toBe(true);
    expect(svg).not.toContain('NaN');
  });
});

describe('renderChart: the document', () => {
  const svg = renderChart(sample);
  const els = elements(svg);

  it('is a well-formed standalone SVG 1.1 document', () => {
    expect(XMLValidator.validate(svg)).toBe(true);
    expect(svg.startsWith('<?xml version="1.0" encoding="UTF-8"?>\n<svg ')).toBe(true);
    const root = els[0];
    expect(root?.tag).toBe('svg');
    expect(root?.attrs).toMatchObject({
      xmlns: 'http://www.w3.org/2000/svg',
      version: '1.1',
      width: '800',
    });
    // The drawing grows below its legend and key when they need the room.
    const h = Number(root?.attrs['height']);
    expect(h).toBeGreaterThanOrEqual(600);
    expect(root?.attrs['viewBox']).toBe(`0 0 800 ${root?.attrs['height']}`);
    expect(els.find((e) => e.tag === 'title')?.text).toBe(sample.title);
    expect(svg).not.toContain('NaN');
  });

  it('takes its size from the options', () => {
    const root = elements(renderChart(minimal, { width: 1024.5, height: 700 }))[0];
    expect(root?.attrs).toMatchObject({
      width: '1024.5',
      height: '700',
      viewBox: '0 0 1024.5 700',
    });
  });

  it('draws every curve, band and point exactly once, with its name', () => {
    const kinds: [string, readonly { name: string }[]][] = [
      ['pump-curve', sample.pumpCurves],
      ['system-curve', sample.systemCurves],
      ['efficiency-curve', sample.efficiencyCurves],
      ['npsh-required', sample.npshRequired],
      ['npsh-available', sample.npshAvailable ?? []],
      ['preferred-region', sample.preferredRegions],
      ['operating-point', sample.operatingPoints],
    ];
    const tags: Record<string, string> = {
      'preferred-region': 'rect',
      'operating-point': 'circle',
    };
    for (const [cls, items] of kinds) {
      const found = byClass(els, cls);
      expect(found.length, cls).toBe(items.length);
      for (const item of items) {
        const named = found.filter((e) => e.attrs['data-name'] === item.name);
        expect(named.length, `${cls} ${item.name}`).toBe(1);
        expect(named[0]?.tag).toBe(tags[cls] ?? 'path');
      }
    }
  });

  it('labels every operating point and lists every series in the legend', () => {
    // Operating points are numbered on the plot and named in the key under the legend.
    const labels = byClass(els, 'point-label');
    expect(labels.map((e) => e.text)).toEqual(sample.operatingPoints.map((_, i) => String(i + 1)));
    const key = byClass(els, 'key-text')
      .map((e) => e.text)
      .join(' ');
    for (const m of sample.operatingPoints) expect(key).toContain(`${m.name}:`);
    const legend = byClass(els, 'legend-text')
      .map((e) => e.text)
      .join(' ');
    expect(legend).toContain('low reservoir, aged pipe: system curve');
    for (const s of [...sample.systemCurves, ...(sample.npshAvailable ?? [])]) {
      expect(legend).toContain(s.name);
    }
  });

  it('labels the axes in the chosen units', () => {
    const labelsOf = (spec: ChartSpec) =>
      byClass(elements(renderChart(spec)), 'axis-label').map((e) => e.text);
    expect(labelsOf(sample)).toEqual(['Head (m)', 'Efficiency (%)', 'NPSH (m)', 'Flow (L/s)']);
    const us = { ...sample, units: { flow: 'gal/min', head: 'ft' } } as const;
    expect(labelsOf(us)).toEqual(['Head (ft)', 'Efficiency (%)', 'NPSH (ft)', 'Flow (gal/min)']);
    // Without efficiency or NPSH curves there is no secondary axis and no lower panel.
    expect(labelsOf(minimal)).toEqual(['Head (m)', 'Flow (m³/h)']);
  });

  it('runs the axes from 0 to the niced largest value, with d3 ticks', () => {
    // Largest flow 0.04 m3/s = 40 L/s; largest head 55 m -> niced to 60; efficiency 0..100 %;
    // largest NPSH 9 m -> 10.
    expect(ticks(els, 'axis-flow', 'x').map((t) => t[0])).toEqual([
      0, 5, 10, 15, 20, 25, 30, 35, 40,
    ]);
    expect(ticks(els, 'axis-head', 'y').map((t) => t[0])).toEqual([0, 10, 20, 30, 40, 50, 60]);
    expect(ticks(els, 'axis-efficiency', 'y').map((t) => t[0])).toEqual([0, 20, 40, 60, 80, 100]);
    expect(ticks(els, 'axis-npsh', 'y').map((t) => t[0])).toEqual([0, 5, 10]);
  });

  it('converts from SI into the chosen units', () => {
    const us = elements(renderChart({ ...sample, units: { flow: 'gal/min', head: 'ft' } }));
    // 1 US gal = 3.785411784e-3 m3 (NIST SP 811, B.8, exact): 0.04 m3/s = 634.01 gal/min,
    // 0.021 m3/s = 332.86 gal/min; 1 ft = 0.3048 m (exact): 55 m = 180.45 ft.
    const flowTicks = ticks(us, 'axis-flow', 'x');
    expect(flowTicks.at(-1)?.[0]).toBeGreaterThanOrEqual(634.01);
    expect(ticks(us, 'axis-head', 'y').at(-1)?.[0]).toBeGreaterThanOrEqual(180.45);
    const band = byClass(us, 'preferred-region').find(
      (e) => e.attrs['data-name'] === 'candidate A',
    );
    // Tolerance: coordinates are written to 0.1 px; 0.15 px allows for two roundings.
    expectAbsolute(num(band as Element, 'x'), pixelAt(flowTicks, 332.86), 0.15, 'band start');
  });

  it('puts the operating points on the curves they belong to', () => {
    // The sample's points were solved from the same formulas the curves were sampled from; the
    // chart joins samples with straight lines, which differ from the formula by < 0.01 m here.
    // Tolerance 0.5 px: 0.1 px rounding of each coordinate plus the chord error (~0.05 px).
    const pump = byClass(els, 'pump-curve').find(
      (e) => e.attrs['data-name'] === 'candidate A, 2900 rpm',
    );
    const system = byClass(els, 'system-curve').find(
      (e) => e.attrs['data-name'] === 'high reservoir, new pipe',
    );
    const point = byClass(els, 'operating-point').find((e) => e.attrs['data-name'] === 'A / high');
    if (!pump || !system || !point) throw new Error('sample items missing');
    const cx = num(point, 'cx');
    const cy = num(point, 'cy');
    expectAbsolute(yOnPath(pump.attrs.d ?? '', cx), cy, 0.5, 'pump curve at the point');
    expectAbsolute(yOnPath(system.attrs.d ?? '', cx), cy, 0.5, 'system curve at the point');
    // The flow and head scales agree with their tick labels.
    expectAbsolute(cx, pixelAt(ticks(els, 'axis-flow', 'x'), 35.05), 0.15, 'cx');
    expectAbsolute(cy, pixelAt(ticks(els, 'axis-head', 'y'), 30.43), 0.15, 'cy');
  });

  it('draws efficiency on the secondary axis in % and NPSH on its own axis', () => {
    const eff = byClass(els, 'efficiency-curve').find(
      (e) => e.attrs['data-name'] === 'candidate A',
    );
    const peak = vertices(eff?.attrs.d ?? '')[6]; // flow 0.03 m3/s, efficiency 0.78
    expect(peak).toBeDefined();
    const [px, py] = peak ?? [0, 0];
    expectAbsolute(px, pixelAt(ticks(els, 'axis-flow', 'x'), 30), 0.15, 'peak x');
    expectAbsolute(py, pixelAt(ticks(els, 'axis-efficiency', 'y'), 78), 0.15, 'peak y');
    const npshA = byClass(els, 'npsh-available').find(
      (e) => e.attrs['data-name'] === 'high reservoir',
    );
    const first = vertices(npshA?.attrs.d ?? '')[0] ?? [0, 0]; // 9 m at zero flow
    expectAbsolute(first[1], pixelAt(ticks(els, 'axis-npsh', 'y'), 9), 0.15, 'NPSHa at 0');
  });

  it('places operating points further right as their flow grows, higher as head grows', () => {
    const points = byClass(els, 'operating-point');
    const data = sample.operatingPoints.map((m) => {
      const el = points.find((e) => e.attrs['data-name'] === m.name) as Element;
      return { flow: m.flow, head: m.head, cx: num(el, 'cx'), cy: num(el, 'cy') };
    });
    const byFlow = [...data].sort((a, b) => a.flow - b.flow);
    for (let i = 1; i < byFlow.length; i++) {
      expect(byFlow[i]?.cx).toBeGreaterThan(byFlow[i - 1]?.cx ?? Number.POSITIVE_INFINITY);
    }
    const byHead = [...data].sort((a, b) => a.head - b.head);
    for (let i = 1; i < byHead.length; i++) {
      expect(byHead[i]?.cy).toBeLessThan(byHead[i - 1]?.cy ?? Number.NEGATIVE_INFINITY);
    }
  });

  it('extends the head axis below zero for a negative static head', () => {
    const spec: ChartSpec = { ...minimal, systemCurves: [line2('siphon', -6, 4)] };
    const headTicks = ticks(elements(renderChart(spec)), 'axis-head', 'y');
    expect(headTicks[0]?.[0]).toBeLessThanOrEqual(-6);
    expect(headTicks.at(-1)?.[0]).toBeGreaterThanOrEqual(20);
  });

  it('draws points in order of flow whatever order they are given in', () => {
    const shuffled: ChartSpec = {
      ...sample,
      pumpCurves: sample.pumpCurves.map((s) => ({ ...s, points: [...s.points].reverse() })),
    };
    expect(renderChart(shuffled)).toBe(svg);
  });
});

describe('renderChart: escaping', () => {
  const nasty = `<&>"' A&amp;B`;
  const spec: ChartSpec = {
    ...sample,
    title: `booster ${nasty}`,
    pumpCurves: [{ ...line2(nasty, 40, 20) }],
    preferredRegions: [{ name: nasty, minFlow: 0.002, maxFlow: 0.008 }],
    operatingPoints: [{ name: nasty, flow: 0.005, head: 25 }],
  };
  const svg = renderChart(spec);

  it('keeps the document well formed and the names intact', () => {
    expect(XMLValidator.validate(svg)).toBe(true);
    const els = elements(svg);
    expect(els.find((e) => e.tag === 'title')?.text).toBe(`booster ${nasty}`);
    for (const cls of ['pump-curve', 'preferred-region', 'operating-point']) {
      expect(byClass(els, cls).map((e) => e.attrs['data-name'])).toEqual([nasty]);
    }
    expect(svg).not.toContain(nasty);
    expect(svg).toContain('&lt;&amp;&gt;&quot;&apos; A&amp;amp;B');
  });

  it('keeps tabs and line breaks as references and replaces what XML cannot carry', () => {
    const odd = 'a\tb\nc\u0001d\uD800e\uDC00f\uFFFEg \u{1F600}';
    const out = renderChart({ ...minimal, pumpCurves: [line2(odd, 20, 10)] });
    expect(XMLValidator.validate(out)).toBe(true);
    const name = byClass(elements(out), 'pump-curve')[0]?.attrs['data-name'];
    expect(name).toBe('a\tb\nc\uFFFDd\uFFFDe\uFFFDf\uFFFDg \u{1F600}');
  });

  it('wraps long names in the key and the legend, never cutting them short', () => {
    const long = 'x'.repeat(150);
    const out = elements(
      renderChart({ ...minimal, operatingPoints: [{ name: long, flow: 0.005, head: 15 }] }),
    );
    expect(byClass(out, 'operating-point')[0]?.attrs['data-name']).toBe(long);
    const key = byClass(out, 'key-text').map((e) => e.text);
    expect(key.length).toBeGreaterThan(1);
    expect(key.join('')).toContain(long);
    expect(out.some((e) => (e.text ?? '').includes('\u2026'))).toBe(false);
  });
});

describe('renderChart: properties', () => {
  /** Characters that XML 1.0 does not allow anywhere in a document. */
  const notXml = (text: string): boolean =>
    Array.from(text).some((ch) => {
      const c = ch.codePointAt(0) ?? 0;
      const lone = c >= 0xd800 && c <= 0xdfff; // Array.from leaves a lone surrogate alone
      return (
        (c < 0x20 && c !== 0x09 && c !== 0x0a && c !== 0x0d) || c === 0xfffe || c === 0xffff || lone
      );
    });
  const name = fc.string({ unit: 'binary', maxLength: 12 });
  const series = fc.record({
    name,
    points: fc.array(
      fc.record({
        flow: fc.double({ min: 0, max: 10, noNaN: true }),
        value: fc.double({ min: -50, max: 500, noNaN: true }),
      }),
      { minLength: 2, maxLength: 6 },
    ),
  });
  const fraction = fc.record({
    name,
    points: fc.array(
      fc.record({
        flow: fc.double({ min: 0, max: 10, noNaN: true }),
        value: fc.double({ min: 0, max: 1, noNaN: true }),
      }),
      { minLength: 2, maxLength: 6 },
    ),
  });
  const spec = fc.record({
    title: name,
    units: fc.constantFrom(
      { flow: 'm3/s', head: 'm' } as const,
      { flow: 'gal/min', head: 'ft' } as const,
      { flow: 'm3/h', head: 'km' } as const,
    ),
    pumpCurves: fc.array(series, { minLength: 1, maxLength: 4 }),
    systemCurves: fc.array(series, { maxLength: 3 }),
    operatingPoints: fc.array(
      fc.record({
        name,
        flow: fc.double({ min: 0, max: 10, noNaN: true }),
        head: fc.double({ min: -50, max: 500, noNaN: true }),
      }),
      { maxLength: 6 },
    ),
    preferredRegions: fc.array(
      fc
        .tuple(
          name,
          fc.double({ min: 0, max: 10, noNaN: true }),
          fc.double({ min: 0, max: 10, noNaN: true }),
        )
        .map(([n, a, b]) => ({ name: n, minFlow: Math.min(a, b), maxFlow: Math.max(a, b) })),
      { maxLength: 3 },
    ),
    efficiencyCurves: fc.array(fraction, { maxLength: 3 }),
    npshRequired: fc.array(
      series.map((s) => ({
        ...s,
        points: s.points.map((p) => ({ ...p, value: Math.abs(p.value) })),
      })),
      { maxLength: 3 },
    ),
  });

  it('any valid spec gives one well-formed, deterministic document with every item in it', () => {
    fc.assert(
      fc.property(spec, (s) => {
        const svg = renderChart(s);
        expect(XMLValidator.validate(svg)).toBe(true);
        expect(notXml(svg)).toBe(false);
        expect(svg).not.toContain('NaN');
        expect(renderChart(s)).toBe(svg);
        const els = elements(svg);
        expect(byClass(els, 'pump-curve').length).toBe(s.pumpCurves.length);
        expect(byClass(els, 'system-curve').length).toBe(s.systemCurves.length);
        expect(byClass(els, 'operating-point').length).toBe(s.operatingPoints.length);
        expect(byClass(els, 'preferred-region').length).toBe(s.preferredRegions.length);
        expect(byClass(els, 'efficiency-curve').length).toBe(s.efficiencyCurves.length);
        expect(byClass(els, 'npsh-required').length).toBe(s.npshRequired.length);
      }),
      { numRuns: 100 },
    );
  });
});

describe('colour groups', () => {
  it('series and bands of one group share a colour; positions decide without a group', () => {
    const grouped: ChartSpec = {
      ...minimal,
      pumpCurves: [
        { ...line2('A full speed', 30, 10), group: 'A' },
        { ...line2('B', 28, 12), group: 'B' },
        { ...line2('A reduced', 20, 8), group: 'A' },
      ],
      efficiencyCurves: [
        {
          name: 'B eff',
          group: 'B',
          points: [
            { flow: 0, value: 0 },
            { flow: 0.04, value: 0.7 },
          ],
        },
      ],
      preferredRegions: [{ name: 'A region', group: 'A', minFlow: 0.01, maxFlow: 0.02 }],
    };
    const els = elements(renderChart(grouped));
    const stroke = (cls: string, name: string): string | undefined =>
      byClass(els, cls).find((e) => e.attrs['data-name'] === name)?.attrs['stroke'];
    expect(stroke('pump-curve', 'A reduced')).toBe(stroke('pump-curve', 'A full speed'));
    expect(stroke('pump-curve', 'B')).not.toBe(stroke('pump-curve', 'A full speed'));
    expect(stroke('efficiency-curve', 'B eff')).toBe(stroke('pump-curve', 'B'));
    const fill = byClass(els, 'preferred-region').find((e) => e.attrs['data-name'] === 'A region')
      ?.attrs['fill'];
    expect(fill).toBe(stroke('pump-curve', 'A full speed'));
  });
});
