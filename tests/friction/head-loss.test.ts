import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  colebrook,
  darcyHeadLoss,
  hazenWilliamsHeadLoss,
  pressureDrop,
  reynolds,
  reynoldsFromFlow,
} from '../../src/friction/index';
import { type Length, q, STANDARD_GRAVITY, si, to } from '../../src/units/index';
import { expectHeadflowError, expectRelative } from '../helpers/expect';

const L = q(100, 'm');
const D = q(100, 'mm');
const V = q(2, 'm/s');

describe('special values and bad input', () => {
  it('reynolds refuses zero, negative and non-finite inputs, naming the parameter', () => {
    for (const bad of [0, -1, Number.NaN, Number.POSITIVE_INFINITY]) {
      expect(
        expectHeadflowError(() => reynolds(si(bad), D, q(1, 'cSt')), 'INVALID_ARGUMENT').parameter,
      ).toBe('velocity');
      expect(
        expectHeadflowError(
          () => reynoldsFromFlow(q(1, 'L/s'), si(bad), q(1, 'cSt')),
          'INVALID_ARGUMENT',
        ).parameter,
      ).toBe('diameter');
      expect(
        expectHeadflowError(() => reynoldsFromFlow(q(1, 'L/s'), D, si(bad)), 'INVALID_ARGUMENT')
          .parameter,
      ).toBe('kinematicViscosity');
    }
  });

  it('darcyHeadLoss and pressureDrop refuse impossible input', () => {
    expectHeadflowError(() => darcyHeadLoss(0, L, D, V), 'INVALID_ARGUMENT');
    expectHeadflowError(() => darcyHeadLoss(Number.NaN, L, D, V), 'INVALID_ARGUMENT');
    expectHeadflowError(() => darcyHeadLoss(0.02, si(-1), D, V), 'INVALID_ARGUMENT');
    expectHeadflowError(() => darcyHeadLoss(0.02, L, si(0), V), 'INVALID_ARGUMENT');
    expectHeadflowError(() => darcyHeadLoss(0.02, L, D, si(Number.NaN)), 'INVALID_ARGUMENT');
    expectHeadflowError(() => darcyHeadLoss(0.02, L, D, V, si(0)), 'INVALID_ARGUMENT');
    expectHeadflowError(() => pressureDrop(0.02, L, D, V, si(-1000)), 'INVALID_ARGUMENT');
    expectHeadflowError(() => pressureDrop(-0.02, L, D, V, q(1000, 'kg/m3')), 'INVALID_ARGUMENT');
  });

  it('hazenWilliamsHeadLoss refuses impossible input', () => {
    expectHeadflowError(() => hazenWilliamsHeadLoss(si(-1), L, D, 130), 'INVALID_ARGUMENT');
    expectHeadflowError(() => hazenWilliamsHeadLoss(q(1, 'L/s'), L, D, 0), 'INVALID_ARGUMENT');
    expectHeadflowError(
      () => hazenWilliamsHeadLoss(q(1, 'L/s'), L, si(0), 130),
      'INVALID_ARGUMENT',
    );
  });

  it('gives zero loss for zero length, zero velocity or zero flow', () => {
    expect(darcyHeadLoss(0.02, q(0, 'm'), D, V)).toBe(0);
    expect(darcyHeadLoss(0.02, L, D, q(0, 'm/s'))).toBe(0);
    expect(hazenWilliamsHeadLoss(q(0, 'm3/s'), L, D, 130)).toBe(0);
  });
});

