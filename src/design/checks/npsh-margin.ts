/**
 * Check `npsh-margin`: NPSH available below NPSH required, or too close to it.
 *
 * @module
 */
import { npshMargin } from '../../pumps/index';
import type { Length } from '../../units/index';
import type { Check } from '../types';
import { type CheckInfo, check } from './check';
import type { Limits } from './context';

export const NPSH_SOURCE =
  'ANSI/HI 9.6.1 (NPSH margin by application, as summarized in the pumps module; use the edition your project names)';

export const NPSH_MARGIN: CheckInfo = {
  id: 'npsh-margin',
  guards: 'cavitation: damage, noise, lost head',
  inputs:
    'pumpLocation; fluid vapour pressure; the NPSH-required curve; limits.npshMarginRatio, limits.npshMinimumMargin',
  severity:
    'error when NPSHa < NPSHr; warning when the margin is below the ratio (default 1.1) or the minimum difference (default 0.6 m)',
  source: NPSH_SOURCE,
};

/** The margin check at an operating point: the ratio, and the check if it is short. */
export function npshMarginCheck(
  candidate: string,
  caseName: string,
  npsha: number,
  npshr: number,
  limits: Limits,
): { ratio: number; check: Check | undefined } {
  const m = npshMargin({
    available: npsha as Length,
    required: npshr as Length,
    marginRatio: limits.npshMarginRatio,
    minimumMargin: limits.npshMinimumMargin as Length,
  });
  if (npsha < npshr) {
    return {
      ratio: m.ratio,
      check: check(
        NPSH_MARGIN.id,
        'error',
        candidate,
        caseName,
        { npshAvailable: npsha, npshRequired: npshr, ratio: m.ratio },
        NPSH_SOURCE,
      ),
    };
  }
  if (!m.ok) {
    return {
      ratio: m.ratio,
      check: check(
        NPSH_MARGIN.id,
        'warning',
        candidate,
        caseName,
        {
          npshAvailable: npsha,
          npshRequired: npshr,
          ratio: m.ratio,
          requiredAvailable: m.requiredAvailable,
        },
        NPSH_SOURCE,
      ),
    };
  }
  return { ratio: m.ratio, check: undefined };
}
