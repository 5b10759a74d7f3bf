/**
 * solveNetwork: invariants checked independently on every solved network (continuity at every
 * junction, Darcy-Weisbach with a Colebrook factor solved here, the pump's head at its flow),
 * laws that must hold over random trees and looped networks, states of valves and pumps,
 * operating cases, and every refusal with its code and ids.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { type FluidState, water } from '../../src/fluids';
import {
  applyNetworkCase,
  type NetworkDefinition,
  type NetworkLink,
  type NetworkNode,
  type NetworkSolution,
  outletCoefficient,
  prepareNetwork,
  solveNetwork,
} from '../../src/network';
import { operatingPoint } from '../../src/pumps';
import { systemCurve } from '../../src/system';
import {
  type Flow,
  type Pressure,
  q,
  STANDARD_ATMOSPHERE,
  STANDARD_GRAVITY,
} from '../../src/units';
import { expectAbsolute, expectHeadflowError, expectRelative } from '../helpers/expect';
import { quadraticPump } from '../pumps/fixtures';

const fluid: FluidState = water().at(q(15, 'degC'));
const G = STANDARD_GRAVITY;
const NU = fluid.kinematicViscosity;

/** Colebrook solved here by plain fixed-point iteration on 1/sqrt(f), 200 steps. */
function colebrookReference(re: number, rr: number): number {
  let x = 8;
  for (let i = 0; i < 200; i++) x = -2 * Math.log10(rr / 3.7 + (2.51 * x) / re);
  return 1 / (x * x);
}

/**
 * Darcy-Weisbach loss (m) of a plain run (no fittings) at |Q|, with the network's stated
 * transition rule: 64/Re to Re 2300, Colebrook from 4000, linear in Re between (F. M. White,
 * "Fluid Mechanics", eq. 6.10 for the loss; Colebrook 1939 for f).
 */
function darcyReference(
  length: number,
  d: number,
  eps: number,
  flow: number,
  rule: 'interpolate' | 'conservative' = 'interpolate',
): number {
  const qa = Math.abs(flow);
  if (qa === 0) return 0;
  const a = (Math.PI * d * d) / 4;
  const v = qa / a;
  const re = (v * d) / NU;
  let f: number;
  if (re <= 2300) f = 64 / re;
  else if (re >= 4000) f = colebrookReference(re, eps / d);
  else if (rule === 'conservative') f = Math.max(64 / re, colebrookReference(re, eps / d));
  else {
    const fl = 64 / 2300;
    const ft = colebrookReference(4000, eps / d);
    f = fl + ((ft - fl) * (re - 2300)) / 1700;
  }
  const h = ((f * length) / d) * ((v * v) / (2 * G));
  return flow < 0 ? -h : h;
}

interface Plain {
  readonly length: number;
  readonly d: number;
  readonly eps: number;
}

function plainRun(p: Plain) {
  return { length: q(p.length, 'm'), insideDiameter: q(p.d, 'm'), roughness: q(p.eps, 'm') };
}

/**
 * The invariants of a solution, computed here: continuity at every junction (to 1e-10 of the
 * largest flow: the solver meets 1e-12 plus the heads' rounding), the Darcy-Weisbach loss of
 * every open plain run (to 1e-8 m: the solver's 1e-9 m plus the reference's own rounding),
 * and head = elevation + (p - 0)/(rho g) on the absolute basis.
 */
function checkInvariants(def: NetworkDefinition, sol: NetworkSolution): void {
  const rule = def.friction?.transition === 'conservative' ? 'conservative' : 'interpolate';
  const net = new Map<string, number>();
  let maxQ = 0;
  for (const n of def.nodes) net.set(n.id, 'demand' in n ? -(n.demand ?? 0) : 0);
  for (const l of def.links) {
    const r = sol.links[l.id];
    expect(r, l.id).toBeDefined();
    const flow = r?.flow ?? 0;
    maxQ = Math.max(maxQ, Math.abs(flow));
    net.set(l.from, (net.get(l.from) ?? 0) - flow);
    net.set(l.to, (net.get(l.to) ?? 0) + flow);
    const hl = r?.headLoss ?? 0;
    const nodeFrom = sol.nodes[l.from];
    const nodeTo = sol.nodes[l.to];
    expectAbsolute(hl, (nodeFrom?.head ?? 0) - (nodeTo?.head ?? 0), 1e-12, `${l.id} head loss`);
    if ('run' in l && r?.state === 'open') {
      const run = l.run;
      const ref = darcyReference(
        run.length,
        run.insideDiameter as number,
        run.roughness as number,
        flow,
        rule,
      );
      expectAbsolute(hl, ref, 1e-8, `${l.id} Darcy-Weisbach at ${flow} m3/s`);
    }
    if ('run' in l && r?.state === 'pinned') {
      // Held at Re 2300, with the head across it inside the jump: between the laminar loss
      // and the conservative turbulent loss at that flow.
      const d = l.run.insideDiameter as number;
      const jump = (2300 * NU * Math.PI * d) / 4;
      expectRelative(Math.abs(flow), jump, 1e-9, `${l.id} pinned flow`);
      const args = [l.run.length, d, l.run.roughness as number] as const;
      const signed = flow < 0 ? -jump : jump;
      const a = darcyReference(...args, signed * (1 - 1e-12), rule);
      const b = darcyReference(...args, signed * (1 + 1e-12), rule);
      expect(hl).toBeGreaterThanOrEqual(Math.min(a, b) - 1e-8);
      expect(hl).toBeLessThanOrEqual(Math.max(a, b) + 1e-8);
    }
  }
  for (const n of def.nodes) {
    const s = sol.nodes[n.id];
    expectRelative(
      s?.head ?? 0,
      (n.elevation as number) + (s?.pressure ?? 0) / (fluid.density * G),
      1e-14,
      `${n.id} head`,
    );
    if (!('surface' in n) && !('outlet' in n)) {
      expectAbsolute(net.get(n.id) ?? 0, 0, 1e-10 * maxQ + 1e-18, `${n.id} continuity`);
    }
  }
}