describe('Reynolds number', () => {
  it('Re = V D / nu and 4Q/(pi D nu) agree', () => {
    expectRelative(reynolds(V, D, q(1, 'cSt')), 2e5, 1e-15, 'doc example');
    expectRelative(
      reynoldsFromFlow(q(0.01, 'm3/s'), D, q(1, 'cSt')),
      4e5 / Math.PI,
      1e-15,
      'doc example',
    );
    fc.assert(
      fc.property(
        fc.double({ min: 1e-3, max: 10, noNaN: true }),
        fc.double({ min: 1e-3, max: 3, noNaN: true }),
        fc.double({ min: 1e-7, max: 1e-3, noNaN: true }),
        (v, d, nu) => {
          const flow = si<'flow'>((v * Math.PI * d * d) / 4);
          expectRelative(
            reynoldsFromFlow(flow, si(d), si(nu)),
            reynolds(si(v), si(d), si(nu)),
            1e-14,
          );
        },
      ),
    );
  });
});

describe('Darcy-Weisbach', () => {
  it('h = f (L/D) V^2/(2g) and dp = rho g h', () => {
    // 0.02 x (100/0.1) x 4 / (2 x 9.80665) = 4.07886... m; rho V^2/2 x 200 = 40 kPa.
    expectRelative(darcyHeadLoss(0.02, L, D, V), 80 / (2 * 9.80665), 1e-15, 'doc example');
    expectRelative(pressureDrop(0.02, L, D, V, q(1000, 'kg/m3')), 40000, 1e-15, 'doc example');
    const h = darcyHeadLoss(0.02, L, D, V, STANDARD_GRAVITY);
    expectRelative(pressureDrop(0.02, L, D, V, q(998, 'kg/m3')), 998 * 9.80665 * h, 1e-15);
    expectRelative(
      darcyHeadLoss(0.02, L, D, V, q(32.174, 'ft/s2')),
      h * (9.80665 / 9.8066352),
      1e-6,
    );
  });

  it('head loss scales with length exactly and with velocity squared', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.008, max: 0.1, noNaN: true }),
        fc.double({ min: 0.1, max: 1e4, noNaN: true }),
        fc.integer({ min: 2, max: 1024 }),
        (f, len, n) => {
          const h1 = darcyHeadLoss(f, si<'length'>(len), D, V);
          // Multiplying by a power of two is exact in binary, so the scaling is exact.
          const p2 = 2 ** Math.floor(Math.log2(n));
          expect(darcyHeadLoss(f, si<'length'>(len * p2), D, V)).toBe(h1 * p2);
          // Any other factor: each side rounds up to five times (half an ulp each, 1.1e-16
          // relative), so they may differ by a few ulps: 1e-15.
          expectRelative(darcyHeadLoss(f, si<'length'>(len * n), D, V), h1 * n, 1e-15);
          expectRelative(darcyHeadLoss(f, si<'length'>(len), D, si(4)), h1 * 4, 1e-15);
        },
      ),
    );
  });

  it('a worked case: water in a 100 mm commercial-steel pipe', () => {
    // Invented example: V 2 m/s, nu 1.0e-6 m2/s, eps 0.045 mm, L 100 m.
    const re = reynolds(V, D, q(1, 'cSt'));
    const f = colebrook(re, 0.045e-3 / 0.1);
    const h: Length = darcyHeadLoss(f, L, D, V);
    expect(to(h, 'm')).toBeGreaterThan(3.5);
    expect(to(h, 'm')).toBeLessThan(4.5);
  });
});

describe('Hazen-Williams', () => {
  it('follows its doc example and its exponents', () => {
    expectRelative(
      hazenWilliamsHeadLoss(q(0.01, 'm3/s'), L, D, 130),
      (10.67 * 100 * 0.01 ** 1.852) / (130 ** 1.852 * 0.1 ** 4.8704),
      1e-15,
    );
    const h1 = hazenWilliamsHeadLoss(q(10, 'L/s'), L, D, 130);
    expectRelative(hazenWilliamsHeadLoss(q(20, 'L/s'), L, D, 130), h1 * 2 ** 1.852, 1e-14);
    expectRelative(hazenWilliamsHeadLoss(q(10, 'L/s'), si(200), D, 130), h1 * 2, 1e-15);
  });
});
