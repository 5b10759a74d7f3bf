/**
 * solveNetwork: the less common states and inputs (valves that open or shut, outlets above
 * their supply, pumps given by a closed form with its slope, explicit friction methods, dense
 * layouts), each checked against a law computed here.
 */
import { describe, expect, it } from 'vitest';
import { type FluidState, water } from '../../src/fluids';
import {
  applyNetworkCase,
  type HeadRiseCurve,
  type NetworkDefinition,
  type NetworkLink,
  type NetworkNode,
  prepareNetwork,
  solveNetwork,
} from '../../src/network';
import { sparseCholesky } from '../../src/network/sparse-cholesky';
import { type Flow, type Length, q, STANDARD_ATMOSPHERE } from '../../src/units';
import { expectAbsolute, expectHeadflowError, expectRelative } from '../helpers/expect';

const fluid: FluidState = water().at(q(15, 'degC'));
const pipe = (length: number, mm: number) => ({
  length: q(length, 'm'),
  insideDiameter: q(mm, 'mm'),
  roughness: q(0.05, 'mm'),
});

/** H = 30 - 2000 Q^2 (m, m3/s) over 0..0.1 m3/s, with its exact slope. */
const closedForm: HeadRiseCurve = {
  head: (f: Flow) => (30 - 2000 * f * f) as Length,
  headSlope: (f: Flow) => -4000 * f,
  flowRange: { min: 0 as Flow, max: 0.1 as Flow },
  speed: q(1450, 'rpm'),
};

describe('solveNetwork: pumps given by a closed form', () => {
  const def: NetworkDefinition = {
    fluid,
    nodes: [
      { id: 'low', elevation: q(0, 'm'), surface: {} },
      { id: 'a', elevation: q(0, 'm') },
      { id: 'b', elevation: q(0, 'm') },
      { id: 'high', elevation: q(12, 'm'), surface: {} },
    ],
    links: [
      { id: 'in', from: 'low', to: 'a', run: pipe(5, 150) },
      { id: 'p', from: 'a', to: 'b', pump: closedForm },
      { id: 'out', from: 'b', to: 'high', run: pipe(200, 150) },
    ],
  };

  it('meets the closed form at its flow, and the affinity laws at another speed', () => {
    const s = solveNetwork(def);
    const f = s.links['p']?.flow ?? 0;
    expectAbsolute(-(s.links['p']?.headLoss ?? 0), 30 - 2000 * f * f, 1e-8);
    const prepared = prepareNetwork(def);
    const slow = prepared.solve({ speeds: { p: q(1160, 'rpm') } });
    const r = 1160 / 1450;
    const fs = slow.links['p']?.flow ?? 0;
    expectAbsolute(-(slow.links['p']?.headLoss ?? 0), r * r * (30 - 2000 * (fs / r) ** 2), 1e-8);
    // Another pump on the same link: a weaker one cannot lift 12 m and is shut.
    const weak: HeadRiseCurve = { ...closedForm, head: (g: Flow) => (10 - 2000 * g * g) as Length };
    const shut = prepared.solve({ pumps: { p: weak } });
    expect(shut.links['p']?.state).toBe('shut');
    expect(shut.links['p']?.flow).toBe(0);
  });

  it('refuses a speed when the pump states none, and counts out of range', () => {
    const { speed: _, ...noSpeed } = closedForm;
    const links = def.links.map((l) =>
      l.id === 'p' ? ({ ...l, pump: noSpeed, speed: q(1000, 'rpm') } as NetworkLink) : l,
    );
    expectHeadflowError(() => solveNetwork({ ...def, links }), 'INVALID_ARGUMENT');
    const many = def.links.map((l) => (l.id === 'p' ? ({ ...l, count: 0 } as NetworkLink) : l));
    expectHeadflowError(() => solveNetwork({ ...def, links: many }), 'INVALID_ARGUMENT');
    const notPump = def.links.map((l) =>
      l.id === 'p' ? ({ ...l, pump: { flowRange: closedForm.flowRange } } as never) : l,
    );
    expectHeadflowError(() => solveNetwork({ ...def, links: notPump }), 'INVALID_ARGUMENT');
  });
});

