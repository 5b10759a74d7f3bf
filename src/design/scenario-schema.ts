/**
 * The valibot schema of a scenario file (format `headflow-scenario/1`): the shape of every
 * part, each quantity read with its unit, each name checked against its catalogue. The parts
 * that stand alone (a pipe size, a fitting, a fluid, a pump curve) are built here; the whole
 * design is assembled in `scenario-build.ts`.
 *
 * @module
 */
import * as v from 'valibot';
import { argumentError } from '../errors';
import {
  constantFluid,
  type Fluid,
  type FluidTableRow,
  tabulatedFluid,
  water,
} from '../fluids/index';
import { TURBULENT_METHODS } from '../friction/index';
import {
  type CurveLoss,
  curveLoss,
  fitting,
  fittingIds,
  type RatedLoss,
  ratedLoss,
} from '../losses/index';
import {
  copperTube,
  MATERIAL_NAMES,
  type MaterialName,
  material,
  type PipeDimensions,
  pipeSize,
  pvcPipe,
  STEEL_SCHEDULES,
  type SteelSchedule,
} from '../pipes/index';
import { type CataloguePoint, type PumpCurveInput, pumpCurve } from '../pumps/index';
import type {
  LineElement,
  LossComponent,
  PipeRunInput,
  RunFrictionLaw,
  ValveCoefficient,
} from '../system/index';
import type {
  Density,
  DynamicViscosity,
  Flow,
  Pressure,
  SpecificHeat,
  Temperature,
} from '../units/index';
import { expecting, found, report, reportError } from './scenario-issues';
import {
  choice,
  flag,
  fraction,
  plainNumber,
  pressure,
  quantity,
  text,
  viscosity,
  wholeNumber,
} from './scenario-values';
import type { CandidateInput } from './types';

/** The format name and version a scenario file must declare. */
export const SCENARIO_FORMAT = 'headflow-scenario/1';

const opt = v.exactOptional;

/** `schema` with a description for editors (the JSON Schema's `description`). */
function about<S extends v.GenericSchema>(schema: S, description: string) {
  return v.pipe(schema, v.description(description));
}

/**
 * A JSON object with exactly these fields (unknown fields are errors); the message names the
 * fields that are allowed.
 */
function obj<const E extends v.ObjectEntries>(entries: E, what = 'an object') {
  const keys = Object.keys(entries).join(', ');
  const schema = v.strictObject(entries, (issue) => {
    if (issue.expected === 'never') return `unknown field; the fields here are: ${keys}`;
    if (issue.input === undefined && issue.expected?.startsWith('"')) {
      return 'this field is required';
    }
    return `expected ${what} with the fields ${keys}, found ${found(issue.input)}`;
  });
  // valibot takes a list for an object (its items as fields); a JSON list is not an object.
  const inner = schema['~run'];
  (schema as { '~run': typeof inner })['~run'] = (dataset, config) => {
    if (Array.isArray(dataset.value)) {
      v._addIssue(schema as Parameters<typeof v._addIssue>[0], 'type', dataset, config);
      return dataset as unknown as ReturnType<typeof inner>;
    }
    return inner.call(schema, dataset, config);
  };
  return schema;
}

/** A JSON list of items; `min` items at least. */
function list<S extends v.GenericSchema>(item: S, what: string, min = 0) {
  return v.pipe(
    v.array(item, expecting(`a list of ${what}`)),
    v.minLength(
      min,
      (issue) => `expected at least ${min} ${what}, found ${String(issue.received)}`,
    ),
  );
}

/** Keys of `value` (an object) among `keys` that are given. */
function given(value: unknown, keys: readonly string[]): string[] {
  if (value === null || typeof value !== 'object') return [];
  const record = value as Record<string, unknown>;
  return keys.filter((k) => record[k] !== undefined);
}

/** `schema` with a check that exactly one (or, with `optional`, at most one) of `keys` is given. */
function oneOf<S extends v.GenericSchema<unknown, object>>(
  schema: S,
  keys: readonly string[],
  optional = false,
) {
  const listed = keys.join(', ');
  return v.pipe(
    schema,
    v.check<v.InferOutput<S>, (issue: v.CheckIssue<v.InferOutput<S>>) => string>(
      (value) => {
        const n = given(value, keys).length;
        return optional ? n <= 1 : n === 1;
      },
      (issue) => {
        const present = given(issue.input, keys);
        return present.length === 0
          ? `give one of ${listed}`
          : `give ${optional ? 'at most' : 'only'} one of ${listed}, found ${present.join(' and ')}`;
      },
    ),
    v.metadata<v.InferOutput<S>, Record<string, unknown>>(
      optional
        ? { not: { anyOf: pairs(keys).map((p) => ({ required: p })) } }
        : { oneOf: keys.map((k) => ({ required: [k] })) },
    ),
  );
}

