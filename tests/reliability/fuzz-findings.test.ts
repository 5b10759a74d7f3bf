/**
 * One test per defect the fuzz suite (tests/fuzz/) found in the functions, report fields and
 * modules added beside the input policy, each named after what it guards. Check values are
 * what the input policy (docs/input-policy.md) says: a HeadflowError with a code, never a
 * TypeError, never Infinity in a result.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { MAX_PROFILE_FLOW } from '../../src/design/input-shape';
import { PHYSICAL_RANGE } from '../../src/design/scenario-values';
import {
  applyNetworkCase,
  CatalogueFileError,
  type Check,
  chartSpecFromReport,
  checkMessage,
  closureSurgeHead,
  economicPipeSize,
  evaluateDesign,
  HeadflowError,
  joukowskyHead,
  lifeCycleCost,
  minimumSubmergence,
  type NetworkDefinition,
  outletCoefficient,
  pipeSize,
  pumpCurve,
  q,
  readCatalogue,
  readScenario,
  renderHtml,
  renderJson,
  renderMarkdown,
  renderSelection,
  renderText,
  reportToPlain,
  restraintFactor,
  selectPumps,
  solveNetwork,
  systemCurve,
  temperatureRise,
  water,
  waveSpeed,
} from '../../src/index';

const example = (name: string): string =>
  readFileSync(new URL(`../../docs/examples/${name}`, import.meta.url), 'utf8');
const ORCHARD = readScenario(example('orchard-tank.json'));
const CATALOGUE = readCatalogue(example('pump-catalogue.json'));
const SMALL = { ...CATALOGUE, pumps: CATALOGUE.pumps.slice(0, 2) };

/** Calls `f` and returns the HeadflowError it throws (fails when it throws anything else). */
function refusal(f: () => unknown): HeadflowError {
  try {
    f();
  } catch (e) {
    expect(e).toBeInstanceOf(HeadflowError);
    return e as HeadflowError;
  }
  throw new Error('expected a HeadflowError, but the call returned');
}

type Path = readonly (string | number)[];

/** A deep copy of `data` with the field at `path` set to `value`, or removed (no value). */
function edited<T>(data: T, path: Path, ...value: [unknown?]): T {
  const copy = structuredClone(data);
  let parent = copy as unknown as Record<string | number, unknown>;
  for (const key of path.slice(0, -1)) parent = parent[key] as Record<string | number, unknown>;
  const last = path[path.length - 1] as string | number;
  if (value.length === 0) delete parent[last];
  else parent[last] = value[0];
  return copy;
}

describe('the report renderers check every field of the calculation sheet they read', () => {
  const report = evaluateDesign(ORCHARD);

  it('refuses restated valves that are not a list, naming the field (was a TypeError)', () => {
    const bad = edited(report, ['inputs', 'runs', 0, 'valves'], 'NaN');
    const e = refusal(() => renderText(bad));
    expect(e.code).toBe('INVALID_ARGUMENT');
    expect(e.parameter).toBe('report.inputs.runs[0].valves');
  });

  it('refuses a candidate without its pump (was a TypeError reading ratedSpeed)', () => {
    const bad = edited(report, ['candidates', 0, 'pump']);
    expect(refusal(() => renderMarkdown(bad)).parameter).toBe('report.candidates[0].pump');
  });

  it('refuses a duty case without its fluid (was a TypeError reading name)', () => {
    const bad = edited(report, ['duty', 0, 'fluid']);
    expect(refusal(() => reportToPlain(bad)).parameter).toBe('report.duty[0].fluid');
  });

  it('refuses a report without its verdict (was a TypeError reading candidates)', () => {
    const bad = edited(report, ['verdict']);
    expect(refusal(() => renderHtml(bad)).parameter).toBe('report.verdict');
  });

  it('refuses curves without their list of systems (was a TypeError in the chart and JSON)', () => {
    const curved = evaluateDesign(ORCHARD, { curves: true });
    const bad = edited(curved, ['curves', 'systems']);
    expect(refusal(() => renderJson(bad)).parameter).toBe('report.curves.systems');
    expect(refusal(() => chartSpecFromReport(bad)).parameter).toBe('report.curves.systems');
  });

  it('still renders every example report unchanged', () => {
    for (const name of ['orchard-tank', 'canal-lift', 'cooling-loop']) {
      const r = evaluateDesign(readScenario(example(`${name}.json`)), { curves: true });
      expect(renderText(r)).not.toMatch(/NaN|Infinity/);
      expect(renderHtml(r)).toContain('<figure class="chart">');
    }
  });
});