describe('solveNetwork: valves that open or shut', () => {
  it('a flow-limiting valve stays open when the network cannot push its setting', () => {
    const def: NetworkDefinition = {
      fluid,
      nodes: [
        { id: 'high', elevation: q(3, 'm'), surface: {} },
        { id: 'mid', elevation: q(0, 'm') },
        { id: 'low', elevation: q(0, 'm'), surface: {} },
      ],
      links: [
        { id: 'pipe', from: 'high', to: 'mid', run: pipe(300, 50) },
        {
          id: 'fcv',
          from: 'mid',
          to: 'low',
          valve: { kind: 'flow-limiting', setting: q(20, 'L/s'), diameter: q(50, 'mm'), openK: 2 },
        },
      ],
    };
    const s = solveNetwork(def);
    expect(s.links['fcv']?.state).toBe('open');
    expect(s.links['fcv']?.flow ?? 0).toBeLessThan(0.02);
    // Open: the valve loses openK V^2 / (2 g).
    const v = (s.links['fcv']?.flow ?? 0) / ((Math.PI * 0.05 * 0.05) / 4);
    expectRelative(s.links['fcv']?.headLoss ?? 0, (2 * v * v) / (2 * 9.80665), 1e-8);
  });

  it('a pressure-reducing valve shuts when its outlet side is held above the setting', () => {
    const def: NetworkDefinition = {
      fluid,
      nodes: [
        { id: 'high', elevation: q(80, 'm'), surface: {} },
        { id: 'in', elevation: q(0, 'm') },
        { id: 'out', elevation: q(0, 'm'), demand: q(1, 'L/s') },
        { id: 'tower', elevation: q(40, 'm'), surface: {} },
      ],
      links: [
        { id: 'feed', from: 'high', to: 'in', run: pipe(100, 100) },
        {
          id: 'prv',
          from: 'in',
          to: 'out',
          valve: {
            kind: 'pressure-reducing',
            setting: q(STANDARD_ATMOSPHERE + 2e5, 'Pa'),
            diameter: q(100, 'mm'),
            openK: 3,
          },
        },
        { id: 'tower pipe', from: 'tower', to: 'out', run: pipe(50, 100) },
      ],
    };
    const s = solveNetwork(def);
    // The tower holds 'out' near 40 m of head (about 3.9 bar gauge), above the 2 bar setting.
    expect(s.links['prv']?.state).toBe('shut');
    expect(s.links['prv']?.flow).toBe(0);
    expectRelative(s.links['tower pipe']?.flow ?? 0, 0.001, 1e-10);
  });

  it('an outlet above its supply gives nothing and is shut', () => {
    const def: NetworkDefinition = {
      fluid,
      nodes: [
        { id: 'tank', elevation: q(10, 'm'), surface: {} },
        { id: 'roof', elevation: q(20, 'm'), outlet: { coefficient: 1e-5 } },
        { id: 'yard', elevation: q(0, 'm'), outlet: { coefficient: 1e-5, exponent: 0.5 } },
      ],
      links: [
        { id: 'up', from: 'tank', to: 'roof', run: pipe(30, 25) },
        { id: 'down', from: 'tank', to: 'yard', run: pipe(30, 25) },
      ],
    };
    const s = solveNetwork(def);
    expect(s.nodes['roof']?.outflow).toBe(0);
    expect(s.links['up']?.flow).toBe(0);
    expect(s.belowAtmosphere).toContain('roof');
    expect(s.nodes['yard']?.outflow ?? 0).toBeGreaterThan(0);
  });

  it('a check valve opens when the case lifts its upstream tank', () => {
    const def: NetworkDefinition = {
      fluid,
      nodes: [
        { id: 'a', elevation: q(5, 'm'), surface: {} },
        { id: 'b', elevation: q(10, 'm'), surface: {} },
      ],
      links: [{ id: 'cv', from: 'a', to: 'b', checkValve: true, run: pipe(40, 80) }],
    };
    const prepared = prepareNetwork(def);
    expect(prepared.solve().links['cv']?.state).toBe('shut');
    const lifted = prepared.solve({ levels: { a: q(15, 'm') } });
    expect(lifted.links['cv']?.state).toBe('open');
    expect(lifted.links['cv']?.flow ?? 0).toBeGreaterThan(0);
  });

  it('a pressurized vessel, a changed setting and a changed fluid through cases', () => {
    const def: NetworkDefinition = {
      fluid,
      nodes: [
        { id: 'vessel', elevation: q(0, 'm'), surface: { pressure: q(3, 'bar') } },
        { id: 'in', elevation: q(0, 'm') },
        { id: 'out', elevation: q(0, 'm'), demand: q(2, 'L/s') },
      ],
      links: [
        { id: 'feed', from: 'vessel', to: 'in', run: pipe(20, 80) },
        {
          id: 'prv',
          from: 'in',
          to: 'out',
          valve: {
            kind: 'pressure-reducing',
            setting: q(2, 'bar'),
            diameter: q(80, 'mm'),
            openK: 3,
          },
        },
      ],
    };
    const c = applyNetworkCase(def, {
      pressures: { vessel: q(4, 'bar') },
      settings: { prv: q(2.5, 'bar') },
      fluid: water().at(q(60, 'degC')),
      aged: false,
      name: 'warm',
    });
    const s = solveNetwork(c);
    expect(s.name).toBe('warm');
    expectRelative(s.nodes['out']?.pressure ?? 0, 2.5e5, 1e-12);
    expectRelative(s.nodes['vessel']?.pressure ?? 0, 4e5, 1e-12);
  });
});