function pairs(keys: readonly string[]): string[][] {
  const out: string[][] = [];
  keys.forEach((a, i) => {
    for (const b of keys.slice(i + 1)) out.push([a, b]);
  });
  return out;
}

/** A name from a catalogue: unknown names are `UNKNOWN_NAME` with the catalogue's message. */
function catalogueName<T extends string>(
  what: string,
  names: readonly T[],
  lookUp: (name: string) => unknown,
) {
  return v.pipe(
    v.unknown(),
    v.metadata({ type: 'string', enum: [...names], description: what }),
    v.rawTransform<unknown, T>((ctx) => {
      const input = ctx.dataset.value;
      if (typeof input !== 'string') {
        report(ctx, 'INVALID_ARGUMENT', `expected ${what} (text), found ${found(input)}`);
        return ctx.NEVER;
      }
      try {
        lookUp(input);
      } catch (e) {
        reportError(ctx, e);
        return ctx.NEVER;
      }
      return input as T;
    }),
  );
}

/** A nominal size: text (`"1-1/4"`, `"4"`) or a number (`4`). */
const nominalSize = v.pipe(
  v.unknown(),
  v.metadata({
    type: ['string', 'number'],
    description: 'nominal size, for example "4" or "1-1/4"',
  }),
  v.rawTransform<unknown, string | number>((ctx) => {
    const input = ctx.dataset.value;
    if (typeof input !== 'string' && typeof input !== 'number') {
      report(
        ctx,
        'INVALID_ARGUMENT',
        `expected a nominal size such as "4" or "1-1/4", found ${found(input)}`,
      );
      return ctx.NEVER;
    }
    return input;
  }),
);

/** A pipe or tube size from a standard, read into its dimensions. */
const pipeSpec = v.pipe(
  v.variant(
    'standard',
    [
      obj({
        standard: v.literal('steel'),
        size: nominalSize,
        schedule: catalogueName<SteelSchedule>('steel pipe schedule', STEEL_SCHEDULES, (s) => {
          if (!(STEEL_SCHEDULES as readonly string[]).includes(s)) {
            throw argumentError(
              'UNKNOWN_NAME',
              'schedule',
              s,
              undefined,
              `a steel pipe schedule: ${STEEL_SCHEDULES.join(', ')}`,
            );
          }
        }),
      }),
      obj({
        standard: v.literal('copper'),
        size: nominalSize,
        type: choice('copper tube type', ['K', 'L', 'M'] as const),
      }),
      obj({
        standard: v.literal('pvc'),
        size: nominalSize,
        schedule: choice('PVC pipe schedule', ['40', '80'] as const),
      }),
    ],
    expecting('a pipe standard: one of "steel", "copper", "pvc"'),
  ),
  v.rawTransform<
    | { standard: 'steel'; size: string | number; schedule: SteelSchedule }
    | { standard: 'copper'; size: string | number; type: 'K' | 'L' | 'M' }
    | { standard: 'pvc'; size: string | number; schedule: '40' | '80' },
    PipeDimensions
  >((ctx) => {
    const p = ctx.dataset.value;
    try {
      if (p.standard === 'steel') return pipeSize(p.size, p.schedule);
      if (p.standard === 'copper') return copperTube(p.size, p.type);
      return pvcPipe(p.size, p.schedule);
    } catch (e) {
      reportError(ctx, e, ['size']);
      return ctx.NEVER;
    }
  }),
);

const fittingCount = obj({
  id: catalogueName('fitting id', fittingIds(), (id) => fitting(id)),
  count: opt(wholeNumber('how many', 0)),
});

