/**
 * A run's friction law (the system's Darcy-Weisbach policy, a stated factor, Hazen-Williams)
 * and its exact derivative dh/dQ, which the network solver needs.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { type FluidState, water } from '../../src/fluids';
import { LOW_FLOW_VELOCITY, type PipeRunInput, pipeRun } from '../../src/network';
import { type LossSlope, runContext, runEvaluator, runLossSlope } from '../../src/network/internal';
import { systemCurve } from '../../src/system';
import { type Flow, q, STANDARD_ATMOSPHERE, STANDARD_GRAVITY } from '../../src/units';
import { expectAbsolute, expectHeadflowError, expectRelative } from '../helpers/expect';

const cold: FluidState = water().at(q(20, 'degC'));
const G = STANDARD_GRAVITY;

function law(input: PipeRunInput, transition: 'conservative' | 'interpolate' = 'interpolate') {
  const ev = runEvaluator(pipeRun(input));
  const ctx = runContext(cold.density, cold.kinematicViscosity, G, { transition });
  const res: LossSlope = { slope: 0 };
  return {
    loss: (flow: number) => runLossSlope(ev, flow, ctx, res),
    slope: (flow: number) => {
      runLossSlope(ev, flow, ctx, res);
      return res.slope;
    },
  };
}

/** Central difference of the loss, relative step 1e-7 (truncation ~1e-14, rounding ~1e-9). */
function numericSlope(loss: (q: number) => number, flow: number): number {
  const h = Math.abs(flow) * 1e-7;
  return (loss(flow + h) - loss(flow - h)) / (2 * h);
}

const base = { length: q(120, 'm'), insideDiameter: q(80, 'mm') };

