/**
 * Check `no-operating-point`: a set whose curve does not meet the system's in a case.
 *
 * @module
 */
import type { SystemCurveLike } from '../../pumps/index';
import type { Flow } from '../../units/index';
import type { Check } from '../types';
import { type CheckInfo, COMMON, check } from './check';
import type { Candidate } from './context';

export const NO_OPERATING_POINT: CheckInfo = {
  id: 'no-operating-point',
  guards: 'a pump that cannot lift the liquid, or runs off the end of its curve',
  inputs: 'the pump curve (and drive speed limit); the system curve in each case',
  severity: 'error',
  source: COMMON,
};

/**
 * Why a set has no operating point in a case, as a reason and its numbers (SI), worked out
 * from the curves themselves so that the report can say it in any unit system.
 */
function noPointReason(
  c: Candidate,
  system: SystemCurveLike,
  dutyFlow: number,
): { words: Record<string, string>; values: Record<string, number> } {
  if (c.control === 'speed') {
    const top = c.maxSpeed === c.pump.speed ? c.pump : c.pump.atSpeed(c.maxSpeed);
    const perPumpDuty = c.pumpFlow(dutyFlow);
    const m = c.arrangement === 'series' ? c.count : 1;
    if (perPumpDuty > top.flowRange.max) {
      return {
        words: { reason: 'beyond-curve' },
        values: { dutyFlow, maxSpeed: c.maxSpeed, maxFlow: c.setFlow(top.flowRange.max) },
      };
    }
    const pumpHead = top.head(perPumpDuty as Flow) * m;
    const systemHead = system.head(perPumpDuty as Flow) * m;
    if (pumpHead < systemHead) {
      return {
        words: { reason: 'too-little-head' },
        values: { dutyFlow, maxSpeed: c.maxSpeed, pumpHead, systemHead },
      };
    }
    return { words: { reason: 'below-curve' }, values: { dutyFlow, systemHead } };
  }
  const m = c.arrangement === 'series' ? c.count : 1;
  const { min, max } = c.fullSpeed.flowRange;
  const headMin = c.fullSpeed.head(min) * m;
  const systemMin = system.head(min) * m;
  if (headMin < systemMin) {
    return {
      words: { reason: 'cannot-reach' },
      values: { dutyFlow, pumpHead: headMin, systemHead: systemMin },
    };
  }
  return {
    words: { reason: 'run-out' },
    values: {
      dutyFlow,
      maxFlow: c.setFlow(max),
      pumpHead: c.fullSpeed.head(max) * m,
      systemHead: system.head(max) * m,
    },
  };
}

/** The check of a set with no operating point in a case, with the reason. */
export function noOperatingPointCheck(
  c: Candidate,
  system: SystemCurveLike,
  dutyFlow: number,
  caseName: string,
): Check {
  const reason = noPointReason(c, system, dutyFlow);
  return check(
    NO_OPERATING_POINT.id,
    'error',
    c.name,
    caseName,
    reason.values,
    COMMON,
    reason.words,
  );
}
