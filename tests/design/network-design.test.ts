import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { design, fastPump, slowPump } from '../../docs/examples/irrigation-lift';
import {
  type DesignReport,
  evaluateDesign,
  type NetworkDesignInput,
  readDesignFile,
} from '../../src/design/index';
import {
  type NetworkCase,
  type NetworkDefinition,
  type NetworkLink,
  prepareNetwork,
} from '../../src/network/index';
import { type PipeRunInput, systemScenarios } from '../../src/system/index';
import {
  type Flow,
  type Length,
  type Pressure,
  q,
  STANDARD_ATMOSPHERE,
  STANDARD_GRAVITY,
} from '../../src/units';
import { expectHeadflowError, expectRelative } from '../helpers/expect';

// The irrigation line of docs/examples/irrigation-lift.ts given as a network: the canal, the
// pump's suction and discharge flanges, the hillside tank; the same runs, cases and pumps.
const [suctionRun, main] = design.system.runs as readonly PipeRunInput[];
const network: NetworkDefinition = {
  name: 'canal to hillside tank',
  fluid: design.system.fluid,
  nodes: [
    { id: 'canal', elevation: q(0, 'm'), surface: {} },
    { id: 'pump in', elevation: q(1.5, 'm') },
    { id: 'pump out', elevation: q(1.5, 'm') },
    { id: 'tank', elevation: q(42, 'm'), surface: {} },
  ],
  links: [
    { id: 'suction', from: 'canal', to: 'pump in', run: suctionRun as PipeRunInput },
    { id: 'pump', from: 'pump in', to: 'pump out', pump: fastPump },
    { id: 'rising main', from: 'pump out', to: 'tank', run: main as PipeRunInput },
  ],
};
const cases: NetworkCase[] = [
  { name: 'normal canal level' },
  { name: 'dry season, low canal', levels: { canal: q(-1.2, 'm') } },
  { name: 'dry season, aged main', levels: { canal: q(-1.2, 'm') }, aged: true },
];
const asNetwork: NetworkDesignInput = {
  name: design.name,
  fluidName: 'water',
  network,
  pumpLink: 'pump',
  cases,
  dutyFlow: design.dutyFlow,
  pumpElevation: q(1.5, 'm'),
  ...(design.candidates === undefined ? {} : { candidates: design.candidates }),
  ...(design.profile === undefined ? {} : { profile: design.profile }),
  ...(design.energyPrice === undefined ? {} : { energyPrice: design.energyPrice }),
};

const line = evaluateDesign(design);
const net = evaluateDesign(asNetwork, { curves: true });