describe('the design and the selection check their input at the entry', () => {
  it('refuses a catalogue pipe size whose nominal size is not a string (was a TypeError)', () => {
    const run = ORCHARD.system.runs[0] as unknown as Record<string, unknown>;
    const pipe = { ...pipeSize('4', '40'), nps: {} };
    const bad = {
      ...ORCHARD,
      system: { ...ORCHARD.system, runs: [{ ...run, insideDiameter: undefined, pipe }] },
    };
    const e = refusal(() => evaluateDesign(bad as never));
    expect(e.parameter).toBe('suction.pipe.nps');
  });

  it('refuses a valve whose name is not a string (was restated as NaN in the report)', () => {
    const run = ORCHARD.system.runs[1] as unknown as Record<string, unknown>;
    const runs = [ORCHARD.system.runs[0], { ...run, valves: [{ name: Number.NaN, k: 2 }] }];
    const bad = { ...ORCHARD, system: { ...ORCHARD.system, runs } };
    expect(refusal(() => evaluateDesign(bad as never)).parameter).toBe('delivery.valves[0].name');
  });

  it('refuses a profile flow past the physical range instead of reporting a flow of Infinity', () => {
    const bad = { ...ORCHARD, profile: [{ flow: 9e297 as never, hours: 100 }] };
    const e = refusal(() => evaluateDesign(bad));
    expect(e.code).toBe('OUT_OF_RANGE');
    expect(e.parameter).toBe('profile[0].flow');
    // The bound is the scenario reader's physical range of a flow.
    expect(MAX_PROFILE_FLOW).toBe(PHYSICAL_RANGE.flow?.largest);
  });

  it('refuses a liquid density past the physical range instead of reporting Infinity', () => {
    const fluid = { ...ORCHARD.system.fluid, density: 1e302 as never };
    const e = refusal(() => systemCurve({ ...ORCHARD.system, fluid }));
    expect(e.code).toBe('OUT_OF_RANGE');
    expect(e.parameter).toBe('fluid.density');
  });

  it('refuses a design whose run is not an object in the pipe sizing (was a TypeError)', () => {
    const bad = { ...ORCHARD, system: { ...ORCHARD.system, runs: [Number.NaN] } };
    const options = {
      runs: [{ run: 'delivery', sizes: [{ pipe: pipeSize('3', '40'), costPerLength: 40 }] }],
    };
    const e = refusal(() => economicPipeSize(bad as never, SMALL, options));
    expect(e.parameter).toBe('system.runs[0]');
  });

  it('renders a selection, and refuses one whose energy lacks its kWh (was a TypeError)', () => {
    const selection = selectPumps(ORCHARD, SMALL);
    expect(renderSelection(selection)).not.toMatch(/NaN|Infinity/);
    // Its ways' curves and candidates are class instances: plain data only is copied.
    const plain = {
      ...selection,
      ranked: selection.ranked.map((w) => ({ ...w, curve: 0, report: 0, candidate: 0 })),
    };
    const bad = edited(plain, ['ranked', 0, 'energy', 'kWh']);
    const e = refusal(() => renderSelection(bad as never));
    expect(e.parameter).toBe('selection.ranked[0].energy.kWh');
  });

  it('refuses check values that are not numbers in checkMessage (was a TypeError)', () => {
    const check = evaluateDesign(ORCHARD).candidates[0]?.checks[0] as Check;
    const bad = { ...check, values: { ...check.values, flow: {} } } as unknown as Check;
    expect(refusal(() => checkMessage(bad, 'si')).parameter).toBe('check.values.flow');
  });
});

