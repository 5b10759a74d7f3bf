import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import {
  evaluateDesign,
  type NetworkDesignInput,
  readDesignFile,
  readScenario,
  ScenarioFileError,
} from '../../src/design/index';
import { q, STANDARD_ATMOSPHERE } from '../../src/units';
import { EXAMPLES_DIR } from '../helpers/examples';
import { expectHeadflowError, expectRelative } from '../helpers/expect';

const text = readFileSync(join(EXAMPLES_DIR, 'booster-floors.json'), 'utf8');
const booster = JSON.parse(text) as Record<string, unknown>;

/** The issues' paths of a file that fails to read. */
function paths(doc: unknown): string[] {
  try {
    readDesignFile(doc);
  } catch (e) {
    expect(e).toBeInstanceOf(ScenarioFileError);
    return (e as ScenarioFileError).issues.map((i) => i.path);
  }
  return expect.fail('the file was read');
}

describe('the network form of a scenario file', () => {
  it('reads nodes, links, the pump link and service pressures as gauge', () => {
    const d = readDesignFile(text) as NetworkDesignInput;
    expect(d.pumpLink).toBe('booster');
    expect(d.network.nodes).toHaveLength(15);
    // "2 barg" is 2 bar above the standard atmosphere (the file gives no site).
    expectRelative(d.service?.[0]?.minPressure ?? 0, STANDARD_ATMOSPHERE + 2e5, 1e-15);
    expectRelative(d.pumpElevation ?? 0, q(0.3, 'm'), 1e-15);
    expect(d.cases?.[1]?.levels?.['break tank']).toBeCloseTo(0.4, 12);
  });

  it('readScenario keeps to the line form and says what to use for a network', () => {
    const e = expectHeadflowError(
      () => readScenario(text, { source: 'b.json' }),
      'INVALID_ARGUMENT',
    );
    expect(e.message).toContain('readDesignFile');
  });

  it('refuses with the path of each problem', () => {
    const links = booster['links'] as Record<string, unknown>[];
    const nodes = booster['nodes'] as Record<string, unknown>[];
    expect(
      paths({ ...booster, links: links.map((l, i) => (i === 2 ? { ...l, to: 'roof' } : l)) }),
    ).toEqual(['links[2].to']);
    expect(paths({ ...booster, links: links.filter((l) => l['pump'] === undefined) })).toEqual([
      'links',
    ]);
    expect(
      paths({ ...booster, nodes: nodes.map((n, i) => (i === 3 ? { ...n, id: 'floor 2' } : n)) }),
    ).toContain('nodes[4].id');
    expect(
      paths({ ...booster, duty: { service: [{ node: 'attic', minPressure: '2 barg' }] } }),
    ).toEqual(['duty.service[0].node']);
    expect(paths({ ...booster, line: [] })).toContain('line');
    expect(paths({ ...booster, nodes: undefined })).toContain('nodes');
    expect(
      paths({
        ...booster,
        links: links.map((l, i) => (i === 1 ? { ...l, run: { length: '1 m' } } : l)),
      }),
    ).toSatisfy(
      (found: string[]) => found.length > 0 && found.every((f) => f.startsWith('links[1]')),
    );
    expect(
      paths({ ...booster, nodes: nodes.map((n, i) => (i === 5 ? { ...n, x: 3 } : n)) }),
    ).toEqual(['nodes[5].y']);
  });

  it('a line-form file may not take service pressures', () => {
    const line = JSON.parse(readFileSync(join(EXAMPLES_DIR, 'canal-lift.json'), 'utf8'));
    expect(paths({ ...line, duty: { service: [{ node: 'x', minPressure: '1 barg' }] } })).toEqual([
      'duty.service',
    ]);
  });

  it('evaluates from the file: every service node at its minimum or above for the passing set', () => {
    const report = evaluateDesign(readDesignFile(text));
    const best = report.candidates[0];
    expect(best?.passed).toBe(true);
    for (const d of report.duty) {
      for (const n of d.network?.tables.nodes ?? []) {
        if (n.minPressure !== undefined) {
          expect(n.pressure).toBeGreaterThanOrEqual(n.minPressure * (1 - 1e-9));
        }
      }
    }
  });
});

