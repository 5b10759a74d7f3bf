import { readFileSync } from 'node:fs';
import fc from 'fast-check';
import * as v from 'valibot';
import { describe, expect, it } from 'vitest';
import {
  readScenario,
  SCENARIO_FORMAT,
  ScenarioFileError,
  scenarioSchema,
} from '../../src/design/scenario-file';
import { HeadflowError } from '../../src/errors';
import { water } from '../../src/fluids/index';
import type { ParallelInput, PipeRunInput } from '../../src/system/index';
import { q, to } from '../../src/units/index';
import { expectHeadflowError, expectRelative } from '../helpers/expect';

/** The demonstration file (an invented irrigation lift). */
const EXAMPLE_TEXT = readFileSync(
  new URL('../../docs/examples/canal-lift.json', import.meta.url),
  'utf8',
);

// biome-ignore lint/suspicious/noExplicitAny: test files mutate parsed JSON freely
type Json = any;

function example(): Json {
  return JSON.parse(EXAMPLE_TEXT);
}

/** A small valid file with every optional part the example leaves out. */
function minimal(): Json {
  return {
    format: SCENARIO_FORMAT,
    name: 'small loop',
    fluid: { water: { temperature: '20 degC' } },
    suction: { elevation: '0 m' },
    discharge: { elevation: '10 m' },
    line: [{ run: { length: '50 m', insideDiameter: '100 mm', roughness: '0.05 mm' } }],
    duty: { flow: '10 L/s' },
  };
}

/** Reads `file` and returns the ScenarioFileError it throws, checking its code. */
function problem(file: unknown, code: HeadflowError['code']): ScenarioFileError {
  const e = expectHeadflowError(() => readScenario(file), code);
  expect(e).toBeInstanceOf(ScenarioFileError);
  return e as ScenarioFileError;
}

function run(element: unknown): PipeRunInput {
  return element as PipeRunInput;
}

describe('readScenario: text that is not JSON', () => {
  it('gives INVALID_ARGUMENT with the line and column of the fault', () => {
    const e = expectHeadflowError(
      () => readScenario('{\n  "format": "headflow-scenario/1",,\n}', { source: 'lift.json' }),
      'INVALID_ARGUMENT',
    );
    expect(e.message).toContain('scenario file lift.json is not valid JSON');
    expect(e.message).toMatch(/line 2, column \d+/);
  });

  it('refuses an empty text and a text that is not an object', () => {
    expectHeadflowError(() => readScenario(''), 'INVALID_ARGUMENT');
    const e = problem('[1, 2]', 'INVALID_ARGUMENT');
    expect(e.issues[0]?.path).toBe('(file)');
    expect(e.message).toContain('found a list');
    expect(problem(null, 'INVALID_ARGUMENT').message).toContain('found null');
    expect(problem(42, 'INVALID_ARGUMENT').message).toContain('found 42');
  });
});

