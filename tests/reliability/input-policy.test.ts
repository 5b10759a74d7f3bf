/**
 * One test per defect the reliability issue listed, each named after what it guards. The fuzz
 * suite (tests/fuzz/) found them; these keep each one fixed with a plain, readable case.
 * Values checked against the Colebrook equation itself (its residual) or against another way
 * of computing the same thing in this library (common practice: flows of pumps in parallel
 * add at equal head; a branch without resistance carries the flow at no loss).
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import {
  applyCase,
  chartSpecFromReport,
  chen,
  churchill,
  colebrook,
  colebrookInto,
  colebrookResidual,
  colebrookSolve,
  convert,
  type DesignReport,
  dutyFor,
  evaluateDesign,
  type Flow,
  fitting,
  flowArea,
  frictionFactor,
  goudarSonnad,
  HeadflowError,
  kFromCv,
  type Length,
  operatingPoint,
  type PipeRunInput,
  pumpCurve,
  pumpsInParallel,
  q,
  readScenario,
  referK,
  renderChart,
  renderJson,
  renderMarkdown,
  renderText,
  ScenarioFileError,
  STANDARD_ATMOSPHERE,
  type SystemDefinition,
  serghides,
  systemCurve,
  to,
  water,
  waterDensityInto,
  zigrangSylvester,
} from '../../src/index';
import { expectHeadflowError, expectRelative } from '../helpers/expect';
import { quadraticPump } from '../pumps/fixtures';

const file = (name: string): Record<string, unknown> =>
  JSON.parse(readFileSync(new URL(`../../docs/examples/${name}.json`, import.meta.url), 'utf8'));

const orchardReport = (): DesignReport & { curves: NonNullable<DesignReport['curves']> } => {
  const r = evaluateDesign(readScenario(file('orchard-tank')), { curves: true });
  if (r.curves === undefined) throw new Error('curves were asked for');
  return { ...r, curves: r.curves };
};

const cold = water().at(q(20, 'degC'));
const tank = (m: number) => ({ elevation: q(m, 'm'), pressure: STANDARD_ATMOSPHERE });
const run = (length: number, mm: number): PipeRunInput => ({
  length: q(length, 'm'),
  insideDiameter: q(mm, 'mm'),
  roughness: q(0.045, 'mm'),
});
const line = (runs: SystemDefinition['runs']): SystemDefinition => ({
  fluid: cold,
  suction: tank(0),
  discharge: tank(10),
  runs,
});

describe('friction at low Reynolds numbers', () => {
  it('colebrook gives a finite, exact answer below Re 2.8 (it was NaN)', () => {
    for (const re of [1e-6, 0.5, 1, 2, 2.8]) {
      for (const k of [0, 1e-4, 0.05]) {
        const f = colebrook(re, k);
        expect(Number.isFinite(f) && f > 0).toBe(true);
        // The Colebrook equation holds at the answer: its residual is rounding only.
        // (in units of 1/sqrt(f); its logarithm term is of order 1, so rounding is ~1e-16)
        expect(Math.abs(colebrookResidual(re, k, f))).toBeLessThan(1e-14);
      }
    }
    const s = colebrookSolve(1, 0);
    expect(Number.isFinite(s.f) && Number.isFinite(s.residual)).toBe(true);
    expect(s.iterations).toBe(3);
    const out = colebrookInto(Float64Array.of(1, 1e5), 0, new Float64Array(2));
    expect([...out].every(Number.isFinite)).toBe(true);
  });

  it('colebrook refuses Re below 1e-150, where f is not a finite number, with OUT_OF_RANGE', () => {
    const e = expectHeadflowError(() => colebrook(1e-200, 0), 'OUT_OF_RANGE');
    expect(e.allowed).toBe('>= 1e-150');
  });

  it('the explicit approximations refuse Re below 100 with OUT_OF_RANGE naming the range', () => {
    for (const f of [goudarSonnad, chen, serghides, zigrangSylvester]) {
      for (const re of [1, 2, 7, 12, 13, 99]) {
        const e = expectHeadflowError(() => f(re, 0), 'OUT_OF_RANGE');
        expect(e.allowed).toBe('>= 100');
      }
      expect(Number.isFinite(f(100, 0.05))).toBe(true);
    }
  });
});

describe('values reported as absent, never Infinity', () => {
  it('the friction factor at zero flow is absent in dutyFor and details', () => {
    const s = systemCurve(line([run(100, 100)]));
    for (const p of [dutyFor(s, 0 as Flow), s.details(0 as Flow)]) {
      for (const r of p.runs) {
        expect(r.frictionFactor).toBeUndefined();
        expect(r.regime).toBe('none');
      }
    }
    // A JSON report writes it as null.
    expect(JSON.stringify(dutyFor(s, 0 as Flow))).not.toContain('Infinity');
  });
});

describe('the scenario reader', () => {
  it('bounds numbers to physical ranges: motor efficiency 1e-300 %, Cv 1e-300, atFlow 1e-300 m3/h', () => {
    const a = file('canal-lift');
    (a['candidates'] as [Record<string, unknown>])[0]['motorEfficiency'] = '1e-300 %';
    expect(() => readScenario(a)).toThrow(ScenarioFileError);
    const b = file('canal-lift');
    const run0 = ((b['line'] as Record<string, unknown>[])[1] as { run: Record<string, unknown> })
      .run;
    run0['valves'] = [{ name: 'v', cv: 1e-300 }];
    expect(() => readScenario(b)).toThrow(ScenarioFileError);
    const c = file('canal-lift');
    const run1 = ((c['line'] as Record<string, unknown>[])[1] as { run: Record<string, unknown> })
      .run;
    run1['equipment'] = [{ name: 'filter', pressureDrop: '20 kPa', atFlow: '1e-300 m3/h' }];
    const e = expectHeadflowError(() => readScenario(c), 'OUT_OF_RANGE');
    expect(e.message).toContain('physical range');
  });

  it('refuses what evaluateDesign refuses: a blank candidate name, a pipe too rough when aged', () => {
    const a = file('orchard-tank');
    (a['candidates'] as [Record<string, unknown>])[0]['name'] = ' ';
    expect(() => readScenario(a)).toThrow(ScenarioFileError);
    const b = file('orchard-tank');
    const [suction, delivery] = b['line'] as [
      { run: Record<string, unknown> },
      { run: Record<string, unknown> },
    ];
    suction.run['agedRoughness'] = '20 mm'; // eps/D about 0.2 in 4 in pipe
    delivery.run['agedRoughness'] = '0.01 mm';
    b['cases'] = [{ name: 'aged', aged: true }];
    const e = expectHeadflowError(() => readScenario(b), 'OUT_OF_RANGE');
    expect(e).toBeInstanceOf(ScenarioFileError);
  });

  it('takes null options and refuses a list of a million items at once', () => {
    expect(() => readScenario('{}', null)).toThrow(ScenarioFileError);
    const big = file('orchard-tank');
    big['cases'] = new Array(1_000_000).fill({ name: 'x' });
    expectHeadflowError(() => readScenario(big), 'INVALID_ARGUMENT');
  });
});

describe('renderers', () => {
  it('renderText cannot loop: a duty list with a hole is refused, not a fatal error', () => {
    const r = orchardReport();
    const duty = [...r.duty];
    delete duty[0];
    const e = expectHeadflowError(() => renderText({ ...r, duty }), 'INVALID_ARGUMENT');
    expect(e.parameter).toBe('report.duty[0]');
  });

  it('renderers take null options, and a report with missing numbers prints dashes', () => {
    const r = orchardReport();
    const noHead = { ...r, duty: r.duty.map((d) => ({ ...d, head: Number.NaN as Length })) };
    for (const text of [
      renderText(noHead, null),
      renderMarkdown(noHead, null),
      renderJson(noHead, null),
    ]) {
      expect(text).not.toMatch(/NaN|Infinity/);
    }
  });

  it('chart sizes have stated bounds (100 to 20000 px)', () => {
    const spec = chartSpecFromReport(orchardReport());
    for (const size of [1e21, 3.6e9, 20_001, 99]) {
      expectHeadflowError(() => renderChart(spec, { height: size }), 'INVALID_ARGUMENT');
      expectHeadflowError(() => renderChart(spec, { width: size }), 'INVALID_ARGUMENT');
    }
    expect(renderChart(spec, { width: 20_000, height: 100 })).toContain('<svg');
  });

  it('charts reports whose curves have 0 or 1 samples or a negative NPSH-required sample', () => {
    const r = orchardReport();
    const pumps = r.curves.pumps.map((c, i) =>
      i === 0 ? { ...c, flows: c.flows.slice(0, 1), values: c.values.slice(0, 1) } : c,
    );
    const npshRequired = [
      ...r.curves.npshRequired,
      { name: 'fit below zero', flows: [0, 0.001, 0.002], values: [-0.3, 0.5, 1] },
      { name: 'empty', flows: [], values: [] },
    ];
    const spec = chartSpecFromReport({ ...r, curves: { ...r.curves, pumps, npshRequired } });
    expect(renderChart(spec)).toContain('fit below zero');
  });
});

describe('shapes refused with HeadflowError, never a TypeError', () => {
  const make = (f: () => unknown) => expectHeadflowError(f, 'INVALID_ARGUMENT');

  it('null and missing option objects mean no options', () => {
    expect(frictionFactor(1e5, 1e-4, null)).toBe(frictionFactor(1e5, 1e-4));
    expect(renderText(orchardReport(), null)).toContain('Pump selection report');
  });

  it('missing objects and fields are named', () => {
    make(() => evaluateDesign(null as never));
    make(() => pumpCurve(undefined as never));
    const pump = quadraticPump();
    const e = make(() => operatingPoint(pump, { staticHead: 1 } as never));
    expect(e.parameter).toBe('system.head');
    make(() => pumpsInParallel([{}] as never));
    const e2 = make(() => systemCurve({ ...line([run(10, 100)]), runs: [null] } as never));
    expect(e2.parameter).toBe('runs[0]');
  });

  it('out buffers are checked', () => {
    make(() => colebrookInto(Float64Array.of(1e5), 0, [0] as never));
    make(() => waterDensityInto([293], 1e5 as never, undefined as never));
  });

  it('a unit that is a Symbol or a null-prototype object is an unknown unit', () => {
    expectHeadflowError(() => q(1, Symbol('m') as never), 'UNKNOWN_UNIT');
    expectHeadflowError(() => to(1 as Length, Object.create(null)), 'UNKNOWN_UNIT');
    expectHeadflowError(() => convert(1, Object.create(null), 'm'), 'UNKNOWN_UNIT');
  });

  it('the error classes construct with any arguments', () => {
    const E = ScenarioFileError as unknown as new (...a: unknown[]) => ScenarioFileError;
    for (const args of [
      [],
      [null],
      [[null, 3]],
      [Symbol('x'), {}],
      [[{ path: 'a', message: 'b', code: 'OUT_OF_RANGE' }], 7],
    ]) {
      const e = new E(...args);
      expect(e).toBeInstanceOf(HeadflowError);
      expect(typeof e.code).toBe('string');
    }
  });
});

describe('names and sizes', () => {
  it('an id longer than 200 characters is refused at once, without a "did you mean" search', () => {
    const e = expectHeadflowError(() => fitting('elbow-'.repeat(20_000)), 'INVALID_ARGUMENT');
    expect(e.message).toContain('120000 characters long');
    // Within the bound the suggestions stay.
    const near = expectHeadflowError(() => fitting('elbow-90-standrad'), 'UNKNOWN_NAME');
    expect(near.message).toContain('elbow-90-standard');
  });
});

describe('pumps in parallel', () => {
  it('a parallel set inside a parallel set has the BEP of the flat set (flows add at equal head)', () => {
    const a = quadraticPump();
    const nested = pumpsInParallel([pumpsInParallel([a, a]), a]);
    const flat = pumpsInParallel([a, a, a]);
    const bn = nested.bestEfficiencyPoint;
    const bf = flat.bestEfficiencyPoint;
    expect(bn && bf).toBeTruthy();
    // The grid search of the maximum sees the same curve: same point to the solver tolerance.
    expectRelative(bn?.efficiency ?? 0, bf?.efficiency ?? 1, 1e-9, 'BEP efficiency');
    expectRelative(nested.head(q(300, 'm3/h')), flat.head(q(300, 'm3/h')), 1e-9, 'head');
  });

  it("advertises an NPSH range inside every member's NPSH data", () => {
    // NPSH data from the second point on (50 m3/h), head data from zero flow.
    const pts = [0, 50, 100, 150].map((x, i) => ({
      flow: q(x, 'm3/h'),
      head: q(40 - 0.001 * x * x, 'm'),
      efficiency: i === 0 ? 0 : 0.015 * x - 0.000075 * x * x,
      ...(i === 0 ? {} : { npshRequired: q(1 + 0.0002 * x * x, 'm') }),
    }));
    const p = pumpCurve({ speed: q(1750, 'rpm'), points: pts });
    const two = pumpsInParallel([p, p]);
    const r = two.npshRange;
    expect(r).toBeDefined();
    if (r === undefined) return;
    expectRelative(r.min, 2 * to(q(50, 'm3/h'), 'm3/s'), 1e-9, 'first NPSH flow of the pair');
    for (let i = 0; i <= 10; i++) {
      const flow = (r.min + ((r.max - r.min) * i) / 10) as Flow;
      expect(Number.isFinite(two.npshRequired(flow))).toBe(true);
    }
  });
});

describe('systems', () => {
  it('a parallel branch of length 0 with no fittings takes the flow at no loss', () => {
    const bare: PipeRunInput = {
      length: q(0, 'm'),
      insideDiameter: q(100, 'mm'),
      roughness: q(0, 'mm'),
    };
    const withBypass = systemCurve(
      line([run(50, 100), { kind: 'parallel', branches: [[run(20, 50)], [bare]] }]),
    );
    const without = systemCurve(line([run(50, 100)]));
    const flow = q(30, 'm3/h');
    expectRelative(withBypass.head(flow), without.head(flow), 1e-12, 'head with a free bypass');
    const d = withBypass.details(flow);
    expect(d.runs.map((r) => r.flow)).toEqual([flow, 0, flow]);
  });
});

describe('found by the fuzz suite beyond the listed defects', () => {
  it('finite inputs whose result overflows are refused with OUT_OF_RANGE, not Infinity', () => {
    expectHeadflowError(() => q(1e306, 'mi'), 'OUT_OF_RANGE');
    expectHeadflowError(() => flowArea(1e300 as Length), 'OUT_OF_RANGE');
    expectHeadflowError(() => kFromCv(1e-300, q(100, 'mm')), 'OUT_OF_RANGE');
    // 0 x Infinity was NaN
    expectHeadflowError(() => referK(0, 1e-300 as Length, q(1, 'm')), 'OUT_OF_RANGE');
    expectHeadflowError(() => pumpCurveAt(8e299), 'OUT_OF_RANGE');
  });

  it('serghides at very large Re (its acceleration was 0/0), churchill at very low Re', () => {
    expect(Number.isFinite(serghides(1e300, 0.1))).toBe(true);
    // Churchill tends to 64/Re in laminar flow; (8/Re)^12 overflowed below Re 6e-25.
    expectRelative(churchill(1e-30, 0), 64e30, 1e-12, 'churchill at Re 1e-30');
    expectHeadflowError(() => colebrook(1.7e308, 0.1), 'OUT_OF_RANGE');
  });

  it('an array with its own constructor is refused (it broke map and slice)', () => {
    const pumps = [quadraticPump()];
    Object.defineProperty(pumps, 'constructor', { value: 1, enumerable: true });
    expectHeadflowError(() => pumpsInParallel(pumps), 'INVALID_ARGUMENT');
  });

  it('a user system whose head is NaN is refused, naming the flow', () => {
    const e = expectHeadflowError(
      () =>
        operatingPoint(quadraticPump(), {
          staticHead: q(1, 'm'),
          head: () => Number.NaN as Length,
        }),
      'INVALID_ARGUMENT',
    );
    expect(e.parameter).toBe('system.head');
  });

  it('applyCase copies only the fields a definition has', () => {
    const base = JSON.parse('{"__proto__": {"x": 1}, "extra": 1}') as Record<string, unknown>;
    const merged = applyCase({ ...line([run(10, 100)]), ...base } as SystemDefinition, {
      name: 'low',
    }) as unknown as Record<string, unknown>;
    expect(Object.keys(merged)).not.toContain('__proto__');
    expect(Object.keys(merged)).not.toContain('extra');
  });
});

function pumpCurveAt(speedRatio: number) {
  const p = quadraticPump();
  return p.atSpeed((p.speed * speedRatio) as never);
}