const valve = v.pipe(
  oneOf(
    obj({
      name: opt(text('valve name')),
      cv: opt(plainNumber('flow coefficient Cv (US gal/min at 1 psi)', 0, 1e9, true, 1e-6)),
      kv: opt(plainNumber('flow coefficient Kv (m3/h at 1 bar)', 0, 1e9, true, 1e-6)),
      k: opt(plainNumber('loss coefficient K', 0)),
    }),
    ['cv', 'kv', 'k'],
  ),
  v.rawTransform<{ name?: string; cv?: number; kv?: number; k?: number }, ValveCoefficient>(
    (ctx) => ctx.dataset.value,
  ),
);

const lossPoint = obj({
  flow: quantity('flow', 'nonNegative'),
  pressureDrop: quantity('pressure', 'nonNegative'),
});

/** Equipment with its own loss: a rated point, or a curve of points. */
const equipment = v.pipe(
  obj({
    name: opt(text('equipment name')),
    pressureDrop: opt(quantity('pressure', 'nonNegative')),
    atFlow: opt(quantity('flow', 'positive')),
    curve: opt(list(lossPoint, 'points', 2)),
  }),
  v.check(
    (e) => {
      const curve = given(e, ['curve']).length === 1;
      const rated = given(e, ['pressureDrop', 'atFlow']).length;
      return curve ? rated === 0 : rated === 2;
    },
    (issue) =>
      given(issue.input, ['curve']).length === 1
        ? 'give pressureDrop and atFlow, or curve, not both'
        : 'give pressureDrop with atFlow (a rated point), or curve (a list of points)',
  ),
  v.rawTransform<
    {
      name?: string;
      pressureDrop?: Pressure;
      atFlow?: Flow;
      curve?: { flow: Flow; pressureDrop: Pressure }[];
    },
    LossComponent
  >((ctx) => {
    const e = ctx.dataset.value;
    let loss: RatedLoss | CurveLoss;
    try {
      if (e.curve !== undefined) loss = curveLoss(e.curve);
      else loss = ratedLoss({ pressureDrop: e.pressureDrop as Pressure, flow: e.atFlow as Flow });
    } catch (err) {
      reportError(ctx, err, e.curve === undefined ? [] : ['curve']);
      return ctx.NEVER;
    }
    const component: LossComponent = {
      headLoss: (flow, density, g) => loss.headLoss(flow, density, g),
    };
    return e.name === undefined ? component : { name: e.name, ...component };
  }),
);

/** A run's stated friction law: a constant Darcy factor or a Hazen-Williams C. */
const runFriction = v.pipe(
  oneOf(
    obj(
      {
        factor: opt(plainNumber('Darcy friction factor', 0, Number.POSITIVE_INFINITY, true)),
        agedFactor: opt(
          plainNumber('Darcy friction factor of aged pipe', 0, Number.POSITIVE_INFINITY, true),
        ),
        hazenWilliamsC: opt(
          plainNumber('Hazen-Williams coefficient C', 0, Number.POSITIVE_INFINITY, true),
        ),
        agedHazenWilliamsC: opt(
          plainNumber('Hazen-Williams C of aged pipe', 0, Number.POSITIVE_INFINITY, true),
        ),
      },
      'a friction law',
    ),
    ['factor', 'hazenWilliamsC'],
  ),
  v.rawTransform<
    {
      factor?: number;
      agedFactor?: number;
      hazenWilliamsC?: number;
      agedHazenWilliamsC?: number;
    },
    RunFrictionLaw
  >((ctx) => {
    const f = ctx.dataset.value;
    if (f.factor !== undefined) {
      return f.agedFactor === undefined
        ? { factor: f.factor }
        : { factor: f.factor, agedFactor: f.agedFactor };
    }
    const c = f.hazenWilliamsC as number;
    return f.agedHazenWilliamsC === undefined
      ? { hazenWilliamsC: c }
      : { hazenWilliamsC: c, agedHazenWilliamsC: f.agedHazenWilliamsC };
  }),
);

const runFields = {
  name: opt(text('run name')),
  length: quantity('length', 'nonNegative', 'length of straight pipe'),
  pipe: opt(pipeSpec),
  insideDiameter: opt(quantity('length', 'positive')),
  material: opt(
    catalogueName<MaterialName>('pipe material', MATERIAL_NAMES, (m) =>
      material(m as MaterialName),
    ),
  ),
  roughness: opt(quantity('length', 'nonNegative')),
  agedRoughness: opt(
    quantity('length', 'nonNegative', 'wall roughness of aged pipe, for aged cases'),
  ),
  fittings: opt(list(fittingCount, 'fittings')),
  valves: opt(list(valve, 'valves')),
  equipment: opt(list(equipment, 'equipment items')),
  rise: opt(quantity('length', 'any', 'rise from inlet to outlet (reported only)')),
  friction: opt(runFriction),
};

