/**
 * Gauge and absolute pressures in scenario files, the site's atmosphere from its elevation,
 * and the report's echo of each end's pressure both ways.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { evaluateDesign } from '../../src/design/evaluate';
import { readScenario, ScenarioFileError } from '../../src/design/scenario-file';
import type { HeadflowError } from '../../src/errors';
import { renderJson, renderText } from '../../src/report/index';
import { atmosphereAt, q } from '../../src/units';
import { expectHeadflowError, expectRelative } from '../helpers/expect';

// biome-ignore lint/suspicious/noExplicitAny: test files mutate parsed JSON freely
type Json = any;

const EXAMPLE = readFileSync(
  new URL('../../docs/examples/canal-lift.json', import.meta.url),
  'utf8',
);

function minimal(): Json {
  return {
    format: 'headflow-scenario/1',
    name: 'small loop',
    fluid: { water: { temperature: '20 degC' } },
    suction: { elevation: '0 m' },
    discharge: { elevation: '10 m' },
    line: [{ run: { length: '50 m', insideDiameter: '100 mm', roughness: '0.05 mm' } }],
    duty: { flow: '10 L/s' },
  };
}

function problem(file: unknown, code: HeadflowError['code']): ScenarioFileError {
  const e = expectHeadflowError(() => readScenario(file), code);
  expect(e).toBeInstanceOf(ScenarioFileError);
  return e as ScenarioFileError;
}

describe('a plain "0 psi" in an absolute field is blamed on that field', () => {
  it('at the suction: the message names suction.pressure, says how it was read and what to write', () => {
    const f = minimal();
    f.suction.pressure = '0 psi';
    const e = problem(f, 'INVALID_ARGUMENT');
    expect(e.issues).toHaveLength(1);
    expect(e.issues[0]?.path).toBe('suction.pressure');
    expect(e.message).toContain('read as absolute');
    expect(e.message).toContain('"0 psig"');
    expect(e.message).toContain('gaugePressure');
    expect(e.message).not.toContain('fluid.water.temperature');
    expect(e.message).not.toContain('gaugeToAbsolute');
  });
  it('at the discharge and in a case too', () => {
    const f = minimal();
    f.discharge.pressure = '0 kPa';
    f.cases = [{ name: 'c', suction: { pressure: '0 bar' } }];
    const e = problem(f, 'INVALID_ARGUMENT');
    expect(e.issues.map((i) => i.path)).toEqual([
      'discharge.pressure',
      'cases[0].suction.pressure',
    ]);
    expect(e.message).toContain('"0 kPag"');
    expect(e.message).toContain('"0 barg"');
  });
  it('a low absolute pressure where the water boils is blamed on the pressure, not the temperature', () => {
    // 1 psi absolute = 6.895 kPa, below the saturation pressure of water at 60 degC
    // (19.95 kPa, IAPWS-IF97 region 4).
    const f = minimal();
    f.fluid.water.temperature = '60 degC';
    f.suction.pressure = '1 psi';
    const e = problem(f, 'OUT_OF_RANGE');
    expect(e.issues[0]?.path).toBe('suction.pressure');
    expect(e.message).toContain('"1 psig"');
    expect(e.message).not.toContain('gaugeToAbsolute');
    // The same reading marked as gauge is fine.
    f.suction.pressure = '1 psig';
    expect(readScenario(f).system.suction.pressure).toBeCloseTo(101325 + 6894.757293168361, 6);
  });
  it("an open surface where the water boils is still the temperature, in a file author's words", () => {
    const f = minimal();
    f.fluid.water.temperature = '120 degC';
    const e = problem(f, 'OUT_OF_RANGE');
    expect(e.issues[0]?.path).toBe('fluid.water.temperature');
    expect(e.message).not.toContain('gaugeToAbsolute');
  });
});

describe('gauge and absolute units in files', () => {
  it("a gauge unit in an absolute field is made absolute with the file's atmosphere", () => {
    const f = minimal();
    f.atmosphere = '95 kPa';
    f.suction.pressure = '15 psig';
    f.discharge.pressure = '2 barg';
    const d = readScenario(f);
    expectRelative(d.system.suction.pressure, 95000 + 15 * 6894.757293168361, 1e-15);
    expectRelative(d.system.discharge.pressure, 95000 + 200000, 1e-15);
  });
  it('an absolute unit in a gauge field stays absolute; kPa(g) and bar(g) read as gauge', () => {
    const f = minimal();
    f.suction.gaugePressure = '2 bara';
    f.discharge.gaugePressure = '150 kPa(g)';
    f.cases = [{ name: 'c', discharge: { pressure: '1.5 bar(g)' } }];
    const d = readScenario(f);
    expect(d.system.suction.pressure).toBe(200000);
    expect(d.system.discharge.pressure).toBe(101325 + 150000);
    expect(d.cases?.[0]?.discharge?.pressure).toBe(101325 + 150000);
  });
  it('design pressure limits take either mark', () => {
    const f = minimal();
    f.limits = { designPressure: '10 barg' };
    expect(readScenario(f).limits?.designPressure).toBe(1101325);
    f.limits = { designGaugePressure: '150 psi' };
    expectRelative(
      readScenario(f).limits?.designPressure ?? 0,
      101325 + 150 * 6894.757293168361,
      1e-15,
    );
  });
  it('a gauge mark where only an absolute pressure or a difference belongs is refused', () => {
    const f = minimal();
    f.fluid = {
      constant: { name: 'oil', density: '870 kg/m3', viscosity: '30 cP', vaporPressure: '5 psig' },
    };
    const e = problem(f, 'INVALID_ARGUMENT');
    expect(e.issues[0]?.path).toBe('fluid.constant.vaporPressure');
    expect(e.message).toContain('a gauge reading has no place here');
    const g = minimal();
    g.atmosphere = '14.2 psig';
    expect(problem(g, 'INVALID_ARGUMENT').issues[0]?.path).toBe('atmosphere');
  });
  it('refuses a malformed pressure and a vacuum below zero absolute, at the field', () => {
    const f = minimal();
    f.suction.pressure = 45;
    expect(problem(f, 'INVALID_ARGUMENT').message).toContain('write a quantity as text');
    f.suction.pressure = '-3 psia';
    expect(problem(f, 'INVALID_ARGUMENT').message).toContain('an absolute pressure is >= 0');
    f.suction.pressure = '3 KPA';
    expect(problem(f, 'UNKNOWN_UNIT').message).toContain('did you mean kPa');
    f.suction.pressure = '3 ft';
    expect(problem(f, 'WRONG_DIMENSION').issues[0]?.path).toBe('suction.pressure');
    f.suction.pressure = '-20 psig';
    expect(problem(f, 'OUT_OF_RANGE').issues[0]?.path).toBe('suction.pressure');
  });
});

describe('site elevation', () => {
  it('gives the standard atmosphere at the site for open surfaces and gauge readings', () => {
    const f = minimal();
    f.site = { elevation: '1500 m' };
    f.discharge.gaugePressure = '100 kPa';
    const d = readScenario(f);
    const atm = atmosphereAt(q(1500, 'm'));
    expect(d.system.suction.pressure).toBe(atm);
    expect(d.system.discharge.pressure).toBe(atm + 100000);
    expect(d.atmosphere).toBe(atm);
    // Without site or atmosphere the design carries no atmosphere (the default applies).
    expect(readScenario(minimal()).atmosphere).toBeUndefined();
  });
  it("refuses both site and atmosphere, and a site outside the standard's troposphere", () => {
    const f = minimal();
    f.site = { elevation: '300 m' };
    f.atmosphere = '97 kPa';
    expect(problem(f, 'INVALID_ARGUMENT').issues[0]?.path).toBe('site');
    const g = minimal();
    g.site = { elevation: '12 km' };
    expect(problem(g, 'OUT_OF_RANGE').issues[0]?.path).toBe('site.elevation');
    const h = minimal();
    h.site = { elevation: '300 m', height: '2 m' };
    expect(problem(h, 'INVALID_ARGUMENT').issues[0]?.path).toBe('site.height');
  });
  it('lowers NPSH available by the drop in atmosphere, as a head of the liquid', () => {
    const sea = JSON.parse(EXAMPLE);
    const high = JSON.parse(EXAMPLE);
    high.site = { elevation: '1500 m' };
    const a = evaluateDesign(readScenario(sea)).duty[0]?.npshAvailable ?? 0;
    const b = evaluateDesign(readScenario(high)).duty[0]?.npshAvailable ?? 0;
    const design = readScenario(sea);
    const rhoG = design.system.fluid.density * 9.80665;
    // NPSHa = (p_surface - p_vapour) / (rho g) + static head - losses: p_surface changes, and
    // with it, slightly, the water's state (IAPWS-IF97 at the suction pressure: density and
    // viscosity, so rho g and the losses); 1e-4 relative covers that.
    expectRelative(a - b, (101325 - atmosphereAt(q(1500, 'm'))) / rhoG, 1e-4);
  });
});

describe("the report echoes every end's pressure both ways", () => {
  it('in the report, the text and the JSON', () => {
    const f = minimal();
    f.atmosphere = '95 kPa';
    f.discharge.pressure = '30 psi';
    const report = evaluateDesign(readScenario(f));
    expect(report.atmosphere).toBe(95000);
    expect(report.duty[0]?.suctionPressure).toBe(95000);
    expectRelative(report.duty[0]?.dischargePressure ?? 0, 30 * 6894.757293168361, 1e-15);
    const text = renderText(report);
    expect(text).toContain('Ends by operating case');
    expect(text).toContain('Atmosphere: 95.00 kPa abs');
    // 30 psi absolute = 206.8 kPa; as gauge against 95 kPa: 111.8 kPa.
    expect(text).toMatch(/small loop\s+\S+\s+95\.00\s+0\.000\s+\S+\s+206\.8\s+111\.8/);
    const json = JSON.parse(renderJson(report));
    expect(json.report.atmosphere).toEqual({ value: 95, unit: 'kPa' });
    expect(json.report.duty[0].dischargePressure.gauge.value).toBeCloseTo(111.843, 3);
  });
  it('evaluateDesign refuses an atmosphere that is not a positive pressure', () => {
    const design = readScenario(minimal());
    expectHeadflowError(
      () => evaluateDesign({ ...design, atmosphere: q(0, 'Pa') }),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () => evaluateDesign({ ...design, atmosphere: Number.NaN as never }),
      'INVALID_ARGUMENT',
    );
  });
});
