import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { constantFluid, type FluidState, water } from '../../src/fluids';
import { fittingSet, kFromCv, kvFromK, ratedLoss } from '../../src/losses';
import { pipeSize } from '../../src/pipes';
import {
  dutyFor,
  type PipeRunInput,
  pipeRun,
  runsOf,
  type SystemDefinition,
  systemCurve,
  systemScenarios,
} from '../../src/system';
import { type Flow, type Length, q, STANDARD_ATMOSPHERE, STANDARD_GRAVITY } from '../../src/units';
import { expectAbsolute, expectHeadflowError, expectRelative } from '../helpers/expect';

/** Colebrook solved independently of the library: plain fixed-point iteration, 200 steps. */
function colebrookReference(re: number, rr: number): number {
  let x = 8; // 1/sqrt(f)
  for (let i = 0; i < 200; i++) x = -2 * Math.log10(rr / 3.7 + (2.51 * x) / re);
  return 1 / (x * x);
}

const cold: FluidState = water().at(q(20, 'degC'));
const openTank = (elevation: number) => ({
  elevation: q(elevation, 'm'),
  pressure: STANDARD_ATMOSPHERE,
});

function simple(
  runs: SystemDefinition['runs'],
  extra: Partial<SystemDefinition> = {},
): SystemDefinition {
  return { fluid: cold, suction: openTank(2), discharge: openTank(32), runs, ...extra };
}

const steel = (length: number, mm: number): PipeRunInput => ({
  length: q(length, 'm'),
  insideDiameter: q(mm, 'mm'),
  roughness: q(0.045, 'mm'),
});

describe('special values', () => {
  it('head at zero flow is the static head', () => {
    const c = systemCurve(simple([steel(100, 102.3)]));
    expect(c.staticHead).toBe(30);
    expect(c.head(q(0, 'm3/s'))).toBe(30);
    expect(c.details(q(0, 'm3/s')).runs[0]?.regime).toBe('none');
  });
  it('counts pressure differences between the surfaces as head', () => {
    const vessel = { elevation: q(2, 'm'), pressure: q(3, 'bar') };
    const c = systemCurve(simple([steel(10, 50)], { discharge: vessel }));
    expectRelative(c.staticHead, (3e5 - 101325) / (cold.density * STANDARD_GRAVITY), 1e-14);
  });
  it('a suction tank above the discharge gives a negative static head', () => {
    const c = systemCurve(simple([steel(10, 50)], { suction: openTank(40) }));
    expect(c.staticHead).toBe(-8);
  });
});

