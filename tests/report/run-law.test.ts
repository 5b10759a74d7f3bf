/**
 * The sheet names a run's stated friction law (a Hazen-Williams C or a constant Darcy factor)
 * beside its regime, so the method behind each loss is shown in text and Markdown as in JSON.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { evaluateDesign, readScenario } from '../../src/design/index';
import { renderJson, renderMarkdown, renderText } from '../../src/report/index';

const FILE = JSON.parse(readFileSync('docs/examples/canal-lift.json', 'utf8')) as {
  line: { run?: Record<string, unknown> }[];
};

function withLaw(friction: Record<string, number>) {
  const file = structuredClone(FILE);
  const main = file.line.map((e) => e.run).find((r) => r?.['name'] === 'rising main');
  if (main === undefined) throw new Error('the example has no rising main');
  main['friction'] = friction;
  delete main['material'];
  delete main['agedRoughness'];
  return evaluateDesign(readScenario(file));
}

describe('a stated friction law in the report', () => {
  it('Hazen-Williams C: text, Markdown and JSON name it', () => {
    const report = withLaw({ hazenWilliamsC: 130 });
    const main = report.duty[0]?.runs.find((r) => r.name === 'rising main');
    expect(main?.law).toBe('hazen-williams');
    expect(renderText(report)).toContain(`${main?.regime} (Hazen-Williams C 130)`);
    expect(renderMarkdown(report)).toContain('(Hazen-Williams C 130)');
    expect(renderJson(report)).toContain('"law": "hazen-williams"');
  });

  it('a constant Darcy factor', () => {
    const report = withLaw({ factor: 0.02 });
    expect(renderText(report)).toContain('(stated f 0.02)');
  });
});