/** A pipe run: length, size, wall, fittings, valves, equipment. */
const run = v.pipe(
  oneOf(obj(runFields, 'a pipe run'), ['pipe', 'insideDiameter']),
  v.check(
    (r) => given(r, ['material', 'roughness', 'friction']).length > 0,
    'give material or roughness (the wall roughness of new pipe), or a friction law',
  ),
  v.rawTransform<v.InferOutput<ReturnType<typeof obj<typeof runFields>>>, PipeRunInput>((ctx) => {
    const r = ctx.dataset.value;
    const out: PipeRunInput = {
      length: r.length,
      ...(r.name === undefined ? {} : { name: r.name }),
      ...(r.pipe === undefined ? {} : { pipe: r.pipe }),
      ...(r.insideDiameter === undefined ? {} : { insideDiameter: r.insideDiameter }),
      ...(r.material === undefined ? {} : { material: r.material }),
      ...(r.roughness === undefined ? {} : { roughness: r.roughness }),
      ...(r.agedRoughness === undefined ? {} : { agedRoughness: r.agedRoughness }),
      ...(r.fittings === undefined ? {} : { fittings: r.fittings }),
      ...(r.valves === undefined ? {} : { valves: r.valves }),
      ...(r.equipment === undefined ? {} : { components: r.equipment }),
      ...(r.rise === undefined ? {} : { elevationChange: r.rise }),
      ...(r.friction === undefined ? {} : { friction: r.friction }),
    };
    return out;
  }),
);

/** Branches in parallel, each a list of runs in series. */
const parallel = obj(
  {
    name: opt(text('group name')),
    branches: list(list(run, 'runs', 1), 'branches', 2),
  },
  'a parallel group',
);

/** One element of the line: `{ "run": {...} }` or `{ "parallel": {...} }`. */
const lineElement = v.pipe(
  oneOf(obj({ run: opt(run), parallel: opt(parallel) }, 'a line element'), ['run', 'parallel']),
  v.rawTransform<
    { run?: PipeRunInput; parallel?: { name?: string; branches: PipeRunInput[][] } },
    LineElement
  >((ctx) => {
    const e = ctx.dataset.value;
    if (e.parallel !== undefined) {
      return {
        kind: 'parallel',
        branches: e.parallel.branches,
        ...(e.parallel.name === undefined ? {} : { name: e.parallel.name }),
      };
    }
    return e.run as PipeRunInput;
  }),
);

/** A fluid as the file gives it, before its state is evaluated. */
export interface FileFluid {
  readonly fluid: Fluid;
  /** Name for the report. */
  readonly name: string;
  /** Temperature of the design case (K). */
  readonly temperature: Temperature;
  /** Which of the file's fluid kinds it is (for paths in messages). */
  readonly kind: 'water' | 'constant' | 'table';
  /** True when its properties change with temperature. */
  readonly variesWithTemperature: boolean;
}

function dynamic(
  v: { value: number; kind: 'dynamicViscosity' | 'kinematicViscosity' },
  density: number,
): DynamicViscosity {
  return (v.kind === 'dynamicViscosity' ? v.value : v.value * density) as DynamicViscosity;
}

const tableRow = obj({
  temperature: quantity('temperature'),
  density: quantity('density', 'positive'),
  viscosity: viscosity(),
  vaporPressure: opt(quantity('pressure', 'nonNegative')),
});

