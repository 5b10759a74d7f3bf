/**
 * Fuzz entries of the network module: the two example networks of docs/examples
 * (network-two-tanks.ts, a branched pumped network; network-ring.ts, a looped gravity ring
 * with a pressure-reducing valve and an outlet), with their levels, lengths and demands drawn
 * across a range around the example's. See tests/fuzz/harness.ts.
 */
import fc from 'fast-check';
import type { NetworkCase, NetworkDefinition } from '../../../src/index';
import * as api from '../../../src/index';
import { type FuzzEntry, logUniform, optionsOf, uniform } from '../harness';

const M3H = 1 / 3600;
const RPM = Math.PI / 30;

const examplePump = api.pumpCurve({
  speed: (2900 * RPM) as never,
  points: [
    { flow: 0 as never, head: 48 as never, efficiency: 0 },
    { flow: (20 * M3H) as never, head: 46 as never, efficiency: 0.55 },
    { flow: (40 * M3H) as never, head: 41 as never, efficiency: 0.72 },
    { flow: (60 * M3H) as never, head: 33 as never, efficiency: 0.74 },
    { flow: (80 * M3H) as never, head: 22 as never, efficiency: 0.62 },
  ],
});

const fluid = api.water().at(288.15 as never);

/** The two-tank example with its tank levels and pipe lengths scaled. */
const twoTanks: fc.Arbitrary<NetworkDefinition> = fc
  .record({ lift: uniform(0.3, 1.5), long: uniform(0.3, 3), check: fc.boolean() })
  .map(({ lift, long, check }) => {
    const steel = (length: number, mm: number) => ({
      length: (length * long) as never,
      insideDiameter: (mm / 1000) as never,
      material: 'commercial-steel' as const,
    });
    return {
      name: 'sump to upper and lower tanks',
      fluid,
      nodes: [
        { id: 'sump', elevation: 0 as never, surface: {} },
        { id: 'pump in', elevation: 0 as never },
        { id: 'pump out', elevation: 0 as never },
        { id: 'tee', elevation: (8 * lift) as never },
        { id: 'lower tank', elevation: (14 * lift) as never, surface: {} },
        { id: 'upper tank', elevation: (22 * lift) as never, surface: {} },
      ],
      links: [
        { id: 'suction', from: 'sump', to: 'pump in', run: steel(4, 102.3) },
        { id: 'pump', from: 'pump in', to: 'pump out', pump: examplePump },
        { id: 'main', from: 'pump out', to: 'tee', run: steel(120, 102.3) },
        { id: 'to lower', from: 'tee', to: 'lower tank', checkValve: check, run: steel(60, 77.9) },
        { id: 'to upper', from: 'tee', to: 'upper tank', checkValve: check, run: steel(90, 77.9) },
      ],
    } as unknown as NetworkDefinition;
  });

/** The ring example with its demands and outlet scaled. */
const ring: fc.Arbitrary<NetworkDefinition> = fc
  .record({ demand: uniform(0, 2), outlet: logUniform(0.1, 3), setting: uniform(2e5, 6e5) })
  .map(({ demand, outlet, setting }) => {
    const pe = (length: number, mm: number) => ({
      length: length as never,
      insideDiameter: (mm / 1000) as never,
      friction: { hazenWilliamsC: 140 },
    });
    return {
      name: 'hillside ring main',
      fluid,
      nodes: [
        { id: 'reservoir', elevation: 95 as never, surface: {} },
        { id: 'valve in', elevation: 30 as never },
        { id: 'valve out', elevation: 30 as never },
        { id: 'north', elevation: 28 as never, demand: (0.006 * demand) as never },
        { id: 'east', elevation: 25 as never, demand: (0.004 * demand) as never },
        { id: 'south', elevation: 22 as never, demand: (0.005 * demand) as never },
        { id: 'west', elevation: 26 as never },
        {
          id: 'yard outlet',
          elevation: 26 as never,
          outlet: { coefficient: 4.216e-6 * outlet },
        },
      ],
      links: [
        { id: 'trunk', from: 'reservoir', to: 'valve in', run: pe(900, 200) },
        {
          id: 'reducing valve',
          from: 'valve in',
          to: 'valve out',
          valve: {
            kind: 'pressure-reducing',
            setting: 101325 + setting,
            diameter: 0.15,
            openK: 4,
          },
        },
        { id: 'feed', from: 'valve out', to: 'north', run: pe(150, 150) },
        { id: 'north-east', from: 'north', to: 'east', run: pe(400, 125) },
        { id: 'east-south', from: 'east', to: 'south', run: pe(350, 100) },
        { id: 'south-west', from: 'south', to: 'west', run: pe(300, 100) },
        { id: 'west-north', from: 'west', to: 'north', run: pe(450, 125) },
        { id: 'yard', from: 'west', to: 'yard outlet', run: pe(40, 50) },
      ],
    } as unknown as NetworkDefinition;
  });

