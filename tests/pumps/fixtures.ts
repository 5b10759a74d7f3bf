/**
 * Invented pumps and systems for the pumps tests: catalogue points placed exactly on closed
 * forms, so that every expected value below is computed, not read from anywhere.
 */
import { type CataloguePoint, type CurveFit, pumpCurve } from '../../src/pumps/index';
import { type Flow, type Length, q, to } from '../../src/units';

/** Pump head H = h0 - a Q^2 (Q in m3/h, H in m), efficiency e = b Q - c Q^2 (Q in m3/h). */
export interface QuadraticPump {
  readonly h0: number;
  readonly a: number;
  readonly b: number;
  readonly c: number;
  readonly qMax: number; // m3/h
}

export const PUMP_A: QuadraticPump = { h0: 40, a: 0.001, b: 0.015, c: 0.000075, qMax: 180 };

export function quadraticPoints(p: QuadraticPump, n = 7, npsh = true): CataloguePoint[] {
  const pts: CataloguePoint[] = [];
  for (let i = 0; i < n; i++) {
    const x = (p.qMax * i) / (n - 1);
    const point: CataloguePoint = {
      flow: q(x, 'm3/h'),
      head: q(p.h0 - p.a * x * x, 'm'),
      efficiency: p.b * x - p.c * x * x,
      ...(npsh && i > 0 ? { npshRequired: q(1 + 0.0002 * x * x, 'm') } : {}),
    };
    pts.push(point);
  }
  return pts;
}

export const EXACT_FITS: { head: CurveFit; efficiency: CurveFit } = {
  head: { method: 'polynomial', degree: 2 },
  efficiency: { method: 'polynomial', degree: 2 },
};

export function quadraticPump(p: QuadraticPump = PUMP_A, rpm = 1750) {
  return pumpCurve({
    speed: q(rpm, 'rpm'),
    impellerDiameter: q(250, 'mm'),
    points: quadraticPoints(p),
    fit: EXACT_FITS,
  });
}

/** System H = hs + k Q^2 with Q in m3/h. */
export function quadraticSystem(hs: number, k: number) {
  return {
    staticHead: q(hs, 'm'),
    head: (f: Flow): Length => q(hs + k * to(f, 'm3/h') ** 2, 'm'),
  };
}
