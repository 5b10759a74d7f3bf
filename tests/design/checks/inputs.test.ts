/**
 * The screening checks' inputs at the entry of `evaluateDesign`: impossible values throw
 * `INVALID_ARGUMENT` naming the field.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { type DesignInput, evaluateDesign } from '../../../src/design';
import { readScenario } from '../../../src/design/scenario-file';
import { expectHeadflowError } from '../../helpers/expect';

const base = readScenario(readFileSync('docs/examples/canal-lift.json', 'utf8'));

describe('screening inputs', () => {
  const bad: [string, Partial<DesignInput>][] = [
    ['surge.closureTime', { surge: { closureTime: -1 as never } }],
    ['surge', { surge: 3 as never }],
    ['lowFlow.minimumFlow', { lowFlow: { minimumFlow: 0 as never } }],
    ['lowFlow.maxTemperatureRise', { lowFlow: { maxTemperatureRise: Number.NaN } }],
    ['intake.depth', { intake: { depth: -2 as never, diameter: 0.3 as never } }],
    ['intake.diameter', { intake: { diameter: Number.POSITIVE_INFINITY as never } }],
  ];
  for (const [name, change] of bad) {
    it(`refuses an impossible ${name}`, () => {
      const e = expectHeadflowError(
        () => evaluateDesign({ ...base, ...change }),
        'INVALID_ARGUMENT',
      );
      expect(e.message).toContain(name);
    });
  }

  it('null blocks mean none', () => {
    const r = evaluateDesign({ ...base, surge: null as never, lowFlow: null as never });
    expect(r.checks.some((k) => k.id === 'surge')).toBe(false);
  });
});
