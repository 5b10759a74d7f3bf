/**
 * M. Massoud, "Engineering Thermofluids: Thermodynamics, Fluid Mechanics, and Heat Transfer",
 * Springer 2005, Chapter IIIb.7 "Fundamentals of waterhammer transients".
 *
 * Example IIIb.7.1: a liquid with c = 4900 ft/s; velocity reduced from 2 ft/s to 1 ft/s.
 * Solution printed: dH = 4900 x (2 - 1) / 32.2 = 152 ft (g = 32.2 ft/s2 as printed).
 */
import { describe, expect, it } from 'vitest';
import { joukowskyHead } from '../../src/system/index';
import { q, to } from '../../src/units';
import { expectAbsolute } from '../helpers/expect';

describe('Massoud (2005), Example IIIb.7.1: Joukowsky head rise', () => {
  it('4900 ft/s, 2 -> 1 ft/s, g = 32.2 ft/s2: 152 ft (printed to 3 digits)', () => {
    const dh = to(joukowskyHead(q(4900, 'ft/s'), q(2 - 1, 'ft/s'), q(32.2, 'ft/s2')), 'ft');
    // printed to the foot: half a unit
    expectAbsolute(dh, 152, 0.5, 'Example IIIb.7.1');
    expect(Math.round(dh)).toBe(152);
  });
});