describe('run friction laws', () => {
  it('refuses a law with both or neither value, and non-positive values', () => {
    expectHeadflowError(
      () => pipeRun({ ...base, friction: { factor: 0.02, hazenWilliamsC: 120 } as never }),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(() => pipeRun({ ...base, friction: {} as never }), 'INVALID_ARGUMENT');
    expectHeadflowError(() => pipeRun({ ...base, friction: { factor: 0 } }), 'INVALID_ARGUMENT');
    expectHeadflowError(
      () => pipeRun({ ...base, friction: { hazenWilliamsC: -1 } }),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(() => pipeRun({ ...base, friction: 3 as never }), 'INVALID_ARGUMENT');
  });

  it('needs no roughness for a stated law, and ages only with an aged value', () => {
    const f = pipeRun({ ...base, friction: { factor: 0.02, agedFactor: 0.03 } }, 1, true);
    expect(f.law).toBe('constant-factor');
    expect(f.lawValue).toBe(0.03);
    expect(pipeRun({ ...base, friction: { factor: 0.02 } }, 1, true).lawValue).toBe(0.02);
    const c = pipeRun(
      { ...base, friction: { hazenWilliamsC: 130, agedHazenWilliamsC: 100 } },
      1,
      true,
    );
    expect(c.law).toBe('hazen-williams');
    expect(c.lawValue).toBe(100);
    expect(pipeRun({ ...base, friction: { hazenWilliamsC: 130 } }, 1, true).lawValue).toBe(130);
  });

  it('gives the Darcy-Weisbach loss with a stated factor, f (L/D) V^2/(2g)', () => {
    // Darcy-Weisbach (F. M. White, "Fluid Mechanics", eq. 6.10), computed here by hand.
    const r = law({ ...base, friction: { factor: 0.021 } });
    const flow = 0.006;
    const v = flow / ((Math.PI * 0.08 * 0.08) / 4);
    expectRelative(r.loss(flow), ((0.021 * 120) / 0.08) * ((v * v) / (2 * G)), 1e-14);
    expectRelative(r.loss(-flow), -r.loss(flow), 0);
  });

  it('gives the Hazen-Williams loss, 10.67 L Q^1.852 / (C^1.852 D^4.8704)', () => {
    // SI Hazen-Williams head form (Williams and Hazen 1905; SI constants from memory, as in
    // tests/reference/hazen-williams.test.ts), computed here by hand.
    const r = law({ ...base, friction: { hazenWilliamsC: 130 } });
    const flow = 0.006;
    expectRelative(
      r.loss(flow),
      (10.67 * 120 * flow ** 1.852) / (130 ** 1.852 * 0.08 ** 4.8704),
      1e-13,
    );
  });

  it('has a derivative equal to the central difference of the loss, for every law', () => {
    const laws: PipeRunInput[] = [
      { ...base, roughness: q(0.045, 'mm') },
      { ...base, roughness: q(0.5, 'mm'), fittings: [{ id: 'elbow-90-long-radius', count: 4 }] },
      { ...base, friction: { factor: 0.02 } },
      { ...base, friction: { hazenWilliamsC: 120 }, valves: [{ k: 2 }] },
    ];
    fc.assert(
      fc.property(
        fc.integer({ min: 0, max: laws.length - 1 }),
        fc.constantFrom('conservative' as const, 'interpolate' as const),
        fc.double({ min: 1e-4, max: 5, noNaN: true }),
        fc.boolean(),
        (i, transition, velocity, negative) => {
          const r = law(laws[i] as PipeRunInput, transition);
          const flow = velocity * ((Math.PI * 0.08 * 0.08) / 4) * (negative ? -1 : 1);
          const re = (velocity * 0.08) / cold.kinematicViscosity;
          // The law is not differentiable at Re 2300 and 4000 (band edges): skip their
          // neighbourhood, where a central difference straddles the kink.
          if (Math.abs(re - 2300) < 1e-3 || Math.abs(re - 4000) < 1e-3) return;
          // Near the low-flow threshold the cubic meets the law with the same slope (C1).
          expectRelative(r.slope(flow), numericSlope(r.loss, flow), 2e-6, `law ${i} Q ${flow}`);
          expect(r.slope(flow)).toBeGreaterThan(0);
        },
      ),
    );
  });

  it('keeps a finite positive slope at zero flow and a continuous, rising loss', () => {
    const hw = law({ ...base, friction: { hazenWilliamsC: 120 } });
    const a = (Math.PI * 0.08 * 0.08) / 4;
    const q0 = LOW_FLOW_VELOCITY * a;
    expect(hw.loss(0)).toBe(0);
    expect(hw.slope(0)).toBeGreaterThan(0);
    expectRelative(hw.loss(q0 * (1 - 1e-12)), hw.loss(q0 * (1 + 1e-12)), 1e-10);
    expectRelative(hw.slope(q0 * (1 - 1e-12)), hw.slope(q0 * (1 + 1e-12)), 1e-9);
    let last = -1;
    for (let k = 0; k <= 100; k++) {
      const h = hw.loss((q0 * k) / 50);
      expect(h).toBeGreaterThan(last);
      last = h;
    }
  });

  it('is the law systemCurve uses', () => {
    const run: PipeRunInput = { ...base, friction: { hazenWilliamsC: 130 } };
    const curve = systemCurve({
      fluid: cold,
      suction: { elevation: q(0, 'm'), pressure: STANDARD_ATMOSPHERE },
      discharge: { elevation: q(10, 'm'), pressure: STANDARD_ATMOSPHERE },
      runs: [run],
    });
    const r = law(run, 'conservative');
    expectRelative(curve.head(0.005 as Flow), 10 + r.loss(0.005), 1e-15);
    const d = curve.details(0.005 as Flow).runs[0];
    expectRelative(d?.totalLoss ?? 0, r.loss(0.005), 1e-15);
    // The details (and the JSON report built from them) name the law.
    expect(d?.law).toBe('hazen-williams');
    expect(d?.lawValue).toBe(130);
  });
});

describe('friction factor with its slope in Re', () => {
  it('equals frictionFactor, with a slope equal to the central difference, in every regime', async () => {
    const { frictionPolicy, frictionWithSlope } = await import('../../src/friction/slope');
    const { frictionFactor } = await import('../../src/friction');
    const out = { f: 0, dfdRe: 0 };
    for (const options of [
      undefined,
      { transition: 'interpolate' as const },
      { method: 'chen' as const, transition: 'conservative' as const },
    ]) {
      const p = frictionPolicy(options);
      for (const re of [500, 2000, 2500, 3000, 3900, 5000, 1e5, 1e7]) {
        for (const rr of [0, 1e-4, 0.01]) {
          frictionWithSlope(p, re, rr, out);
          expectRelative(out.f, frictionFactor(re, rr, options), 1e-15, `Re ${re}`);
          const h = re * 1e-7;
          const fd =
            (frictionFactor(re + h, rr, options) - frictionFactor(re - h, rr, options)) / (2 * h);
          // Central difference: truncation ~1e-14, rounding ~1e-16 / 1e-7 of f/Re (the
          // slope's natural scale; in fully rough flow the slope itself nearly vanishes).
          expectAbsolute(out.dfdRe, fd, (1e-6 * out.f) / re, `Re ${re} eps/D ${rr}`);
        }
      }
    }
  });
});
