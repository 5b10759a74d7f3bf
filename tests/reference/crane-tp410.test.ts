/**
 * Checks against Crane Co., "Flow of Fluids Through Valves, Fittings, and Pipe", Technical
 * Paper No. 410: the K-Cv relation and the reducer/expander formulas of page A-26 (formulas
 * 1-4, K1 referred to the smaller diameter), as reproduced in E. E. Ludwig, "Applied Process
 * Design for Chemical and Petrochemical Plants", vol. 1, 3rd ed., Table 2-2.
 */
import { describe, expect, it } from 'vitest';
import {
  cvFromK,
  gradualContractionK,
  gradualExpansionK,
  referK,
  suddenContractionK,
  suddenExpansionK,
} from '../../src/losses';
import { q } from '../../src/units';
import { expectRelative } from '../helpers/expect';

describe('Crane TP-410: Cv = 29.9 d^2 / sqrt(K) (d in inches)', () => {
  it('the exact derivation gives 29.84; Crane prints 29.9 (0.2 % apart)', () => {
    // Crane's coefficient is rounded and rests on its own water density; ours follows from
    // the exact unit factors and the reference water of Cv and Kv, 15 degC (999.10 kg/m3). Tolerance 0.3 % covers
    // the gap (29.84 against 29.9 is 0.20 %).
    for (const [dIn, k] of [
      [1, 1],
      [4, 0.5],
      [12, 3],
    ] as const) {
      const cv = cvFromK(k, q(dIn, 'in'));
      expectRelative(cv, (29.9 * dIn * dIn) / Math.sqrt(k), 3e-3, `d = ${dIn} in, K = ${k}`);
      expectRelative((cv * Math.sqrt(k)) / (dIn * dIn), 29.8377, 1e-5);
    }
  });
});

describe('Crane TP-410 page A-26, formulas 1-4 and K2 = K1 / beta^4', () => {
  const small = q(2, 'in');
  const large = q(4, 'in');
  const beta = 0.5;
  it('formula 1 (contraction, angle <= 45 deg): 0.8 sin(angle/2) (1 - beta^2)', () => {
    expectRelative(
      gradualContractionK(large, small, 30),
      0.8 * Math.sin(Math.PI / 12) * 0.75,
      1e-15,
    );
  });
  it('formula 2 (contraction, 45 < angle <= 180): 0.5 sqrt(sin(angle/2)) (1 - beta^2)', () => {
    expectRelative(
      gradualContractionK(large, small, 90),
      0.5 * Math.sqrt(Math.SQRT1_2) * 0.75,
      1e-15,
    );
    expect(suddenContractionK(large, small)).toBe(0.375);
  });
  it('formula 3 (expansion, angle <= 45 deg): 2.6 sin(angle/2) (1 - beta^2)^2', () => {
    expectRelative(
      gradualExpansionK(small, large, 20),
      2.6 * Math.sin(Math.PI / 18) * 0.5625,
      1e-15,
    );
  });
  it('formula 4 (expansion, 45 < angle <= 180): (1 - beta^2)^2', () => {
    expect(gradualExpansionK(small, large, 90)).toBe(0.5625);
    expect(suddenExpansionK(small, large)).toBe(0.5625);
  });
  it('K2 = K1 / beta^4 refers K1 (small pipe) to the large pipe', () => {
    expectRelative(referK(0.5625, small, large), 0.5625 / beta ** 4, 1e-15);
  });
  it('limits: a contraction from a tank is the sharp entrance (0.5), an expansion into one the exit (1)', () => {
    // beta^2 = (0.0508 / 1e4)^2 = 2.6e-11 is what remains of the finite tank: tolerance 1e-10.
    expectRelative(suddenContractionK(q(1e4, 'm'), small), 0.5, 1e-10);
    expectRelative(suddenExpansionK(small, q(1e4, 'm')), 1, 1e-10);
  });
});
