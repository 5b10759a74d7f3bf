/**
 * F. M. White, "Fluid Mechanics" (McGraw-Hill), Example 6.16: water (1.94 slug/ft3,
 * nu = 0.000011 ft2/s) pumped between two reservoirs at 0.2 ft3/s through 400 ft of 2-in pipe,
 * eps/d = 0.001, z1 = 20 ft, z2 = 120 ft, with a sharp entrance (K 0.5), an open globe valve
 * (6.9), a 12-in-radius bend (0.25), a screwed regular 90 degree elbow (0.95), a half-open
 * gate valve (3.8) and a sharp exit (1.0): sum K = 13.4. The book computes V = 9.17 ft/s
 * (problem data and V as printed in the example's statement and first step).
 * The book's result, pump head about 185 ft and about 4.2 hp delivered to the water, is
 * from memory; it rests on f = 0.0216 read for Re = 1.39e5, so the check allows 1 %.
 */
import { describe, it } from 'vitest';
import { constantFluid } from '../../src/fluids';
import { systemCurve } from '../../src/system';
import { q, STANDARD_ATMOSPHERE, to } from '../../src/units';
import { expectRelative } from '../helpers/expect';

const fluid = constantFluid({
  name: 'water (White Ex. 6.16)',
  density: q(1.94, 'slug/ft3'),
  dynamicViscosity: q(1.94 * 0.000011, 'lbf*s/ft2'), // mu = rho nu
}).at(q(68, 'degF'));

const curve = systemCurve({
  fluid,
  suction: { elevation: q(20, 'ft'), pressure: STANDARD_ATMOSPHERE },
  discharge: { elevation: q(120, 'ft'), pressure: STANDARD_ATMOSPHERE },
  runs: [
    {
      length: q(400, 'ft'),
      insideDiameter: q(2, 'in'),
      roughness: q(0.002, 'in'), // eps/d = 0.001
      valves: [
        { name: 'sharp entrance', k: 0.5 },
        { name: 'open globe valve', k: 6.9 },
        { name: '12-in bend', k: 0.25 },
        { name: 'regular 90 degree elbow', k: 0.95 },
        { name: 'half-open gate valve', k: 3.8 },
        { name: 'sharp exit', k: 1.0 },
      ],
    },
  ],
  g: q(32.174, 'ft/s2'),
});

describe('White, Fluid Mechanics, Example 6.16 (pump head with minor losses)', () => {
  const flow = q(0.2, 'ft3/s');
  const point = curve.details(flow);
  it('velocity 9.17 ft/s (printed in the example)', () => {
    expectRelative(to(point.runs[0]?.velocity ?? q(0, 'm/s'), 'ft/s'), 9.17, 5e-4);
  });
  it('Reynolds number about 1.39e5 (from memory)', () => {
    expectRelative(point.runs[0]?.reynolds ?? 0, 1.39e5, 5e-3);
  });
  it('pump head about 185 ft (from memory; the book reads f from the chart), within 1 %', () => {
    expectRelative(to(point.head, 'ft'), 185, 0.01);
  });
  it('power to the water about 4.2 hp (from memory), within 1.5 %', () => {
    const watts = fluid.density * 9.80665 * flow * point.head;
    expectRelative(to(q(watts, 'W'), 'hp'), 4.2, 0.015);
  });
});
