import {
  argumentError,
  checkFraction,
  checkNonNegative,
  checkPositive,
  HeadflowError,
} from '../errors';
import { guardArray, guardOneOf, guardRecord, guardResult, guardString } from '../guards';
import {
  type Acceleration,
  type Density,
  type Energy,
  type Flow,
  type Length,
  type Power,
  type RotationalSpeed,
  STANDARD_GRAVITY,
} from '../units/index';
import { fmt, guardPump, systemHeadOf } from './internal';
import { speedForFlow } from './speed-for-flow';
import type { PumpCurve, SystemCurveLike } from './types';

/** One row of a duty profile: a flow held for a number of hours a year. */
export interface ProfileRow {
  /** Required flow; 0 means the pump is off for these hours. */
  readonly flow: Flow;
  /** Hours a year at this flow, >= 0. */
  readonly hours: number;
}

/** Input of {@link annualEnergy}. */
export interface AnnualEnergyInput {
  /** The pump at its full (rated) speed; it needs efficiency or power data. */
  readonly pump: PumpCurve;
  readonly system: SystemCurveLike;
  readonly profile: readonly ProfileRow[];
  readonly density: Density;
  /** Motor efficiency, (0, 1], taken as constant over the profile. */
  readonly motorEfficiency: number;
  /** Drive efficiency, (0, 1], constant; default 1 (no drive losses counted: set it for a VFD). */
  readonly driveEfficiency?: number;
  /** 'speed': a variable-speed drive meets each flow; 'throttle': a valve at full speed. */
  readonly control: 'speed' | 'throttle';
  /** Energy price per kWh, with a currency label, to cost the year. */
  readonly price?: { readonly perKWh: number; readonly currency: string };
  /** Highest drive speed for speed control; default the pump curve's speed. */
  readonly maxSpeed?: RotationalSpeed;
  readonly g?: Acceleration;
}

/** One row of {@link annualEnergy}'s result. */
export interface EnergyRow {
  readonly flow: Flow;
  readonly hours: number;
  /** Pump speed (the curve's speed when throttled); undefined when the pump is off. */
  readonly speed: RotationalSpeed | undefined;
  /** Pump head at this flow (m). */
  readonly pumpHead: Length;
  /** Head the system needs at this flow (m). */
  readonly systemHead: Length;
  /** Head burnt in the throttling valve (m); 0 with speed control. */
  readonly valveLoss: Length;
  readonly pumpEfficiency: number;
  readonly shaftPower: Power;
  /** Electrical input = shaft / (motor x drive efficiency) (W). */
  readonly inputPower: Power;
  readonly energy: Energy;
  readonly kWh: number;
}

/** Result of {@link annualEnergy}. */
export interface AnnualEnergy {
  readonly rows: readonly EnergyRow[];
  readonly total: Energy;
  readonly totalKWh: number;
  /** Cost of the year, when a price was given. */
  readonly cost: { readonly amount: number; readonly currency: string } | undefined;
}

/**
 * Energy a pump uses over a year of duty rows `{ flow, hours }`:
 * `E = sum P_input,i t_i` with `P_input = P_shaft / (eta_motor eta_drive)`.
 *
 * - `control: 'throttle'`: the pump runs at full speed at the required flow on its own
 *   curve; a valve burns the difference `H_pump(Q) - H_sys(Q)` (it must not be negative).
 * - `control: 'speed'`: {@link speedForFlow} finds the speed that meets the system at the
 *   flow, and the shaft power follows from the affinity-scaled curve. Pump efficiency is taken
 *   as constant along each affinity parabola (the affinity-law assumption; it overstates
 *   efficiency at deep speed reduction). Motor and drive efficiencies are held constant:
 *   their published part-load derating is not modelled.
 *
 * A row with zero flow counts as the pump off (no energy).
 *
 * @throws HeadflowError `INVALID_ARGUMENT` for bad input or a pump without efficiency data;
 *   `NO_SOLUTION` when a throttled pump cannot reach the system head at a flow, or no speed
 *   meets it; `OUT_OF_RANGE` for flows outside the pump's catalogue.
 * @example
 * ```ts
 * const year = annualEnergy({ pump, system, density: q(998.2, 'kg/m3'), motorEfficiency: 0.93,
 *   control: 'throttle', profile: [{ flow: q(80, 'm3/h'), hours: 4000 }],
 *   price: { perKWh: 0.12, currency: 'EUR' } });
 * year.totalKWh; // 4000 h x shaft(80 m3/h) / 0.93
 * ```
 */