const fluidSchema = v.pipe(
  oneOf(
    obj(
      {
        water: opt(obj({ temperature: quantity('temperature') })),
        constant: opt(
          obj({
            name: text('fluid name'),
            density: quantity('density', 'positive'),
            viscosity: viscosity(),
            vaporPressure: opt(quantity('pressure', 'nonNegative')),
            temperature: opt(quantity('temperature')),
            bulkModulus: opt(
              quantity('pressure', 'positive', 'bulk modulus of the liquid, for the surge check'),
            ),
            specificHeat: opt(
              quantity(
                'specificHeat',
                'positive',
                'specific heat of the liquid, for the low-flow heating check',
              ),
            ),
          }),
        ),
        table: opt(
          obj({
            name: text('fluid name'),
            source: opt(text('source of the table')),
            temperature: quantity('temperature'),
            rows: list(tableRow, 'rows', 2),
          }),
        ),
      },
      'a fluid',
    ),
    ['water', 'constant', 'table'],
  ),
  v.description('the liquid: one of water, constant, table'),
  v.rawTransform<
    {
      water?: { temperature: Temperature };
      constant?: {
        name: string;
        density: Density;
        viscosity: { value: number; kind: 'dynamicViscosity' | 'kinematicViscosity' };
        vaporPressure?: Pressure;
        temperature?: Temperature;
        bulkModulus?: Pressure;
        specificHeat?: SpecificHeat;
      };
      table?: {
        name: string;
        source?: string;
        temperature: Temperature;
        rows: v.InferOutput<typeof tableRow>[];
      };
    },
    FileFluid
  >((ctx) => {
    const f = ctx.dataset.value;
    if (f.water !== undefined) {
      return {
        fluid: water(),
        name: 'water',
        temperature: f.water.temperature,
        kind: 'water',
        variesWithTemperature: true,
      };
    }
    if (f.constant !== undefined) {
      const c = f.constant;
      try {
        return {
          fluid: constantFluid({
            name: c.name,
            density: c.density,
            dynamicViscosity: dynamic(c.viscosity, c.density),
            ...(c.vaporPressure === undefined ? {} : { vaporPressure: c.vaporPressure }),
            ...(c.bulkModulus === undefined ? {} : { bulkModulus: c.bulkModulus }),
            ...(c.specificHeat === undefined ? {} : { specificHeat: c.specificHeat }),
          }),
          name: c.name,
          // A constant fluid has no temperature dependence: the temperature is for the report.
          temperature: c.temperature ?? (293.15 as Temperature),
          kind: 'constant',
          variesWithTemperature: false,
        };
      } catch (e) {
        reportError(ctx, e, ['constant'], true);
        return ctx.NEVER;
      }
    }
    const t = f.table as NonNullable<typeof f.table>;
    try {
      const rows: FluidTableRow[] = t.rows.map((r) => ({
        temperature: r.temperature,
        density: r.density,
        dynamicViscosity: dynamic(r.viscosity, r.density),
        ...(r.vaporPressure === undefined ? {} : { vaporPressure: r.vaporPressure }),
      }));
      return {
        fluid: tabulatedFluid({
          name: t.name,
          rows,
          ...(t.source === undefined ? {} : { source: t.source }),
        }),
        name: t.name,
        temperature: t.temperature,
        kind: 'table',
        variesWithTemperature: true,
      };
    } catch (e) {
      reportError(ctx, e, ['table'], true);
      return ctx.NEVER;
    }
  }),
);

const ELEVATION = 'elevation of the surface or point above the datum';

const endpointFields = (partial: boolean) => ({
  elevation: partial
    ? opt(quantity('length', 'any', ELEVATION))
    : quantity('length', 'any', ELEVATION),
  pressure: opt(pressure('absolute', 'pressure on the surface or at the point')),
  gaugePressure: opt(
    pressure(
      'gauge',
      'gauge pressure on the surface or at the point (made absolute with the atmosphere)',
    ),
  ),
  velocityDiameter: opt(
    quantity(
      'length',
      'positive',
      'diameter whose mean velocity is the velocity here (a jet, a point in a pipe); omit for a still surface',
    ),
  ),
});

/**
 * Where the liquid comes from or goes. `pressure` reads a unit without a mark as absolute,
 * `gaugePressure` as gauge; a marked unit (`psig`, `bara`) says which in either field.
 */
function endpoint<const P extends boolean>(partial: P) {
  return oneOf(
    obj(endpointFields(partial), 'an end of the system'),
    ['pressure', 'gaugePressure'],
    true,
  );
}

const frictionSchema = obj({
  method: opt(choice('friction-factor method', TURBULENT_METHODS)),
  transition: opt(
    choice('rule between Re 2300 and 4000', ['conservative', 'interpolate'] as const),
  ),
  allowLargeRoughness: opt(flag('accept relative roughness above 0.1')),
});

/** What a case changes in the network form. */
const networkCaseFields = {
  levels: opt(v.record(v.string(), quantity('length', 'any', 'surface level by node id'))),
  demands: opt(v.record(v.string(), quantity('flow', 'any', 'demand by node id'))),
  status: opt(v.record(v.string(), choice('link status', ['open', 'closed'] as const))),
};