describe('the whole job on a network', () => {
  it('a line given as a network: the same duty heads (1e-6 relative)', () => {
    expect(net.duty.map((d) => d.case)).toEqual(line.duty.map((d) => d.case));
    net.duty.forEach((d, i) => {
      const l = line.duty[i];
      expectRelative(d.head, l?.head ?? 0, 1e-6, d.case);
      expectRelative(d.staticHead, l?.staticHead ?? 0, 1e-6, d.case);
      expectRelative(d.npshAvailable ?? 0, l?.npshAvailable ?? 0, 1e-6, d.case);
    });
  });

  it('a line given as a network: the same operating points, speeds, NPSHa and energy', () => {
    for (const c of line.candidates) {
      const n = net.candidates.find((k) => k.name === c.name);
      expect(n?.passed).toBe(c.passed);
      c.cases.forEach((r, i) => {
        const m = n?.cases[i];
        expectRelative(m?.flow ?? 0, r.flow ?? 0, 1e-6, `${c.name} ${r.case} flow`);
        expectRelative(m?.head ?? 0, r.head ?? 0, 1e-6, `${c.name} ${r.case} head`);
        expectRelative(m?.speed ?? 0, r.speed ?? 0, 1e-6, `${c.name} ${r.case} speed`);
        expectRelative(
          m?.npshAvailable ?? 0,
          r.npshAvailable ?? 0,
          1e-6,
          `${c.name} ${r.case} NPSHa`,
        );
        expectRelative(m?.percentOfBep ?? 0, r.percentOfBep ?? 0, 1e-6);
      });
      expectRelative(n?.energy?.kWh ?? 0, c.energy?.kWh ?? 0, 1e-6, `${c.name} energy`);
      expect(n?.motor?.rating).toBe(c.motor?.rating);
    }
    expect(net.verdict).toEqual(line.verdict);
  });

  it('agrees with solving the network by hand at the reported operating point', () => {
    const prepared = prepareNetwork(network);
    const fast = net.candidates.find((c) => c.name === 'fast pump, fixed');
    fast?.cases.forEach((r, i) => {
      const sol = prepared.solve({ ...cases[i], pumps: { pump: fastPump } });
      const link = sol.links['pump'];
      expectRelative(r.flow ?? 0, link?.flow ?? 0, 1e-12, r.case);
      expectRelative(r.head ?? 0, fastPump.head((link?.flow ?? 0) as Flow), 1e-9, r.case);
      // NPSH available from the solved suction pressure: (p - pv)/(rho g) + z_node - z_eye.
      const fluid = network.fluid;
      const p = sol.nodes['pump in']?.pressure ?? 0;
      const npsha = (p - (fluid.vaporPressure ?? 0)) / (fluid.density * STANDARD_GRAVITY);
      expectRelative(r.npshAvailable ?? 0, npsha, 1e-12, r.case);
    });
    const slow = net.candidates.find((c) => c.name === 'slow pump, drive');
    slow?.cases.forEach((r, i) => {
      const sol = prepared.solve({
        ...cases[i],
        pumps: { pump: slowPump },
        speeds: { pump: r.speed ?? slowPump.speed },
      });
      expectRelative(sol.links['pump']?.flow ?? 0, design.dutyFlow, 1e-9, r.case);
    });
  });

  it('gives node and link tables per case and the system curve seen by the pump link', () => {
    const t = net.duty[0]?.network?.tables;
    expect(t?.nodes.map((n) => n.id)).toEqual(['canal', 'pump in', 'pump out', 'tank']);
    const main = t?.links.find((l) => l.id === 'rising main');
    expectRelative(main?.flow ?? 0, design.dutyFlow, 1e-9);
    expect(main?.reynolds).toBeGreaterThan(1e4);
    const sys = net.curves?.systems[0];
    expect(sys?.flows.length).toBeGreaterThan(20);
    // Every sampled point lies on the line's system curve (system module, independent path).
    const lineCurve = systemScenarios(design.system, design.cases ?? [])[0]?.curve;
    sys?.flows.forEach((f, i) => {
      expectRelative(lineCurve?.head(f as Flow) ?? 0, sys.values[i] ?? 0, 1e-6, `at ${f} m3/s`);
    });
  });
});

/** A source of (almost exactly) fixed head: 1e-7 of its head is lost at 1 m3/s. */
function fixedHead(h: number) {
  const cap = 1e7;
  return {
    head: (x: Flow) => (h * (1 - x / cap)) as Length,
    flowRange: { min: 0 as Flow, max: cap as Flow },
  };
}