/** A random connected network: a spanning tree plus `extra` loop links, one surface. */
function randomNetwork(
  nodeCount: number,
  extra: number,
  seed: number,
): { def: NetworkDefinition; plains: Map<string, Plain> } {
  let s = seed >>> 0 || 1;
  const rnd = (): number => {
    s = (Math.imul(s, 1664525) + 1013904223) >>> 0;
    return s / 4294967296;
  };
  const nodes: NetworkNode[] = [{ id: 'src', elevation: q(40 + 20 * rnd(), 'm'), surface: {} }];
  for (let i = 1; i < nodeCount; i++) {
    nodes.push({ id: `j${i}`, elevation: q(20 * rnd(), 'm'), demand: q(0.5 * rnd(), 'L/s') });
  }
  const id = (i: number) => (i === 0 ? 'src' : `j${i}`);
  const links: NetworkLink[] = [];
  const plains = new Map<string, Plain>();
  const add = (a: number, b: number): void => {
    const p: Plain = { length: 10 + 490 * rnd(), d: 0.1 + 0.2 * rnd(), eps: 1e-5 + 5e-4 * rnd() };
    const lid = `p${links.length}`;
    plains.set(lid, p);
    links.push({ id: lid, from: id(a), to: id(b), run: plainRun(p) });
  };
  for (let i = 1; i < nodeCount; i++) add(Math.floor(rnd() * i), i);
  for (let e = 0; e < extra; e++) {
    const a = Math.floor(rnd() * nodeCount);
    let b = Math.floor(rnd() * nodeCount);
    if (b === a) b = (a + 1) % nodeCount;
    add(a, b);
  }
  return { def: { fluid, nodes, links }, plains };
}

const arbNetwork = fc
  .record({
    nodes: fc.integer({ min: 2, max: 120 }),
    loops: fc.integer({ min: 0, max: 80 }),
    seed: fc.integer({ min: 1, max: 2 ** 31 - 1 }),
  })
  .filter((r) => r.nodes - 1 + r.loops >= 2 && r.nodes - 1 + r.loops <= 200);

