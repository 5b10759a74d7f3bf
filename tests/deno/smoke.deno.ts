/**
 * Runs the built ESM package under Deno and checks computed values against independent
 * numbers. Run by `npm run test:deno` after `npm run build` (part of `npm test`).
 */
// @ts-nocheck: checked by Deno against dist/, which does not exist at typecheck time
import {
  colebrook,
  evaluateDesign,
  frictionFactor,
  pipeSize,
  q,
  to,
  water,
} from '../../dist/index.js';

let passed = 0;
let failed = 0;
function close(name: string, actual: number, expected: number, tol: number): void {
  const ok = Math.abs(actual - expected) <= tol * Math.abs(expected);
  if (ok) passed++;
  else failed++;
  console.log(
    `${ok ? 'ok  ' : 'FAIL'} ${name}: ${actual} (expected ${expected}, tolerance ${tol})`,
  );
}

// 1200 US gal/min = 272.549648448 m3/h exactly (NIST SP 811: gal = 3.785411784 L)
close('units', to(q(1200, 'gal/min'), 'm3/h'), 272.549648448, 1e-14);
// IAPWS-IF97 Table 5: T = 300 K, p = 3 MPa, v = 0.100215168e-2 m3/kg
close('water density', water().at(q(300, 'K'), q(3, 'MPa')).density, 1 / 0.100215168e-2, 1e-8);
// Colebrook residual at the returned f is zero to machine precision
const f = colebrook(1e5, 1e-4);
close(
  'colebrook residual',
  1 / Math.sqrt(f),
  -2 * Math.log10(1e-4 / 3.7 + 2.51 / (1e5 * Math.sqrt(f))),
  1e-14,
);
close('friction factor policy', frictionFactor(1000, 1e-4), 0.064, 1e-15);
// ASME B36.10M: NPS 4 schedule 40 is 4.500 in OD, 0.237 in wall: ID 4.026 in
close('pipe size', to(pipeSize('4', '40').insideDiameter, 'in'), 4.026, 1e-12);
const report = evaluateDesign({
  name: 'deno check',
  system: {
    fluid: water().at(q(20, 'degC')),
    suction: { elevation: q(0, 'm'), pressure: q(1, 'atm') },
    discharge: { elevation: q(15, 'm'), pressure: q(1, 'atm') },
    runs: [{ length: q(0, 'm'), insideDiameter: q(100, 'mm'), roughness: q(0, 'm') }],
  },
  dutyFlow: q(10, 'L/s'),
});
close('duty head (no losses in a zero-length run)', report.duty[0].head, 15, 1e-12);

// the README's Deno sample
const readme = water().at(q(60, 'degC'));
close('README sample: water at 60 degC', to(readme.density, 'kg/m3'), 983.2, 5e-5);

console.log(`deno: ${passed} passed, ${failed} failed`);
if (failed > 0) Deno.exit(1);