// An invented building: a booster from a break tank feeds a riser with three floors; the top
// floor needs at least 1.5 bar gauge.
const fixture = (id: string, floor: number) => ({
  id,
  elevation: q(3 * floor + 1, 'm'),
  outlet: { coefficient: 2.5e-5, exponent: 0.5 },
});
const riser = (length: number, mm: number): PipeRunInput => ({
  length: q(length, 'm'),
  insideDiameter: q(mm, 'mm'),
  material: 'commercial-steel',
});
const building: NetworkDefinition = {
  fluid: design.system.fluid,
  nodes: [
    { id: 'break tank', elevation: q(0.5, 'm'), surface: {} },
    { id: 'in', elevation: q(0, 'm') },
    { id: 'out', elevation: q(0, 'm') },
    { id: 'f1', elevation: q(3, 'm') },
    { id: 'f2', elevation: q(6, 'm') },
    { id: 'f3', elevation: q(9, 'm') },
    fixture('tap 1', 1),
    fixture('tap 2', 2),
    fixture('tap 3', 3),
  ],
  links: [
    { id: 'suction', from: 'break tank', to: 'in', run: riser(3, 52.5) },
    { id: 'booster', from: 'in', to: 'out', run: riser(0.5, 52.5) } as NetworkLink,
    { id: 'r1', from: 'out', to: 'f1', run: riser(8, 40.9) },
    { id: 'r2', from: 'f1', to: 'f2', run: riser(3, 35.1) },
    { id: 'r3', from: 'f2', to: 'f3', run: riser(3, 26.6) },
    { id: 'b1', from: 'f1', to: 'tap 1', run: riser(6, 20.9) },
    { id: 'b2', from: 'f2', to: 'tap 2', run: riser(6, 20.9) },
    { id: 'b3', from: 'f3', to: 'tap 3', run: riser(6, 20.9) },
  ],
};
const bar = (x: number) => (STANDARD_ATMOSPHERE + x * 1e5) as Pressure;

describe('service pressures as the duty', () => {
  const input: NetworkDesignInput = {
    name: 'booster',
    network: building,
    pumpLink: 'booster',
    service: [
      { node: 'tap 3', minPressure: bar(1.5) },
      { node: 'tap 2', minPressure: bar(1.5) },
    ],
  };
  const report: DesignReport = evaluateDesign(input);

  it('the duty head is the least head meeting every minimum (met there, not 1 mm below)', () => {
    const d = report.duty[0];
    const head = d?.head ?? 0;
    const prepared = prepareNetwork({
      ...building,
      links: building.links.map((l) =>
        l.id === 'booster' ? { id: 'booster', from: 'in', to: 'out', pump: fixedHead(head) } : l,
      ),
    });
    const at = prepared.solve();
    expect((at.nodes['tap 3']?.pressure ?? 0) - bar(1.5)).toBeGreaterThanOrEqual(-1e-3);
    expect(at.nodes['tap 2']?.pressure ?? 0).toBeGreaterThan(bar(1.5));
    const below = prepared.solve({ pumps: { booster: fixedHead(head - 1e-3) } });
    expect(below.nodes['tap 3']?.pressure ?? 0).toBeLessThan(bar(1.5));
    expectRelative(d?.network?.dutyFlow ?? 0, at.links['booster']?.flow ?? 0, 1e-6);
    const row = d?.network?.tables.nodes.find((n) => n.id === 'tap 3');
    expect(row?.minPressure).toBe(bar(1.5));
    expect(row?.shortfall).toBeUndefined();
  });

  it('a pump too weak fails with service-pressure checks giving each shortfall', () => {
    const weak = evaluateDesign({
      ...input,
      candidates: [{ name: 'small', pump: slowPump.atSpeed(q(700, 'rpm')), motorEfficiency: 0.9 }],
    });
    const c = weak.candidates[0];
    const service = c?.checks.filter((k) => k.id === 'service-pressure') ?? [];
    expect(c?.passed).toBe(false);
    expect(service.length).toBeGreaterThan(0);
    for (const k of service) {
      expect(k.severity).toBe('error');
      expectRelative(
        k.values['shortfall'] ?? 0,
        (k.values['minPressure'] ?? 0) - (k.values['pressure'] ?? 0),
        1e-12,
      );
      expect(k.message).toContain(k.words['node'] ?? '?');
    }
  });

  it('refuses with codes and paths', () => {
    const e1 = expectHeadflowError(
      () => evaluateDesign({ ...input, pumpLink: 'nope' }),
      'INVALID_ARGUMENT',
    );
    expect(e1.parameter).toBe('pumpLink');
    const { service: _s, ...none } = input;
    expect(expectHeadflowError(() => evaluateDesign(none), 'INVALID_ARGUMENT').parameter).toBe(
      'dutyFlow',
    );
    expect(
      expectHeadflowError(
        () => evaluateDesign({ ...input, dutyFlow: q(1, 'L/s') }),
        'INVALID_ARGUMENT',
      ).parameter,
    ).toBe('service');
    expect(
      expectHeadflowError(
        () => evaluateDesign({ ...input, service: [{ node: 'break tank', minPressure: bar(1) }] }),
        'INVALID_ARGUMENT',
      ).parameter,
    ).toBe('service[0].node');
    expect(
      expectHeadflowError(
        () =>
          evaluateDesign({ ...input, service: [{ node: 'tap 1', minPressure: -1 as Pressure }] }),
        'INVALID_ARGUMENT',
      ).parameter,
    ).toBe('service[0].minPressure');
  });
});

