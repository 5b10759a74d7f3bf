/**
 * Type tests: wrong units must not compile. Checked by `tsc` (npm run typecheck) and by
 * `vitest --typecheck`; every `@ts-expect-error` line fails the build if it compiles.
 */
import { describe, expectTypeOf, it } from 'vitest';
import {
  type Flow,
  type Length,
  type Pressure,
  q,
  type Temperature,
  to,
  type UnitOf,
} from '../../src/units';

function pipeLength(length: Length): number {
  return length;
}

describe('branded quantities', () => {
  it('q types a quantity by its unit', () => {
    expectTypeOf(q(350, 'ft')).toEqualTypeOf<Length>();
    expectTypeOf(q(1200, 'gal/min')).toEqualTypeOf<Flow>();
    expectTypeOf(q(45, 'psi')).toEqualTypeOf<Pressure>();
    expectTypeOf(q(20, 'degC')).toEqualTypeOf<Temperature>();
  });

  it('a Flow cannot stand where a Length is expected', () => {
    pipeLength(q(10, 'm'));
    // @ts-expect-error a Flow is not a Length
    pipeLength(q(10, 'm3/h'));
    // @ts-expect-error a bare number is not a Length
    pipeLength(10);
    expectTypeOf<Flow>().not.toMatchTypeOf<Length>();
  });

  it('to admits only units of the quantity dimension', () => {
    to(q(3, 'm'), 'ft');
    // @ts-expect-error psi is not a unit of length
    to(q(3, 'm'), 'psi');
    // @ts-expect-error unknown symbol
    to(q(3, 'm'), 'furlong');
    // @ts-expect-error unknown symbol in q
    q(3, 'furlong');
    expectTypeOf<UnitOf<'rotationalSpeed'>>().toEqualTypeOf<'rad/s' | 'rpm' | 'rev/s'>();
  });
});