const operatingCase = obj({
  name: text('case name'),
  suction: opt(endpoint(true)),
  discharge: opt(endpoint(true)),
  temperature: opt(quantity('temperature')),
  aged: opt(flag('aged pipe')),
  friction: opt(frictionSchema),
  ...networkCaseFields,
});

const fitSchema = v.variant(
  'method',
  [
    obj({ method: v.literal('monotone') }),
    obj({ method: v.literal('polynomial'), degree: wholeNumber('polynomial degree', 1) }),
  ],
  expecting('a curve fit: "monotone" or "polynomial"'),
);

const cataloguePoint = obj({
  flow: quantity('flow', 'nonNegative'),
  head: quantity('length', 'positive'),
  efficiency: opt(fraction(true)),
  npshRequired: opt(quantity('length', 'positive')),
  shaftPower: opt(quantity('power', 'nonNegative')),
});

const region = v.strictTuple(
  [
    plainNumber('low share of BEP flow', 0, Number.POSITIVE_INFINITY, true),
    plainNumber('high share of BEP flow', 0, Number.POSITIVE_INFINITY, true),
  ],
  expecting('two shares of the BEP flow, low and high, such as [0.7, 1.2]'),
);

const candidateFields = {
  name: text('candidate name'),
  speed: quantity('rotationalSpeed', 'positive'),
  impellerDiameter: opt(quantity('length', 'positive')),
  points: list(cataloguePoint, 'catalogue points', 3),
  fit: opt(
    obj({
      head: opt(fitSchema),
      efficiency: opt(fitSchema),
      npshRequired: opt(fitSchema),
      shaftPower: opt(fitSchema),
    }),
  ),
  extrapolateShutoff: opt(flag('extend the head curve to zero flow')),
  catalogueDensity: opt(quantity('density', 'positive')),
  preferredRegion: opt(region),
  allowableRegion: opt(region),
  count: opt(wholeNumber('number of pumps', 1)),
  arrangement: opt(choice('arrangement', ['single', 'parallel', 'series'] as const)),
  control: opt(choice('speed control', ['fixed', 'speed'] as const)),
  maxSpeed: opt(quantity('rotationalSpeed', 'positive')),
  motorEfficiency: fraction(),
  driveEfficiency: opt(fraction()),
  motorSeries: opt(choice('motor rating series', ['iec', 'nema'] as const)),
  serviceFactor: opt(plainNumber('service factor', 1, 2)),
  motorRating: opt(quantity('power', 'positive')),
};

/** A candidate pump set: its catalogue curve, how many, control, motor. */
const candidate = v.pipe(
  obj(candidateFields, 'a candidate pump'),
  v.rawTransform<v.InferOutput<ReturnType<typeof obj<typeof candidateFields>>>, CandidateInput>(
    (ctx) => {
      const c = ctx.dataset.value;
      const curveInput: PumpCurveInput = {
        speed: c.speed,
        points: c.points as CataloguePoint[],
        ...(c.impellerDiameter === undefined ? {} : { impellerDiameter: c.impellerDiameter }),
        ...(c.fit === undefined ? {} : { fit: c.fit }),
        ...(c.extrapolateShutoff === undefined ? {} : { extrapolateShutoff: c.extrapolateShutoff }),
        ...(c.catalogueDensity === undefined ? {} : { catalogueDensity: c.catalogueDensity }),
        ...(c.preferredRegion === undefined && c.allowableRegion === undefined
          ? {}
          : {
              regions: {
                ...(c.preferredRegion === undefined ? {} : { preferred: c.preferredRegion }),
                ...(c.allowableRegion === undefined ? {} : { allowable: c.allowableRegion }),
              },
            }),
      };
      let pump: CandidateInput['pump'];
      try {
        pump = pumpCurve(curveInput);
      } catch (e) {
        reportError(ctx, e, [], true);
        return ctx.NEVER;
      }
      return {
        name: c.name,
        pump,
        motorEfficiency: c.motorEfficiency,
        ...(c.count === undefined ? {} : { count: c.count }),
        ...(c.arrangement === undefined ? {} : { arrangement: c.arrangement }),
        ...(c.control === undefined ? {} : { control: c.control }),
        ...(c.maxSpeed === undefined ? {} : { maxSpeed: c.maxSpeed }),
        ...(c.driveEfficiency === undefined ? {} : { driveEfficiency: c.driveEfficiency }),
        ...(c.motorSeries === undefined ? {} : { motorSeries: c.motorSeries }),
        ...(c.serviceFactor === undefined ? {} : { serviceFactor: c.serviceFactor }),
        ...(c.motorRating === undefined ? {} : { motorRating: c.motorRating }),
      };
    },
  ),
);