describe('solveNetwork: a single line', () => {
  it('delivers the demand and loses the Darcy-Weisbach head', () => {
    const def: NetworkDefinition = {
      fluid,
      nodes: [
        { id: 'tank', elevation: q(30, 'm'), surface: {} },
        { id: 'tap', elevation: q(0, 'm'), demand: q(5, 'L/s') },
      ],
      links: [
        { id: 'main', from: 'tank', to: 'tap', run: plainRun({ length: 500, d: 0.1, eps: 5e-5 }) },
      ],
    };
    const sol = solveNetwork(def);
    expectRelative(sol.links['main']?.flow ?? 0, 0.005, 1e-12);
    checkInvariants(def, sol);
    expect(sol.nodes['tank']?.outflow).toBeCloseTo(-0.005, 15);
    expect(sol.headResidual).toBeLessThanOrEqual(1e-9);
    expect(sol.flowResidual).toBeLessThanOrEqual(1e-12);
    expect(sol.iterations).toBeLessThanOrEqual(10);
    expectRelative(sol.nodes['tank']?.pressure ?? 0, STANDARD_ATMOSPHERE, 1e-12);
  });

  it('equals systemCurve on the same layout to 1e-9 m (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.array(
          fc.record({
            // A link whose loss is a millionth of the heads (a metre of 400 mm pipe at a
            // trickle) has its flow fixed by the heads only to their rounding: not drawn here.
            length: fc.double({ min: 5, max: 800, noNaN: true }),
            d: fc.double({ min: 0.02, max: 0.2, noNaN: true }),
            eps: fc.double({ min: 0, max: 1e-3, noNaN: true }),
          }),
          { minLength: 1, maxLength: 8 },
        ),
        fc.double({ min: 1e-5, max: 0.05, noNaN: true }),
        (runs, demand) => {
          const nodes: NetworkNode[] = [{ id: 'n0', elevation: q(100, 'm'), surface: {} }];
          const links: NetworkLink[] = [];
          runs.forEach((r, i) => {
            nodes.push({ id: `n${i + 1}`, elevation: q(100 - 5 * (i + 1), 'm') });
            links.push({ id: `r${i}`, from: `n${i}`, to: `n${i + 1}`, run: plainRun(r) });
          });
          const last = nodes[nodes.length - 1] as NetworkNode;
          nodes[nodes.length - 1] = { ...last, demand: demand as Flow };
          // Each link balances to headTolerance, so a path of k links to k times it: 1e-10 per
          // link keeps a line of up to 8 runs within 1e-9 m of systemCurve.
          // Each link's loss must stand well above the heads' rounding (a run losing a
          // millionth of the heads has its flow fixed by them only to about 1e-9): skip
          // lines with a run losing less than 1 mm.
          for (const r of runs) fc.pre(darcyReference(r.length, r.d, r.eps, demand) > 1e-3);
          const sol = solveNetwork({ fluid, nodes, links }, { headTolerance: 1e-10 });
          const end = sol.nodes[last.id];
          // Only physical results: the line must keep a positive absolute pressure.
          fc.pre((end?.pressure ?? 0) > 1000);
          const curve = systemCurve({
            fluid,
            suction: { elevation: q(100, 'm'), pressure: STANDARD_ATMOSPHERE },
            discharge: {
              elevation: last.elevation,
              pressure: end?.pressure ?? STANDARD_ATMOSPHERE,
            },
            runs: runs.map(plainRun),
            friction: { transition: 'interpolate' },
          });
          // The pump head the line needs at the demand is zero: the surface drives it.
          expectAbsolute(curve.head(demand as Flow), 0, 1e-9, `${runs.length} runs`);
        },
      ),
      { numRuns: 60 },
    );
  });
});

