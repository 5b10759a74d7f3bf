/**
 * The entry guard of the screening checks' inputs (`surge`, `lowFlow`, `intake`): impossible
 * values throw; missing ones make the check say it could not run.
 *
 * @module
 */
import { argumentError } from '../../errors';
import { guardBoolean, guardFunction, guardRange, guardRecord } from '../../guards';
import type { DesignInput } from '../types';

const positive = { min: 0, minOpen: true } as const;

/** Throws HeadflowError `INVALID_ARGUMENT` for a screening input that cannot be. */
export function guardCheckInputs(input: DesignInput): void {
  if (input.surge !== undefined && input.surge !== null) {
    const s = guardRecord('surge', input.surge);
    if (s['closureTime'] !== undefined) {
      guardRange('surge.closureTime', s['closureTime'], { min: 0, unit: 's' });
    }
  }
  if (input.lowFlow !== undefined && input.lowFlow !== null) {
    const l = guardRecord('lowFlow', input.lowFlow);
    if (l['minimumFlow'] !== undefined) {
      guardRange('lowFlow.minimumFlow', l['minimumFlow'], { ...positive, unit: 'm3/s' });
    }
    if (l['maxTemperatureRise'] !== undefined) {
      guardRange('lowFlow.maxTemperatureRise', l['maxTemperatureRise'], { ...positive, unit: 'K' });
    }
  }
  if (input.liquid !== undefined) {
    // The liquid itself (for the margin to boiling): its vapour pressure is read directly.
    const f = guardRecord('liquid', input.liquid);
    guardBoolean('liquid.hasVaporPressure', f['hasVaporPressure']);
    guardFunction('liquid.vaporPressureInto', f['vaporPressureInto']);
    // An open upper end (Infinity, as a constant fluid has) is allowed; NaN or a non-number not.
    const top = guardRecord('liquid.validRange', f['validRange'])['maxTemperature'];
    if (typeof top !== 'number' || !(top > 0)) {
      throw argumentError('INVALID_ARGUMENT', 'liquid.validRange.maxTemperature', top, 'K', '> 0');
    }
  }
  if (input.intake !== undefined && input.intake !== null) {
    const i = guardRecord('intake', input.intake);
    for (const key of ['depth', 'diameter'] as const) {
      if (i[key] !== undefined) guardRange(`intake.${key}`, i[key], { ...positive, unit: 'm' });
    }
  }
}
