import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import {
  CATALOGUE_SCHEMA_PATH,
  catalogueJsonSchema,
  catalogueJsonSchemaText,
} from '../../docs/tools/catalogue-schema';
import { CatalogueFileError, readCatalogue } from '../../src/select/index';
import { q, to } from '../../src/units/index';
import { expectHeadflowError, expectRelative } from '../helpers/expect';

const text = readFileSync('docs/examples/pump-catalogue.json', 'utf8');

// biome-ignore lint/suspicious/noExplicitAny: the test edits parsed JSON freely
type Node = any;

function edited(change: (file: Node) => void): string {
  const file: Node = JSON.parse(text);
  change(file);
  return JSON.stringify(file);
}

function issuesOf(json: string): CatalogueFileError {
  try {
    readCatalogue(json, { source: 'pumps.json' });
  } catch (e) {
    expect(e).toBeInstanceOf(CatalogueFileError);
    return e as CatalogueFileError;
  }
  return expect.fail('expected a CatalogueFileError');
}

describe('readCatalogue', () => {
  it('reads the example catalogue into SI', () => {
    const c = readCatalogue(text, { source: 'pump-catalogue.json' });
    expect(c.pumps).toHaveLength(20);
    expect(c.currency).toBe('EUR');
    expect(c.motorEfficiency).toBe(0.92);
    const p = c.pumps.find((x) => x.name === '65-200/2900');
    expectRelative(to(p?.speed ?? q(0, 'rpm'), 'rpm'), 2900, 1e-12);
    expectRelative(to(p?.impellerDiameter ?? q(0, 'm'), 'mm'), 219, 1e-12);
    expectRelative(to(p?.drive?.maxSpeed ?? q(0, 'rpm'), 'rpm'), 3000, 1e-12);
    expect(p?.drive?.efficiency).toBe(0.97);
    expect(p?.points[2]?.efficiency).toBeCloseTo(0.73, 12);
    // The parsed value is accepted as well as the text.
    expect(readCatalogue(JSON.parse(text)).pumps).toHaveLength(20);
  });

  it('refuses text that is not JSON, and bad options', () => {
    expectHeadflowError(() => readCatalogue('{', { source: 'x.json' }), 'INVALID_ARGUMENT');
    expectHeadflowError(() => readCatalogue(text, 'x.json' as never), 'INVALID_ARGUMENT');
    expectHeadflowError(() => readCatalogue(text, { source: 7 as never }), 'INVALID_ARGUMENT');
  });

  it('names the place of each problem in the file, with its code', () => {
    const e = issuesOf(
      edited((f) => {
        f.pumps[1].points[2].head = '52 L/s';
        f.pumps[5].speed = 2900;
        f.pumps[4].colour = 'blue';
        f.pumps[3].drive.efficiency = '130 %';
        f.pumps[6].points[0].flow = '3 furlongs';
        delete f.pumps[7].impellerDiameter;
      }),
    );
    const by = new Map(e.issues.map((i) => [i.path, i]));
    expect(e.code).toBe('WRONG_DIMENSION');
    expect(e.parameter).toBe('pumps[1].points[2].head');
    expect(by.get('pumps[1].points[2].head')?.message).toContain('which is a flow');
    expect(by.get('pumps[5].speed')?.message).toContain('write a quantity as text');
    expect(by.get('pumps[4].colour')?.message).toContain('unknown field');
    expect(by.get('pumps[3].drive.efficiency')?.code).toBe('INVALID_ARGUMENT');
    expect(by.get('pumps[6].points[0].flow')?.code).toBe('UNKNOWN_UNIT');
    expect(by.get('pumps[7].impellerDiameter')?.message).toBe('this field is required');
    expect(e.message).toContain('pump catalogue pumps.json has 6 problems');
  });

  it('checks the pumps as selectPumps does, at their path', () => {
    const dup = issuesOf(edited((f) => (f.pumps[2].name = f.pumps[0].name)));
    expect(dup.issues[0]?.path).toBe('pumps[2].name');
    const rising = issuesOf(edited((f) => (f.pumps[0].points[3].head = '90 m')));
    expect(rising.issues[0]?.path).toMatch(/^pumps\[0\]\.points/);
    const motor = issuesOf(edited((f) => delete f.motorEfficiency));
    expect(motor.issues[0]?.path).toBe('pumps[0].motorEfficiency');
    const big = issuesOf(edited((f) => (f.pumps[4].curves[0].impellerDiameter = '300 mm')));
    expect(big.issues[0]?.path).toBe('pumps[4].curves[0].impellerDiameter');
    const format = issuesOf(edited((f) => (f.format = 'headflow-scenario/1')));
    expect(format.issues[0]?.path).toBe('format');
  });
});

describe('docs/pump-catalogue.schema.json', () => {
  const committed = readFileSync(CATALOGUE_SCHEMA_PATH, 'utf8');
  it('is what docs/tools/catalogue-schema.ts generates (npm run schema)', () => {
    expect(JSON.parse(committed)).toEqual(JSON.parse(catalogueJsonSchemaText()));
  });
  it('forbids unknown fields and requires format and pumps', () => {
    const schema: Node = catalogueJsonSchema();
    expect(schema.additionalProperties).toBe(false);
    expect(schema.required).toEqual(expect.arrayContaining(['format', 'pumps']));
    expect(schema.properties.pumps.items.required).toEqual(
      expect.arrayContaining(['name', 'speed', 'impellerDiameter', 'points']),
    );
  });
});
