import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';

/** The folder of the invented demo files. */
export const EXAMPLES_DIR = join(__dirname, '../../docs/examples');

/** Names of the scenario files among the demo files (not the pump catalogue or other formats). */
export function scenarioExampleFiles(): string[] {
  return readdirSync(EXAMPLES_DIR)
    .filter((f) => f.endsWith('.json'))
    .filter((f) => {
      const doc: unknown = JSON.parse(readFileSync(join(EXAMPLES_DIR, f), 'utf8'));
      return (
        typeof doc === 'object' &&
        doc !== null &&
        (doc as { format?: unknown }).format === 'headflow-scenario/1'
      );
    });
}
