// example: docs/examples/guide-fluids-2.ts
import { q, waterDensityInto, waterViscosityInto } from 'headflow';

const t = Float64Array.from({ length: 9 }, (_, i) => 278.15 + 5 * i); // 5..45 degC in K
export const rho = waterDensityInto(t, q(1, 'atm'), new Float64Array(t.length));
export const mu = waterViscosityInto(t, q(1, 'atm'), new Float64Array(t.length));
// mu[0] / mu[8] is about 2.5: the viscosity more than halves over the loop's range