describe('solveNetwork: friction methods and dense layouts', () => {
  it('an explicit turbulent method and the conservative rule at transitional flows converge', () => {
    const nodes: NetworkNode[] = [{ id: 's', elevation: q(10, 'm'), surface: {} }];
    const links: NetworkLink[] = [];
    for (let i = 1; i <= 6; i++)
      nodes.push({ id: `j${i}`, elevation: q(0, 'm'), demand: q(0.05 * i, 'L/s') });
    for (let i = 1; i <= 6; i++)
      links.push({
        id: `a${i}`,
        from: i === 1 ? 's' : `j${i - 1}`,
        to: `j${i}`,
        run: pipe(50, 40),
      });
    links.push({ id: 'loop', from: 's', to: 'j6', run: pipe(300, 40) });
    for (const friction of [
      { method: 'swameeJain' as const },
      { method: 'haaland' as const, transition: 'conservative' as const },
    ]) {
      const s = solveNetwork({ fluid, nodes, links, friction });
      expect(s.headResidual).toBeLessThanOrEqual(1e-9);
    }
  });

  it('a fully connected layout (every junction joined to every other) solves', () => {
    const nodes: NetworkNode[] = [{ id: 's', elevation: q(30, 'm'), surface: {} }];
    const links: NetworkLink[] = [];
    for (let i = 0; i < 12; i++)
      nodes.push({ id: `n${i}`, elevation: q(0, 'm'), demand: q(0.5, 'L/s') });
    links.push({ id: 'feed', from: 's', to: 'n0', run: pipe(100, 150) });
    for (let i = 0; i < 12; i++) {
      for (let j = i + 1; j < 12; j++)
        links.push({ id: `l${i}_${j}`, from: `n${i}`, to: `n${j}`, run: pipe(20 + i + j, 50) });
    }
    const s = solveNetwork({ fluid, nodes, links });
    expectRelative(s.links['feed']?.flow ?? 0, 0.006, 1e-12);
  });

  it('the sparse factorization reports a matrix that is not positive definite', () => {
    // Two nodes joined by one edge: [[1, 2], [2, 1]] has a negative pivot at the second.
    const chol = sparseCholesky({
      n: 2,
      ptr: new Int32Array([0, 1, 2]),
      adj: new Int32Array([1, 0]),
    });
    chol.values[chol.diagonal(0)] = 1;
    chol.values[chol.diagonal(1)] = 1;
    chol.values[chol.entry(0, 1)] = 2;
    expect(chol.factor()).toBeGreaterThanOrEqual(0);
    // A definite one afterwards factors (the state was reset).
    chol.values[chol.entry(0, 1)] = 0.5;
    expect(chol.factor()).toBe(-1);
    expect(chol.entry(0, 0)).toBe(chol.diagonal(0));
  });
});

describe('solveNetwork: any input is refused with a HeadflowError, never a TypeError', () => {
  it('random shapes for the definition, its nodes and links, and the options', async () => {
    const fc = (await import('fast-check')).default;
    const { HeadflowError } = await import('../../src/errors');
    const base: NetworkDefinition = {
      fluid,
      nodes: [
        { id: 't', elevation: q(10, 'm'), surface: {} },
        { id: 'j', elevation: q(0, 'm'), demand: q(1, 'L/s') },
      ],
      links: [{ id: 'l', from: 't', to: 'j', run: pipe(10, 50) }],
    };
    const bad = fc.oneof(fc.anything(), fc.constantFrom(null, undefined, Number.NaN, -1, '', []));
    fc.assert(
      fc.property(
        bad,
        bad,
        bad,
        fc.constantFrom('definition', 'node', 'link', 'run', 'options', 'case'),
        (x, y, z, where) => {
          try {
            if (where === 'definition') solveNetwork(x as never);
            else if (where === 'node')
              solveNetwork({ ...base, nodes: [base.nodes[0] as NetworkNode, x as never] });
            else if (where === 'link') solveNetwork({ ...base, links: [x as never] });
            else if (where === 'run')
              solveNetwork({
                ...base,
                links: [
                  {
                    id: 'l',
                    from: 't',
                    to: 'j',
                    run: { length: x, insideDiameter: y, roughness: z } as never,
                  },
                ],
              });
            else if (where === 'options') solveNetwork(base, x as never);
            else prepareNetwork(base).solve(x as never);
          } catch (e) {
            expect(e).toBeInstanceOf(HeadflowError);
          }
        },
      ),
      { numRuns: 300 },
    );
  });
});