/** A node of the network form: a junction, a fixed-level surface or an outlet. */
const networkNode = v.pipe(
  oneOf(
    obj(
      {
        id: text('node id'),
        elevation: quantity(
          'length',
          'any',
          'elevation above the datum (of the liquid surface, for a surface)',
        ),
        demand: opt(quantity('flow', 'any', 'flow drawn off at a junction (negative: fed in)')),
        surface: opt(
          oneOf(
            obj(
              {
                pressure: opt(pressure('absolute', 'pressure on the surface')),
                gaugePressure: opt(pressure('gauge', 'gauge pressure on the surface')),
              },
              'a fixed-level surface',
            ),
            ['pressure', 'gaugePressure'],
            true,
          ),
        ),
        outlet: opt(
          obj(
            {
              ratedFlow: quantity('flow', 'positive', 'flow at the rated pressure'),
              ratedPressure: pressure('gauge', 'gauge pressure at the rated flow'),
              exponent: opt(plainNumber('exponent n of Q = k p^n', 0.3, 3)),
            },
            'an outlet rated by a flow at a pressure',
          ),
        ),
        x: opt(plainNumber('x of the node in a schematic', Number.NEGATIVE_INFINITY)),
        y: opt(plainNumber('y of the node in a schematic (up)', Number.NEGATIVE_INFINITY)),
      },
      'a node',
    ),
    ['demand', 'surface', 'outlet'],
    true,
  ),
);

/** A control valve of the network form. */
const controlValve = obj(
  {
    kind: choice('control valve kind', [
      'pressure-reducing',
      'pressure-sustaining',
      'flow-limiting',
    ] as const),
    setting: v.union(
      [quantity('flow', 'positive'), pressure('gauge', 'held pressure')],
      expecting(
        'a flow (flow-limiting) or a pressure (pressure-reducing, -sustaining) with its unit',
      ),
    ),
    diameter: quantity('length', 'positive', 'diameter the wide-open K refers to'),
    openK: plainNumber('K when wide open', 0),
  },
  'a control valve',
);

/** A link of the network form: a pipe run, the pump (`"pump": "candidates"`) or a control valve. */
const networkLink = oneOf(
  obj(
    {
      id: text('link id'),
      from: text('node id at the start (flow is positive from here)'),
      to: text('node id at the end'),
      run: opt(run),
      checkValve: opt(flag('a check valve: no flow from to to from')),
      pump: opt(
        v.literal('candidates', expecting('"candidates" (the candidate pumps go in this link)')),
      ),
      valve: opt(controlValve),
      status: opt(choice('link status', ['open', 'closed'] as const)),
    },
    'a link',
  ),
  ['run', 'pump', 'valve'],
);

const velocityRange = v.pipe(
  obj({ min: quantity('velocity', 'nonNegative'), max: quantity('velocity', 'positive') }),
);

