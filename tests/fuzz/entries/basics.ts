/** Fuzz entries of units, fluids, pipes, friction and losses. See tests/fuzz/harness.ts. */
import fc from 'fast-check';
import type { Flow, Length, Temperature } from '../../../src/index';
import * as api from '../../../src/index';
import { type FuzzEntry, logUniform, optionsOf, uniform } from '../harness';

const {
  UNITS,
  DIMENSIONS,
  MATERIAL_NAMES,
  STEEL_PIPE_SIZES,
  STEEL_SCHEDULES,
  PVC_PIPE_SIZES,
  COPPER_TUBE_SIZES,
  TURBULENT_METHODS,
} = api;

const unitSymbols = Object.keys(UNITS) as (keyof typeof UNITS)[];
const unit = fc.constantFrom(...unitSymbols);
/** Values of any sign and size that a user may write in a unit (not near overflow). */
const plainValue = fc.oneof(uniform(-1e6, 1e6), logUniform(1e-9, 1e9));
/** A unit and a value in it that lies above absolute zero. */
const valueInUnit = fc
  .tuple(plainValue, unit)
  .map(([v, u]): [number, (typeof unitSymbols)[number]] => {
    const d = UNITS[u];
    return d.dimension === 'temperature' ? [Math.abs(v) - d.offset * 0.5, u] : [v, u];
  });

const re = logUniform(1e-3, 1e9);
const roughness = fc.oneof(fc.constant(0), logUniform(1e-8, 0.1));
const roughOptions = optionsOf(
  fc.record({ allowLargeRoughness: fc.boolean() }, { requiredKeys: [] }),
);
const diameter = logUniform(1e-3, 5) as fc.Arbitrary<Length>;
const ffOptions = optionsOf(
  fc.record(
    {
      method: fc.constantFrom(...TURBULENT_METHODS),
      transition: fc.constantFrom('conservative', 'interpolate'),
      allowLargeRoughness: fc.boolean(),
    },
    { requiredKeys: [] },
  ),
);
const reArray = fc.array(re, { minLength: 0, maxLength: 8 }).map((a) => Float64Array.from(a));

/** Water states inside IF97 region 1 (liquid), with a margin from boiling. */
const liquidTemperature = uniform(273.15, 440) as fc.Arbitrary<Temperature>;
const liquidPressure = logUniform(1e6, 1e8);

const fittingId = fc.constantFrom(...api.fittingIds());
const constantDef = fc.record({
  name: fc.constantFrom('brine', 'glycol mix', 'oil'),
  density: logUniform(500, 2000),
  dynamicViscosity: logUniform(1e-4, 1),
  vaporPressure: logUniform(1, 5e4),
});
const tableDef = fc
  .tuple(fc.integer({ min: 2, max: 6 }), uniform(250, 300), logUniform(1, 20))
  .map(([n, t0, step]) => ({
    name: 'test liquid',
    rows: Array.from({ length: n }, (_, i) => ({
      temperature: t0 + i * step,
      density: 1000 - i,
      dynamicViscosity: 1e-3 / (1 + i),
      vaporPressure: 1000 * (1 + i),
    })),
  }));

const ratedPoint = fc.record({ pressureDrop: logUniform(1, 1e6), flow: logUniform(1e-5, 10) });
const curvePoints = fc
  .tuple(fc.integer({ min: 2, max: 6 }), logUniform(1e-4, 1), logUniform(10, 1e5))
  .map(([n, q0, p0]) =>
    Array.from({ length: n }, (_, i) => ({ flow: q0 * (i + 1), pressureDrop: p0 * (i + 1) ** 2 })),
  );
const flowArg = fc.oneof(uniform(-10, 10), logUniform(1e-9, 100)) as fc.Arbitrary<Flow>;