describe('readScenario: the example file', () => {
  const design = readScenario(EXAMPLE_TEXT, { source: 'canal-lift.json' });

  it('reads name, units, duty and ends in SI', () => {
    expect(design.name).toBe('Canal lift to hillside tank');
    expect(design.units).toBe('si');
    expect(design.fluidName).toBe('water');
    expect(design.dutyFlow).toBe(0.04); // 40 L/s
    expect(design.system.discharge.elevation).toBe(38);
    // Open surfaces: the standard atmosphere, 101 325 Pa (NIST SP 811, B.8: 1 atm = 101 325 Pa).
    expect(design.system.suction.pressure).toBe(101325);
    expect(design.system.discharge.pressure).toBe(101325);
    expect(design.pumpLocation).toEqual({ elevation: 1.5, suctionRuns: 1 });
  });

  it('evaluates water at the file temperature and the suction pressure', () => {
    const expected = water().at(q(15, 'degC'), q(101325, 'Pa'));
    expect(design.system.fluid).toEqual(expected);
    expect(design.system.fluid.temperature).toBeCloseTo(288.15, 12); // 15 degC + 273.15 K
    const warm = design.cases?.find((c) => c.name === 'warm water');
    expect(warm?.fluid).toEqual(water().at(q(32, 'degC'), q(101325, 'Pa')));
  });

  it('reads pipe sizes into inside diameters from the standards', () => {
    const [suction, main] = design.system.runs.map(run);
    // ASME B36.10M Table 1: NPS 8 sch 40, OD 8.625 in, wall 0.322 in -> ID 7.981 in.
    expectRelative(suction?.pipe?.insideDiameter ?? 0, 7.981 * 0.0254, 1e-12, 'NPS 8 sch 40');
    // ASME B36.10M Table 1: NPS 6 sch 40, OD 6.625 in, wall 0.280 in -> ID 6.065 in.
    expectRelative(main?.pipe?.insideDiameter ?? 0, 6.065 * 0.0254, 1e-12, 'NPS 6 sch 40');
    expect(main?.material).toBe('commercial-steel');
    expect(main?.agedRoughness).toBeCloseTo(0.0005, 15);
    expect(main?.elevationChange).toBe(38);
    expect(main?.fittings).toEqual([
      { id: 'elbow-90-flanged', count: 6 },
      { id: 'gate-valve-open' },
      { id: 'swing-check-valve' },
      { id: 'exit' },
    ]);
    expect(main?.valves).toEqual([{ name: 'flow control valve', cv: 900 }]);
  });

  it('turns a rated equipment point into a square-law loss', () => {
    const main = run(design.system.runs[1]);
    const filter = main.components?.[0];
    expect(filter?.name).toBe('screen filter');
    const rho = q(1000, 'kg/m3');
    // 20 kPa at 40 L/s: head = dp / (rho g) = 20000 / (1000 x 9.80665) m; a quarter at half flow.
    expectRelative(filter?.headLoss(q(40, 'L/s'), rho) ?? 0, 20000 / 9806.65, 1e-12, 'rated');
    expectRelative(filter?.headLoss(q(20, 'L/s'), rho) ?? 0, 5000 / 9806.65, 1e-12, 'half');
  });

  it('reads the cases, changing only what each gives', () => {
    expect(design.cases?.map((c) => c.name)).toEqual([
      'normal canal level',
      'low canal level, aged pipe',
      'warm water',
    ]);
    expect(design.cases?.[0]).toEqual({ name: 'normal canal level' });
    expect(design.cases?.[1]).toEqual({
      name: 'low canal level, aged pipe',
      suction: { elevation: -1.2 },
      aged: true,
    });
  });

  it('builds the candidates from catalogue points in any units', () => {
    const [a, b] = design.candidates ?? [];
    expect(a?.name).toBe('pump A');
    expect(to(a?.pump.speed ?? q(0, 'rpm'), 'rpm')).toBeCloseTo(2900, 9);
    // "62 %" at 20 L/s; the default efficiency fit (cubic through the origin) passes through
    // all four points exactly.
    expectRelative(a?.pump.efficiency(q(20, 'L/s')) ?? 0, 0.62, 1e-9, 'pump A at 20 L/s');
    expect(a?.motorEfficiency).toBeCloseTo(0.93, 15);
    expect(a?.motorSeries).toBe('iec');
    // 800 gal/min: 1 gal = 3.785411784 L exactly (NIST SP 811, B.8).
    expectRelative(b?.pump.flowRange.max ?? 0, (800 * 3.785411784e-3) / 60, 1e-12, 'gal/min');
    expectRelative(b?.pump.head(q(0, 'gal/min')) ?? 0, 230 * 0.3048, 1e-12, 'ft');
    expect(b?.control).toBe('speed');
    expect(b?.driveEfficiency).toBe(0.97);
    expect(to(b?.maxSpeed ?? q(0, 'rpm'), 'rpm')).toBeCloseTo(1850, 9);
  });

  it('reads the profile, price and limits; gauge pressures become absolute', () => {
    expect(design.profile?.map((r) => [r.flow, r.hours])).toEqual([
      [0.04, 1800],
      [0.03, 1200],
      [0, 5760],
    ]);
    expect(design.energyPrice).toEqual({ perKWh: 0.14, currency: 'EUR' });
    // 10 bar gauge + 101 325 Pa (1 bar = 100 kPa, NIST SP 811, B.8).
    expect(design.limits?.designPressure).toBeCloseTo(1_000_000 + 101_325, 6);
    expect(design.limits?.npshMarginRatio).toBe(1.3);
  });

  it('gives the same design from the text and from the parsed value', () => {
    const fromValue = readScenario(example());
    expect(fromValue.system.runs.length).toBe(2);
    expect(fromValue.dutyFlow).toBe(design.dutyFlow);
  });

  it('is what the valibot schema gives', () => {
    const result = v.safeParse(scenarioSchema, example());
    expect(result.success).toBe(true);
  });
});