/** Every field of a scenario file, before the parts are put together. */
export const scenarioFields = {
  $schema: opt(v.string(expecting('the address of the JSON Schema (text)'))),
  format: v.pipe(
    v.literal(SCENARIO_FORMAT, expecting(`"${SCENARIO_FORMAT}" (the format this version reads)`)),
    v.description('format name and version'),
  ),
  name: text('design name'),
  description: opt(v.string(expecting('a description (text)'))),
  units: opt(choice('units of the report', ['si', 'us'] as const)),
  atmosphere: opt(
    quantity(
      'pressure',
      'positive',
      'atmospheric pressure at the site (absolute), for gauge pressures and open surfaces; default 101325 Pa, or the standard atmosphere at site.elevation',
    ),
  ),
  site: opt(
    obj({
      elevation: quantity(
        'length',
        'any',
        'elevation of the site above mean sea level; the atmosphere is the standard atmosphere there (give this or atmosphere)',
      ),
    }),
  ),
  gravity: opt(quantity('acceleration', 'positive', 'gravity; default 9.80665 m/s2')),
  friction: opt(frictionSchema),
  aged: opt(flag('aged pipe in the design case')),
  fluid: fluidSchema,
  suction: opt(about(endpoint(false), 'where the liquid comes from (a surface or a point)')),
  discharge: opt(about(endpoint(false), 'where the liquid goes (a surface or a point)')),
  line: opt(
    about(
      list(lineElement, 'line elements (runs and parallel groups)', 1),
      'the line from suction to discharge, in flow order',
    ),
  ),
  nodes: opt(about(list(networkNode, 'nodes', 2), 'the network form: its nodes')),
  links: opt(
    about(
      list(networkLink, 'links', 1),
      'the network form: its links; the one with "pump": "candidates" takes the candidate pumps',
    ),
  ),
  pumpElevation: opt(
    quantity(
      'length',
      'any',
      'network form: elevation of the impeller eye (default the suction node)',
    ),
  ),
  cases: opt(list(operatingCase, 'operating cases')),
  duty: about(
    oneOf(
      obj({
        flow: opt(quantity('flow', 'positive')),
        service: opt(
          list(
            obj({
              node: text('node id'),
              minPressure: pressure('gauge', 'the lowest pressure the node may have'),
            }),
            'service pressures',
            1,
          ),
        ),
      }),
      ['flow', 'service'],
    ),
    'the flow the pumps must deliver, or (network form) the minimum pressures at nodes',
  ),
  pumpLocation: opt(
    obj({
      elevation: quantity('length'),
      suctionRuns: opt(wholeNumber('number of suction-line runs', 0)),
    }),
  ),
  candidates: opt(list(candidate, 'candidates')),
  profile: opt(
    list(
      obj({
        flow: quantity('flow', 'nonNegative'),
        hours: plainNumber('hours a year at this flow', 0, 8784),
      }),
      'profile rows',
    ),
  ),
  energyPrice: opt(
    obj({
      perKWh: plainNumber('price per kWh', 0),
      currency: text('currency'),
    }),
  ),
  surge: opt(
    about(
      obj({
        closureTime: opt(
          quantity(
            'time',
            'nonNegative',
            'effective time over which the flow stops on a pump trip or valve closure; default 0 s (sudden)',
          ),
        ),
      }),
      'asks for the surge screening (needs pumpLocation, the bulk modulus and the design pressure)',
    ),
  ),
  lowFlow: opt(
    about(
      obj({
        minimumFlow: opt(
          quantity(
            'flow',
            'positive',
            "lowest flow one pump may run at; default the low end of the pump's allowable region",
          ),
        ),
        maxTemperatureRise: opt(
          plainNumber('largest temperature rise through the pump, in kelvins (default 8)', 0),
        ),
      }),
      'asks for the low-flow heating check',
    ),
  ),
  intake: opt(
    about(
      obj({
        depth: opt(
          quantity(
            'length',
            'positive',
            'depth of the suction inlet below the suction surface in the design case',
          ),
        ),
        diameter: opt(quantity('length', 'positive', 'suction inlet (bell) diameter')),
      }),
      'asks for the intake submergence check (a free-surface suction end)',
    ),
  ),
  limits: opt(
    oneOf(
      obj({
        npshMarginRatio: opt(plainNumber('NPSH margin ratio', 1)),
        npshMinimumMargin: opt(quantity('length', 'nonNegative')),
        designPressure: opt(pressure('absolute', 'design pressure of the discharge piping')),
        designGaugePressure: opt(
          pressure('gauge', 'design pressure of the discharge piping, as gauge'),
        ),
        suctionVelocity: opt(velocityRange),
        dischargeVelocity: opt(velocityRange),
        nearBoilingRatio: opt(plainNumber('near-boiling ratio', 0, 1, true)),
        dutyFlowTolerance: opt(fraction(true)),
      }),
      ['designPressure', 'designGaugePressure'],
      true,
    ),
  ),
};

/** The shape of a scenario file, every part read (before assembly). */
export const scenarioObject = v.pipe(
  obj(scenarioFields, 'a scenario'),
  v.metadata({
    oneOf: [{ required: ['suction', 'discharge', 'line'] }, { required: ['nodes', 'links'] }],
  }),
);

/** A scenario file as read, every part checked, before assembly into a design. */
export type ScenarioParts = v.InferOutput<typeof scenarioObject>;
