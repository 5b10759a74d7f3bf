/**
 * A published worked example of NPSH available, as reproduced on the page
 * "civilengineeringhandbook.tk/centrifugal-pumps/npsha-ha-hs2-hvp-hf-hi-npsha-339-60-0839-20-20-npsha-35061-feet"
 * (a chapter on NPSH from a centrifugal-pump book: NPSHa = Ha + Hs - Hvp - Hf - Hi, in feet).
 * The book appears to be L. Bachus and A. Custodio, "Know and Understand Centrifugal Pumps",
 * Elsevier, 2003, chapter 2 (attribution from memory; the page seen does not name it).
 *
 * Printed: Ha = 33.9 ft (sea level), Hs = 6.0 ft, Hvp = 0.839 ft, Hf = 2.0 ft, Hi = 2.0 ft,
 * NPSHa = 35.061 ft. The second example on the page (7000 ft altitude, Ha = 26.2 ft, suction lift
 * Hs = -8.0 ft, 50 degF water Hvp = 0.411 ft, Hf = 1 ft, Hi = 2.0 ft) prints its inputs but its
 * result was not on the page seen; the value below is computed from those inputs.
 *
 * npshAvailable takes pressures; the heads are turned into pressures with the same density, so
 * the check exercises the balance and its sign conventions (a suction lift is negative).
 * Hi (the book's pump inlet loss term) is added to the suction loss.
 */
import { describe, it } from 'vitest';
import { npshAvailable } from '../../src/pumps/index';
import { q, to } from '../../src/units';
import { expectRelative } from '../helpers/expect';

const rho = q(62.3, 'lb/ft3'); // any density: heads are converted with the same one
const g = 9.80665;
const pressureOfHead = (ft: number) => q(ft * 0.3048 * rho * g, 'Pa');

describe('NPSHa worked example (Ha + Hs - Hvp - Hf - Hi)', () => {
  it('flooded suction at sea level: 35.061 ft (printed)', () => {
    const npsha = npshAvailable({
      surfacePressure: pressureOfHead(33.9),
      vaporPressure: pressureOfHead(0.839),
      density: rho,
      staticHeadAboveImpeller: q(6.0, 'ft'),
      suctionLoss: q(2.0 + 2.0, 'ft'),
    });
    expectRelative(to(npsha, 'ft'), 35.061, 1e-12);
  });
  it('suction lift at 7000 ft altitude: 14.789 ft (computed from the printed inputs)', () => {
    const npsha = npshAvailable({
      surfacePressure: pressureOfHead(26.2),
      vaporPressure: pressureOfHead(0.411),
      density: rho,
      staticHeadAboveImpeller: q(-8.0, 'ft'),
      suctionLoss: q(1.0 + 2.0, 'ft'),
    });
    expectRelative(to(npsha, 'ft'), 14.789, 1e-12);
  });
});