describe('solveNetwork: random trees and looped networks (fast-check, 2-200 links)', () => {
  it('converges, and every solution keeps continuity and the Darcy-Weisbach law', () => {
    fc.assert(
      fc.property(arbNetwork, ({ nodes, loops, seed }) => {
        const { def } = randomNetwork(nodes, loops, seed);
        const sol = solveNetwork(def);
        expect(sol.iterations).toBeLessThanOrEqual(20);
        checkInvariants(def, sol);
      }),
      { numRuns: 40 },
    );
  });

  it("with the 'conservative' jump: converges, runs on the jump are pinned there", () => {
    fc.assert(
      fc.property(arbNetwork, fc.double({ min: 0.002, max: 0.05, noNaN: true }), (r, scale) => {
        const { def } = randomNetwork(r.nodes, r.loops, r.seed);
        // Small demands put many runs near Re 2300.
        const slow: NetworkDefinition = {
          ...def,
          friction: { transition: 'conservative' },
          nodes: def.nodes.map((n) =>
            'demand' in n ? { ...n, demand: ((n.demand ?? 0) * scale) as Flow } : n,
          ),
        };
        checkInvariants(slow, solveNetwork(slow));
      }),
      { numRuns: 40 },
    );
  });

  it("with the 'conservative' jump: a 12 x 12 grid at low demand pins runs on the jump", () => {
    const nodes: NetworkNode[] = [];
    const links: NetworkLink[] = [];
    const k = 12;
    for (let i = 0; i < k; i++) {
      for (let j = 0; j < k; j++) {
        const id = `n${i}_${j}`;
        if (i === 0 && j === 0) nodes.push({ id, elevation: q(50, 'm'), surface: {} });
        else nodes.push({ id, elevation: q((i + j) * 0.01, 'm'), demand: q(0.2, 'L/s') });
      }
    }
    for (let i = 0; i < k; i++) {
      for (let j = 0; j < k; j++) {
        const run = plainRun({ length: 100 + ((i * 7 + j * 13) % 50), d: 0.15, eps: 5e-5 });
        if (j + 1 < k)
          links.push({ id: `h${i}_${j}`, from: `n${i}_${j}`, to: `n${i}_${j + 1}`, run });
        if (i + 1 < k)
          links.push({ id: `v${i}_${j}`, from: `n${i}_${j}`, to: `n${i + 1}_${j}`, run });
      }
    }
    const def: NetworkDefinition = {
      fluid,
      nodes,
      links,
      friction: { transition: 'conservative' },
    };
    const sol = solveNetwork(def);
    expect(Object.values(sol.links).filter((l) => l.state === 'pinned').length).toBeGreaterThan(0);
    expect(sol.iterations).toBeLessThanOrEqual(20);
    checkInvariants(def, sol);
  });

  it('more demand at one junction never raises any head', () => {
    fc.assert(
      fc.property(arbNetwork, fc.double({ min: 1e-4, max: 5e-3, noNaN: true }), (r, extra) => {
        const { def } = randomNetwork(r.nodes, r.loops, r.seed);
        const k = 1 + (r.seed % (r.nodes - 1));
        const before = prepareNetwork(def);
        const id = `j${k}`;
        const node = def.nodes[k] as { demand?: Flow };
        const base = before.solve();
        const more = before.solve({ demands: { [id]: ((node.demand ?? 0) + extra) as Flow } });
        for (const n of def.nodes) {
          // Heads agree to the 1e-9 m balance of each solve; allow 1e-8 m.
          expect(more.nodes[n.id]?.head ?? 0).toBeLessThanOrEqual(
            (base.nodes[n.id]?.head ?? 0) + 1e-8,
          );
        }
      }),
      { numRuns: 30 },
    );
  });

  it("reversing a link's direction flips the sign of its flow only", () => {
    fc.assert(
      fc.property(arbNetwork, fc.nat(), (r, pick) => {
        const { def } = randomNetwork(r.nodes, r.loops, r.seed);
        const k = pick % def.links['length'];
        const link = def.links[k] as NetworkLink;
        const flipped: NetworkDefinition = {
          ...def,
          links: def.links['map']((l, i) => (i === k ? { ...l, from: link.to, to: link.from } : l)),
        };
        const a = solveNetwork(def);
        const b = solveNetwork(flipped);
        // Flows agree to what a 1e-9 m head balance on each solve fixes: a link's loss rises at
        // least as fast as h/Q, so |dQ| <= 2e-9 m * Q / h (plus rounding, 1e-12 of the largest).
        let maxQ = 0;
        for (const l of def.links) maxQ = Math.max(maxQ, Math.abs(a.links[l.id]?.flow ?? 0));
        for (const l of def.links) {
          const fa = a.links[l.id]?.flow ?? 0;
          const fb = b.links[l.id]?.flow ?? 0;
          const h = Math.abs(a.links[l.id]?.headLoss ?? 0);
          const tol = (h > 0 ? (2e-9 * Math.abs(fa)) / h : maxQ) + 1e-12 * maxQ;
          expectAbsolute(l.id === link.id ? -fb : fb, fa, tol, l.id);
        }
        for (const n of def.nodes) {
          const h = a.nodes[n.id]?.head ?? 0;
          expectAbsolute(b.nodes[n.id]?.head ?? 0, h, 1e-8 + 1e-10 * Math.abs(h), n.id);
        }
      }),
      { numRuns: 30 },
    );
  });

  it('a symmetric network gives symmetric flows', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 20, max: 400, noNaN: true }),
        fc.double({ min: 0.05, max: 0.3, noNaN: true }),
        fc.double({ min: 1e-4, max: 0.02, noNaN: true }),
        (length, d, demand) => {
          const p = plainRun({ length, d, eps: 4.5e-5 });
          const def: NetworkDefinition = {
            fluid,
            nodes: [
              { id: 'tank', elevation: q(50, 'm'), surface: {} },
              { id: 'hub', elevation: q(0, 'm') },
              { id: 'left', elevation: q(2, 'm'), demand: demand as Flow },
              { id: 'right', elevation: q(2, 'm'), demand: demand as Flow },
            ],
            links: [
              {
                id: 'main',
                from: 'tank',
                to: 'hub',
                run: plainRun({ length: 100, d: 0.3, eps: 4.5e-5 }),
              },
              { id: 'a', from: 'hub', to: 'left', run: p },
              { id: 'b', from: 'hub', to: 'right', run: p },
              { id: 'tie', from: 'left', to: 'right', run: p },
            ],
          };
          const sol = solveNetwork(def);
          // Each link balances to 1e-9 m, which fixes a flow to 2e-9 m * Q / h (h its loss).
          const qa = sol.links['a']?.flow ?? 0;
          const tol = (2e-9 * qa) / (sol.links['a']?.headLoss ?? 1) + 1e-12 * qa;
          expectAbsolute(sol.links['b']?.flow ?? 0, qa, tol);
          expectAbsolute(sol.links['tie']?.flow ?? 1, 0, tol);
          checkInvariants(def, sol);
        },
      ),
      { numRuns: 40 },
    );
  });
});

