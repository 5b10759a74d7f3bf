/**
 * The display units of each unit system, shared by the text, Markdown, JSON and chart
 * renderers (and the CLI), so that every output of one report speaks the same units.
 *
 * @module
 */

import { argumentError } from '../errors';
import type { DisplayUnits, UnitSystem } from './types';

const SI: DisplayUnits = Object.freeze({
  flow: 'm3/h',
  head: 'm',
  pressure: 'kPa',
  power: 'kW',
  velocity: 'm/s',
  speed: 'rpm',
  length: 'm',
});

const US: DisplayUnits = Object.freeze({
  flow: 'gal/min',
  head: 'ft',
  pressure: 'psi',
  power: 'hp',
  velocity: 'ft/s',
  speed: 'rpm',
  length: 'ft',
});

/**
 * The units a report is printed in for a unit system.
 *
 * - `'si'`: flow m3/h, head m, pressure kPa, power kW, velocity m/s, speed rpm, length m.
 *   Flow is in m3/h because pump catalogues in SI mostly quote it so; L/s is also common
 *   (water supply, building services): convert with `to(flow, 'L/s')` where you need it.
 * - `'us'`: flow gal/min (US gallons), head ft, pressure psi, power hp (550 ft lbf/s),
 *   velocity ft/s, speed rpm, length ft.
 *
 * Energy is in kWh in both systems (the unit electricity is sold in).
 *
 * @param system - `'si'` or `'us'`
 * @returns the unit symbols (a frozen object; symbols from the units catalogue)
 * @throws HeadflowError `INVALID_ARGUMENT` for any other value.
 * @example
 * ```ts
 * displayUnits('si').flow; // 'm3/h'
 * displayUnits('us').head; // 'ft'
 * ```
 */
export function displayUnits(system: UnitSystem): DisplayUnits {
  if (system === 'si') return SI;
  if (system === 'us') return US;
  throw argumentError('INVALID_ARGUMENT', 'units', system, undefined, "'si' or 'us'");
}