describe('node pressure checks of a network', () => {
  // A suction line over a crest (invented): the crest's pressure is the well's less its height
  // and the losses, so a high crest falls below the atmosphere, a higher one below boiling.
  const crest = (height: number): NetworkDesignInput => ({
    name: 'over a crest',
    network: {
      fluid: design.system.fluid,
      nodes: [
        { id: 'well', elevation: q(0, 'm'), surface: {} },
        { id: 'crest', elevation: q(height, 'm') },
        { id: 'in', elevation: q(0, 'm') },
        { id: 'out', elevation: q(0, 'm') },
        { id: 'tank', elevation: q(30, 'm'), surface: {} },
      ],
      links: [
        { id: 'up', from: 'well', to: 'crest', run: riser(20, 102.3) },
        { id: 'down', from: 'crest', to: 'in', run: riser(20, 102.3) },
        { id: 'pump', from: 'in', to: 'out', pump: fastPump },
        { id: 'main', from: 'out', to: 'tank', run: riser(200, 102.3) },
      ],
    },
    pumpLink: 'pump',
    dutyFlow: q(20, 'L/s'),
    candidates: [{ name: 'fast', pump: fastPump, motorEfficiency: 0.9 }],
  });

  it('a node below the atmosphere is a warning, below the vapour pressure an error', () => {
    const five = evaluateDesign(crest(5));
    const low = five.checks.filter((k) => k.id === 'node-below-atmosphere');
    // The crest, and the pump's suction below the atmosphere by the suction line's losses.
    expect(low.map((k) => k.words['node'])).toEqual(['crest', 'in']);
    expect(low[0]?.severity).toBe('warning');
    expect(five.checks.some((k) => k.id === 'node-vapour-pressure')).toBe(false);
    const twelve = evaluateDesign(crest(12));
    const boil = twelve.checks.filter((k) => k.id === 'node-vapour-pressure');
    expect(boil.map((k) => k.words['node'])).toEqual(['crest']);
    expect(boil[0]?.severity).toBe('error');
    expect(twelve.passed).toBe(false);
    expect(twelve.candidates[0]?.checks.some((k) => k.id === 'node-vapour-pressure')).toBe(true);
  });

  it('shut-off pressure above the design pressure is an error at each discharge-side node', () => {
    const input: NetworkDesignInput = {
      ...crest(0),
      limits: { designPressure: bar(5) },
    };
    const report = evaluateDesign(input);
    const c = report.candidates[0];
    const shut = c?.checks.filter((k) => k.id === 'shutoff-pressure') ?? [];
    // fastPump shuts off at 75 m: 7.35 bar above the well at the pump (elevation 0), so the
    // pump outlet ('out') exceeds 5 bar gauge; the tank is a surface and holds its own.
    expect(shut.map((k) => k.words['node'])).toEqual(['out']);
    const rhoG = design.system.fluid.density * STANDARD_GRAVITY;
    const shutoff = fastPump.shutoffHead ?? 0;
    expectRelative(shut[0]?.values['maxPressure'] ?? 0, STANDARD_ATMOSPHERE + rhoG * shutoff, 1e-9);
  });
});