describe('solveNetwork: stated laws and closed forms', () => {
  it('splits flow between parallel pipes of stated factor as sqrt(D^5 / (f L))', () => {
    // Darcy-Weisbach with constant f: equal head loss gives Q ~ sqrt(D^5/(f L)) (White,
    // "Fluid Mechanics", section 6.9, parallel pipes).
    const def: NetworkDefinition = {
      fluid,
      nodes: [
        { id: 'tank', elevation: q(20, 'm'), surface: {} },
        { id: 'a', elevation: q(0, 'm') },
        { id: 'b', elevation: q(0, 'm'), demand: q(40, 'L/s') },
      ],
      links: [
        {
          id: 'feed',
          from: 'tank',
          to: 'a',
          run: { length: q(10, 'm'), insideDiameter: q(300, 'mm'), friction: { factor: 0.015 } },
        },
        {
          id: 'p1',
          from: 'a',
          to: 'b',
          run: { length: q(300, 'm'), insideDiameter: q(150, 'mm'), friction: { factor: 0.02 } },
        },
        {
          id: 'p2',
          from: 'a',
          to: 'b',
          run: { length: q(500, 'm'), insideDiameter: q(200, 'mm'), friction: { factor: 0.025 } },
        },
      ],
    };
    const sol = solveNetwork(def);
    const ratio = Math.sqrt(0.15 ** 5 / (0.02 * 300)) / Math.sqrt(0.2 ** 5 / (0.025 * 500));
    expectRelative((sol.links['p1']?.flow ?? 0) / (sol.links['p2']?.flow ?? 1), ratio, 1e-9);
    expectRelative((sol.links['p1']?.flow ?? 0) + (sol.links['p2']?.flow ?? 0), 0.04, 1e-12);
  });

  it('splits flow between Hazen-Williams pipes as (C D^4.8704 / L)^0.54', () => {
    // Hazen-Williams h = 10.67 L Q^1.852 / (C^1.852 D^4.8704): equal h gives
    // Q ~ C D^(4.8704/1.852) L^(-1/1.852) (Williams and Hazen 1905, SI form from memory).
    const def: NetworkDefinition = {
      fluid,
      nodes: [
        { id: 'tank', elevation: q(20, 'm'), surface: {} },
        { id: 'b', elevation: q(0, 'm'), demand: q(30, 'L/s') },
      ],
      links: [
        {
          id: 'p1',
          from: 'tank',
          to: 'b',
          run: {
            length: q(400, 'm'),
            insideDiameter: q(150, 'mm'),
            friction: { hazenWilliamsC: 130 },
          },
        },
        {
          id: 'p2',
          from: 'tank',
          to: 'b',
          run: {
            length: q(250, 'm'),
            insideDiameter: q(100, 'mm'),
            friction: { hazenWilliamsC: 100 },
          },
        },
      ],
    };
    const sol = solveNetwork(def);
    const w = (c: number, d: number, l: number) => c * d ** (4.8704 / 1.852) * l ** (-1 / 1.852);
    expectRelative(
      (sol.links['p1']?.flow ?? 0) / (sol.links['p2']?.flow ?? 1),
      w(130, 0.15, 400) / w(100, 0.1, 250),
      1e-9,
    );
  });

  it('an outlet discharges k p^n at its solved pressure', () => {
    const k = outletCoefficient(q(80, 'L/min'), q(1, 'bar'));
    expectRelative(k, 80 / 60000 / Math.sqrt(1e5), 1e-14);
    const def: NetworkDefinition = {
      fluid,
      nodes: [
        { id: 'tank', elevation: q(40, 'm'), surface: {} },
        { id: 'head', elevation: q(0, 'm'), outlet: { coefficient: k } },
      ],
      links: [
        {
          id: 'pipe',
          from: 'tank',
          to: 'head',
          run: plainRun({ length: 60, d: 0.025, eps: 1.5e-6 }),
        },
      ],
    };
    const sol = solveNetwork(def);
    const gauge = (sol.nodes['head']?.pressure ?? 0) - STANDARD_ATMOSPHERE;
    expectRelative(sol.links['pipe']?.flow ?? 0, k * Math.sqrt(gauge), 1e-9);
    expectRelative(sol.nodes['head']?.outflow ?? 0, sol.links['pipe']?.flow ?? 0, 1e-12);
    checkInvariants(def, sol);
  });
});

