/**
 * The invented canal-lift scenario (docs/examples/canal-lift.json) with changes, for the
 * checks' tests.
 */
import { readFileSync } from 'node:fs';
import { evaluateDesign } from '../../../src/design';
import { readScenario } from '../../../src/design/scenario-file';
import type { Check, DesignReport } from '../../../src/design/types';

type Json = Record<string, unknown>;

/** The canal-lift file as an object. */
export function canalLift(): Json {
  return JSON.parse(readFileSync('docs/examples/canal-lift.json', 'utf8')) as Json;
}

/** The report of a changed canal-lift file. */
export function evaluateFile(change: (file: Json) => void): DesignReport {
  const file = canalLift();
  delete file['$schema'];
  change(file);
  return evaluateDesign(readScenario(JSON.stringify(file)));
}

/** Every finding of a check, system and candidates. */
export function findings(report: DesignReport, id: string): Check[] {
  return [...report.checks, ...report.candidates.flatMap((c) => c.checks)].filter(
    (k) => k.id === id,
  );
}
