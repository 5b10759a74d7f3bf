/** Fuzz entries of systems and pumps. See tests/fuzz/harness.ts. */
import fc from 'fast-check';
import type {
  Flow,
  Length,
  PipeRunInput,
  Pump,
  PumpCurve,
  SystemCurve,
  SystemDefinition,
} from '../../../src/index';
import * as api from '../../../src/index';
import { type FuzzEntry, logUniform, optionsOf, uniform } from '../harness';

const fittingId = fc.constantFrom(...api.fittingIds());
const diameter = logUniform(0.025, 1);

/** A run as a user writes it: diameter, length, roughness or material, fittings, valves. */
const runInput: fc.Arbitrary<PipeRunInput> = fc
  .record({
    name: fc.constantFrom('suction', 'discharge', 'riser', 'header'),
    length: uniform(0, 2000),
    insideDiameter: diameter,
    roughness: logUniform(1e-7, 5e-4),
    material: fc.constantFrom(...api.MATERIAL_NAMES),
    fittings: fc.array(fc.record({ id: fittingId, count: fc.integer({ min: 0, max: 6 }) }), {
      maxLength: 3,
    }),
    valves: fc.array(
      fc.oneof(
        fc.record({ cv: logUniform(10, 5000) }),
        fc.record({ kv: logUniform(10, 5000) }),
        fc.record({ k: uniform(0, 20) }),
      ),
      { maxLength: 2 },
    ),
    elevationChange: uniform(-50, 50),
    useMaterial: fc.boolean(),
  })
  .map(({ useMaterial, roughness, material, ...r }) =>
    useMaterial
      ? ({ ...r, material } as unknown as PipeRunInput)
      : ({ ...r, roughness, agedRoughness: roughness * 4 } as unknown as PipeRunInput),
  );

/** A run of length 0 with nothing in it: a branch without resistance. */
const bareRun: PipeRunInput = {
  length: 0 as Length,
  insideDiameter: 0.1 as Length,
  roughness: 0 as Length,
};

const parallel = fc
  .tuple(
    fc.array(fc.array(runInput, { minLength: 1, maxLength: 2 }), { minLength: 2, maxLength: 3 }),
    fc.boolean(),
  )
  .map(([branches, bare]) => ({
    kind: 'parallel' as const,
    name: 'bypass',
    branches: bare ? [...branches, [bareRun]] : branches,
  }));

export const systemDefinition: fc.Arbitrary<SystemDefinition> = fc.record(
  {
    name: fc.constant('test loop'),
    fluid: fc.record({
      temperature: uniform(275, 360),
      pressure: fc.constant(101325),
      density: uniform(700, 1300),
      dynamicViscosity: logUniform(3e-4, 0.1),
      kinematicViscosity: logUniform(3e-7, 1e-4),
      vaporPressure: uniform(0, 2e4),
    }),
    suction: fc.record({ elevation: uniform(-10, 10), pressure: uniform(5e4, 3e5) }),
    discharge: fc.record(
      { elevation: uniform(0, 80), pressure: uniform(5e4, 5e5), velocityDiameter: diameter },
      { requiredKeys: ['elevation', 'pressure'] },
    ),
    runs: fc.array(
      fc.oneof({ weight: 4, arbitrary: runInput }, { weight: 1, arbitrary: parallel }),
      {
        minLength: 1,
        maxLength: 3,
      },
    ),
    friction: fc.record(
      {
        method: fc.constantFrom(...api.TURBULENT_METHODS),
        transition: fc.constantFrom('conservative', 'interpolate'),
      },
      { requiredKeys: [] },
    ),
    aged: fc.boolean(),
  },
  { requiredKeys: ['fluid', 'suction', 'discharge', 'runs'] },
) as unknown as fc.Arbitrary<SystemDefinition>;

const flow = fc.oneof(fc.constant(0), logUniform(1e-6, 2), uniform(0, 0.5)) as fc.Arbitrary<Flow>;

/** Catalogue points of a falling head curve with efficiency and NPSH required. */
const catalogue = fc
  .record({
    n: fc.integer({ min: 3, max: 8 }),
    h0: logUniform(5, 300),
    qMax: logUniform(1e-3, 2),
    drop: uniform(0.2, 0.8),
    bep: uniform(0.45, 0.9),
    npsh0: uniform(0.5, 5),
    withNpsh: fc.boolean(),
    firstAboveZero: fc.boolean(),
  })
  .map(({ n, h0, qMax, drop, bep, npsh0, withNpsh, firstAboveZero }) =>
    Array.from({ length: n }, (_, i) => {
      const x = (i + (firstAboveZero ? 1 : 0)) / (n - 1 + (firstAboveZero ? 1 : 0));
      const e = i === 0 && !firstAboveZero ? 0 : Math.max(0.05, bep * (1 - (x - 0.6) ** 2 / 0.36));
      return {
        flow: qMax * x,
        head: h0 * (1 - drop * x * x),
        efficiency: Math.min(1, e),
        ...(withNpsh ? { npshRequired: npsh0 * (1 + 2 * x * x) } : {}),
      };
    }),
  );