const network = fc.oneof(twoTanks, ring);

/** A case of the two-tank network (levels, a closed branch, a pump speed, aged pipe). */
const twoTankCase: fc.Arbitrary<NetworkCase> = fc.record(
  {
    name: fc.constant('low sump'),
    levels: fc.record({ sump: uniform(-2, 0) }, { requiredKeys: [] }),
    status: fc.record({ 'to lower': fc.constantFrom('open', 'closed') }, { requiredKeys: [] }),
    speeds: fc.record({ pump: uniform(250, 2900 * RPM) }, { requiredKeys: [] }),
    aged: fc.boolean(),
  },
  { requiredKeys: [] },
) as unknown as fc.Arbitrary<NetworkCase>;

/** A case of the ring (night demands, the east side closed). */
const ringCase: fc.Arbitrary<NetworkCase> = fc.record(
  {
    name: fc.constant('night'),
    demands: fc.record(
      { north: uniform(0, 0.006), east: uniform(0, 0.004), south: uniform(0, 0.005) },
      { requiredKeys: [] },
    ),
    status: fc.record({ 'north-east': fc.constantFrom('open', 'closed') }, { requiredKeys: [] }),
  },
  { requiredKeys: [] },
) as unknown as fc.Arbitrary<NetworkCase>;

const networkWithCase = fc.oneof(
  fc.tuple(twoTanks, twoTankCase),
  fc.tuple(ring, ringCase),
) as fc.Arbitrary<[NetworkDefinition, NetworkCase]>;

const solveOptions = optionsOf(
  fc.record(
    {
      maxIterations: fc.integer({ min: 20, max: 200 }),
      headTolerance: logUniform(1e-8, 1e-3),
      flowTolerance: logUniform(1e-10, 1e-5),
    },
    { requiredKeys: [] },
  ),
);

// A network solve takes about a millisecond: these rows run 200 calls of each kind.
const NETWORK_RUNS = 200;

export const networkEntries: readonly FuzzEntry[] = [
  {
    name: 'outletCoefficient',
    valid: fc.tuple(logUniform(1e-6, 1), logUniform(1e3, 2e6), uniform(0.3, 3)),
    call: api.outletCoefficient,
  },
  {
    name: 'applyNetworkCase',
    valid: networkWithCase,
    call: api.applyNetworkCase,
  },
  {
    name: 'solveNetwork',
    valid: fc.tuple(network, solveOptions),
    call: api.solveNetwork,
    // A solve stopped at a small iteration cap; a short line that runs the pump past its
    // last catalogue point (no extrapolation).
    validMayThrow: ['NO_SOLUTION', 'OUT_OF_RANGE'],
    runs: NETWORK_RUNS,
  },
  {
    name: 'prepareNetwork',
    valid: fc.tuple(network),
    call: (d: NetworkDefinition) => {
      const p = api.prepareNetwork(d);
      return [p.linkCount, p.nodeCount, p.factorEntries];
    },
    runs: NETWORK_RUNS,
  },
  {
    // The solve method of a prepared network, with a case and options.
    name: 'prepareNetwork',
    valid: fc.tuple(networkWithCase, solveOptions).map(([[d, c], o]) => [d, c, o]),
    call: (d: NetworkDefinition, c: NetworkCase, o: never) => api.prepareNetwork(d).solve(c, o),
    validMayThrow: ['NO_SOLUTION', 'OUT_OF_RANGE'],
    runs: NETWORK_RUNS,
  },
];
