import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import {
  SCENARIO_SCHEMA_PATH,
  scenarioJsonSchema,
  scenarioJsonSchemaText,
} from '../../docs/tools/scenario-schema';

const committed = readFileSync(new URL(`../../${SCENARIO_SCHEMA_PATH}`, import.meta.url), 'utf8');

// biome-ignore lint/suspicious/noExplicitAny: the test walks generated JSON freely
type Node = any;

describe('docs/scenario.schema.json', () => {
  it('is what docs/tools/scenario-schema.ts generates (run it after changing the format)', () => {
    expect(JSON.parse(committed)).toEqual(JSON.parse(scenarioJsonSchemaText()));
  });

  it('forbids unknown fields and requires the format, name, fluid, duty and one form', () => {
    const schema: Node = scenarioJsonSchema();
    expect(schema.additionalProperties).toBe(false);
    expect(schema.required).toEqual(expect.arrayContaining(['format', 'name', 'fluid', 'duty']));
    // The line form (ends and line) or the network form (nodes and links).
    expect(schema.oneOf).toEqual([
      { required: ['suction', 'discharge', 'line'] },
      { required: ['nodes', 'links'] },
    ]);
  });

  it('describes quantities as text with a pattern, a description and an example', () => {
    const schema: Node = scenarioJsonSchema();
    const flow: Node = schema.properties.duty.properties.flow;
    expect(flow.type).toBe('string');
    expect(typeof flow.pattern).toBe('string');
    expect(flow.description).toContain('a flow > 0');
    expect(flow.examples).toEqual(['1200 gal/min']);
    const pattern = new RegExp(flow.pattern);
    for (const ok of ['40 L/s', '1,200 gal/min', '2.5e-3 m3/s', '-1.2 m']) {
      expect(pattern.test(ok), ok).toBe(true);
    }
    for (const bad of ['L/s', '', 'forty L/s']) expect(pattern.test(bad), bad).toBe(false);
  });

  it('writes the one-of rules of the reader', () => {
    const schema: Node = scenarioJsonSchema();
    const fluid: Node = schema.properties.fluid;
    expect(fluid.oneOf).toEqual([
      { required: ['water'] },
      { required: ['constant'] },
      { required: ['table'] },
    ]);
    const suction: Node = schema.properties.suction;
    expect(suction.not).toEqual({ anyOf: [{ required: ['pressure', 'gaugePressure'] }] });
  });
});