describe('results that would overflow are refused with OUT_OF_RANGE', () => {
  it('minimumSubmergence of an inlet of 1e-300 m', () => {
    const e = refusal(() =>
      minimumSubmergence({ flow: q(1, 'm3/s'), inletDiameter: 1e-300 as never }),
    );
    expect(e.code).toBe('OUT_OF_RANGE');
  });

  it('closureSurgeHead at a wave speed of 5e-324 m/s', () => {
    const input = { waveSpeed: 5e-324, length: 1, velocityChange: 0, closureTime: 0 };
    expect(refusal(() => closureSurgeHead(input as never)).code).toBe('OUT_OF_RANGE');
  });

  it('restraintFactor of a thick wall of 1.8e308 m', () => {
    const input = {
      anchoring: 'anchored-upstream',
      poissonRatio: 0,
      wall: 'thick',
      insideDiameter: 1,
      wallThickness: Number.MAX_VALUE,
    };
    expect(refusal(() => restraintFactor(input as never)).code).toBe('OUT_OF_RANGE');
  });

  it('outletCoefficient at a pressure of 1e-297 Pa', () => {
    expect(refusal(() => outletCoefficient(1 as never, 1e-297 as never, 1.04)).code).toBe(
      'OUT_OF_RANGE',
    );
  });
});

describe('more results that would overflow, found by longer local runs', () => {
  it('temperatureRise at a density of 5e-324 kg/m3', () => {
    const e = refusal(() =>
      temperatureRise(10 as never, 0 as never, 5e-324 as never, 1500 as never, 1 as never),
    );
    expect(e.code).toBe('OUT_OF_RANGE');
  });

  it('joukowskyHead of a velocity change of 1.8e308 m/s', () => {
    expect(refusal(() => joukowskyHead(100 as never, Number.MAX_VALUE as never)).code).toBe(
      'OUT_OF_RANGE',
    );
  });

  it('waveSpeed in a liquid of 1e-300 kg/m3', () => {
    const input = { bulkModulus: 1.8e8, density: 1e-300 };
    expect(refusal(() => waveSpeed(input as never)).code).toBe('OUT_OF_RANGE');
  });

  it('lifeCycleCost of yearly costs near the largest number', () => {
    const e = refusal(() => lifeCycleCost({ operationPerYear: Number.MAX_VALUE }));
    expect(e.code).toBe('OUT_OF_RANGE');
  });

  it('evaluateDesign with a motor efficiency of 9.3e-301 (an input power of Infinity)', () => {
    const candidates = ORCHARD.candidates?.map((c) => ({ ...c, motorEfficiency: 9.3e-301 }));
    const e = refusal(() => evaluateDesign({ ...ORCHARD, ...(candidates ? { candidates } : {}) }));
    expect(e.code).toBe('OUT_OF_RANGE');
    expect(e.parameter).toBe('candidates[0].motorEfficiency');
  });
});