describe('bad input', () => {
  it('rejects a zero diameter, a negative length and a missing diameter or roughness', () => {
    expectHeadflowError(
      () => systemCurve(simple([{ ...steel(10, 50), insideDiameter: q(0, 'm') }])),
      'INVALID_ARGUMENT',
    );
    const neg = expectHeadflowError(
      () => systemCurve(simple([{ ...steel(10, 50), length: q(-1, 'm') }])),
      'INVALID_ARGUMENT',
    );
    expect(neg.message).toContain('run 1.length');
    expectHeadflowError(
      () => pipeRun({ length: q(1, 'm'), roughness: q(0, 'm') }),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () => pipeRun({ length: q(1, 'm'), insideDiameter: q(1, 'in') }),
      'INVALID_ARGUMENT',
    );
  });
  it('rejects an unknown fitting and an unknown material by name', () => {
    const run = { ...steel(10, 50), fittings: [{ id: 'elbow-91' as never }] };
    expectHeadflowError(() => systemCurve(simple([run])), 'UNKNOWN_NAME');
    expectHeadflowError(
      () =>
        pipeRun({
          length: q(1, 'm'),
          insideDiameter: q(1, 'in'),
          material: 'unobtainium' as never,
        }),
      'UNKNOWN_NAME',
    );
  });
  it('rejects negative and non-finite flows, and empty lines', () => {
    const c = systemCurve(simple([steel(10, 50)]));
    expectHeadflowError(() => c.head(q(-1, 'L/s')), 'INVALID_ARGUMENT');
    expectHeadflowError(() => c.head(Number.NaN as Flow), 'INVALID_ARGUMENT');
    expectHeadflowError(() => c.headInto([0.001, -1], new Float64Array(2)), 'INVALID_ARGUMENT');
    expectHeadflowError(() => c.headInto([0.001], new Float64Array(2)), 'INVALID_ARGUMENT');
    expectHeadflowError(() => systemCurve(simple([])), 'INVALID_ARGUMENT');
  });
  it('refuses a fluid that boils at the suction, saying what to change', () => {
    const hot = water().at(q(95, 'degC'), q(1, 'bar'));
    const vacuumTank = { elevation: q(0, 'm'), pressure: q(50, 'kPa') };
    const err = expectHeadflowError(
      () => systemCurve(simple([steel(10, 50)], { fluid: hot, suction: vacuumTank })),
      'OUT_OF_RANGE',
    );
    expect(err.message).toContain('boils at the suction');
    expect(err.message).toContain('Raise the suction pressure');
  });
  it('needs an aged roughness for an aged case', () => {
    expectHeadflowError(
      () => systemCurve(simple([steel(10, 50)], { aged: true })),
      'INVALID_ARGUMENT',
    );
  });
  it('rejects a valve with no or two coefficients', () => {
    expectHeadflowError(
      () => systemCurve(simple([{ ...steel(10, 50), valves: [{}] }])),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () => systemCurve(simple([{ ...steel(10, 50), valves: [{ cv: 10, k: 2 }] }])),
      'INVALID_ARGUMENT',
    );
  });
  it('rejects a parallel group with fewer than two branches or an empty branch', () => {
    expectHeadflowError(
      () => systemCurve(simple([{ kind: 'parallel', branches: [[steel(1, 50)]] }])),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () => systemCurve(simple([{ kind: 'parallel', branches: [[steel(1, 50)], []] }])),
      'INVALID_ARGUMENT',
    );
  });
});

describe('a single straight pipe between two open tanks', () => {
  it('equals static head plus Darcy-Weisbach with Colebrook, computed independently here', () => {
    const c = systemCurve(simple([steel(250, 102.3)]));
    for (const lps of [2, 5, 10, 20, 40]) {
      const flow = lps / 1000;
      const d = 0.1023;
      const v = flow / ((Math.PI * d * d) / 4);
      const re = (v * d) / cold.kinematicViscosity;
      const f = colebrookReference(re, 0.045e-3 / d);
      const expected = 30 + ((f * 250) / d) * ((v * v) / (2 * STANDARD_GRAVITY));
      // 1e-12: the library's exact Colebrook and 200 fixed-point steps agree to ~1e-15 in f.
      expectRelative(c.head(q(lps, 'L/s')), expected, 1e-12, `${lps} L/s`);
    }
  });
  it('reports each run: velocity, Re, regime, friction factor, losses and pressure drop', () => {
    const c = systemCurve(simple([steel(250, 102.3)]));
    const p = dutyFor(c, q(10, 'L/s'));
    const run = p.runs[0];
    expect(run?.regime).toBe('turbulent');
    expectRelative(run?.velocity ?? 0, 0.01 / ((Math.PI * 0.1023 ** 2) / 4), 1e-14);
    expectRelative(run?.totalLoss ?? 0, p.head - 30, 1e-14);
    expectRelative(
      run?.pressureDrop ?? 0,
      (run?.totalLoss ?? 0) * cold.density * STANDARD_GRAVITY,
      1e-14,
    );
    expect(p.velocityHead).toBe(0);
  });
  it('reports laminar and transition regimes for a viscous oil', () => {
    const oil = constantFluid({
      name: 'test oil',
      density: q(880, 'kg/m3'),
      dynamicViscosity: q(0.2, 'Pa*s'),
    }).at(q(40, 'degC'));
    const c = systemCurve(simple([steel(50, 52.5)], { fluid: oil }));
    expect(c.details(q(1, 'L/s')).runs[0]?.regime).toBe('laminar');
    // laminar: hf = 128 mu L Q / (pi rho g D^4) (Hagen-Poiseuille)
    const hf = (128 * 0.2 * 50 * 0.001) / (Math.PI * 880 * STANDARD_GRAVITY * 0.0525 ** 4);
    expectRelative(c.head(q(1, 'L/s')) - 30, hf, 1e-12);
    const thin = constantFluid({
      name: 'thin oil',
      density: q(880, 'kg/m3'),
      dynamicViscosity: q(0.02, 'Pa*s'),
    }).at(q(40, 'degC'));
    expect(
      systemCurve(simple([steel(50, 52.5)], { fluid: thin })).details(q(3, 'L/s')).runs[0]?.regime,
    ).toBe('transition');
  });
});

