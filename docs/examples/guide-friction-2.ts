// example: docs/examples/guide-friction-2.ts
import { colebrookInto, frictionFactorInto } from 'headflow';

const re = Float64Array.of(1000, 3000, 1e4, 1e5, 1e6);
export const f = frictionFactorInto(re, 1e-4, new Float64Array(re.length));
export const fc = colebrookInto(re, 1e-4, new Float64Array(re.length), {
  allowLargeRoughness: false,
});
