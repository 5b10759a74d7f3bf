/**
 * Constant loss coefficients against R. L. Sanks (ed.), "Pumping Station Design", 2nd ed.,
 * Butterworth-Heinemann, 1998, Appendix B: Table B-6 "Recommended energy loss coefficients,
 * K, for flanged pipe fittings" and Table B-7 "Recommended energy loss coefficients, K, for
 * valves fully open". The tables say K may vary from -20 % to +30 % or more.
 */
import { describe, expect, it } from 'vitest';
import { fitting, fittingK } from '../../src/losses';
import { q } from '../../src/units';

const B6: readonly (readonly [string, string, number])[] = [
  ['entrance-bellmouth', 'Entrance, bellmouth', 0.05],
  ['entrance-rounded', 'Entrance, rounded', 0.25],
  ['entrance-sharp', 'Entrance, sharp-edged', 0.5],
  ['entrance-projecting', 'Entrance, projecting', 0.8],
  ['exit', 'Exits, all of the above', 1.0],
];
const B7: readonly (readonly [string, string, number])[] = [
  ['butterfly-valve-open-class-25', 'Butterfly, 25-lb class', 0.16],
  ['butterfly-valve-open-class-75', 'Butterfly, 75-lb class', 0.27],
  ['butterfly-valve-open', 'Butterfly, 150-lb class', 0.35],
  ['foot-valve-hinged-disc', 'Check valves, foot, hinged disc', 11.4],
];

describe('Sanks, Pumping Station Design (1998), Tables B-6 and B-7', () => {
  for (const [table, rows] of [
    ['B-6', B6],
    ['B-7', B7],
  ] as const) {
    for (const [id, row, k] of rows) {
      it(`Table ${table}, ${row}: K = ${k} (${id})`, () => {
        expect(fitting(id).constantK).toBe(k);
        expect(fitting(id).sources.join(' ')).toContain(`Table ${table}`);
        // A constant K does not depend on Re or size.
        expect(fittingK(id, 10, q(25, 'mm'))).toBe(k);
        expect(fittingK(id, 1e7, q(1, 'm'))).toBe(k);
      });
    }
  }
});