describe('readScenario: the other forms of each part', () => {
  it('reads a constant fluid with a kinematic viscosity', () => {
    const f = minimal();
    f.fluid = {
      constant: {
        name: 'light oil',
        density: '870 kg/m3',
        viscosity: '34 cSt',
        vaporPressure: '1 kPa',
      },
    };
    const d = readScenario(f);
    expect(d.fluidName).toBe('light oil');
    // mu = nu rho = 34e-6 m2/s x 870 kg/m3.
    expectRelative(d.system.fluid.dynamicViscosity, 34e-6 * 870, 1e-12, 'mu');
    expect(d.system.fluid.vaporPressure).toBe(1000);
    expect(d.system.fluid.temperature).toBe(293.15);
  });

  it('reads a constant fluid with a dynamic viscosity and a stated temperature', () => {
    const f = minimal();
    f.fluid = {
      constant: { name: 'oil', density: '870 kg/m3', viscosity: '30 cP', temperature: '40 degC' },
    };
    const d = readScenario(f);
    expectRelative(d.system.fluid.dynamicViscosity, 0.03, 1e-12, 'mu');
    expectRelative(d.system.fluid.temperature, 313.15, 1e-12, 'T');
  });

  it('reads a table fluid and evaluates each case at its temperature', () => {
    const f = minimal();
    f.fluid = {
      table: {
        name: 'glycol mix',
        source: 'invented demonstration rows',
        temperature: '20 degC',
        rows: [
          {
            temperature: '0 degC',
            density: '1050 kg/m3',
            viscosity: '6 cP',
            vaporPressure: '0.5 kPa',
          },
          {
            temperature: '40 degC',
            density: '1035 kg/m3',
            viscosity: '2 cP',
            vaporPressure: '4 kPa',
          },
        ],
      },
    };
    f.cases = [{ name: 'cold', temperature: '0 degC' }];
    const d = readScenario(f);
    expect(d.fluidName).toBe('glycol mix');
    expect(d.cases?.[0]?.fluid?.density).toBeCloseTo(1050, 9);
    expect(d.system.fluid.density).toBeGreaterThan(1035);
    expect(d.system.fluid.density).toBeLessThan(1050);
  });

  it('reads copper and PVC sizes, Cv and Kv valves, equipment curves and parallel groups', () => {
    const f = minimal();
    f.line = [
      {
        run: {
          name: 'copper',
          length: '10 ft',
          pipe: { standard: 'copper', size: '1', type: 'L' },
          material: 'copper',
          valves: [{ cv: 40 }, { kv: 30 }],
        },
      },
      {
        parallel: {
          name: 'two coils',
          branches: [
            [
              {
                length: '5 m',
                pipe: { standard: 'pvc', size: 4, schedule: '80' },
                material: 'pvc',
              },
            ],
            [
              {
                length: '5 m',
                insideDiameter: '90 mm',
                roughness: '0.0015 mm',
                equipment: [
                  {
                    name: 'coil',
                    curve: [
                      { flow: '2 L/s', pressureDrop: '4 kPa' },
                      { flow: '4 L/s', pressureDrop: '16 kPa' },
                    ],
                  },
                ],
              },
            ],
          ],
        },
      },
    ];
    const d = readScenario(f);
    const copper = run(d.system.runs[0]);
    // ASTM B88 Table 1: 1 in type L, OD 1.125 in, wall 0.050 in -> ID 1.025 in.
    expectRelative(copper.pipe?.insideDiameter ?? 0, 1.025 * 0.0254, 1e-12, 'copper 1 L');
    expect(copper.valves).toEqual([{ cv: 40 }, { kv: 30 }]);
    const group = d.system.runs[1] as ParallelInput;
    expect(group.kind).toBe('parallel');
    expect(group.name).toBe('two coils');
    // ASTM D1785 Table 2: 4 in schedule 80, OD 4.500 in, minimum wall 0.337 in -> 3.826 in.
    expectRelative(
      group.branches[0]?.[0]?.pipe?.insideDiameter ?? 0,
      3.826 * 0.0254,
      1e-12,
      'PVC 4 sch 80',
    );
    const coil = group.branches[1]?.[0]?.components?.[0];
    expectRelative(
      coil?.headLoss(q(4, 'L/s'), q(1000, 'kg/m3')) ?? 0,
      16000 / 9806.65,
      1e-12,
      'coil',
    );
  });

  it('makes gauge pressures absolute with the site atmosphere, in the design and in cases', () => {
    const f = minimal();
    f.atmosphere = '95 kPa';
    f.gravity = '9.81 m/s2';
    f.suction = { elevation: '0 m', gaugePressure: '-20 kPa' };
    f.discharge = { elevation: '10 m', pressure: '300 kPa', velocityDiameter: '50 mm' };
    f.cases = [
      {
        name: 'pressurised',
        suction: { gaugePressure: '50 kPa' },
        discharge: { elevation: '12 m' },
      },
    ];
    f.friction = { method: 'swameeJain', transition: 'interpolate' };
    f.aged = false;
    const d = readScenario(f);
    expect(d.system.suction.pressure).toBe(75000); // -20 kPa gauge at 95 kPa
    expect(d.system.discharge).toEqual({ elevation: 10, pressure: 300000, velocityDiameter: 0.05 });
    expect(d.system.g).toBe(9.81);
    expect(d.system.friction).toEqual({ method: 'swameeJain', transition: 'interpolate' });
    expect(d.cases?.[0]?.suction).toEqual({ pressure: 145000 });
    expect(d.cases?.[0]?.discharge).toEqual({ elevation: 12 });
  });

  it('an open surface is at the site atmosphere', () => {
    const f = minimal();
    f.atmosphere = '90 kPa';
    const d = readScenario(f);
    expect(d.system.suction.pressure).toBe(90000);
  });

  it('reads limits, fit choices, regions and motor options', () => {
    const f = example();
    f.limits = {
      npshMinimumMargin: '0.6 m',
      designPressure: '1.2 MPa',
      suctionVelocity: { min: '0.5 m/s', max: '2 m/s' },
      dischargeVelocity: { min: '1 m/s', max: '3 m/s' },
      nearBoilingRatio: 0.8,
    };
    Object.assign(f.candidates[0], {
      impellerDiameter: '250 mm',
      fit: { head: { method: 'polynomial', degree: 2 }, npshRequired: { method: 'monotone' } },
      preferredRegion: [0.7, 1.2],
      allowableRegion: [0.4, 1.25],
      count: 2,
      arrangement: 'parallel',
      serviceFactor: 1.15,
      motorRating: '37 kW',
    });
    const d = readScenario(f);
    expect(d.limits).toEqual({
      npshMinimumMargin: 0.6,
      designPressure: 1_200_000,
      suctionVelocity: { min: 0.5, max: 2 },
      dischargeVelocity: { min: 1, max: 3 },
      nearBoilingRatio: 0.8,
    });
    const a = d.candidates?.[0];
    expect(a?.count).toBe(2);
    expect(a?.arrangement).toBe('parallel');
    expect(a?.serviceFactor).toBe(1.15);
    expect(a?.motorRating).toBe(37000);
    expect(a?.pump.fits.head.degree).toBe(2);
    expect(a?.pump.impellerDiameter).toBeCloseTo(0.25, 15);
  });

  it('accepts a $schema address and a description', () => {
    const f = minimal();
    f.$schema = './scenario.schema.json';
    f.description = 'notes';
    expect(readScenario(f).name).toBe('small loop');
  });
});