describe('the endpoints', () => {
  it('a free jet at the discharge adds its velocity head', () => {
    const jet = {
      elevation: q(32, 'm'),
      pressure: STANDARD_ATMOSPHERE,
      velocityDiameter: q(102.3, 'mm'),
    };
    const a = systemCurve(simple([steel(250, 102.3)]));
    const b = systemCurve(simple([steel(250, 102.3)], { discharge: jet }));
    const v = 0.01 / ((Math.PI * 0.1023 ** 2) / 4);
    expectRelative(
      b.head(q(10, 'L/s')) - a.head(q(10, 'L/s')),
      (v * v) / (2 * STANDARD_GRAVITY),
      1e-12,
    );
  });
});

describe('pipe sizes and materials', () => {
  it('takes the inside diameter of a schedule pipe and the roughness of a material', () => {
    const run = pipeRun({
      length: q(10, 'm'),
      pipe: pipeSize('4', '40'),
      material: 'commercial-steel',
    });
    expectRelative(run.insideDiameter, 4.026 * 0.0254, 1e-12); // ASME B36.10M: NPS 4 sch 40, 4.500 - 2 x 0.237 in
    expect(run.roughness).toBeGreaterThan(0);
    expect(
      runsOf(
        simple([{ length: q(10, 'm'), pipe: pipeSize('4', '40'), material: 'commercial-steel' }]),
      ),
    ).toHaveLength(1);
  });
});

describe('series and parallel', () => {
  it('series heads add', () => {
    const a = steel(100, 80);
    const b = steel(60, 52.5);
    const both = systemCurve(simple([a, b]));
    const one = systemCurve(simple([a]));
    const two = systemCurve(simple([b]));
    fc.assert(
      fc.property(fc.double({ min: 1e-5, max: 0.02, noNaN: true }), (flow) => {
        const Q = flow as Flow;
        expectAbsolute(both.head(Q), one.head(Q) + two.head(Q) - 30, 1e-11);
      }),
    );
  });
  const parallelLine: SystemDefinition['runs'] = [
    steel(20, 102.3),
    {
      kind: 'parallel',
      name: 'exchangers',
      branches: [
        [steel(40, 52.5)],
        [steel(15, 40.9), { ...steel(5, 40.9), valves: [{ k: 6 }] }],
        [steel(80, 77.9)],
      ],
    },
  ];
  function checkSplit(def: SystemDefinition, min: number, max: number): void {
    const c = systemCurve(def);
    fc.assert(
      fc.property(fc.double({ min, max, noNaN: true }), (flow) => {
        const p = c.details(flow as Flow);
        const byBranch = new Map<string, { flow: number; loss: number }>();
        for (const r of p.runs.filter((r) => r.group !== undefined)) {
          const key = r.group ?? '';
          const prev = byBranch.get(key) ?? { flow: r.flow, loss: 0 };
          byBranch.set(key, { flow: r.flow, loss: prev.loss + r.totalLoss });
        }
        const branches = [...byBranch.values()];
        expect(branches).toHaveLength(3);
        const losses = branches.map((b) => b.loss);
        expect(Math.max(...losses) - Math.min(...losses)).toBeLessThan(1e-9);
        expectRelative(
          branches.reduce((s, b) => s + b.flow, 0),
          flow,
          1e-12,
        );
        expectRelative(p.head, c.head(flow as Flow), 1e-12);
      }),
      { numRuns: 50 },
    );
  }
  it('parallel branches end with equal heads (< 1e-9 m) and flows that sum to the total (turbulent)', () => {
    checkSplit(simple(parallelLine), 0.02, 0.06);
  });
  it('the same at any flow with the continuous transition rule', () => {
    // The default 'conservative' rule jumps at Re 2300, so a branch can sit at that jump
    // (documented); the 'interpolate' rule is continuous and the split is exact everywhere.
    checkSplit(simple(parallelLine, { friction: { transition: 'interpolate' } }), 1e-5, 0.06);
  });
  it('two identical parallel branches each carry half the flow', () => {
    const c = systemCurve(
      simple([{ kind: 'parallel', branches: [[steel(30, 52.5)], [steel(30, 52.5)]] }]),
    );
    const half = systemCurve(simple([steel(30, 52.5)]));
    expectRelative(c.head(q(8, 'L/s')), half.head(q(4, 'L/s')), 1e-12);
  });
});