export function annualEnergy(input: AnnualEnergyInput): AnnualEnergy {
  guardRecord('input', input);
  const { pump, system, profile, density } = input;
  guardPump('pump', pump);
  const systemHeadOfRow = systemHeadOf('system', system);
  const g = input.g ?? STANDARD_GRAVITY;
  checkPositive('density', density, 'kg/m3');
  checkFraction('motorEfficiency', input.motorEfficiency);
  const drive = input.driveEfficiency ?? 1;
  checkFraction('driveEfficiency', drive);
  guardOneOf('control', input.control, ['speed', 'throttle'] as const);
  if (!pump.hasEfficiency) {
    throw new HeadflowError('INVALID_ARGUMENT', 'energy needs efficiency or power data.', {
      parameter: 'pump',
    });
  }
  if (!Array.isArray(profile) || profile.length === 0) {
    throw argumentError(
      'INVALID_ARGUMENT',
      'profile',
      0,
      'rows',
      'at least one { flow, hours } row',
    );
  }
  if (input.price !== undefined) {
    guardRecord('price', input.price);
    checkNonNegative('price.perKWh', input.price.perKWh);
    guardString('price.currency', input.price.currency);
  }
  guardArray('profile', profile, { max: 100_000 });
  const rows: EnergyRow[] = [];
  let total = 0;
  profile.forEach((line, i) => {
    const row = guardRecord(`profile[${i}]`, line) as unknown as ProfileRow;
    checkNonNegative(`profile[${i}].flow`, row.flow, 'm3/s');
    checkNonNegative(`profile[${i}].hours`, row.hours, 'h');
    if (row.flow === 0) {
      rows.push({
        flow: row.flow,
        hours: row.hours,
        speed: undefined,
        pumpHead: 0 as Length,
        systemHead: system.staticHead,
        valveLoss: 0 as Length,
        pumpEfficiency: 0,
        shaftPower: 0 as Power,
        inputPower: 0 as Power,
        energy: 0 as Energy,
        kWh: 0,
      });
      return;
    }
    const systemHead = systemHeadOfRow(row.flow) as Length;
    let speed: RotationalSpeed;
    let pumpHead: number;
    let eff: number;
    let shaft: number;
    if (input.control === 'throttle') {
      pumpHead = pump.head(row.flow);
      if (pumpHead < systemHead) {
        throw new HeadflowError(
          'NO_SOLUTION',
          `profile[${i}]: at full speed the pump gives ${fmt(pumpHead)} m at ${fmt(row.flow)} m3/s, ` +
            `below the system's ${fmt(systemHead)} m; throttling cannot raise head.`,
          { parameter: `profile[${i}].flow`, value: row.flow, unit: 'm3/s' },
        );
      }
      speed = pump.speed;
      eff = pump.efficiency(row.flow);
      shaft = pump.shaftPower(row.flow, density, g);
    } else {
      const s =
        input.maxSpeed === undefined
          ? speedForFlow(pump, system, row.flow)
          : speedForFlow(pump, system, row.flow, { maxSpeed: input.maxSpeed });
      speed = s.speed;
      pumpHead = s.head;
      eff = s.pump.efficiency(row.flow);
      shaft = s.pump.shaftPower(row.flow, density, g);
    }
    const inputPower = shaft / (input.motorEfficiency * drive);
    const joules = guardResult(
      `profile[${i}] energy`,
      inputPower * row.hours * 3600,
      'OUT_OF_RANGE',
    );
    total = guardResult('total energy', total + joules, 'OUT_OF_RANGE');
    rows.push({
      flow: row.flow,
      hours: row.hours,
      speed,
      pumpHead: pumpHead as Length,
      systemHead,
      valveLoss: Math.max(0, pumpHead - systemHead) as Length,
      pumpEfficiency: eff,
      shaftPower: shaft as Power,
      inputPower: inputPower as Power,
      energy: joules as Energy,
      kWh: joules / 3.6e6,
    });
  });
  const totalKWh = total / 3.6e6;
  return {
    rows,
    total: total as Energy,
    totalKWh,
    cost:
      input.price === undefined
        ? undefined
        : { amount: totalKWh * input.price.perKWh, currency: input.price.currency },
  };
}
