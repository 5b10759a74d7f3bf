/**
 * Input errors echo the value as the file wrote it, not as the library converted it to SI.
 */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { readScenario, ScenarioFileError } from '../../src/design/index';

const base = JSON.parse(
  readFileSync(join(__dirname, '../../docs/examples/canal-lift.json'), 'utf8'),
) as Record<string, unknown> & { fluid: { water: { temperature: string } } };

function problem(edit: (f: typeof base) => void): string {
  const f = structuredClone(base);
  edit(f);
  try {
    readScenario(f);
  } catch (e) {
    expect(e).toBeInstanceOf(ScenarioFileError);
    return (e as ScenarioFileError).issues[0]?.message ?? '';
  }
  return expect.fail('the file was read');
}

describe('input errors echo the value as written', () => {
  it('a site elevation above the troposphere: "90000 ft", not its value in metres', () => {
    const said = problem((f) => {
      f['site'] = { elevation: '90000 ft' };
    });
    expect(said).toContain('found "90000 ft"');
    // 90 000 ft = 27 432 m (ft = 0.3048 m exactly, NIST SP 811).
    expect(said).not.toContain('27432');
  });
  it('water above its boiling point: the file\'s "250 degF" is quoted', () => {
    const said = problem((f) => {
      f.fluid.water.temperature = '250 degF';
    });
    expect(said).toContain('(the file gives "250 degF")');
  });
});