describe('laws (fast-check)', () => {
  const c = systemCurve(simple([steel(120, 77.9), steel(40, 52.5)]));
  it('head is non-decreasing in flow', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 0.03, noNaN: true }),
        fc.double({ min: 0, max: 0.03, noNaN: true }),
        (a, b) => {
          const [lo, hi] = a < b ? [a, b] : [b, a];
          expect(c.head(hi as Flow)).toBeGreaterThanOrEqual(c.head(lo as Flow));
        },
      ),
    );
  });
  it('headInto agrees with head, point by point', () => {
    const flows = Float64Array.from({ length: 101 }, (_, i) => i * 3e-4);
    const out = c.headInto(flows, new Float64Array(flows.length));
    flows.forEach((f, i) => {
      expect(out[i]).toBe(c.head(f as Flow));
    });
  });
});

describe('operating cases', () => {
  const base: SystemDefinition = simple([
    {
      length: q(300, 'm'),
      pipe: pipeSize('6', '40'),
      material: 'commercial-steel',
      agedRoughness: q(1, 'mm'),
    },
  ]);
  const family = systemScenarios(base, [
    { name: 'high suction level', suction: { elevation: q(5, 'm') } },
    { name: 'low suction level', suction: { elevation: q(0, 'm') } },
    { name: 'low suction level, aged pipe', suction: { elevation: q(0, 'm') }, aged: true },
    { name: 'hot water', fluid: water().at(q(80, 'degC')) },
  ]);
  it('a higher static head lies above the lower one at every flow', () => {
    const [high, low] = family;
    fc.assert(
      fc.property(fc.double({ min: 0, max: 0.08, noNaN: true }), (flow) => {
        expectAbsolute(
          (low?.curve.head(flow as Flow) ?? 0) - (high?.curve.head(flow as Flow) ?? 0),
          5,
          1e-9,
        );
      }),
    );
  });
  it('aged pipe needs more head than new pipe at the same flow', () => {
    const Q = q(40, 'L/s');
    expect(family[2]?.curve.head(Q)).toBeGreaterThan(family[1]?.curve.head(Q) ?? 0);
  });
  it('hot water has less friction than cold at the same flow (lower viscosity)', () => {
    const coldCurve = systemCurve(base);
    expect(family[3]?.curve.head(q(40, 'L/s'))).toBeLessThan(coldCurve.head(q(40, 'L/s')));
  });
  it('names cases, refuses duplicates, and returns the base when there are none', () => {
    expect(family.map((s) => s.name)).toEqual([
      'high suction level',
      'low suction level',
      'low suction level, aged pipe',
      'hot water',
    ]);
    expectHeadflowError(
      () => systemScenarios(base, [{ name: 'a' }, { name: 'a' }]),
      'INVALID_ARGUMENT',
    );
    expect(systemScenarios(base, []).map((s) => s.name)).toEqual(['design']);
  });
});

describe('duty', () => {
  it('gives the head a pump must supply at a flow, with its parts', () => {
    const c = systemCurve(simple([steel(250, 102.3)]));
    const d = dutyFor(c, q(10, 'L/s'));
    expectRelative(d.head, d.staticHead + d.velocityHead + d.lossHead, 1e-15);
    expect(d.head as Length).toBe(c.head(q(10, 'L/s')));
  });
});

