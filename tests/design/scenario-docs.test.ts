import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { evaluateDesign } from '../../src/design/index';
import { readScenario } from '../../src/design/scenario-file';

const guide = readFileSync(new URL('../../docs/scenario-format.md', import.meta.url), 'utf8');
const example = readFileSync(
  new URL('../../docs/examples/orchard-tank.json', import.meta.url),
  'utf8',
);

function jsonBlocks(markdown: string): string[] {
  return [...markdown.matchAll(/```json\n([\s\S]*?)\n```/g)].map((m) => m[1] ?? '');
}

describe('docs/scenario-format.md', () => {
  it('shows docs/examples/orchard-tank.json as it is', () => {
    const [block] = jsonBlocks(guide);
    expect(JSON.parse(block ?? 'null')).toEqual(JSON.parse(example));
  });

  it('its example reads and evaluates, and passes', () => {
    const design = readScenario(example, { source: 'orchard-tank.json' });
    expect(design.units).toBe('us');
    const report = evaluateDesign(design);
    expect(report.passed).toBe(true);
    expect(report.duty.map((d) => d.case)).toEqual(['ditch full', 'ditch low']);
  });

  it('shows the messages the reader gives', () => {
    const f = JSON.parse(
      readFileSync(new URL('../../docs/examples/canal-lift.json', import.meta.url), 'utf8'),
    );
    f.line[1].run.length = '420 psi';
    f.candidates[0].points[2].head = 'high';
    let message = '';
    try {
      readScenario(f);
    } catch (e) {
      message = e instanceof Error ? e.message : '';
    }
    const shown =
      /```\n {2}(the scenario file has 2 problems:[\s\S]*?)\n\s*```/.exec(guide)?.[1] ?? '';
    const dedented = shown
      .split('\n')
      .map((line) => line.replace(/^ {2}/, ''))
      .join('\n');
    expect(message).toBe(dedented);
  });

  it('lists every top-level field of the format', () => {
    for (const field of [
      'format',
      'name',
      'units',
      'atmosphere',
      'gravity',
      'friction',
      'aged',
      'fluid',
      'suction',
      'discharge',
      'line',
      'cases',
      'duty',
      'pumpLocation',
      'candidates',
      'profile',
      'energyPrice',
      'limits',
    ]) {
      expect(guide).toContain(`| \`${field}\` |`);
    }
  });
});