describe('network cases in a file', () => {
  it('reports an id the network does not hold at its path in the case', () => {
    const ring = JSON.parse(readFileSync(join(EXAMPLES_DIR, 'ring-main.json'), 'utf8'));
    ring.cases[2].demands.attic = '1 L/s';
    expect(paths(ring)).toEqual(['cases[2].demands.attic']);
  });
});

describe('the network form: more fields and refusals', () => {
  const ring = () => JSON.parse(readFileSync(join(EXAMPLES_DIR, 'ring-main.json'), 'utf8'));

  it('reads a pressurized surface, an absolute outlet rating and a flow-limiting valve', () => {
    const f = ring();
    f.nodes[0].surface = { gaugePressure: '0.5 bar' };
    f.links[8].valve = { kind: 'flow-limiting', setting: '3 L/s', diameter: '100 mm', openK: 4 };
    f.nodes.push({
      id: 'hydrant',
      elevation: '100 m',
      outlet: { ratedFlow: '5 L/s', ratedPressure: '301.325 kPa(a)', exponent: 0.5 },
    });
    f.links.push({
      id: 'to hydrant',
      from: 'west',
      to: 'hydrant',
      status: 'closed',
      run: f.links[3].run,
    });
    const d = readDesignFile(f) as NetworkDesignInput;
    const well = d.network.nodes[0];
    expect(well && 'surface' in well ? well.surface.pressure : 0).toBeCloseTo(
      STANDARD_ATMOSPHERE + 5e4,
      6,
    );
    const hydrant = d.network.nodes.find((n) => n.id === 'hydrant');
    // 5 L/s at 200 kPa gauge: k = 0.005 / 200000^0.5.
    expect(hydrant && 'outlet' in hydrant ? hydrant.outlet.coefficient : 0).toBeCloseTo(
      0.005 / Math.sqrt(2e5),
      12,
    );
    const valve = d.network.links.find((l) => l.id === 'zone valve');
    expect(valve && 'valve' in valve ? valve.valve.setting : 0).toBeCloseTo(0.003, 12);
  });

  it('refuses line-form fields, two pump links, a case temperature for a constant fluid', () => {
    const f = ring();
    expect(paths({ ...f, suction: { elevation: '0 m' } })).toEqual(['suction']);
    expect(paths({ ...f, pumpLocation: { elevation: '0 m' } })).toEqual(['pumpLocation']);
    const twice = ring();
    twice.links[3] = { id: 'second', from: 'west', to: 'north', pump: 'candidates' };
    expect(paths(twice)).toEqual(['links[3].pump']);
    const suction = ring();
    suction.cases[0].suction = { elevation: '1 m' };
    expect(paths(suction)).toEqual(['cases[0].suction']);
    const constant = ring();
    constant.fluid = {
      constant: {
        name: 'water',
        density: '1000 kg/m3',
        viscosity: '1 cSt',
        vaporPressure: '2 kPa',
      },
    };
    constant.cases[0].temperature = '20 degC';
    expect(paths(constant)).toEqual(['cases[0].temperature']);
    const valve = ring();
    valve.links[8].valve.kind = 'flow-limiting';
    expect(paths(valve)).toEqual(['links[8].valve.setting']);
  });

  it('reads case temperatures, aged pipe and statuses', () => {
    const f = ring();
    f.cases.push({
      name: 'winter, aged',
      temperature: '4 degC',
      aged: true,
      status: { 'tank main': 'closed' },
    });
    for (const l of f.links) if (l.run) l.run.agedRoughness = '0.5 mm';
    const d = readDesignFile(f) as NetworkDesignInput;
    const winter = d.cases?.[3];
    expect(winter?.aged).toBe(true);
    expect(winter?.status?.['tank main']).toBe('closed');
    expect(winter?.fluid?.density).toBeGreaterThan(d.network.fluid.density);
  });
});
