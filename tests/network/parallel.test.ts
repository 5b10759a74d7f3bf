/**
 * Parallel groups of systems are split by the network core's global gradient step: the same
 * answer as solveNetwork on the same layout, a bounded number of steps, and a stated rule
 * for a branch that sits on the friction jump of the 'conservative' transition rule.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { water } from '../../src/fluids';
import { type NetworkLink, type NetworkNode, pipeRun, solveNetwork } from '../../src/network';
import {
  parallelGroup,
  parallelSplit,
  runContext,
  runEvaluator,
  runLoss,
} from '../../src/network/internal';
import { type PipeRunInput, systemCurve } from '../../src/system';
import { type Flow, q, STANDARD_ATMOSPHERE, STANDARD_GRAVITY } from '../../src/units';
import { expectAbsolute, expectRelative } from '../helpers/expect';

const fluid = water().at(q(15, 'degC'));
const NU = fluid.kinematicViscosity;

const arbRun = fc.record({
  length: fc.double({ min: 5, max: 300, noNaN: true }),
  d: fc.double({ min: 0.05, max: 0.2, noNaN: true }),
  eps: fc.double({ min: 0, max: 5e-4, noNaN: true }),
});
const asRun = (r: { length: number; d: number; eps: number }): PipeRunInput => ({
  length: q(r.length, 'm'),
  insideDiameter: q(r.d, 'm'),
  roughness: q(r.eps, 'm'),
});

describe('parallel groups', () => {
  it('systemCurve with a parallel group equals solveNetwork on the same layout (1e-9 m)', () => {
    fc.assert(
      fc.property(
        fc.array(fc.array(arbRun, { minLength: 1, maxLength: 3 }), { minLength: 2, maxLength: 5 }),
        fc.double({ min: 1e-4, max: 0.02, noNaN: true }),
        (branches, total) => {
          const curve = systemCurve({
            fluid,
            suction: { elevation: q(0, 'm'), pressure: STANDARD_ATMOSPHERE },
            discharge: { elevation: q(0, 'm'), pressure: STANDARD_ATMOSPHERE },
            runs: [{ kind: 'parallel', branches: branches.map((b) => b.map(asRun)) }],
            friction: { transition: 'interpolate' },
          });
          // The same group as a network: a surface feeding node A, branches of runs in
          // series to node B, which draws the total.
          const nodes: NetworkNode[] = [
            { id: 'A', elevation: q(0, 'm'), surface: {} },
            { id: 'B', elevation: q(0, 'm'), demand: total as Flow },
          ];
          const links: NetworkLink[] = [];
          branches.forEach((b, i) => {
            b.forEach((r, j) => {
              const from = j === 0 ? 'A' : `b${i}_${j}`;
              const to = j === b.length - 1 ? 'B' : `b${i}_${j + 1}`;
              if (to !== 'B') nodes.push({ id: to, elevation: q(0, 'm') });
              links.push({ id: `r${i}_${j}`, from, to, run: asRun(r) });
            });
          });
          // 1e-10 m per link keeps a path of up to 3 runs well inside 1e-9 m.
          const sol = solveNetwork({ fluid, nodes, links }, { headTolerance: 1e-10 });
          const drop = (sol.nodes['A']?.head ?? 0) - (sol.nodes['B']?.head ?? 0);
          // 1e-9 m, or 1e-12 of the loss where a drawn layout loses hundreds of metres.
          const tol = 1e-9 + 1e-12 * Math.abs(drop);
          expectAbsolute(curve.head(total as Flow), drop, tol, `${branches.length} branches`);
        },
      ),
      { numRuns: 60 },
    );
  });

  it('needs at most 6 steps per evaluation along a sweep of flows', () => {
    const branches = Array.from({ length: 10 }, (_, i) => [
      runEvaluator(pipeRun(asRun({ length: 30 + 10 * i, d: 0.08 + 0.01 * i, eps: 4.5e-5 }))),
    ]);
    for (const transition of ['interpolate', 'conservative'] as const) {
      const g = parallelGroup(branches);
      const ctx = runContext(fluid.density, NU, STANDARD_GRAVITY, { transition });
      const flows = new Float64Array(10);
      let worst = 0;
      for (let i = 0; i < 200; i++) {
        parallelSplit(g, 0.001 + 0.0005 * i, ctx, flows);
        worst = Math.max(worst, g.lastIterations);
      }
      expect(worst, transition).toBeLessThanOrEqual(6);
    }
  });

  it("pins a branch on the 'conservative' jump with the common loss inside its jump", () => {
    // Two branches; over the flows drawn either may pass Re 2300.
    const diameters = [0.03, 0.1];
    const evs = diameters.map((d) => [
      runEvaluator(pipeRun(asRun({ length: 50, d, eps: 4.5e-5 }))),
    ]);
    const ctx = runContext(fluid.density, NU, STANDARD_GRAVITY, undefined);
    let pinned = 0;
    fc.assert(
      fc.property(fc.double({ min: 1e-5, max: 0.03, noNaN: true }), (total) => {
        const g = parallelGroup(evs);
        const flows = new Float64Array(2);
        const h = parallelSplit(g, total, ctx, flows);
        expectRelative((flows[0] ?? 0) + (flows[1] ?? 0), total, 1e-12);
        diameters.forEach((d, i) => {
          const ev = evs[i]?.[0] as never;
          const flow = flows[i] ?? 0;
          // Re 2300 at Q = 2300 nu pi D / 4.
          const jump = (2300 * NU * Math.PI * d) / 4;
          if (Math.abs(flow - jump) <= 1e-12 * jump) {
            pinned++;
            const lo = runLoss(ev, jump * (1 - 1e-9), ctx);
            const hi = runLoss(ev, jump * (1 + 1e-9), ctx);
            expect(h).toBeGreaterThanOrEqual(lo - 1e-12);
            expect(h).toBeLessThanOrEqual(hi + 1e-12);
          } else {
            // Free branches agree to the split's criterion, 1e-13 of the loss plus 1e-15 m.
            expectAbsolute(runLoss(ev, flow, ctx), h, 2e-13 * h + 2e-15);
          }
        });
      }),
      { numRuns: 300 },
    );
    expect(pinned).toBeGreaterThan(0);
  });
});
