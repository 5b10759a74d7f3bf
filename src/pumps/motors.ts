import { argumentError, checkNonNegative, checkPositive, HeadflowError } from '../errors';
import { guardOneOf, guardRecord } from '../guards';
import {
  type Acceleration,
  type Density,
  type Flow,
  type Power,
  STANDARD_GRAVITY,
  UNITS,
} from '../units/index';
import { fmt, guardPump, maximize } from './internal';
import type { Pump } from './types';

const HP = UNITS.hp.factor; // W, mechanical horsepower (NIST SP 811)

/**
 * Standard horsepower ratings of NEMA MG 1 ("Motors and Generators"): fractional ratings of
 * small motors (MG 1 Part 10, 10.32) and integral ratings of medium polyphase induction
 * motors up to 500 hp (MG 1 Part 10, 10.32.4). Values from memory: the standard's table was
 * not in hand when this was written; check against your edition.
 */
export const NEMA_MG1_HP_RATINGS: readonly number[] = [
  0.25,
  1 / 3,
  0.5,
  0.75,
  1,
  1.5,
  2,
  3,
  5,
  7.5,
  10,
  15,
  20,
  25,
  30,
  40,
  50,
  60,
  75,
  100,
  125,
  150,
  200,
  250,
  300,
  350,
  400,
  450,
  500,
];

/**
 * Standard rated outputs (kW) of IEC 60072-1 ("Dimensions and output series for rotating
 * electrical machines - Part 1: Frame numbers 56 to 400 and flange numbers 55 to 1080"),
 * the output series 0.06 kW to 1000 kW. Values from memory: the standard's table was not in
 * hand when this was written; check against your edition.
 */
export const IEC_60072_KW_RATINGS: readonly number[] = [
  0.06, 0.09, 0.12, 0.18, 0.25, 0.37, 0.55, 0.75, 1.1, 1.5, 2.2, 3, 4, 5.5, 7.5, 11, 15, 18.5, 22,
  30, 37, 45, 55, 75, 90, 110, 132, 160, 200, 250, 315, 355, 400, 450, 500, 560, 630, 710, 800, 900,
  1000,
];

/** A motor rating series. */
export type MotorSeries = 'nema' | 'iec';

/** Options of {@link selectMotor}. */
export interface MotorOptions {
  readonly series: MotorSeries;
  /**
   * Service factor the selection may rely on; default 1.0 (do not rely on it). With SF > 1 a
   * rating is accepted when rating x SF covers the power. Running in the service factor
   * shortens insulation life (NEMA MG 1 treats it as an allowance for occasional overload,
   * from memory); keep 1.0 for continuous duty.
   */
  readonly serviceFactor?: number;
}

/** A standard motor rating. */
export interface MotorRating {
  readonly series: MotorSeries;
  /** Rated output (W). */
  readonly rating: Power;
  /** Rated output in the series' unit: hp for NEMA, kW for IEC. */
  readonly nameplate: number;
  readonly unit: 'hp' | 'kW';
  /** Power / rating. */
  readonly loadFraction: number;
  readonly serviceFactor: number;
}

/**
 * The smallest standard motor rating that covers a shaft power: NEMA MG 1 horsepower series
 * ({@link NEMA_MG1_HP_RATINGS}) or IEC 60072-1 kilowatt series ({@link IEC_60072_KW_RATINGS}).
 * A rating covers the power when `rating x serviceFactor >= power` (a power equal to a rating
 * picks that rating; a power just above picks the next).
 *
 * @param power - shaft power the motor must deliver (W), >= 0
 * @throws HeadflowError `INVALID_ARGUMENT` for a negative power, an unknown series or a
 *   service factor outside [1, 2]; `OUT_OF_RANGE` above the largest rating of the series.
 * @example
 * ```ts
 * selectMotor(q(10.9, 'kW'), { series: 'iec' }).nameplate; // 11
 * selectMotor(q(10.9, 'kW'), { series: 'nema' }).nameplate; // 15 (10.9 kW = 14.6 hp)
 * ```
 */
