/**
 * Check `curve-fit`: a head or efficiency fit that misses the catalogue points.
 *
 * @module
 */
import { CATALOGUE_FIT_TOLERANCE, type FitReport } from '../../pumps/index';
import type { Check } from '../types';
import { type CheckInfo, COMMON, check } from './check';
import type { Candidate } from './context';

export const CURVE_FIT: CheckInfo = {
  id: 'curve-fit',
  guards: 'operating points and power read off a curve that misses the catalogue',
  inputs: "the pump's catalogue points and chosen fit",
  severity:
    'warning when the head fit misses a point by more than 0.5 % or the efficiency fit by more than 0.5 percentage point',
  source: COMMON,
};

function fitName(f: FitReport): string {
  return f.method === 'polynomial' ? `polynomial of degree ${f.degree ?? '?'}` : 'monotone cubic';
}

/**
 * Warns when a head or efficiency fit misses the catalogue tolerance (head within 0.5 % of
 * each point, efficiency within 0.5 percentage point). The default fits always meet it, so
 * this concerns a fit the caller chose.
 */
export function curveFitChecks(c: Candidate, checks: Check[]): void {
  const { head, efficiency } = c.pump.fits;
  if (head.withinTolerance === false) {
    checks.push(
      check(
        CURVE_FIT.id,
        'warning',
        c.name,
        undefined,
        {
          maxResidual: head.maxResidual,
          maxRelativeResidual: head.maxRelativeResidual,
          tolerance: CATALOGUE_FIT_TOLERANCE.headRelative,
        },
        COMMON,
        { curve: 'head', fit: fitName(head) },
      ),
    );
  }
  if (efficiency?.withinTolerance === false) {
    checks.push(
      check(
        CURVE_FIT.id,
        'warning',
        c.name,
        undefined,
        {
          maxResidual: efficiency.maxResidual,
          tolerance: CATALOGUE_FIT_TOLERANCE.efficiency,
        },
        COMMON,
        { curve: 'efficiency', fit: fitName(efficiency) },
      ),
    );
  }
}
