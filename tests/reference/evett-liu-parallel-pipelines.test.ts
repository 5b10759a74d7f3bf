/**
 * A published looped system: three pipes in parallel between two points, Hazen-Williams with
 * C = 120, solved in the source by reading a Hazen-Williams chart.
 *
 * Source: J. B. Evett and C. Liu, "2500 Solved Problems in Fluid Mechanics and Hydraulics"
 * (Schaum's Solved Problems Series, McGraw-Hill, 1989), chapter 11 "Parallel Pipeline
 * Systems", problem 11.1 (read from a copy of the text found online, not from the printed
 * book: check against the print before relying on it). Data: pressure
 * heads 70.0 m at A and 46.0 m at E; pipe ABE 3000 m of 300 mm, pipe ACE 1300 m of 200 mm,
 * pipe ADE 2600 m of 250 mm, C = 120 for all pipes. Published flows (from the chart, Fig.
 * ABE 0.105 m3/s, ACE 0.056 m3/s, ADE 0.070 m3/s.
 *
 * Tolerance: the published flows are chart readings given to two or three figures; the
 * chart's own slope and flow scales are logarithmic, so a reading is good to about 2 %. We
 * check 3 %, and the exact Hazen-Williams split (computed here from the formula) to 1e-9.
 */
import { describe, it } from 'vitest';
import { water } from '../../src/fluids';
import { type NetworkDefinition, solveNetwork } from '../../src/network';
import { q } from '../../src/units';
import { expectRelative } from '../helpers/expect';

const pipe = (length: number, mm: number) => ({
  length: q(length, 'm'),
  insideDiameter: q(mm, 'mm'),
  friction: { hazenWilliamsC: 120 },
});

// A and E as fixed heads 70.0 m and 46.0 m (the same elevation, pressure heads as given).
const network: NetworkDefinition = {
  fluid: water().at(q(15, 'degC')),
  nodes: [
    { id: 'A', elevation: q(70, 'm'), surface: {} },
    { id: 'E', elevation: q(46, 'm'), surface: {} },
  ],
  links: [
    { id: 'ABE', from: 'A', to: 'E', run: pipe(3000, 300) },
    { id: 'ACE', from: 'A', to: 'E', run: pipe(1300, 200) },
    { id: 'ADE', from: 'A', to: 'E', run: pipe(2600, 250) },
  ],
};

describe('Evett and Liu (1989), problem 11.1: three pipes in parallel, C = 120', () => {
  const sol = solveNetwork(network);
  const published: Record<string, number> = { ABE: 0.105, ACE: 0.056, ADE: 0.07 };
  it('gives the published flows (chart readings) within 3 %', () => {
    for (const [id, flow] of Object.entries(published)) {
      expectRelative(sol.links[id]?.flow ?? 0, flow, 0.03, id);
    }
  });
  it('gives the Hazen-Williams flow of each pipe at 24 m, Q = (h C^1.852 D^4.8704 / (10.67 L))^0.54', () => {
    const data: Record<string, [number, number]> = {
      ABE: [3000, 0.3],
      ACE: [1300, 0.2],
      ADE: [2600, 0.25],
    };
    for (const [id, [l, d]] of Object.entries(data)) {
      const exact = ((24 * 120 ** 1.852 * d ** 4.8704) / (10.67 * l)) ** (1 / 1.852);
      expectRelative(sol.links[id]?.flow ?? 0, exact, 1e-9, id);
    }
  });
});
