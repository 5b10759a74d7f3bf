/**
 * The shape every pipe and tube lookup returns, and the one place that turns a row in
 * inches into SI lengths.
 *
 * @module
 */
import { type Length, UNITS } from '../units/index';

/** Exact metres per inch (NIST SP 811, B.8). */
export const METRES_PER_INCH = UNITS.in.factor;

/** Dimensions of one pipe or tube, lengths in metres. */
export interface PipeDimensions {
  /** Nominal size in trade notation, for example `'1-1/4'`. */
  readonly nps: string;
  /** Metric designation DN (ISO 6708) that ASME B36.10M lists beside the NPS, where there is one. */
  readonly dn: number | undefined;
  /** Wall designation: a schedule (`'40'`, `'STD'`, `'10S'`) or a copper tube type (`'K'`). */
  readonly schedule: string;
  /** Outside diameter. */
  readonly outsideDiameter: Length;
  /** Wall thickness: nominal, or the minimum where `wallBasis` says so. */
  readonly wallThickness: Length;
  /** Inside diameter, `outsideDiameter - 2 * wallThickness`. */
  readonly insideDiameter: Length;
  /**
   * What the wall thickness is: `'nominal'` (ASME B36.10M/B36.19M, ASTM B88) or `'minimum'`
   * (ASTM D1785 lists minimum walls, so the inside diameter is the largest the standard
   * allows, not the average).
   */
  readonly wallBasis: 'nominal' | 'minimum';
  /** The standard and table the numbers come from, for example `'ASME B36.10M Table 1'`. */
  readonly standard: string;
}

/**
 * Builds a frozen {@link PipeDimensions} from a table row in inches.
 * @internal
 */
export function dimensionsFromInches(
  nps: string,
  dn: number | undefined,
  schedule: string,
  outsideDiameterInches: number,
  wallInches: number,
  wallBasis: 'nominal' | 'minimum',
  standard: string,
): PipeDimensions {
  const outside = outsideDiameterInches * METRES_PER_INCH;
  const wall = wallInches * METRES_PER_INCH;
  return Object.freeze({
    nps,
    dn,
    schedule,
    outsideDiameter: outside as Length,
    wallThickness: wall as Length,
    insideDiameter: (outside - 2 * wall) as Length,
    wallBasis,
    standard,
  });
}

/** Lists the keys of a walls record in table order, for messages. @internal */
export function listed(walls: object): string {
  return Object.keys(walls)
    .map((k) => `'${k}'`)
    .join(', ');
}
