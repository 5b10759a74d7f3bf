/**
 * Closed-form fixtures for the selection tests: a parabolic pump `H = A - B Q^2` (Q in m3/h)
 * with a parabolic efficiency, and a system of exactly `H = Hs + k Q^2` (a run of zero length
 * whose only loss is an equipment loss k Q^2, between two still surfaces).
 */
import type { DesignInput } from '../../src/design/index';
import { water } from '../../src/fluids/index';
import type { CataloguePoint } from '../../src/pumps/index';
import type { CataloguePump, PumpCatalogue } from '../../src/select/index';
import type { OperatingCase } from '../../src/system/index';
import { type Flow, type Length, q, STANDARD_ATMOSPHERE } from '../../src/units/index';

/** m3/s per m3/h. */
export const M3H = 1 / 3600;

/** Points of `H = a - b Q^2`, `eta = e (2x - x^2)` with x = Q / qBest, Q in m3/h. */
export function parabolicPoints(
  a: number,
  b: number,
  qBest: number,
  e = 0.8,
  qMax = Math.min(Math.sqrt((0.4 * a) / b), 1.6 * qBest),
): CataloguePoint[] {
  const out: CataloguePoint[] = [];
  for (let j = 0; j <= 6; j++) {
    const flow = (qMax * j) / 6;
    const x = flow / qBest;
    out.push({
      flow: q(flow, 'm3/h'),
      head: q(a - b * flow * flow, 'm'),
      efficiency: j === 0 ? 0 : e * (2 * x - x * x),
    });
  }
  return out;
}

/** A catalogue pump with a parabolic curve; the head fit is the exact parabola. */
export function parabolicPump(
  name: string,
  a: number,
  b: number,
  qBest: number,
  extra: Partial<CataloguePump> = {},
): CataloguePump {
  return {
    name,
    speed: q(1750, 'rpm'),
    impellerDiameter: q(250, 'mm'),
    minImpellerDiameter: q(190, 'mm'),
    points: parabolicPoints(a, b, qBest),
    ...extra,
  };
}

/** A catalogue of the given pumps, motor efficiency 0.9. */
export function catalogueOf(...pumps: CataloguePump[]): PumpCatalogue {
  return { name: 'test', currency: 'EUR', motorEfficiency: 0.9, pumps };
}

const fluid = water().at(q(20, 'degC'));

/**
 * A design whose system head is exactly `hs + k Q^2` (Q in m3/h) in the design case, and
 * `hs + dh + k Q^2` in each further case of `extraStatic` (the discharge raised by dh).
 */
export function parabolicDesign(
  hs: number,
  k: number,
  dutyM3h: number,
  extraStatic: readonly number[] = [],
): DesignInput {
  const cases: OperatingCase[] = extraStatic.map((dh, i) => ({
    name: `case ${i + 1}`,
    discharge: { elevation: q(hs + dh, 'm') },
  }));
  return {
    name: 'parabolic',
    system: {
      fluid,
      suction: { elevation: q(0, 'm'), pressure: STANDARD_ATMOSPHERE },
      discharge: { elevation: q(hs, 'm'), pressure: STANDARD_ATMOSPHERE },
      runs: [
        {
          name: 'line',
          length: q(0, 'm'),
          insideDiameter: q(100, 'mm'),
          roughness: q(0.05, 'mm'),
          components: [
            {
              name: 'k Q^2',
              headLoss: (flow: Flow) => (k * (flow / M3H) ** 2) as Length,
            },
          ],
        },
      ],
    },
    ...(cases.length === 0
      ? {}
      : { cases: [{ name: 'design', discharge: { elevation: q(hs, 'm') } }, ...cases] }),
    dutyFlow: q(dutyM3h, 'm3/h'),
  };
}