describe('solveNetwork: pumps and valves', () => {
  const pump = quadraticPump(); // H = 40 - 0.001 Q^2 (Q in m3/h), 0..180 m3/h, 1750 rpm
  const lift = (extra: Partial<NetworkLink> = {}, upper = 20): NetworkDefinition => ({
    fluid,
    nodes: [
      { id: 'sump', elevation: q(0, 'm'), surface: {} },
      { id: 'suction', elevation: q(0, 'm') },
      { id: 'discharge', elevation: q(0, 'm') },
      { id: 'tank', elevation: q(upper, 'm'), surface: {} },
    ],
    links: [
      { id: 'in', from: 'sump', to: 'suction', run: plainRun({ length: 5, d: 0.15, eps: 4.5e-5 }) },
      { id: 'pump', from: 'suction', to: 'discharge', pump, ...extra } as NetworkLink,
      {
        id: 'out',
        from: 'discharge',
        to: 'tank',
        run: plainRun({ length: 300, d: 0.125, eps: 4.5e-5 }),
      },
    ],
  });

  it('runs at the pump curve and system curve crossing (operatingPoint of the pumps module)', () => {
    const def = lift();
    const sol = solveNetwork(def);
    const flow = sol.links['pump']?.flow ?? 0;
    expectAbsolute(-(sol.links['pump']?.headLoss ?? 0), pump.head(flow as Flow), 1e-8, 'pump head');
    checkInvariants(def, sol);
    const curve = systemCurve({
      fluid,
      suction: { elevation: q(0, 'm'), pressure: STANDARD_ATMOSPHERE },
      discharge: { elevation: q(20, 'm'), pressure: STANDARD_ATMOSPHERE },
      runs: [
        plainRun({ length: 5, d: 0.15, eps: 4.5e-5 }),
        plainRun({ length: 300, d: 0.125, eps: 4.5e-5 }),
      ],
      friction: { transition: 'interpolate' },
    });
    expectRelative(flow, operatingPoint(pump, curve).flow, 1e-8);
  });

  it('scales by the affinity laws and combines identical pumps', () => {
    const slow = solveNetwork(lift({ speed: q(1450, 'rpm') } as Partial<NetworkLink>));
    const r = 1450 / 1750;
    const f = slow.links['pump']?.flow ?? 0;
    expectAbsolute(-(slow.links['pump']?.headLoss ?? 0), r * r * pump.head((f / r) as Flow), 1e-8);
    const two = solveNetwork(lift({ count: 2, arrangement: 'parallel' } as Partial<NetworkLink>));
    const f2 = two.links['pump']?.flow ?? 0;
    expectAbsolute(-(two.links['pump']?.headLoss ?? 0), pump.head((f2 / 2) as Flow), 1e-8);
    const series = solveNetwork(
      lift({ count: 2, arrangement: 'series' } as Partial<NetworkLink>, 60),
    );
    const fs = series.links['pump']?.flow ?? 0;
    expectAbsolute(-(series.links['pump']?.headLoss ?? 0), 2 * pump.head(fs as Flow), 1e-8);
  });

  it('shuts a pump off when the static head exceeds its shut-off head, and says so', () => {
    const sol = solveNetwork(lift({}, 45));
    expect(sol.links['pump']?.state).toBe('shut');
    expect(sol.links['pump']?.flow).toBe(0);
    expect(sol.links['pump']?.pumpHead).toBe(0);
  });

  it('refuses a solution past the pump curve, naming the link', () => {
    const def = lift({}, -30);
    const err = expectHeadflowError(() => solveNetwork(def), 'OUT_OF_RANGE');
    expect(err.message).toContain("'pump'");
  });

  it('a check valve stops reverse flow', () => {
    const def: NetworkDefinition = {
      fluid,
      nodes: [
        { id: 'low', elevation: q(5, 'm'), surface: {} },
        { id: 'high', elevation: q(15, 'm'), surface: {} },
      ],
      links: [
        {
          id: 'cv',
          from: 'low',
          to: 'high',
          checkValve: true,
          run: plainRun({ length: 50, d: 0.1, eps: 4.5e-5 }),
        },
      ],
    };
    const sol = solveNetwork(def);
    expect(sol.links['cv']?.state).toBe('shut');
    expect(sol.links['cv']?.flow).toBe(0);
    const forward = solveNetwork({
      ...def,
      links: [{ ...(def.links[0] as NetworkLink), from: 'high', to: 'low' }],
    });
    expect(forward.links['cv']?.state).toBe('open');
    expect(forward.links['cv']?.flow ?? 0).toBeGreaterThan(0);
  });

  const valveNet = (
    valve: NetworkLink['id'] extends string ? object : never,
    upper = 60,
  ): NetworkDefinition => ({
    fluid,
    nodes: [
      { id: 'tank', elevation: q(upper, 'm'), surface: {} },
      { id: 'in', elevation: q(0, 'm') },
      { id: 'out', elevation: q(0, 'm') },
      { id: 'user', elevation: q(0, 'm'), demand: q(8, 'L/s') },
    ],
    links: [
      { id: 'feed', from: 'tank', to: 'in', run: plainRun({ length: 200, d: 0.15, eps: 4.5e-5 }) },
      { id: 'valve', from: 'in', to: 'out', valve } as unknown as NetworkLink,
      {
        id: 'branch',
        from: 'out',
        to: 'user',
        run: plainRun({ length: 100, d: 0.1, eps: 4.5e-5 }),
      },
    ],
  });

  it('a pressure-reducing valve holds its outlet pressure, or opens when it cannot', () => {
    const setting = STANDARD_ATMOSPHERE + 2e5;
    const sol = solveNetwork(
      valveNet({ kind: 'pressure-reducing', setting, diameter: q(100, 'mm'), openK: 5 }),
    );
    expect(sol.links['valve']?.state).toBe('active');
    expectRelative(sol.nodes['out']?.pressure ?? 0, setting, 1e-12);
    expectRelative(sol.links['valve']?.flow ?? 0, 0.008, 1e-10);
    const low = solveNetwork(
      valveNet({ kind: 'pressure-reducing', setting, diameter: q(100, 'mm'), openK: 5 }, 15),
    );
    expect(low.links['valve']?.state).toBe('open');
    expect(low.nodes['out']?.pressure ?? 0).toBeLessThan(setting);
    // Open: the valve loses openK V^2/(2g).
    const v = 0.008 / ((Math.PI * 0.1 * 0.1) / 4);
    expectRelative(low.links['valve']?.headLoss ?? 0, (5 * v * v) / (2 * G), 1e-9);
  });

  it('a pressure-sustaining valve holds its inlet pressure', () => {
    // A user upstream keeps 5 bar (gauge) while the valve lets the rest run to a low tank.
    const setting = STANDARD_ATMOSPHERE + 5e5;
    const def: NetworkDefinition = {
      fluid,
      nodes: [
        { id: 'tank', elevation: q(60, 'm'), surface: {} },
        { id: 'in', elevation: q(0, 'm'), demand: q(5, 'L/s') },
        { id: 'out', elevation: q(0, 'm') },
        { id: 'low', elevation: q(0, 'm'), surface: {} },
      ],
      links: [
        {
          id: 'feed',
          from: 'tank',
          to: 'in',
          run: plainRun({ length: 200, d: 0.15, eps: 4.5e-5 }),
        },
        {
          id: 'valve',
          from: 'in',
          to: 'out',
          valve: {
            kind: 'pressure-sustaining',
            setting: setting as Pressure,
            diameter: q(100, 'mm'),
            openK: 5,
          },
        },
        {
          id: 'drain',
          from: 'out',
          to: 'low',
          run: plainRun({ length: 100, d: 0.1, eps: 4.5e-5 }),
        },
      ],
    };
    const open = solveNetwork({
      ...def,
      links: def.links.map((l) => (l.id === 'valve' ? { ...l, status: 'closed' as const } : l)),
    });
    expect(open.nodes['in']?.pressure ?? 0).toBeGreaterThan(setting);
    const sol = solveNetwork(def);
    expect(sol.links['valve']?.state).toBe('active');
    expectRelative(sol.nodes['in']?.pressure ?? 0, setting, 1e-12);
    expect(sol.links['valve']?.flow ?? 0).toBeGreaterThan(0);
    checkInvariants(def, sol);
  });

  it('a flow-limiting valve holds its flow when the network would push more', () => {
    const def: NetworkDefinition = {
      fluid,
      nodes: [
        { id: 'high', elevation: q(30, 'm'), surface: {} },
        { id: 'mid', elevation: q(0, 'm') },
        { id: 'low', elevation: q(0, 'm'), surface: {} },
      ],
      links: [
        {
          id: 'pipe',
          from: 'high',
          to: 'mid',
          run: plainRun({ length: 100, d: 0.1, eps: 4.5e-5 }),
        },
        {
          id: 'fcv',
          from: 'mid',
          to: 'low',
          valve: { kind: 'flow-limiting', setting: q(5, 'L/s'), diameter: q(100, 'mm'), openK: 3 },
        },
      ],
    };
    const sol = solveNetwork(def);
    expect(sol.links['fcv']?.state).toBe('active');
    expectRelative(sol.links['fcv']?.flow ?? 0, 0.005, 1e-12);
    expectRelative(sol.links['pipe']?.flow ?? 0, 0.005, 1e-10);
  });
});