const fit = fc.constantFrom<PumpCurveFit>(
  undefined,
  {
    head: { method: 'monotone' },
    efficiency: { method: 'monotone' },
    npshRequired: { method: 'monotone' },
  },
  { head: { method: 'polynomial', degree: 2 }, efficiency: { method: 'polynomial', degree: 2 } },
);
type PumpCurveFit = api.PumpCurveInput['fit'];

export const pumpInput = fc
  .record(
    {
      speed: uniform(100, 400),
      points: catalogue,
      impellerDiameter: uniform(0.1, 0.5),
      fit,
      extrapolateShutoff: fc.boolean(),
      regions: fc.record(
        {
          preferred: fc.constant([0.7, 1.2] as const),
          allowable: fc.constant([0.5, 1.3] as const),
        },
        { requiredKeys: [] },
      ),
    },
    { requiredKeys: ['speed', 'points'] },
  )
  .map((r) =>
    r.fit === undefined ? (({ fit: _, ...rest }) => rest)(r) : r,
  ) as unknown as fc.Arbitrary<api.PumpCurveInput>;

/** A flow at a fraction of a range, or the (hostile) fraction itself when it is no number. */
function flowAt(range: api.FlowRange, at: unknown): Flow {
  return (typeof at === 'number' ? range.min + (range.max - range.min) * at : at) as Flow;
}

/** A pump from the catalogue points, or null where the random points make no curve. */
function tryPump(input: api.PumpCurveInput): PumpCurve | null {
  try {
    return api.pumpCurve(input);
  } catch {
    return null;
  }
}

const pump = pumpInput.map(tryPump).filter((p): p is PumpCurve => p !== null);

/** A simple system curve H = hs + k Q^2 that a pump of the same draw meets. */
const quadraticSystem = fc
  .tuple(pump, uniform(0, 0.9), uniform(0.2, 1.5))
  .map(([p, hsShare, flowShare]) => {
    const h0 = p.head(p.flowRange.min) as number;
    const qd = p.flowRange.min + (p.flowRange.max - p.flowRange.min) * Math.min(1, flowShare);
    const hs = h0 * hsShare;
    const k = Math.max(0, ((p.head(qd as Flow) as number) - hs) / Math.max(qd * qd, 1e-12));
    return [
      p,
      { staticHead: hs as Length, head: (q: Flow) => (hs + k * q * q) as Length },
    ] as const;
  });

