/** The code samples of docs/friction.md, run so that the guide cannot drift from the API. */
import { describe, expect, it } from 'vitest';
import {
  colebrook,
  colebrookInto,
  darcyHeadLoss,
  frictionFactor,
  frictionFactorInto,
  hazenWilliamsHeadLoss,
  reynolds,
} from '../../src/friction/index';
import { q, to } from '../../src/units/index';
import { expectRelative } from '../helpers/expect';

describe('docs/friction.md samples', () => {
  it('from flow to head loss', () => {
    const v = q(2, 'm/s');
    const d = q(100, 'mm');
    const re = reynolds(v, d, q(1, 'cSt'));
    expectRelative(re, 200000, 1e-15);
    const f = frictionFactor(re, 0.045e-3 / 0.1);
    const h = darcyHeadLoss(f, q(100, 'm'), d, v);
    expect(to(h, 'm').toFixed(2)).toBe('3.79');
    expect(colebrook(1e5, 1e-4)).toBe(0.018513866077471648);
  });

  it('many points at once', () => {
    const re = Float64Array.of(1000, 3000, 1e4, 1e5, 1e6);
    const f = frictionFactorInto(re, 1e-4, new Float64Array(re.length));
    const fc = colebrookInto(re, 1e-4, new Float64Array(re.length), {
      allowLargeRoughness: false,
    });
    expect(f[0]).toBe(0.064);
    expect(fc[3]).toBe(colebrook(1e5, 1e-4));
  });

  it('Hazen-Williams', () => {
    const h = hazenWilliamsHeadLoss(q(10, 'L/s'), q(100, 'm'), q(100, 'mm'), 130);
    expect(to(h, 'm').toFixed(2)).toBe('1.90');
  });
});