describe('solveNetwork: operating cases', () => {
  it('applies demands, levels, status, and a prepared network repeats the solve', () => {
    const { def } = randomNetwork(30, 10, 12345);
    const prepared = prepareNetwork(def);
    const c = {
      levels: { src: q(70, 'm') },
      demands: { j3: q(3, 'L/s') },
      status: { p30: 'closed' as const },
    };
    const a = prepared.solve(c);
    const b = solveNetwork(applyNetworkCase(def, c));
    for (const n of def.nodes) expect(a.nodes[n.id]?.head).toBe(b.nodes[n.id]?.head);
    expect(a.links['p30']?.state).toBe('closed');
    expect(a.links['p30']?.flow).toBe(0);
    checkInvariants(applyNetworkCase(def, c), a);
  });

  it('refuses case ids the network does not hold or of the wrong kind', () => {
    const { def } = randomNetwork(5, 0, 7);
    expectHeadflowError(
      () => applyNetworkCase(def, { levels: { j1: q(3, 'm') } }),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () => applyNetworkCase(def, { demands: { nowhere: q(3, 'L/s') } }),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(() => applyNetworkCase(def, { settings: { p0: 3 } }), 'INVALID_ARGUMENT');
  });
});

describe('solveNetwork: refusals', () => {
  const base = (): NetworkDefinition => ({
    fluid,
    nodes: [
      { id: 'tank', elevation: q(30, 'm'), surface: {} },
      { id: 'a', elevation: q(0, 'm'), demand: q(1, 'L/s') },
    ],
    links: [
      { id: 'l1', from: 'tank', to: 'a', run: plainRun({ length: 100, d: 0.1, eps: 4.5e-5 }) },
    ],
  });

  it('a part of the network with no fixed-level surface, naming its nodes', () => {
    const def = base();
    const err = expectHeadflowError(
      () =>
        solveNetwork({
          ...def,
          nodes: [
            ...def.nodes,
            { id: 'x', elevation: q(0, 'm') },
            { id: 'y', elevation: q(0, 'm') },
          ],
          links: [
            ...def.links,
            { id: 'xy', from: 'x', to: 'y', run: plainRun({ length: 1, d: 0.1, eps: 0 }) },
          ],
        }),
      'NO_SOLUTION',
    );
    expect(err.message).toContain("'x'");
  });

  it('duplicate node and link ids, unknown nodes, self-loops', () => {
    const def = base();
    expect(
      expectHeadflowError(
        () => solveNetwork({ ...def, nodes: [...def.nodes, { id: 'a', elevation: q(0, 'm') }] }),
        'INVALID_ARGUMENT',
      ).message,
    ).toContain("'a'");
    expect(
      expectHeadflowError(
        () => solveNetwork({ ...def, links: [...def.links, { ...(def.links[0] as NetworkLink) }] }),
        'INVALID_ARGUMENT',
      ).message,
    ).toContain("'l1'");
    expect(
      expectHeadflowError(
        () => solveNetwork({ ...def, links: [{ ...(def.links[0] as NetworkLink), to: 'ghost' }] }),
        'INVALID_ARGUMENT',
      ).message,
    ).toContain("'ghost'");
    expectHeadflowError(
      () => solveNetwork({ ...def, links: [{ ...(def.links[0] as NetworkLink), to: 'tank' }] }),
      'INVALID_ARGUMENT',
    );
  });

  it('a demand that no open path can supply', () => {
    const def = base();
    const err = expectHeadflowError(
      () => prepareNetwork(def).solve({ status: { l1: 'closed' } }),
      'NO_SOLUTION',
    );
    expect(err.message).toContain("'a'");
  });

  it('no convergence within the cap, with the last residuals', () => {
    const { def } = randomNetwork(40, 20, 99);
    const err = expectHeadflowError(() => solveNetwork(def, { maxIterations: 1 }), 'NO_SOLUTION');
    expect(err.message).toMatch(/head imbalance .* m/);
  });

  it('malformed input: null definition, bad options, a link with two parts, a run with no loss', () => {
    expectHeadflowError(() => solveNetwork(null as never), 'INVALID_ARGUMENT');
    expectHeadflowError(() => solveNetwork(base(), { maxIterations: 0 }), 'INVALID_ARGUMENT');
    expectHeadflowError(() => solveNetwork(base(), { headTolerance: -1 }), 'INVALID_ARGUMENT');
    const def = base();
    expectHeadflowError(
      () =>
        solveNetwork({
          ...def,
          links: [{ ...(def.links[0] as NetworkLink), pump: quadraticPump() } as never],
        }),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () =>
        solveNetwork({
          ...def,
          links: [
            {
              id: 'z',
              from: 'tank',
              to: 'a',
              run: { length: q(0, 'm'), insideDiameter: q(0.1, 'm') },
            },
          ],
        }),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(() => solveNetwork({ ...def, nodes: [] }), 'INVALID_ARGUMENT');
    expectHeadflowError(
      () =>
        solveNetwork({
          ...def,
          nodes: [
            { id: 'tank', elevation: q(Number.NaN, 'm') as never, surface: {} },
            def.nodes[1] as NetworkNode,
          ],
        }),
      'INVALID_ARGUMENT',
    );
  });
});