describe('readScenario: malformed files name the path', () => {
  it('a quantity without its unit', () => {
    const f = example();
    f.line[1].run.length = '420';
    const e = problem(f, 'INVALID_ARGUMENT');
    expect(e.message).toContain('line[1].run.length');
    expect(e.message).toContain('the unit is missing');
    expect(e.parameter).toBe('line[1].run.length');
  });

  it('a number where a quantity is text', () => {
    const f = example();
    f.duty.flow = 40;
    expect(problem(f, 'INVALID_ARGUMENT').message).toContain('duty.flow: expected a flow > 0');
  });

  it('a unit of the wrong dimension', () => {
    const f = example();
    f.line[1].run.length = '420 psi';
    const e = problem(f, 'WRONG_DIMENSION');
    expect(e.message).toContain('line[1].run.length');
    expect(e.message).toContain('which is a pressure');
  });

  it('an unknown unit lists the units of the dimension', () => {
    const f = example();
    f.candidates[0].speed = '2900 rpms';
    const e = problem(f, 'UNKNOWN_UNIT');
    expect(e.message).toContain('candidates[0].speed');
    expect(e.message).toContain('rpm');
  });

  it('an unknown field', () => {
    const f = example();
    f.line[0].run.lenght = '6 m';
    const e = problem(f, 'INVALID_ARGUMENT');
    expect(e.message).toContain('line[0].run.lenght: unknown field');
    expect(e.message).toContain('length');
  });

  it('a field of the wrong type', () => {
    const f = example();
    f.line[1].run.fittings[0].count = 'six';
    expect(problem(f, 'INVALID_ARGUMENT').message).toContain(
      'line[1].run.fittings[0].count: expected how many (a whole number >= 0), found "six"',
    );
    const g = example();
    g.cases[1].aged = 'yes';
    expect(problem(g, 'INVALID_ARGUMENT').message).toContain('cases[1].aged');
    const h = example();
    h.units = 'metric';
    expect(problem(h, 'INVALID_ARGUMENT').message).toContain('units: expected units of the report');
  });

  it('a negative length', () => {
    const f = example();
    f.line[1].run.length = '-5 m';
    expect(problem(f, 'INVALID_ARGUMENT').message).toContain(
      'line[1].run.length: expected a length >= 0',
    );
  });

  it('an unknown fitting, material or schedule', () => {
    const f = example();
    f.line[1].run.fittings[0].id = 'elbow-90-standart';
    const e = problem(f, 'UNKNOWN_NAME');
    expect(e.message).toContain('line[1].run.fittings[0].id');
    expect(e.message).toContain('elbow-90-standard'); // the closest id is suggested
    const g = example();
    g.line[1].run.material = 'steel';
    expect(problem(g, 'UNKNOWN_NAME').message).toContain('line[1].run.material');
    const h = example();
    h.line[1].run.pipe.schedule = '45';
    expect(problem(h, 'UNKNOWN_NAME').message).toContain('line[1].run.pipe.schedule');
  });

  it('a size the standard does not list', () => {
    const f = example();
    f.line[1].run.pipe.size = '7';
    expect(problem(f, 'OUT_OF_RANGE').message).toContain('line[1].run.pipe.size');
    const g = example();
    g.line[1].run.pipe = { standard: 'iron', size: '6' };
    expect(problem(g, 'INVALID_ARGUMENT').message).toContain('line[1].run.pipe.standard');
  });

  it('a missing field', () => {
    const f = example();
    delete f.duty;
    expect(problem(f, 'INVALID_ARGUMENT').message).toContain('duty: this field is required');
  });

  it('the wrong format', () => {
    const f = example();
    f.format = 'headflow-scenario/2';
    expect(problem(f, 'INVALID_ARGUMENT').message).toContain(
      'format: expected "headflow-scenario/1"',
    );
  });

  it('exactly one of two fields', () => {
    const f = example();
    f.line[1].run.insideDiameter = '150 mm';
    expect(problem(f, 'INVALID_ARGUMENT').message).toContain(
      'line[1].run: give only one of pipe, insideDiameter',
    );
    const g = example();
    g.suction.pressure = '1 bar';
    g.suction.gaugePressure = '0 bar';
    expect(problem(g, 'INVALID_ARGUMENT').message).toContain('suction: give at most one');
    const h = example();
    h.fluid = {};
    expect(problem(h, 'INVALID_ARGUMENT').message).toContain('fluid: give one of water');
    const k = example();
    k.line[1].run.valves = [{ cv: 10, k: 2 }];
    expect(problem(k, 'INVALID_ARGUMENT').message).toContain('line[1].run.valves[0]');
    const m = example();
    m.line[1].run.equipment = [{ pressureDrop: '20 kPa' }];
    expect(problem(m, 'INVALID_ARGUMENT').message).toContain(
      'line[1].run.equipment[0]: give pressureDrop with atFlow',
    );
    const n = example();
    delete n.line[0].run.material;
    expect(problem(n, 'INVALID_ARGUMENT').message).toContain(
      'line[0].run: give material or roughness',
    );
  });

  it('lists every problem, not only the first', () => {
    const f = example();
    f.line[1].run.length = '420';
    f.duty.flow = '40 m';
    f.extra = true;
    const e = problem(f, 'INVALID_ARGUMENT');
    expect(e.issues.map((i) => i.path)).toEqual(['line[1].run.length', 'duty.flow', 'extra']);
    expect(e.issues.map((i) => i.code)).toEqual([
      'INVALID_ARGUMENT',
      'WRONG_DIMENSION',
      'INVALID_ARGUMENT',
    ]);
    expect(e.message).toContain('has 3 problems');
  });

  it('names the source file', () => {
    const f = example();
    f.duty.flow = '40 m';
    const e = expectHeadflowError(
      () => readScenario(f, { source: 'lift.json' }),
      'WRONG_DIMENSION',
    );
    expect(e.message).toMatch(/^scenario file lift\.json has a problem/);
  });

  it('a catalogue curve the pumps module refuses, at the point', () => {
    const f = example();
    f.candidates[0].points[2].head = '70 m';
    const e = problem(f, 'INVALID_ARGUMENT');
    expect(e.message).toContain('candidates[0].points[2].head');
    expect(e.message).toContain('rises');
    const g = example();
    g.candidates[0].points = g.candidates[0].points.slice(0, 2);
    expect(problem(g, 'INVALID_ARGUMENT').message).toContain(
      'candidates[0].points: expected at least 3 catalogue points, found 2',
    );
  });

  it('efficiencies as fractions or percentages only', () => {
    for (const bad of ['120 %', 1.2, 0, '72', -0.5, 'abc %']) {
      const f = example();
      f.candidates[0].motorEfficiency = bad;
      expect(problem(f, 'INVALID_ARGUMENT').message).toContain('candidates[0].motorEfficiency');
    }
  });

  it('problems across parts', () => {
    const dup = example();
    dup.candidates[1].name = 'pump A';
    expect(problem(dup, 'INVALID_ARGUMENT').message).toContain(
      'candidates[1].name: the name "pump A" is used twice',
    );
    const hot = example();
    hot.fluid.water.temperature = '120 degC';
    expect(problem(hot, 'OUT_OF_RANGE').message).toContain('fluid.water.temperature');
    const hotCase = example();
    hotCase.cases[2].temperature = '105 degC';
    expect(problem(hotCase, 'OUT_OF_RANGE').message).toContain('cases[2].temperature');
    const constant = example();
    constant.fluid = { constant: { name: 'oil', density: '870 kg/m3', viscosity: '30 cP' } };
    expect(problem(constant, 'INVALID_ARGUMENT').message).toContain('cases[2].temperature');
    const vacuum = example();
    vacuum.suction.gaugePressure = '-2 bar';
    expect(problem(vacuum, 'OUT_OF_RANGE').message).toContain('suction.gaugePressure');
    const hours = example();
    hours.profile[2].hours = 8000;
    expect(problem(hours, 'INVALID_ARGUMENT').message).toContain('profile: expected at most 8784');
    const speeds = example();
    speeds.limits.suctionVelocity = { min: '3 m/s', max: '1 m/s' };
    expect(problem(speeds, 'INVALID_ARGUMENT').message).toContain('limits.suctionVelocity');
  });

  it('a suction line that is not the first runs of the line', () => {
    const f = minimal();
    f.line = [
      {
        parallel: {
          branches: [
            [{ length: '5 m', insideDiameter: '50 mm', roughness: '0.05 mm' }],
            [{ length: '5 m', insideDiameter: '50 mm', roughness: '0.05 mm' }],
          ],
        },
      },
    ];
    f.pumpLocation = { elevation: '0 m', suctionRuns: 1 };
    expect(problem(f, 'INVALID_ARGUMENT').message).toContain(
      'pumpLocation.suctionRuns: the suction line is the first 1 line elements',
    );
    f.pumpLocation.suctionRuns = 3;
    expect(problem(f, 'INVALID_ARGUMENT').message).toContain('expected at most 1');
  });

  it('a run the system cannot use, in a case', () => {
    const f = minimal();
    f.cases = [{ name: 'aged', aged: true }];
    const e = problem(f, 'INVALID_ARGUMENT');
    expect(e.message).toContain('cases[0]');
    expect(e.message).toContain('agedRoughness');
  });

  it('a parallel group needs two branches, each with a run', () => {
    const f = minimal();
    f.line = [{ parallel: { branches: [[f.line[0].run]] } }];
    expect(problem(f, 'INVALID_ARGUMENT').message).toContain(
      'line[0].parallel.branches: expected at least 2 branches',
    );
    f.line = [{ parallel: { branches: [[f.line[0].parallel.branches[0][0]], []] } }];
    expect(problem(f, 'INVALID_ARGUMENT').message).toContain('line[0].parallel.branches[1]');
  });

  it('a fluid table the fluids module refuses, at its row', () => {
    const f = minimal();
    f.fluid = {
      table: {
        name: 'mix',
        temperature: '20 degC',
        rows: [
          { temperature: '40 degC', density: '1000 kg/m3', viscosity: '1 cP' },
          { temperature: '0 degC', density: '1000 kg/m3', viscosity: '1 cP' },
        ],
      },
    };
    expect(problem(f, 'INVALID_ARGUMENT').message).toContain('fluid.table.rows[1].temperature');
  });
});