export function selectMotor(power: Power, options: MotorOptions): MotorRating {
  checkNonNegative('power', power, 'W');
  guardRecord('options', options);
  const sf = options.serviceFactor ?? 1;
  if (typeof sf !== 'number' || !Number.isFinite(sf) || sf < 1 || sf > 2) {
    throw argumentError(
      'INVALID_ARGUMENT',
      'serviceFactor',
      sf,
      undefined,
      '1 <= serviceFactor <= 2',
    );
  }
  const series = options.series;
  if (series !== 'nema' && series !== 'iec') {
    guardOneOf('series', series, ['nema', 'iec'] as const);
  }
  const table = series === 'nema' ? NEMA_MG1_HP_RATINGS : IEC_60072_KW_RATINGS;
  const unitW = series === 'nema' ? HP : 1000;
  const need = power / sf;
  for (const r of table) {
    const rating = r * unitW;
    if (need <= rating * (1 + 1e-12)) {
      return {
        series,
        rating: rating as Power,
        nameplate: r,
        unit: series === 'nema' ? 'hp' : 'kW',
        loadFraction: power / rating,
        serviceFactor: sf,
      };
    }
  }
  const top = (table[table.length - 1] ?? 0) * unitW;
  throw argumentError(
    'OUT_OF_RANGE',
    'power',
    power,
    'W',
    `<= ${fmt(top * sf)} W (the largest ${series === 'nema' ? 'NEMA MG 1' : 'IEC 60072-1'} rating in the table, times the service factor)`,
  );
}

/** Input of {@link motorForPump}. */
export interface MotorForPumpInput extends MotorOptions {
  readonly pump: Pump;
  readonly density: Density;
  /** Duty flow (the operating point). */
  readonly dutyFlow: Flow;
  /** Highest flow the pump may reach in service; default the end of its curve. */
  readonly upTo?: Flow;
  readonly g?: Acceleration;
}

/** Result of {@link motorForPump}: the non-overloading motor and the duty-only motor. */
export interface MotorForPump {
  readonly duty: { readonly flow: Flow; readonly shaftPower: Power; readonly motor: MotorRating };
  readonly nonOverloading: {
    /** Flow at which the shaft power is largest, in [flowRange.min, upTo]. */
    readonly flow: Flow;
    readonly shaftPower: Power;
    readonly motor: MotorRating;
  };
}

/**
 * Sizes a motor for a pump two ways so the caller sees both: the smallest standard rating
 * that covers the largest shaft power anywhere from the start of the curve to `upTo`
 * (default the end of the curve: a non-overloading motor, safe wherever the system lets the
 * pump run), and the rating that covers only the duty point. The largest power is found by
 * a grid scan and golden-section refinement of `pump.shaftPower` (radial pumps peak at the end
 * of the curve; mixed and axial flow pumps often at shut-off).
 *
 * @throws HeadflowError `INVALID_ARGUMENT` for a pump without efficiency data or bad input;
 *   `OUT_OF_RANGE` for flows outside the curve or powers above the series.
 * @example
 * ```ts
 * const m = motorForPump({ pump, density: q(998, 'kg/m3'), dutyFlow: q(100, 'm3/h'), series: 'iec' });
 * m.duty.motor.nameplate; // 11
 * m.nonOverloading.motor.nameplate; // 15
 * ```
 */
export function motorForPump(input: MotorForPumpInput): MotorForPump {
  guardRecord('input', input);
  const { pump, density } = input;
  guardPump('pump', pump);
  checkPositive('dutyFlow', input.dutyFlow, 'm3/s');
  const g = input.g ?? STANDARD_GRAVITY;
  checkPositive('density', density, 'kg/m3');
  if (!pump.hasEfficiency) {
    throw new HeadflowError('INVALID_ARGUMENT', 'motor sizing needs efficiency or power data.', {
      parameter: 'pump',
    });
  }
  const { min, max } = pump.flowRange;
  const upTo = input.upTo ?? max;
  checkPositive('upTo', upTo, 'm3/s');
  if (upTo > max * (1 + 1e-12) || upTo < min) {
    throw argumentError('OUT_OF_RANGE', 'upTo', upTo, 'm3/s', `${fmt(min)} to ${fmt(max)} m3/s`);
  }
  const options: MotorOptions =
    input.serviceFactor === undefined
      ? { series: input.series }
      : { series: input.series, serviceFactor: input.serviceFactor };
  const dutyPower = pump.shaftPower(input.dutyFlow, density, g);
  const m = maximize((x) => pump.shaftPower(x as Flow, density, g), min, Math.min(upTo, max));
  return {
    duty: { flow: input.dutyFlow, shaftPower: dutyPower, motor: selectMotor(dutyPower, options) },
    nonOverloading: {
      flow: m.x as Flow,
      shaftPower: m.value as Power,
      motor: selectMotor(m.value as Power, options),
    },
  };
}