export const machineEntries: readonly FuzzEntry[] = [
  {
    name: 'pipeRun',
    valid: fc.tuple(runInput, fc.integer({ min: 1, max: 20 }), fc.boolean()),
    call: api.pipeRun,
    // Aged pipe needs an aged roughness that some materials do not list.
    validMayThrow: ['INVALID_ARGUMENT'],
  },
  {
    name: 'systemCurve',
    valid: fc.tuple(systemDefinition, flow),
    call: (d: SystemDefinition, q: Flow) => {
      const s = api.systemCurve(d);
      return [s.staticHead, s.head(q), s.details(q), s.headInto([q, 0], new Float64Array(2))];
    },
    validMayThrow: ['INVALID_ARGUMENT', 'OUT_OF_RANGE'],
  },
  {
    name: 'runsOf',
    valid: fc.tuple(systemDefinition),
    call: api.runsOf,
    validMayThrow: ['INVALID_ARGUMENT'],
  },
  {
    name: 'dutyFor',
    valid: fc.tuple(systemDefinition, flow).map(([d, q]) => {
      try {
        return [api.systemCurve(d), q];
      } catch {
        return [api.systemCurve({ ...d, aged: false, runs: [bareRun] }), q];
      }
    }),
    call: (s: SystemCurve, q: Flow) => api.dutyFor(s, q),
    check: (r, args) => {
      // No flow, no friction factor: absent, never Infinity.
      if (args[1] === 0)
        for (const run of (r as api.SystemPoint).runs)
          if (run.frictionFactor !== undefined) throw new Error('friction factor at zero flow');
    },
    validMayThrow: ['OUT_OF_RANGE'],
  },
  {
    name: 'applyCase',
    valid: fc.tuple(
      systemDefinition,
      fc.record(
        {
          name: fc.constant('low level'),
          suction: fc.record({ elevation: uniform(-20, 0) }),
          aged: fc.boolean(),
        },
        { requiredKeys: ['name'] },
      ),
    ),
    call: api.applyCase,
    validMayThrow: ['INVALID_ARGUMENT'],
  },
  {
    name: 'systemScenarios',
    valid: fc.tuple(
      systemDefinition,
      fc
        .array(
          fc.record({ name: fc.string({ minLength: 1, maxLength: 8 }).map((s) => `case ${s}`) }),
          { maxLength: 3 },
        )
        .map((cs) => cs.filter((c, i) => cs.findIndex((d) => d.name === c.name) === i)),
    ),
    call: (d: SystemDefinition, cases: api.OperatingCase[]) =>
      api.systemScenarios(d, cases).map((s) => [s.name, s.curve.head(0.01 as Flow)]),
    validMayThrow: ['INVALID_ARGUMENT', 'OUT_OF_RANGE'],
  },

  // pumps
  {
    name: 'pumpCurve',
    valid: fc.tuple(pumpInput, uniform(0, 1), uniform(0.8, 1.2)),
    call: (input: api.PumpCurveInput, at: number, speedRatio: number) => {
      const p = api.pumpCurve(input);
      const q = flowAt(p.flowRange, at);
      const scaled = p.atSpeed(
        (typeof speedRatio === 'number' ? p.speed * speedRatio : speedRatio) as never,
      );
      const out: unknown[] = [
        p,
        p.head(q),
        p.shares(q),
        p.efficiency(q),
        p.shaftPower(q, 998 as never),
      ];
      if (p.npshRange)
        out.push(p.npshRequired(Math.max(p.npshRange.min, Math.min(p.npshRange.max, q)) as Flow));
      out.push(scaled, scaled.head(scaled.flowRange.max));
      if (p.impellerDiameter !== undefined)
        out.push(p.trimmedTo((p.impellerDiameter * 0.95) as never));
      return out;
    },
    // Random catalogue points may not admit the chosen fit.
    validMayThrow: ['INVALID_ARGUMENT'],
  },
  {
    name: 'operatingPoint',
    valid: fc
      .tuple(
        quadraticSystem,
        optionsOf(fc.record({ density: uniform(700, 1300) }, { requiredKeys: [] })),
      )
      .map(([[p, s], o]) => [p, s, o]),
    call: api.operatingPoint,
    validMayThrow: ['NO_SOLUTION'],
  },
  {
    name: 'pumpsInParallel',
    valid: fc.tuple(fc.array(pump, { minLength: 1, maxLength: 3 }), fc.boolean(), uniform(0, 1)),
    call: (pumps: Pump[], nest: boolean, at: number) => {
      const group = api.pumpsInParallel(pumps);
      const p = nest ? api.pumpsInParallel([group, pumps[0] as Pump]) : group;
      const q = flowAt(p.flowRange, at);
      const out: unknown[] = [p.flowRange, p.bestEfficiencyPoint, p.head(q), p.shares(q)];
      if (p.npshRange) {
        out.push(p.npshRequired(p.npshRange.min), p.npshRequired(p.npshRange.max));
        out.push(p.npshRequired(flowAt(p.npshRange, at)));
      }
      return out;
    },
    // Random pumps need not share a head range.
    validMayThrow: ['NO_SOLUTION'],
  },
  {
    name: 'pumpsInSeries',
    valid: fc.tuple(fc.array(pump, { minLength: 1, maxLength: 3 }), uniform(0, 1)),
    call: (pumps: Pump[], at: number) => {
      const p = api.pumpsInSeries(pumps);
      const q = flowAt(p.flowRange, at);
      return [p.flowRange, p.bestEfficiencyPoint, p.head(q), p.shares(q)];
    },
    // Random pumps need not share a flow range.
    validMayThrow: ['NO_SOLUTION'],
  },
  {
    name: 'speedForFlow',
    valid: fc
      .tuple(quadraticSystem, uniform(0.3, 1))
      .map(([[p, s], share]) => [p, s, (p.flowRange.max * share) as Flow]),
    call: api.speedForFlow,
    validMayThrow: ['NO_SOLUTION', 'OUT_OF_RANGE'],
  },
  {
    name: 'annualEnergy',
    valid: fc
      .tuple(
        quadraticSystem,
        fc.array(fc.tuple(uniform(0.3, 1), uniform(0, 8760)), { minLength: 1, maxLength: 4 }),
        fc.constantFrom('speed', 'throttle'),
      )
      .map(([[p, s], rows, control]) => [
        {
          pump: p,
          system: s,
          profile: rows.map(([share, hours]) => ({ flow: p.flowRange.max * share * 0.8, hours })),
          density: 998,
          motorEfficiency: 0.92,
          control,
          price: { perKWh: 0.15, currency: 'EUR' },
        },
      ]),
    call: api.annualEnergy,
    validMayThrow: ['NO_SOLUTION', 'OUT_OF_RANGE'],
  },
  {
    name: 'motorForPump',
    valid: fc
      .tuple(pump, fc.constantFrom('nema', 'iec'), uniform(0.1, 1))
      .map(([p, series, share]) => [
        { pump: p, density: 998, dutyFlow: p.flowRange.max * share, series },
      ]),
    call: api.motorForPump,
    validMayThrow: ['OUT_OF_RANGE'],
  },
  {
    name: 'selectMotor',
    valid: fc.tuple(
      uniform(0, 3e5),
      fc.record(
        { series: fc.constantFrom('nema', 'iec'), serviceFactor: uniform(1, 1.5) },
        { requiredKeys: ['series'] },
      ),
    ),
    call: api.selectMotor,
    validMayThrow: ['OUT_OF_RANGE'],
  },
  {
    name: 'npshAvailable',
    valid: fc.tuple(
      fc.record({
        surfacePressure: uniform(5e4, 5e5),
        vaporPressure: uniform(0, 5e4),
        density: uniform(700, 1300),
        staticHeadAboveImpeller: uniform(-8, 30),
        suctionLoss: uniform(0, 5),
      }),
    ),
    call: api.npshAvailable,
  },
  {
    name: 'npshMargin',
    valid: fc.tuple(
      fc.record(
        {
          available: uniform(-5, 30),
          required: uniform(0.5, 15),
          marginRatio: uniform(1, 2),
          minimumMargin: uniform(0, 3),
        },
        { requiredKeys: ['available', 'required'] },
      ),
    ),
    call: api.npshMargin,
  },
  {
    name: 'hydraulicPower',
    valid: fc.tuple(uniform(0, 5), uniform(0, 500), uniform(500, 2000)),
    call: api.hydraulicPower,
  },
  {
    name: 'powerChain',
    valid: fc.tuple(
      fc.record(
        {
          flow: uniform(0, 5),
          head: uniform(0, 500),
          density: uniform(500, 2000),
          pumpEfficiency: uniform(0.05, 1),
          motorEfficiency: uniform(0.5, 1),
          driveEfficiency: uniform(0.5, 1),
        },
        { requiredKeys: ['flow', 'head', 'density', 'pumpEfficiency'] },
      ),
    ),
    call: api.powerChain,
  },
  {
    name: 'specificSpeed',
    valid: fc.tuple(
      uniform(50, 600),
      logUniform(1e-4, 5),
      logUniform(1, 500),
      fc.constantFrom('si', 'us', undefined),
    ),
    call: api.specificSpeed,
  },
  {
    name: 'suctionSpecificSpeed',
    valid: fc.tuple(
      uniform(50, 600),
      logUniform(1e-4, 5),
      logUniform(0.3, 30),
      fc.constantFrom('si', 'us', undefined),
    ),
    call: api.suctionSpecificSpeed,
  },
  {
    name: 'minimumSubmergence',
    valid: fc.tuple(
      fc.record(
        { flow: logUniform(1e-4, 20), inletDiameter: logUniform(0.05, 3), g: uniform(9.7, 9.9) },
        { requiredKeys: ['flow', 'inletDiameter'] },
      ),
    ),
    call: api.minimumSubmergence,
  },
  {
    name: 'temperatureRise',
    valid: fc
      .tuple(
        logUniform(10, 5e6),
        uniform(0, 1),
        uniform(500, 2000),
        uniform(1500, 4500),
        logUniform(1e-5, 5),
      )
      .map(([shaft, share, rho, cp, q]) => [shaft, shaft * share, rho, cp, q]),
    call: api.temperatureRise,
  },
  {
    name: 'viscosityCorrectionFactors',
    valid: fc.tuple(
      fc.record({
        flowAtBep: logUniform(1e-4, 3),
        headAtBep: logUniform(2, 300),
        speed: uniform(50, 400),
        kinematicViscosity: logUniform(1e-7, api.VISCOSITY_NU_MAX),
      }),
      optionsOf(fc.record({ stages: fc.integer({ min: 1, max: 10 }) }, { requiredKeys: [] })),
      uniform(0, 1.5),
    ),
    call: (input: api.ViscosityFactorsInput, options: never, share: number) => {
      const f = api.viscosityCorrectionFactors(input, options);
      const at = typeof share === 'number' && typeof input?.flowAtBep === 'number';
      return [f, f.headAt((at ? input.flowAtBep * share : share) as Flow)];
    },
    // B of 40 and above, or above 3000 cSt: outside the method.
    validMayThrow: ['OUT_OF_RANGE'],
  },
  {
    name: 'correctForViscosity',
    valid: fc.tuple(
      pump,
      fc.record({
        temperature: uniform(275, 360),
        pressure: fc.constant(101325),
        density: uniform(700, 1300),
        dynamicViscosity: logUniform(3e-4, 1),
        kinematicViscosity: logUniform(1e-7, api.VISCOSITY_NU_MAX),
      }),
      optionsOf(
        fc.record(
          { stages: fc.integer({ min: 1, max: 6 }), points: fc.integer({ min: 5, max: 60 }) },
          { requiredKeys: [] },
        ),
      ),
      uniform(0, 1),
    ),
    call: (p: PumpCurve, state: never, options: never, at: number) => {
      const c = api.correctForViscosity(p, state, options);
      const q = flowAt(c.curve.flowRange, at);
      return [c.applied, c.factors, c.curve.head(q), c.curve.efficiency(q)];
    },
    // B of 40 and above, or above 3000 cSt: outside the method.
    validMayThrow: ['OUT_OF_RANGE'],
  },

  // surge
  {
    name: 'joukowskyHead',
    valid: fc.tuple(uniform(100, 1500), uniform(0, 10), uniform(9.7, 9.9)),
    call: api.joukowskyHead,
  },
  {
    name: 'closureSurgeHead',
    valid: fc.tuple(
      fc.record(
        {
          waveSpeed: uniform(100, 1500),
          length: logUniform(1, 1e5),
          velocityChange: uniform(0, 10),
          closureTime: uniform(0, 600),
          g: uniform(9.7, 9.9),
        },
        { requiredKeys: ['waveSpeed', 'length', 'velocityChange', 'closureTime'] },
      ),
    ),
    call: api.closureSurgeHead,
  },
  {
    name: 'restraintFactor',
    valid: fc.tuple(
      fc.oneof(
        fc.record(
          {
            anchoring: fc.constantFrom(...api.PIPE_ANCHORINGS),
            poissonRatio: uniform(0, 0.5),
            wall: fc.constant('thin' as const),
          },
          { requiredKeys: ['anchoring', 'poissonRatio'] },
        ),
        fc.record({
          anchoring: fc.constantFrom(...api.PIPE_ANCHORINGS),
          poissonRatio: uniform(0, 0.5),
          wall: fc.constant('thick' as const),
          insideDiameter: logUniform(0.01, 3),
          wallThickness: logUniform(5e-4, 0.1),
        }),
      ),
    ),
    call: api.restraintFactor,
  },
  {
    name: 'waveSpeed',
    valid: fc.tuple(
      fc.oneof(
        fc.record({ bulkModulus: logUniform(1e8, 3e9), density: uniform(500, 2000) }),
        fc.record(
          {
            bulkModulus: logUniform(1e8, 3e9),
            density: uniform(500, 2000),
            insideDiameter: logUniform(0.01, 3),
            wallThickness: logUniform(5e-4, 0.1),
            elasticModulus: logUniform(5e8, 2.2e11),
            anchoring: fc.constantFrom(...api.PIPE_ANCHORINGS),
            poissonRatio: uniform(0, 0.5),
            wall: fc.constantFrom('thin' as const, 'thick' as const),
          },
          {
            requiredKeys: [
              'bulkModulus',
              'density',
              'insideDiameter',
              'wallThickness',
              'elasticModulus',
              'anchoring',
              'poissonRatio',
            ],
          },
        ),
        fc.record({
          bulkModulus: logUniform(1e8, 3e9),
          density: uniform(500, 2000),
          insideDiameter: logUniform(0.01, 3),
          wallThickness: logUniform(5e-4, 0.1),
          elasticModulus: logUniform(5e8, 2.2e11),
          restraintFactor: uniform(0.5, 1.5),
        }),
      ),
    ),
    call: api.waveSpeed,
  },
];
