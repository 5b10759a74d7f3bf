/** Fuzz entries of the design, the scenario reader and the report renderers. See tests/fuzz/harness.ts. */
import { readFileSync } from 'node:fs';
import fc from 'fast-check';
import type { DesignReport } from '../../../src/index';
import * as api from '../../../src/index';
import { REPORT as fixtureReport } from '../../report/fixture';
import { type FuzzEntry, optionsOf, uniform } from '../harness';

const EXAMPLES = ['canal-lift', 'cooling-loop', 'orchard-tank'].map(
  (name) =>
    JSON.parse(
      readFileSync(new URL(`../../../docs/examples/${name}.json`, import.meta.url), 'utf8'),
    ) as Record<string, unknown>,
);

/** A scenario file: an example with its duty flow scaled by a factor. */
// The small example (orchard tank, 0.3 ms to evaluate) is drawn most often so that the whole
// suite stays within its minute; the cooling loop (17 ms) least.
const example = fc.oneof(
  { weight: 2, arbitrary: fc.constant(0) },
  { weight: 1, arbitrary: fc.constant(1) },
  { weight: 5, arbitrary: fc.constant(2) },
);
const scenario = fc.tuple(example, uniform(0.6, 1.3)).map(([i, factor]) => {
  const file = structuredClone(EXAMPLES[i] as Record<string, unknown>);
  const duty = file['duty'] as { flow: string };
  const [value, ...unit] = duty.flow.split(' ');
  duty.flow = `${Number(value) * factor} ${unit.join(' ')}`;
  return file;
});

// Reports with their sampled curves (the chart needs them) and without (the default).
const CURVED: readonly DesignReport[] = EXAMPLES.map((file) =>
  api.evaluateDesign(api.readScenario(file), { curves: true }),
);
const REPORTS: readonly DesignReport[] = [
  ...EXAMPLES.map((file) => api.evaluateDesign(api.readScenario(file))),
  ...CURVED,
  fixtureReport,
];
const report = fc.oneof(
  { weight: 1, arbitrary: fc.constantFrom(...REPORTS) },
  { weight: 2, arbitrary: fc.constant(REPORTS[2] as DesignReport) },
);
const curvedReport = fc.oneof(
  { weight: 1, arbitrary: fc.constantFrom(...CURVED) },
  { weight: 2, arbitrary: fc.constant(CURVED[2] as DesignReport) },
);
const unitSystem = fc.constantFrom('si', 'us');
/** Every check of the reports: the messages checkMessage rebuilds. */
const CHECKS: readonly api.Check[] = REPORTS.flatMap((r) => [
  ...r.checks,
  ...r.candidates.flatMap((c) => c.checks),
]);
const noNanText = (out: unknown): void => {
  const text = typeof out === 'string' ? out : JSON.stringify(out);
  if (/\bNaN\b|Infinity/.test(text)) throw new Error('a rendered report shows NaN or Infinity');
};

export const documentEntries: readonly FuzzEntry[] = [
  {
    name: 'readScenario',
    valid: fc
      .tuple(
        scenario,
        fc.boolean(),
        optionsOf(
          fc.record({ source: fc.constantFrom('lift.json', 'loop.json') }, { requiredKeys: [] }),
        ),
      )
      .map(([file, asText, o]) => [asText ? JSON.stringify(file) : file, o]),
    call: api.readScenario,
  },
  {
    name: 'evaluateDesign',
    valid: scenario.map((file) => [api.readScenario(file)]),
    call: api.evaluateDesign,
  },
  { name: 'displayUnits', valid: fc.tuple(unitSystem), call: api.displayUnits },
  {
    name: 'renderText',
    valid: fc.tuple(
      report,
      optionsOf(
        fc.record(
          { units: unitSystem, width: fc.integer({ min: 40, max: 200 }) },
          { requiredKeys: [] },
        ),
      ),
    ),
    call: api.renderText,
    check: noNanText,
  },
  {
    name: 'renderMarkdown',
    valid: fc.tuple(report, optionsOf(fc.record({ units: unitSystem }, { requiredKeys: [] }))),
    call: api.renderMarkdown,
    check: noNanText,
  },
  {
    name: 'renderJson',
    valid: fc.tuple(report, optionsOf(fc.record({ units: unitSystem }, { requiredKeys: [] }))),
    call: api.renderJson,
    check: noNanText,
  },
  {
    name: 'reportToPlain',
    valid: fc.tuple(report, fc.option(unitSystem, { nil: undefined })),
    call: api.reportToPlain,
  },
  {
    name: 'chartSpecFromReport',
    valid: fc.tuple(
      curvedReport,
      optionsOf(fc.record({ units: unitSystem }, { requiredKeys: [] })),
    ),
    call: api.chartSpecFromReport,
  },
  {
    name: 'renderChart',
    valid: fc.tuple(
      curvedReport.map((r) => api.chartSpecFromReport(r)),
      optionsOf(
        fc.record(
          {
            width: fc.integer({ min: 320, max: 2400 }),
            height: fc.integer({ min: 240, max: 1600 }),
          },
          { requiredKeys: [] },
        ),
      ),
    ),
    call: api.renderChart,
    check: noNanText,
  },
  {
    name: 'renderHtml',
    // The chart needs the sampled curves: `chart: true` only with a report that has them.
    valid: fc.oneof(
      fc.tuple(
        report,
        optionsOf(
          fc.record(
            { units: unitSystem, summary: fc.boolean(), chart: fc.constant(false) },
            { requiredKeys: [] },
          ),
        ),
      ),
      fc.tuple(
        curvedReport,
        optionsOf(
          fc.record(
            { units: unitSystem, summary: fc.boolean(), chart: fc.boolean() },
            { requiredKeys: [] },
          ),
        ),
      ),
    ),
    call: api.renderHtml,
    check: noNanText,
  },
  {
    name: 'checkMessage',
    valid: fc.tuple(
      fc.constantFrom(...CHECKS),
      unitSystem,
      fc.constantFrom('ascii', 'unicode', undefined),
    ),
    call: api.checkMessage,
    check: noNanText,
  },
  {
    name: 'HeadflowError',
    valid: fc.tuple(
      fc.constantFrom('INVALID_ARGUMENT', 'OUT_OF_RANGE', 'NO_SOLUTION'),
      fc.string(),
      optionsOf(
        fc.record(
          { parameter: fc.string(), value: fc.double(), unit: fc.constant('m') },
          { requiredKeys: [] },
        ),
      ),
    ),
    call: (...a: never[]) => {
      const e = new (api.HeadflowError as unknown as new (...x: unknown[]) => api.HeadflowError)(
        ...a,
      );
      return [e.code, e.message, e.parameter, e.unit, e.allowed];
    },
  },
  {
    name: 'ScenarioFileError',
    valid: fc.tuple(
      fc.array(
        fc.record({
          path: fc.constant('duty.flow'),
          message: fc.string(),
          code: fc.constant('INVALID_ARGUMENT'),
        }),
        { minLength: 1, maxLength: 3 },
      ),
      fc.option(fc.constant('lift.json'), { nil: undefined }),
    ),
    call: (...a: never[]) => {
      const e = new (
        api.ScenarioFileError as unknown as new (
          ...x: unknown[]
        ) => api.ScenarioFileError
      )(...a);
      return [e.code, e.message, e.issues.length];
    },
  },
];
