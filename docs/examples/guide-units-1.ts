// example: docs/examples/guide-units-1.ts
import { type Flow, type Length, q, to } from 'headflow';

const flow: Flow = q(1200, 'gal/min'); // 0.07570823568 m3/s
export const head: Length = q(350, 'ft'); // 106.68 m
to(flow, 'm3/h'); // 272.549648448
// to(head, 'psi');  // does not compile: psi is not a unit of length