/** Every path (as keys) to every value inside `value`. */
function pathsOf(value: Json, prefix: (string | number)[] = []): (string | number)[][] {
  const out: (string | number)[][] = [prefix];
  if (Array.isArray(value)) {
    for (const [i, x] of value.entries()) out.push(...pathsOf(x, [...prefix, i]));
  } else if (value !== null && typeof value === 'object') {
    for (const [k, x] of Object.entries(value)) out.push(...pathsOf(x, [...prefix, k]));
  }
  return out;
}

/** Sets (or, with `remove`, deletes) the value at `path`; the root is never replaced. */
function mutate(
  root: Json,
  path: (string | number)[],
  replacement: unknown,
  remove: boolean,
): void {
  if (path.length === 0) {
    root.unexpected = replacement;
    return;
  }
  let node = root;
  for (const key of path.slice(0, -1)) node = node[key];
  const last = path[path.length - 1] as string | number;
  if (remove && !Array.isArray(node)) delete node[last];
  else node[last] = replacement;
}

function onlyHeadflowErrors(input: unknown): void {
  try {
    readScenario(input);
  } catch (e) {
    if (!(e instanceof HeadflowError)) throw e;
    expect(e.message.length).toBeGreaterThan(0);
    if (e instanceof ScenarioFileError) {
      expect(e.issues.length).toBeGreaterThan(0);
      for (const issue of e.issues) expect(issue.path.length).toBeGreaterThan(0);
    }
  }
}

