import { describe, expectTypeOf, it } from 'vitest';
import type { CataloguePump, SelectionEntry } from '../../src/select/index';
import type { Length, Power, RotationalSpeed } from '../../src/units/index';
import { q } from '../../src/units/index';

describe('selection types carry units', () => {
  it('trim diameters are lengths, speeds are speeds, valve losses are powers', () => {
    expectTypeOf<SelectionEntry['trimDiameter']>().toEqualTypeOf<Length | undefined>();
    expectTypeOf<SelectionEntry['speed']>().toEqualTypeOf<RotationalSpeed | undefined>();
    expectTypeOf<SelectionEntry['cases'][number]['throttlePower']>().toEqualTypeOf<
      Power | undefined
    >();
  });
  it('a catalogue pump refuses a length where a speed belongs', () => {
    const ok: Pick<CataloguePump, 'speed'> = { speed: q(2900, 'rpm') };
    // @ts-expect-error a length is not a rotational speed
    const bad: Pick<CataloguePump, 'speed'> = { speed: q(250, 'mm') };
    expectTypeOf(ok).not.toBeAny();
    expectTypeOf(bad).not.toBeAny();
  });
});
