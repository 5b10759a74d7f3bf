/**
 * The duty-flow tolerance of a fixed-speed set: any shortfall is a note with its percentage,
 * beyond `limits.dutyFlowTolerance` (default 2 %) an error. Data: the invented irrigation
 * example (docs/examples/irrigation-lift.ts); the check values are the operating point the
 * pumps module computes for the same pump and system.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { design, fastPump } from '../../docs/examples/irrigation-lift';
import { DESIGN_DEFAULTS, type DesignInput, evaluateDesign } from '../../src/design';
import { readScenario } from '../../src/design/scenario-file';
import { operatingPoint } from '../../src/pumps';
import { systemCurve } from '../../src/system';
import type { Flow } from '../../src/units';
import { expectHeadflowError, expectRelative } from '../helpers/expect';

const flowAt = operatingPoint(fastPump, systemCurve(design.system)).flow;

/** The fast pump alone, fixed speed, design case only, `short` (a fraction) short of the duty. */
function shortBy(short: number, limits?: DesignInput['limits']): DesignInput {
  return {
    ...design,
    cases: [],
    dutyFlow: (flowAt / (1 - short)) as Flow,
    profile: [{ flow: (0.9 * flowAt) as Flow, hours: 2000 }],
    candidates: [{ name: 'fixed', pump: fastPump, control: 'fixed', motorEfficiency: 0.92 }],
    ...(limits === undefined ? {} : { limits }),
  };
}

const dutyChecks = (input: DesignInput) =>
  evaluateDesign(input).candidates[0]?.checks.filter((k) => k.id === 'duty-flow') ?? [];

describe('limits.dutyFlowTolerance', () => {
  it('defaults to 2 %', () => {
    expect(DESIGN_DEFAULTS.dutyFlowTolerance).toBe(0.02);
  });

  it('a shortfall within the tolerance is a note with its percentage', () => {
    const checks = dutyChecks(shortBy(0.013));
    expect(checks).toHaveLength(1);
    const [k] = checks;
    expect(k?.severity).toBe('info');
    expect(k?.message).toContain('1.3 % short of the duty');
    expect(k?.message).toContain('within the duty-flow tolerance of 2 %');
    expectRelative(k?.values['shortfall'] ?? 0, 0.013, 1e-9);
    expect(k?.values['tolerance']).toBe(0.02);
    expect(evaluateDesign(shortBy(0.013)).candidates[0]?.passed).toBe(true);
  });

  it('a shortfall beyond the tolerance is an error', () => {
    const input = shortBy(0.013, { dutyFlowTolerance: 0.01 });
    const [k] = dutyChecks(input);
    expect(k?.severity).toBe('error');
    expect(k?.message).toContain('1.3 % short of the duty');
    expect(k?.message).toContain('more than the duty-flow tolerance of 1 %');
    expect(evaluateDesign(input).candidates[0]?.passed).toBe(false);
    // The default 2 % is exceeded by a 2.5 % shortfall.
    expect(dutyChecks(shortBy(0.025))[0]?.severity).toBe('error');
  });

  it('a pump on the duty gets no duty-flow check; one well above it gets a note', () => {
    expect(dutyChecks(shortBy(0))).toEqual([]);
    const [above] = dutyChecks(shortBy(-0.05));
    expect(above?.severity).toBe('info');
    expect(above?.message).toContain('above the duty');
  });

  it('refuses a tolerance outside 0 to 1', () => {
    for (const bad of [-0.01, 1.5, Number.NaN]) {
      const err = expectHeadflowError(
        () => evaluateDesign(shortBy(0.01, { dutyFlowTolerance: bad })),
        'INVALID_ARGUMENT',
      );
      expect(err.parameter).toBe('limits.dutyFlowTolerance');
    }
  });

  it('is read from a scenario file as a fraction or a percentage', () => {
    const file = JSON.parse(
      readFileSync(new URL('../../docs/examples/canal-lift.json', import.meta.url), 'utf8'),
    );
    file.limits = { ...file.limits, dutyFlowTolerance: '1 %' };
    expect(readScenario(file).limits?.dutyFlowTolerance).toBe(0.01);
    file.limits.dutyFlowTolerance = 0.03;
    expect(readScenario(file).limits?.dutyFlowTolerance).toBe(0.03);
    file.limits.dutyFlowTolerance = '150 %';
    expect(() => readScenario(file)).toThrow(/limits\.dutyFlowTolerance/);
  });
});