describe('readScenario: properties', () => {
  it('any JSON text: a design or a HeadflowError, never another error', () => {
    fc.assert(fc.property(fc.json(), onlyHeadflowErrors), { numRuns: 300 });
  });

  it('any value: a design or a HeadflowError', () => {
    fc.assert(fc.property(fc.anything(), onlyHeadflowErrors), { numRuns: 300 });
  });

  it('any text: a design or a HeadflowError', () => {
    fc.assert(fc.property(fc.string(), onlyHeadflowErrors), { numRuns: 200 });
  });

  const paths = pathsOf(example());
  const odd = fc.oneof(
    fc.anything(),
    fc.constantFrom(
      '',
      '5',
      '5 psi',
      '-1 m',
      '1e999 m',
      'NaN m',
      '20 degC',
      '-300 degC',
      '72 %',
      '3 rpm',
    ),
    fc.double(),
  );

  it('a valid file with one value changed or removed: a design or a HeadflowError naming a path', () => {
    fc.assert(
      fc.property(fc.nat(paths.length - 1), odd, fc.boolean(), (i, replacement, remove) => {
        const f = example();
        mutate(f, paths[i] ?? [], replacement, remove);
        onlyHeadflowErrors(f);
      }),
      { numRuns: 400 },
    );
  });

  it('a valid file with several values changed: a design or a HeadflowError', () => {
    fc.assert(
      fc.property(
        fc.array(fc.tuple(fc.nat(paths.length - 1), odd, fc.boolean()), {
          minLength: 2,
          maxLength: 6,
        }),
        (changes) => {
          const f = example();
          for (const [i, replacement, remove] of changes) {
            try {
              mutate(f, paths[i] ?? [], replacement, remove);
            } catch {
              // an earlier change removed the parent: skip this one
            }
          }
          onlyHeadflowErrors(f);
        },
      ),
      { numRuns: 200 },
    );
  });

  it('a quantity of the wrong dimension is reported at its own path', () => {
    const quantityPaths = paths.filter((p) => {
      let node: Json = example();
      for (const k of p) node = node[k];
      return (
        typeof node === 'string' && /^-?\d.*\s(m|L\/s|kPa|degC|rpm|gal\/min|ft|bar|mm)$/.test(node)
      );
    });
    expect(quantityPaths.length).toBeGreaterThan(20);
    for (const p of quantityPaths) {
      const f = example();
      mutate(f, p, '3 kg', false);
      const e = expectHeadflowError(() => readScenario(f), 'WRONG_DIMENSION') as ScenarioFileError;
      const where = p
        .map((k) => (typeof k === 'number' ? `[${k}]` : `.${k}`))
        .join('')
        .slice(1);
      expect(e.issues[0]?.path).toBe(where);
    }
  });
});