describe('objects handed back keep only what they describe', () => {
  it('pumpCurve refuses a catalogue efficiency of 5.55e-301 (a selection reported Infinity power)', () => {
    const points = [
      { flow: 0 as never, head: 50 as never, efficiency: 0 },
      { flow: 0.01 as never, head: 45 as never, efficiency: 5.55e-301 },
      { flow: 0.02 as never, head: 35 as never, efficiency: 0.7 },
    ];
    const e = refusal(() => pumpCurve({ speed: 300 as never, points }));
    expect(e.parameter).toBe('points[1].efficiency');
  });

  it('pumpCurve refuses a catalogue head of 9.8e301 m (a selection reported a flow of Infinity)', () => {
    const points = [
      { flow: 0 as never, head: 9.8e301 as never, efficiency: 0 },
      { flow: 0.01 as never, head: 45 as never, efficiency: 0.6 },
      { flow: 0.02 as never, head: 35 as never, efficiency: 0.7 },
    ];
    const e = refusal(() => pumpCurve({ speed: 300 as never, points }));
    expect(e.code).toBe('OUT_OF_RANGE');
    expect(e.parameter).toBe('points[0].head');
  });

  it("a pump curve's catalogue points drop the caller's extra keys (an own __proto__)", () => {
    const first = JSON.parse('{"flow":0,"head":5,"efficiency":0,"__proto__":[null]}') as object;
    const p = pumpCurve({
      speed: 100 as never,
      points: [
        first as never,
        { flow: 0.5 as never, head: 4.75 as never, efficiency: 0.4375 },
        { flow: 1 as never, head: 4 as never, efficiency: 0.25 },
      ],
    });
    expect(Object.keys(p.catalogue?.[0] as object)).toEqual(['flow', 'head', 'efficiency']);
  });

  it('applyNetworkCase refuses a node that is not an object (was copied into the case)', () => {
    const definition = {
      name: 'two tanks',
      nodes: [{ id: 'a', elevation: 10, surface: {} }, [Number.NaN]],
      links: [],
    } as unknown as NetworkDefinition;
    const e = refusal(() => applyNetworkCase(definition, { name: 'night', demands: {} }));
    expect(e.parameter).toBe('definition.nodes[1]');
  });

  it("applyNetworkCase keeps only a definition's own fields (not an extra __proto__ key)", () => {
    const definition = JSON.parse(
      '{"name":"two tanks","nodes":[{"id":"a","elevation":10,"surface":{}},{"id":"b","elevation":0,"surface":{}}],"links":[{"id":"ab","from":"a","to":"b","run":{"length":10,"insideDiameter":0.1,"roughness":0}}],"__proto__":[1]}',
    ) as Record<string, unknown>;
    const withFluid = {
      ...definition,
      fluid: water().at(q(20, 'degC')),
    } as unknown as NetworkDefinition;
    const result = applyNetworkCase(withFluid, { name: 'low', levels: { a: q(8, 'm') } });
    expect(Object.keys(result)).not.toContain('__proto__');
    // A node the case changes is copied with a node's fields only.
    const node = JSON.parse('{"id":"a","elevation":10,"surface":{},"__proto__":[1],"extra":2}');
    const two = { ...withFluid, nodes: [node, withFluid.nodes[1]] } as NetworkDefinition;
    const low = applyNetworkCase(two, { levels: { a: q(8, 'm') } });
    expect(Object.keys(low.nodes[0] as object)).toEqual(['id', 'elevation', 'surface']);
  });

  it('solveNetwork refuses a vapour pressure that is not a number (was a TypeError)', () => {
    const fluid = { ...water().at(q(20, 'degC')), vaporPressure: Object.create(null) };
    const definition = {
      fluid,
      nodes: [
        { id: 'a', elevation: 10, surface: {} },
        { id: 'b', elevation: 0, surface: {} },
      ],
      links: [
        { id: 'ab', from: 'a', to: 'b', run: { length: 10, insideDiameter: 0.1, roughness: 0 } },
      ],
    } as unknown as NetworkDefinition;
    expect(refusal(() => solveNetwork(definition)).parameter).toBe('fluid.vaporPressure');
  });

  it('CatalogueFileError constructs with any arguments (null issues included)', () => {
    const make = (...a: unknown[]) =>
      new (CatalogueFileError as unknown as new (...x: unknown[]) => CatalogueFileError)(...a);
    expect(make(null).code).toBe('INVALID_ARGUMENT');
    expect(make(undefined, 7).issues).toEqual([]);
    expect(make([{ path: 'pumps', message: 'm', code: 'OUT_OF_RANGE' }], 'p.json').code).toBe(
      'OUT_OF_RANGE',
    );
  });
});