describe('sets, failures and refusals on a network', () => {
  const base: NetworkDesignInput = {
    name: 'booster',
    network: building,
    pumpLink: 'booster',
    service: [{ node: 'tap 3', minPressure: bar(1.5) }],
  };
  const twoInParallel = evaluateDesign({
    ...base,
    candidates: [
      { name: 'pair', pump: fastPump, count: 2, arrangement: 'parallel', motorEfficiency: 0.9 },
      { name: 'series', pump: slowPump, count: 2, arrangement: 'series', motorEfficiency: 0.9 },
    ],
  });

  it('a set of identical pumps: each pump at the set flow / n (parallel), head / n (series)', () => {
    const pair = twoInParallel.candidates.find((c) => c.name === 'pair');
    const r = pair?.cases[0];
    expectRelative(r?.head ?? 0, fastPump.head(((r?.flow ?? 0) / 2) as Flow), 1e-9);
    const series = twoInParallel.candidates.find((c) => c.name === 'series');
    const s = series?.cases[0];
    expectRelative(s?.head ?? 0, 2 * slowPump.head((s?.flow ?? 0) as Flow), 1e-9);
  });

  it('a pump that cannot reach the duty: no operating point, an error check', () => {
    const weak = evaluateDesign({
      ...base,
      candidates: [
        { name: 'tiny', pump: slowPump.atSpeed(q(300, 'rpm')), motorEfficiency: 0.9 },
        {
          name: 'tiny drive',
          pump: slowPump.atSpeed(q(300, 'rpm')),
          control: 'speed',
          motorEfficiency: 0.9,
        },
      ],
    });
    for (const c of weak.candidates) {
      expect(c.passed, c.name).toBe(false);
      expect(c.cases[0]?.failure, c.name).toBeDefined();
      expect(c.checks.some((k) => k.id === 'no-operating-point')).toBe(true);
    }
  });

  it('refuses a duty the network meets without the pump, cases named twice, a bad case', () => {
    // The booster example with its break tank lifted 60 m: the fixtures get their pressure,
    // and a small flow, by gravity alone.
    const file = readDesignFile(
      readFileSync(new URL('../../docs/examples/booster-floors.json', import.meta.url), 'utf8'),
    ) as NetworkDesignInput;
    const lifted: NetworkDesignInput = {
      ...file,
      candidates: [],
      cases: [{ name: 'high', levels: { 'break tank': q(60, 'm') } }],
    };
    expect(expectHeadflowError(() => evaluateDesign(lifted), 'INVALID_ARGUMENT').parameter).toBe(
      'service',
    );
    const { service: _s, ...flowDuty } = lifted;
    expect(
      expectHeadflowError(
        () => evaluateDesign({ ...flowDuty, dutyFlow: q(0.1, 'L/s') }),
        'INVALID_ARGUMENT',
      ).parameter,
    ).toBe('dutyFlow');
    expect(
      expectHeadflowError(
        () => evaluateDesign({ ...base, cases: [{ name: 'a' }, { name: 'a' }] }),
        'INVALID_ARGUMENT',
      ).parameter,
    ).toBe('cases[1].name');
    expectHeadflowError(
      () => evaluateDesign({ ...base, units: 'metric' as never }),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(() => evaluateDesign(base, { curves: 'yes' as never }), 'INVALID_ARGUMENT');
  });

  it('a liquid without a vapour pressure: no NPSH, a note that it is not checked', () => {
    const { vaporPressure: _v, ...noVapour } = building.fluid;
    const r = evaluateDesign({
      ...base,
      network: { ...building, fluid: noVapour },
      candidates: [{ name: 'pair', pump: fastPump, count: 2, motorEfficiency: 0.9 }],
    });
    expect(r.duty[0]?.npshAvailable).toBeUndefined();
    expect(r.checks.some((k) => k.id === 'npsh-data')).toBe(true);
  });
});
