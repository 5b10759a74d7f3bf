// The README's Deno sample, run by Deno against the built package (tests/docs checks that the
// README shows these lines after its `npm:headflow` import).
// @ts-nocheck: checked by Deno against dist/, which does not exist at typecheck time
import { q, to, water } from '../../dist/index.js';

const state = water().at(q(60, 'degC'));
console.log(to(state.density, 'kg/m3')); // 983.2 (IAPWS-IF97)
