/**
 * Fuzz entries of the pump selection: the catalogue reader, life-cycle costs, the selection
 * and the economic pipe size, and the selection's renderer. Valid designs are the orchard-tank
 * and canal-lift examples (docs/examples/*.json), catalogues a few pumps of
 * docs/examples/pump-catalogue.json. See tests/fuzz/harness.ts.
 */
import { readFileSync } from 'node:fs';
import fc from 'fast-check';
import type { DesignInput, PumpCatalogue, Selection } from '../../../src/index';
import * as api from '../../../src/index';
import { type FuzzEntry, optionsOf, uniform } from '../harness';

function example(name: string): string {
  return readFileSync(new URL(`../../../docs/examples/${name}`, import.meta.url), 'utf8');
}

const CATALOGUE_FILE = JSON.parse(example('pump-catalogue.json')) as {
  pumps: Record<string, unknown>[];
} & Record<string, unknown>;
const CATALOGUE = api.readCatalogue(CATALOGUE_FILE);
const ORCHARD = api.readScenario(example('orchard-tank.json'));
const CANAL = api.readScenario(example('canal-lift.json'));

/** Indices of 1 to 3 different pumps of the catalogue. */
const somePumps = fc.uniqueArray(fc.integer({ min: 0, max: CATALOGUE.pumps.length - 1 }), {
  minLength: 1,
  maxLength: 3,
});

/** A catalogue file (JSON data or its text) with a few of the example's pumps. */
const catalogueFile = fc.tuple(somePumps, fc.boolean()).map(([picked, asText]) => {
  const file = {
    ...structuredClone(CATALOGUE_FILE),
    pumps: picked.map((i) => structuredClone(CATALOGUE_FILE.pumps[i])),
  };
  return asText ? JSON.stringify(file) : file;
});

/** A read catalogue with a few pumps. */
const catalogue: fc.Arbitrary<PumpCatalogue> = somePumps.map((picked) => ({
  ...CATALOGUE,
  pumps: picked.map((i) => CATALOGUE.pumps[i] as PumpCatalogue['pumps'][number]),
}));

// The orchard tank (a few milliseconds to select from three pumps) most often; the canal lift
// (about 15 ms) now and then.
const design: fc.Arbitrary<DesignInput> = fc.oneof(
  { weight: 4, arbitrary: fc.constant(ORCHARD) },
  { weight: 1, arbitrary: fc.constant(CANAL) },
);

const costs = fc.record(
  {
    years: fc.integer({ min: 1, max: 40 }),
    discountRate: uniform(0, 0.15),
    energyEscalation: uniform(-0.05, 0.1),
    maintenancePerYear: uniform(0, 5000),
  },
  { requiredKeys: [] },
);

const selectOptions = optionsOf(
  fc.record(
    {
      methods: fc.uniqueArray(fc.constantFrom('throttle', 'trim', 'speed'), {
        minLength: 1,
        maxLength: 3,
      }),
      costs,
    },
    { requiredKeys: [] },
  ),
);

/** The run whose size is chosen, per design, with sizes around the example's. */
function sizesFor(d: DesignInput): api.PipeSizeOptions['runs'] {
  const run = d === ORCHARD ? 'delivery' : 'rising main';
  const nps = d === ORCHARD ? ['3', '4'] : ['5', '6', '8'];
  return [
    {
      run,
      sizes: nps.map((n, i) => ({ pipe: api.pipeSize(n, '40'), costPerLength: 40 + 30 * i })),
    },
  ];
}

const SELECTIONS: readonly Selection[] = [
  api.selectPumps(ORCHARD, { ...CATALOGUE, pumps: CATALOGUE.pumps.slice(0, 3) }),
  api.selectPumps(
    CANAL,
    { ...CATALOGUE, pumps: CATALOGUE.pumps.slice(0, 4) },
    {
      costs: { years: 20, discountRate: 0.05 },
    },
  ),
];

// One selection or pipe sizing takes a few milliseconds: those rows run 100 calls of each kind.
const WHOLE_JOB_RUNS = 100;

export const selectionEntries: readonly FuzzEntry[] = [
  {
    name: 'readCatalogue',
    valid: fc.tuple(
      catalogueFile,
      optionsOf(fc.record({ source: fc.constant('pumps.json') }, { requiredKeys: [] })),
    ),
    call: api.readCatalogue,
    runs: 300,
  },
  {
    name: 'CatalogueFileError',
    valid: fc.tuple(
      fc.array(
        fc.record({
          path: fc.constant('pumps[0].speed'),
          message: fc.string(),
          code: fc.constant('INVALID_ARGUMENT'),
        }),
        { minLength: 1, maxLength: 3 },
      ),
      fc.option(fc.constant('pumps.json'), { nil: undefined }),
    ),
    call: (...a: never[]) => {
      const e = new (
        api.CatalogueFileError as unknown as new (
          ...x: unknown[]
        ) => api.CatalogueFileError
      )(...a);
      return [e.code, e.message, e.issues.length];
    },
  },
  {
    name: 'presentValueFactor',
    valid: fc.tuple(fc.integer({ min: 1, max: 100 }), uniform(0, 1), uniform(-0.99, 1)),
    call: api.presentValueFactor,
  },
  {
    name: 'lifeCycleCost',
    valid: fc.tuple(
      optionsOf(
        fc.record(
          {
            years: fc.integer({ min: 1, max: 100 }),
            discountRate: uniform(0, 1),
            energyEscalation: uniform(-0.99, 1),
            escalation: uniform(-0.99, 1),
            initial: uniform(0, 1e7),
            installation: uniform(0, 1e7),
            energyPerYear: uniform(0, 1e7),
            operationPerYear: uniform(0, 1e6),
            maintenancePerYear: uniform(0, 1e6),
            downtimePerYear: uniform(0, 1e6),
            environmentalPerYear: uniform(0, 1e6),
            decommissioning: uniform(0, 1e6),
          },
          { requiredKeys: [] },
        ),
      ),
    ),
    call: api.lifeCycleCost,
  },
  {
    name: 'selectPumps',
    valid: fc.tuple(design, catalogue, selectOptions),
    call: api.selectPumps,
    runs: WHOLE_JOB_RUNS,
  },
  {
    name: 'economicPipeSize',
    valid: fc
      .tuple(design, catalogue, costs, fc.integer({ min: 1, max: 64 }))
      .map(([d, c, k, max]) => [d, c, { runs: sizesFor(d), costs: k, maxCombinations: max }]),
    call: api.economicPipeSize,
    runs: WHOLE_JOB_RUNS,
  },
  {
    name: 'renderSelection',
    valid: fc.tuple(
      fc.constantFrom(...SELECTIONS),
      optionsOf(
        fc.record(
          {
            format: fc.constantFrom('text', 'markdown', 'json'),
            units: fc.constantFrom('si', 'us'),
            limit: fc.integer({ min: 1, max: 20 }),
          },
          { requiredKeys: [] },
        ),
      ),
    ),
    call: api.renderSelection,
    check: (out) => {
      if (/\bNaN\b|Infinity/.test(String(out))) throw new Error('the selection shows NaN');
    },
  },
];
