/**
 * Scenario files may state a run's friction law: a constant Darcy factor or a Hazen-Williams
 * C, with optional aged values, instead of a roughness.
 */
import { describe, expect, it } from 'vitest';
import { readScenario, SCENARIO_FORMAT } from '../../src/design/scenario-file';
import type { PipeRunInput } from '../../src/system/index';
import { expectHeadflowError } from '../helpers/expect';

function file(run: Record<string, unknown>) {
  return {
    format: SCENARIO_FORMAT,
    name: 'stated laws',
    fluid: { water: { temperature: '15 degC' } },
    suction: { elevation: '0 m' },
    discharge: { elevation: '10 m' },
    line: [{ run: { length: '300 m', insideDiameter: '150 mm', ...run } }],
    duty: { flow: '20 L/s' },
  };
}

function firstRun(design: ReturnType<typeof readScenario>): PipeRunInput {
  return design.system.runs[0] as PipeRunInput;
}

describe('scenario files: a run with a stated friction law', () => {
  it('reads a Hazen-Williams C and a constant factor (with aged values), no roughness needed', () => {
    const hw = readScenario(file({ friction: { hazenWilliamsC: 130, agedHazenWilliamsC: 100 } }));
    expect(firstRun(hw).friction).toEqual({ hazenWilliamsC: 130, agedHazenWilliamsC: 100 });
    const f = readScenario(file({ friction: { factor: 0.021 } }));
    expect(firstRun(f).friction).toEqual({ factor: 0.021 });
  });

  it('refuses both laws, neither, a bad value, and a run with no wall and no law', () => {
    for (const bad of [
      { friction: { factor: 0.02, hazenWilliamsC: 120 } },
      { friction: {} },
      { friction: { factor: -1 } },
      { friction: { manning: 0.013 } },
      {},
    ]) {
      expectHeadflowError(() => readScenario(file(bad)), 'INVALID_ARGUMENT');
    }
  });
});
