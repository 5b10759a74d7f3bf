/**
 * Life-cycle cost of a pumping system by the components of the published pump LCC method,
 * each brought to present value.
 *
 * @module
 */
import { guardInteger, guardNumber, guardOptions, guardRange, guardResult } from '../guards';
import type { LifeCycleCost } from './types';

/** Input of {@link lifeCycleCost}; every field is optional and defaults to zero (years: 20). */
export interface LifeCycleCostInput {
  /** Years of service, a whole number 1 to 100 (default 20). */
  readonly years?: number;
  /** Discount rate a year, a fraction 0 to 1 (default 0). */
  readonly discountRate?: number;
  /** Escalation of the energy price a year, a fraction above -1 and at most 1 (default 0). */
  readonly energyEscalation?: number;
  /** Escalation of the other yearly costs and of decommissioning (default 0). */
  readonly escalation?: number;
  /** C_ic: initial cost (purchase price of pump, motor, drive, pipe ...), at year 0. */
  readonly initial?: number;
  /** C_in: installation and commissioning, at year 0. */
  readonly installation?: number;
  /** C_e: energy cost of the first year, at today's price. */
  readonly energyPerYear?: number;
  /** C_o: operation (supervision labour) a year, at today's price. */
  readonly operationPerYear?: number;
  /** C_m: maintenance and repair a year, at today's price. */
  readonly maintenancePerYear?: number;
  /** C_s: downtime (lost production) a year, at today's price. */
  readonly downtimePerYear?: number;
  /** C_env: environmental costs a year, at today's price. */
  readonly environmentalPerYear?: number;
  /** C_d: decommissioning and disposal at the end of the life, at today's price. */
  readonly decommissioning?: number;
}

/** The default service life of {@link lifeCycleCost}, years. */
export const DEFAULT_LIFE_YEARS = 20;

/**
 * Present value of a cost of 1 a year (today's price) that escalates at `escalation` a year
 * and is paid at the end of each of `years` years, discounted at `discountRate`:
 *
 * `PV = sum_{n=1..N} x^n = x (1 - x^N) / (1 - x)`, `x = (1 + e) / (1 + i)` (`= N` when x = 1).
 *
 * The exact form of the escalating annuity (engineering economics, common practice); the
 * pump LCC guide writes the discount of year n as `1 / (1 + (i - p))^n`, which approximates
 * `x^n` for small rates (from memory).
 *
 * @param years - whole years, 1 to 100
 * @param discountRate - a fraction 0 to 1
 * @param escalation - a fraction above -1 and at most 1
 * @throws HeadflowError `INVALID_ARGUMENT` for input outside those ranges.
 * @example
 * ```ts
 * presentValueFactor(10, 0.08, 0.02); // 7.4013 (x = 1.02 / 1.08)
 * ```
 */
export function presentValueFactor(
  years: number,
  discountRate: number,
  escalation: number,
): number {
  const n = guardInteger('years', years, 1, 100);
  const i = guardRange('discountRate', discountRate, { min: 0, max: 1 });
  const e = guardRange('escalation', escalation, { min: -1, minOpen: true, max: 1 });
  return annuityFactor(n, i, e);
}

/** {@link presentValueFactor} without the checks. */
function annuityFactor(n: number, i: number, e: number): number {
  const x = (1 + e) / (1 + i);
  if (Math.abs(1 - x) < 1e-12) return n;
  return (x * (1 - x ** n)) / (1 - x);
}

/**
 * Life-cycle cost by the published pump LCC method (Hydraulic Institute and Europump, 2001,
 * "Pump Life Cycle Costs: A Guide to LCC Analysis for Pumping Systems"):
 *
 * `LCC = C_ic + C_in + C_e + C_o + C_m + C_s + C_env + C_d`
 *
 * each component as a present value: initial and installation costs at year 0 as given;
 * energy a year escalated at `energyEscalation` and the other yearly costs at `escalation`,
 * paid at the end of each year ({@link presentValueFactor}); decommissioning at the end of the
 * last year, escalated and discounted, `C_d ((1 + e) / (1 + i))^N`. Costs are in one currency
 * (the caller's); every one defaults to 0 and the life to 20 years (pumping systems are
 * commonly appraised over 15 to 20 years; Hydraulic Institute, common practice).
 *
 * @throws HeadflowError `INVALID_ARGUMENT` for a negative or non-finite cost, or years or rates
 *   outside their ranges; `OUT_OF_RANGE` for costs whose sum would overflow.
 * @example
 * ```ts
 * lifeCycleCost({ years: 10, discountRate: 0.08, initial: 12000, energyPerYear: 5000 }).total;
 * // 12000 + 5000 x 6.7101 = 45550.4
 * ```
 */
export function lifeCycleCost(input?: LifeCycleCostInput | null): LifeCycleCost {
  const o = guardOptions<LifeCycleCostInput>('input', input);
  const n =
    o.years === undefined ? DEFAULT_LIFE_YEARS : guardInteger('input.years', o.years, 1, 100);
  const rate = (key: 'discountRate' | 'energyEscalation' | 'escalation'): number => {
    const v = o[key];
    if (v === undefined) return 0;
    return key === 'discountRate'
      ? guardRange(`input.${key}`, v, { min: 0, max: 1 })
      : guardRange(`input.${key}`, v, { min: -1, minOpen: true, max: 1 });
  };
  const cost = (key: keyof LifeCycleCostInput): number => {
    const v = o[key];
    if (v === undefined) return 0;
    guardNumber(`input.${key}`, v);
    return guardRange(`input.${key}`, v, { min: 0 });
  };
  const i = rate('discountRate');
  const ee = rate('energyEscalation');
  const e = rate('escalation');
  const energyFactor = annuityFactor(n, i, ee);
  const otherFactor = annuityFactor(n, i, e);
  const initial = cost('initial');
  const installation = cost('installation');
  const energy = cost('energyPerYear') * energyFactor;
  const operation = cost('operationPerYear') * otherFactor;
  const maintenance = cost('maintenancePerYear') * otherFactor;
  const downtime = cost('downtimePerYear') * otherFactor;
  const environmental = cost('environmentalPerYear') * otherFactor;
  const decommissioning = cost('decommissioning') * ((1 + e) / (1 + i)) ** n;
  const total =
    initial +
    installation +
    energy +
    operation +
    maintenance +
    downtime +
    environmental +
    decommissioning;
  // Costs near the largest number can add up past it: refused rather than an Infinity total.
  guardResult('total', total, 'OUT_OF_RANGE');
  return {
    total,
    initial,
    installation,
    energy,
    operation,
    maintenance,
    downtime,
    environmental,
    decommissioning,
  };
}