/** The functions that share an entry shape, by name (a static table: no dynamic namespace access). */
const FUNCTIONS = {
  colebrook: api.colebrook,
  colebrookSolve: api.colebrookSolve,
  swameeJain: api.swameeJain,
  haaland: api.haaland,
  churchill: api.churchill,
  serghides: api.serghides,
  zigrangSylvester: api.zigrangSylvester,
  goudarSonnad: api.goudarSonnad,
  chen: api.chen,
  suddenExpansionK: api.suddenExpansionK,
  gradualExpansionK: api.gradualExpansionK,
  suddenContractionK: api.suddenContractionK,
  gradualContractionK: api.gradualContractionK,
  kFromCv: api.kFromCv,
  cvFromK: api.cvFromK,
  kFromKv: api.kFromKv,
  kvFromK: api.kvFromK,
} as const;

export const basicEntries: readonly FuzzEntry[] = [
  // units
  { name: 'q', valid: valueInUnit.map(([v, u]) => [v, u]), call: api.q },
  {
    name: 'to',
    valid: fc
      .tuple(plainValue, unit)
      .map(([v, u]) => [UNITS[u].dimension === 'temperature' ? Math.abs(v) : v, u]),
    call: api.to,
  },
  {
    name: 'convert',
    valid: fc.tuple(valueInUnit, fc.nat()).map(([[v, u], i]) => {
      const same = unitSymbols.filter((s) => UNITS[s].dimension === UNITS[u].dimension);
      return [v, u, same[i % same.length]];
    }),
    call: api.convert,
  },
  { name: 'isUnit', valid: fc.tuple(fc.oneof(unit, fc.string())), call: api.isUnit },
  { name: 'unitsOf', valid: fc.tuple(fc.constantFrom(...DIMENSIONS)), call: api.unitsOf },
  { name: 'si', valid: fc.tuple(plainValue), call: api.si, identity: true },
  {
    name: 'parseQuantity',
    valid: fc
      .tuple(valueInUnit, fc.boolean())
      .map(([[v, u], withDim]) => (withDim ? [`${v} ${u}`, UNITS[u].dimension] : [`${v} ${u}`])),
    call: api.parseQuantity,
  },
  {
    name: 'formatQuantity',
    valid: fc
      .tuple(plainValue, unit, fc.option(fc.integer({ min: 1, max: 17 }), { nil: undefined }))
      .map(([v, u, d]) => [UNITS[u].dimension === 'temperature' ? Math.abs(v) : v, u, d]),
    call: api.formatQuantity,
  },
  {
    name: 'gaugeToAbsolute',
    valid: fc.tuple(uniform(-5e4, 1e8), fc.option(uniform(6e4, 1.1e5), { nil: undefined })),
    call: api.gaugeToAbsolute,
  },
  {
    name: 'absoluteToGauge',
    valid: fc.tuple(uniform(0, 1e8), fc.option(uniform(6e4, 1.1e5), { nil: undefined })),
    call: api.absoluteToGauge,
  },
  {
    name: 'headFromPressure',
    valid: fc.tuple(
      uniform(-1e8, 1e8),
      logUniform(1, 2e4),
      fc.option(uniform(1, 30), { nil: undefined }),
    ),
    call: api.headFromPressure,
  },
  {
    name: 'pressureFromHead',
    valid: fc.tuple(
      uniform(-1e4, 1e4),
      logUniform(1, 2e4),
      fc.option(uniform(1, 30), { nil: undefined }),
    ),
    call: api.pressureFromHead,
  },

  // fluids
  {
    name: 'water',
    // At the standard atmosphere (no pressure given) water boils at 373.12 K.
    valid: fc.oneof(
      fc.tuple(liquidTemperature, liquidPressure),
      fc.tuple(uniform(273.15, 370), fc.constant(undefined)),
    ),
    call: (t: number, p: number | undefined) => {
      const w = api.water();
      const temps = [t, t];
      return [
        w.at(t as Temperature, p as never),
        w.densityInto(temps, new Float64Array(2), p as never),
        w.dynamicViscosityInto(temps, new Float64Array(2), p as never),
        w.vaporPressureInto(temps, new Float64Array(2)),
      ];
    },
  },
  {
    name: 'waterDensity',
    valid: fc.tuple(liquidTemperature, liquidPressure),
    call: api.waterDensity,
  },
  {
    name: 'waterViscosity',
    valid: fc.tuple(liquidTemperature, liquidPressure),
    call: api.waterViscosity,
  },
  {
    name: 'waterDensityInto',
    valid: fc
      .tuple(fc.array(liquidTemperature, { maxLength: 5 }), liquidPressure)
      .map(([t, p]) => [Float64Array.from(t), p, new Float64Array(t.length)]),
    call: api.waterDensityInto,
  },
  {
    name: 'waterViscosityInto',
    valid: fc
      .tuple(fc.array(liquidTemperature, { maxLength: 5 }), liquidPressure)
      .map(([t, p]) => [Float64Array.from(t), p, new Float64Array(t.length)]),
    call: api.waterViscosityInto,
  },
  {
    name: 'waterSaturationPressure',
    valid: fc.tuple(uniform(273.16, 647.096)),
    call: api.waterSaturationPressure,
  },
  {
    name: 'waterSaturationPressureInto',
    valid: fc
      .array(uniform(273.16, 647.096), { maxLength: 5 })
      .map((t) => [Float64Array.from(t), new Float64Array(t.length)]),
    call: api.waterSaturationPressureInto,
  },
  {
    name: 'waterSaturationTemperature',
    valid: fc.tuple(uniform(611.2127, 22.064e6)),
    call: api.waterSaturationTemperature,
  },
  {
    name: 'constantFluid',
    valid: fc.tuple(
      constantDef,
      uniform(250, 400),
      fc.option(logUniform(1e3, 1e7), { nil: undefined }),
    ),
    call: (def: never, t: Temperature, p: never) => {
      const f = api.constantFluid(def);
      const temps = [t];
      return [
        f.at(t, p),
        f.densityInto(temps, new Float64Array(1), p),
        f.dynamicViscosityInto(temps, new Float64Array(1), p),
        f.vaporPressureInto(temps, new Float64Array(1)),
        f.validRange,
      ];
    },
    // A constant fluid holds at any temperature: its range is documented as 0 K to Infinity.
    documentedInfinity: ['$[4].maxTemperature'],
  },
  {
    name: 'tabulatedFluid',
    valid: fc.tuple(tableDef, fc.double({ min: 0, max: 1, noNaN: true })),
    call: (def: { rows: { temperature: number }[] }, s: number) => {
      const f = api.tabulatedFluid(def as never);
      const lo = def.rows[0]?.temperature ?? 0;
      const hi = def.rows[def.rows.length - 1]?.temperature ?? 0;
      const t = (lo + (hi - lo) * (typeof s === 'number' ? s : 0)) as Temperature;
      const temps = [t];
      return [
        f.at(t),
        f.densityInto(temps, new Float64Array(1)),
        f.dynamicViscosityInto(temps, new Float64Array(1)),
        f.vaporPressureInto(temps, new Float64Array(1)),
      ];
    },
  },

  // pipes
  {
    name: 'pipeSize',
    valid: fc.tuple(fc.constantFrom(...STEEL_PIPE_SIZES), fc.constantFrom(...STEEL_SCHEDULES)),
    call: api.pipeSize,
    // Not every size is made in every schedule.
    validMayThrow: ['OUT_OF_RANGE', 'UNKNOWN_NAME'],
  },
  {
    name: 'steelSchedules',
    valid: fc.tuple(fc.constantFrom(...STEEL_PIPE_SIZES)),
    call: api.steelSchedules,
  },
  {
    name: 'pvcPipe',
    valid: fc.tuple(fc.constantFrom(...PVC_PIPE_SIZES), fc.constantFrom('40', '80')),
    call: api.pvcPipe,
  },
  {
    name: 'copperTube',
    valid: fc.tuple(fc.constantFrom(...COPPER_TUBE_SIZES), fc.constantFrom('K', 'L', 'M')),
    call: api.copperTube,
    validMayThrow: ['OUT_OF_RANGE'],
  },
  { name: 'flowArea', valid: fc.tuple(diameter), call: api.flowArea },
  { name: 'material', valid: fc.tuple(fc.constantFrom(...MATERIAL_NAMES)), call: api.material },

  // friction
  ...(
    [
      'colebrook',
      'colebrookSolve',
      'swameeJain',
      'haaland',
      'churchill',
      'serghides',
      'zigrangSylvester',
      'goudarSonnad',
      'chen',
    ] as const
  ).map(
    (name): FuzzEntry => ({
      name,
      valid: fc.tuple(re, roughness, roughOptions),
      call: FUNCTIONS[name],
      validMayThrow:
        name === 'colebrook' || name === 'colebrookSolve' || name === 'churchill'
          ? []
          : ['OUT_OF_RANGE'],
    }),
  ),
  { name: 'laminar', valid: fc.tuple(logUniform(1e-6, 2300)), call: api.laminar },
  {
    name: 'blasius',
    valid: fc.tuple(logUniform(4000, 1e5)),
    call: api.blasius,
    validMayThrow: ['OUT_OF_RANGE'],
  },
  {
    name: 'colebrookResidual',
    valid: fc.tuple(logUniform(2000, 1e9), roughness, logUniform(0.005, 0.1)),
    call: api.colebrookResidual,
  },
  {
    name: 'frictionFactor',
    valid: fc.tuple(re, roughness, ffOptions),
    call: api.frictionFactor,
    validMayThrow: ['OUT_OF_RANGE'],
  },
  {
    name: 'colebrookInto',
    valid: fc
      .tuple(reArray, roughness, roughOptions)
      .map(([r, k, o]) => [r, k, new Float64Array(r.length), o]),
    call: api.colebrookInto,
  },
  {
    name: 'frictionFactorInto',
    valid: fc
      .tuple(reArray, roughness, ffOptions)
      .map(([r, k, o]) => [r, Float64Array.from(r, () => k), new Float64Array(r.length), o]),
    call: api.frictionFactorInto,
    validMayThrow: ['OUT_OF_RANGE'],
  },
  {
    name: 'darcyHeadLoss',
    valid: fc.tuple(
      logUniform(0.005, 0.2),
      uniform(0, 1e5),
      diameter,
      uniform(-20, 20),
      fc.option(uniform(1, 30), { nil: undefined }),
    ),
    call: api.darcyHeadLoss,
  },
  {
    name: 'pressureDrop',
    valid: fc.tuple(
      logUniform(0.005, 0.2),
      uniform(0, 1e5),
      diameter,
      uniform(-20, 20),
      logUniform(1, 2e4),
    ),
    call: api.pressureDrop,
  },
  {
    name: 'reynolds',
    valid: fc.tuple(logUniform(1e-6, 50), diameter, logUniform(1e-7, 1e-2)),
    call: api.reynolds,
  },
  {
    name: 'reynoldsFromFlow',
    valid: fc.tuple(logUniform(1e-9, 50), diameter, logUniform(1e-7, 1e-2)),
    call: api.reynoldsFromFlow,
  },
  {
    name: 'hazenWilliamsHeadLoss',
    valid: fc.tuple(uniform(0, 20), uniform(0, 1e5), diameter, uniform(40, 160)),
    call: api.hazenWilliamsHeadLoss,
  },

  // losses
  { name: 'fittingIds', valid: fc.constant([]), call: api.fittingIds },
  { name: 'fitting', valid: fc.tuple(fittingId), call: api.fitting },
  {
    name: 'fittingK',
    valid: fc.tuple(
      fittingId,
      logUniform(1, 1e8),
      diameter,
      optionsOf(
        fc.record(
          { method: fc.constantFrom('3K', '2K', 'constant'), sizeDiameter: diameter },
          { requiredKeys: [] },
        ),
      ),
    ),
    call: api.fittingK,
    // An entry has no constants for some methods.
    validMayThrow: ['INVALID_ARGUMENT', 'UNKNOWN_NAME'],
  },
  {
    name: 'fittingSet',
    valid: fc.tuple(
      fc.array(
        fc.record(
          { id: fittingId, count: fc.integer({ min: 0, max: 20 }) },
          { requiredKeys: ['id'] },
        ),
        { maxLength: 6 },
      ),
      diameter,
      optionsOf(fc.record({ sizeDiameter: diameter }, { requiredKeys: [] })),
    ),
    call: api.fittingSet,
  },
  {
    name: 'twoK',
    valid: fc.tuple(uniform(0, 2000), uniform(0, 10), logUniform(1, 1e8), diameter),
    call: api.twoK,
  },
  {
    name: 'threeK',
    valid: fc.tuple(uniform(0, 2000), uniform(0, 10), uniform(0, 10), logUniform(1, 1e8), diameter),
    call: api.threeK,
  },
  ...(['suddenExpansionK', 'gradualExpansionK'] as const).map(
    (name): FuzzEntry => ({
      name,
      valid: fc
        .tuple(diameter, logUniform(1, 10), uniform(1, 180))
        .map(([d, r, a]) => [d, d * r, a]),
      call: FUNCTIONS[name],
    }),
  ),
  ...(['suddenContractionK', 'gradualContractionK'] as const).map(
    (name): FuzzEntry => ({
      name,
      valid: fc
        .tuple(diameter, logUniform(1, 10), uniform(1, 180))
        .map(([d, r, a]) => [d * r, d, a]),
      call: FUNCTIONS[name],
    }),
  ),
  {
    name: 'equivalentLength',
    valid: fc.tuple(uniform(0, 1e3), logUniform(0.005, 0.2), diameter),
    call: api.equivalentLength,
  },
  {
    name: 'kFromEquivalentLength',
    valid: fc.tuple(uniform(0, 1e4), logUniform(0.005, 0.2), diameter),
    call: api.kFromEquivalentLength,
  },
  ...(['kFromCv', 'cvFromK', 'kFromKv', 'kvFromK'] as const).map(
    (name): FuzzEntry => ({
      name,
      valid: fc.tuple(logUniform(1e-3, 1e5), diameter),
      call: FUNCTIONS[name],
    }),
  ),
  { name: 'referK', valid: fc.tuple(uniform(-10, 1e4), diameter, diameter), call: api.referK },
  {
    name: 'ratedLoss',
    valid: fc.tuple(ratedPoint, flowArg, logUniform(1, 2e4)),
    call: (rated: never, flow: Flow, rho: never) => {
      const loss = api.ratedLoss(rated);
      return [
        loss.pressureDrop(flow),
        loss.headLoss(flow, rho),
        loss.pressureDropInto([flow], new Float64Array(1)),
      ];
    },
  },
  {
    name: 'curveLoss',
    valid: fc.tuple(curvePoints, flowArg, logUniform(1, 2e4)),
    call: (points: never, flow: Flow, rho: never) => {
      const loss = api.curveLoss(points);
      return [
        loss.pressureDrop(flow),
        loss.headLoss(flow, rho),
        loss.pressureDropInto([flow], new Float64Array(1)),
        loss.covers(flow),
        loss.lastFlow,
      ];
    },
  },
  // IF97 region 1 properties: cold water at any pressure up to 100 MPa, hot water above its
  // saturation pressure (16.5 MPa at 623.15 K).
  ...(
    [
      ['waterSpeedOfSound', api.waterSpeedOfSound],
      ['waterSpecificHeat', api.waterSpecificHeat],
    ] as const
  ).map(
    ([name, fn]): FuzzEntry => ({
      name,
      valid: fc.oneof(
        fc.tuple(uniform(273.15, 370), uniform(1.1e5, 1e8)),
        fc.tuple(uniform(370, 623.15), uniform(1.7e7, 1e8)),
      ),
      call: fn,
    }),
  ),
  { name: 'atmosphereAt', valid: fc.tuple(uniform(-5000, 11_000)), call: api.atmosphereAt },
  {
    name: 'aliasesOf',
    valid: fc.tuple(fc.constantFrom(...api.DIMENSIONS)),
    call: api.aliasesOf,
  },
  {
    name: 'parsePressure',
    valid: fc.tuple(
      fc
        .tuple(
          uniform(0, 1e4),
          fc.constantFrom('psig', 'psia', 'psi', 'barg', 'bara', 'bar', 'kPa(g)', 'kPa', 'MPa'),
        )
        .map(([x, unit]) => `${x} ${unit}`),
      optionsOf(
        fc.record({ unmarked: fc.constantFrom('absolute', 'gauge') }, { requiredKeys: [] }),
      ),
    ),
    call: api.parsePressure,
  },
];