describe('fittings, valves and equipment in a run', () => {
  it('fittings add K(Re) V^2/2g with K from the losses catalogue', () => {
    const fittings = [
      { id: 'elbow-90-standard', count: 3 },
      { id: 'gate-valve-open', count: 1 },
    ] as const;
    const bare = systemCurve(simple([steel(50, 77.9)]));
    const fitted = systemCurve(simple([{ ...steel(50, 77.9), fittings }]));
    const set = fittingSet(fittings, q(77.9, 'mm'));
    for (const lps of [0.05, 1, 8, 20]) {
      const flow = lps / 1000;
      const v = flow / ((Math.PI * 0.0779 ** 2) / 4);
      const re = (v * 0.0779) / cold.kinematicViscosity;
      const expected = (set.k(re) * v * v) / (2 * STANDARD_GRAVITY);
      expectRelative(
        fitted.head(q(lps, 'L/s')) - bare.head(q(lps, 'L/s')),
        expected,
        1e-9,
        `${lps} L/s`,
      );
      expectRelative(fitted.details(q(lps, 'L/s')).runs[0]?.fittingsLoss ?? 0, expected, 1e-12);
    }
  });
  it('a valve by Cv, by Kv and by the K they imply give the same head', () => {
    const d = q(52.5, 'mm');
    const k = kFromCv(40, d);
    const byCv = systemCurve(simple([{ ...steel(10, 52.5), valves: [{ cv: 40 }] }]));
    const byK = systemCurve(simple([{ ...steel(10, 52.5), valves: [{ k }] }]));
    const byKv = systemCurve(simple([{ ...steel(10, 52.5), valves: [{ kv: kvFromK(k, d) }] }]));
    expectRelative(byCv.head(q(5, 'L/s')), byK.head(q(5, 'L/s')), 1e-14);
    expectRelative(byKv.head(q(5, 'L/s')), byK.head(q(5, 'L/s')), 1e-12);
    expectHeadflowError(
      () => systemCurve(simple([{ ...steel(10, 52.5), valves: [{ k: -1 }] }])),
      'INVALID_ARGUMENT',
    );
  });
  it('equipment with a rated pressure drop adds its loss, scaled with flow squared', () => {
    const exchanger = ratedLoss({ pressureDrop: q(50, 'kPa'), flow: q(10, 'L/s') });
    const c = systemCurve(
      simple([{ ...steel(10, 77.9), components: [exchanger], elevationChange: q(3, 'm') }]),
    );
    const bare = systemCurve(simple([steel(10, 77.9)]));
    const extra = c.head(q(5, 'L/s')) - bare.head(q(5, 'L/s'));
    expectRelative(extra, 12500 / (cold.density * STANDARD_GRAVITY), 1e-12);
    const run = c.details(q(5, 'L/s')).runs[0];
    expect(run?.elevationChange).toBe(3);
    expectRelative(run?.componentLoss ?? 0, extra, 1e-12);
    expectHeadflowError(
      () => systemCurve(simple([{ ...steel(10, 77.9), elevationChange: Number.NaN as Length }])),
      'INVALID_ARGUMENT',
    );
  });
  it('rejects an impossible endpoint', () => {
    expectHeadflowError(
      () =>
        systemCurve(
          simple([steel(10, 50)], { discharge: { elevation: q(1, 'm'), pressure: q(-1, 'Pa') } }),
        ),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () =>
        systemCurve(
          simple([steel(10, 50)], {
            suction: { elevation: Number.NaN as Length, pressure: STANDARD_ATMOSPHERE },
          }),
        ),
      'INVALID_ARGUMENT',
    );
  });
  it('lists every run of a line, branches included', () => {
    const def = simple([
      steel(1, 50),
      { kind: 'parallel', branches: [[steel(2, 50)], [steel(3, 50), steel(4, 50)]] },
    ]);
    expect(runsOf(def).map((r) => r.length)).toEqual([1, 2, 3, 4]);
    const p = systemCurve(def).details(q(0, 'L/s'));
    expect(p.runs.map((r) => r.flow)).toEqual([0, 0, 0, 0]);
  });
  it('an operating case may change the friction policy', () => {
    const base = simple([steel(100, 52.5)]);
    const [a, b] = systemScenarios(base, [
      { name: 'exact' },
      { name: 'Swamee-Jain', friction: { method: 'swameeJain' } },
    ]);
    expect(a?.curve.head(q(5, 'L/s'))).not.toBe(b?.curve.head(q(5, 'L/s')));
  });
});
