/**
 * Check `viscous-correction`: the pump's water curve corrected for a viscous liquid by
 * ANSI/HI 9.6.7 in every case where the liquid calls for it; outside the method's range the
 * candidate is refused.
 *
 * @module
 */
import { HeadflowError } from '../../errors';
import type { FluidState } from '../../fluids/index';
import { correctForViscosity } from '../../pumps/index';
import type { Say } from '../say';
import { short } from '../say';
import type { Check } from '../types';
import { type CheckInfo, check } from './check';
import type { Candidate } from './context';

const SOURCE =
  'ANSI/HI 9.6.7-2010 Effects of Liquid Viscosity on Rotodynamic Pump Performance (parameter B, factors C_Q, C_H, C_eta)';

export const VISCOUS_CORRECTION: CheckInfo = {
  id: 'viscous-correction',
  guards:
    'a viscous liquid pumped on a water curve: less head and flow, more power, an overloaded motor',
  inputs:
    "the liquid's kinematic viscosity in each case; the pump's water BEP and speed (always known for a candidate)",
  severity:
    'note where the correction is applied (operating points, power, motor and energy then use the corrected curve); error where the liquid is outside the method’s range (B >= 40 or above 3000 cSt)',
  source: SOURCE,
};

/**
 * The candidate as it runs on the liquid of one case: its curve corrected when the liquid
 * calls for it, with the finding that says so; or the refusal when the method cannot apply.
 */
export function viscousCorrection(
  c: Candidate,
  fluid: FluidState,
  caseName: string,
): { candidate: Candidate; check: Check | undefined; refused: boolean } {
  let corrected: ReturnType<typeof correctForViscosity>;
  try {
    corrected = correctForViscosity(c.pump, fluid);
  } catch (e) {
    if (!(e instanceof HeadflowError) || e.code !== 'OUT_OF_RANGE') throw e;
    return {
      candidate: c,
      refused: true,
      check: check(
        VISCOUS_CORRECTION.id,
        'error',
        c.name,
        caseName,
        { kinematicViscosity: fluid.kinematicViscosity },
        SOURCE,
        { refused: e.message },
      ),
    };
  }
  if (!corrected.applied) return { candidate: c, check: undefined, refused: false };
  const f = corrected.factors;
  const pump = corrected.curve;
  return {
    candidate: {
      ...c,
      pump,
      fullSpeed: c.maxSpeed === pump.speed ? pump : pump.atSpeed(c.maxSpeed),
    },
    refused: false,
    check: check(
      VISCOUS_CORRECTION.id,
      'info',
      c.name,
      caseName,
      {
        kinematicViscosity: fluid.kinematicViscosity,
        b: f.b,
        flowFactor: f.flow,
        headFactor: f.headAtBep,
        efficiencyFactor: f.efficiency,
      },
      SOURCE,
    ),
  };
}

/** The message of a `viscous-correction` finding. */
export function viscousCorrectionMessage(c: Check, _s: Say): string {
  const n = (k: string): number => c.values[k] ?? Number.NaN;
  const cst = short(n('kinematicViscosity') * 1e6, 4);
  if (c.severity === 'error') {
    return `The liquid (${cst} cSt) is outside the range of the viscosity correction, so this pump's water curve cannot be corrected for it: ${c.words['refused'] ?? ''} Ask the manufacturer for a test on the liquid.`;
  }
  return `Viscous liquid (${cst} cSt, B ${short(n('b'), 3)}): the water curve is corrected by ANSI/HI 9.6.7 (flow x ${short(n('flowFactor'), 3)}, head at BEP x ${short(n('headFactor'), 3)}, efficiency x ${short(n('efficiencyFactor'), 3)}); operating points, power, the motor and the energy use the corrected curve.`;
}
