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
