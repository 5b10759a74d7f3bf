import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  COPPER_TUBE_SIZES,
  type CopperTubeType,
  copperTube,
  flowArea,
  type PipeDimensions,
  PVC_PIPE_SIZES,
  pipeSize,
  pvcPipe,
  STEEL_PIPE_SIZES,
  STEEL_SCHEDULES,
  type SteelSchedule,
  steelSchedules,
} from '../../src/pipes';
import { q, to } from '../../src/units';
import { expectHeadflowError, expectRelative } from '../helpers/expect';

/** Every steel row the module serves. */
const allSteel: PipeDimensions[] = STEEL_PIPE_SIZES.flatMap((n) =>
  steelSchedules(n).map((s) => pipeSize(n, s)),
);
const allCopper: PipeDimensions[] = COPPER_TUBE_SIZES.flatMap((n) =>
  (['K', 'L', 'M'] as const).flatMap((t) => {
    try {
      return [copperTube(n, t)];
    } catch {
      return [];
    }
  }),
);
const allPvc: PipeDimensions[] = PVC_PIPE_SIZES.flatMap((n) => [
  pvcPipe(n, '40'),
  pvcPipe(n, '80'),
]);

describe('special values and bad input', () => {
  it('rejects NaN, infinities, zero and negative sizes with INVALID_ARGUMENT', () => {
    for (const v of [Number.NaN, Number.POSITIVE_INFINITY, -1, 0]) {
      const err = expectHeadflowError(() => pipeSize(v, '40'), 'INVALID_ARGUMENT');
      expect(err.parameter).toBe('nps');
      expectHeadflowError(() => pvcPipe(v, '40'), 'INVALID_ARGUMENT');
      expectHeadflowError(() => copperTube(v, 'L'), 'INVALID_ARGUMENT');
    }
  });

  it('rejects text that is not a size, and non-string non-number input, with INVALID_ARGUMENT', () => {
    for (const v of ['', 'abc', '1/0', '2"', '1--1/4', '0', 'DN']) {
      expectHeadflowError(() => pipeSize(v, '40'), 'INVALID_ARGUMENT');
    }
    expectHeadflowError(() => pipeSize(null as unknown as string, '40'), 'INVALID_ARGUMENT');
    expectHeadflowError(() => pipeSize({} as unknown as string, '40'), 'INVALID_ARGUMENT');
  });

  it('refuses sizes the tables do not hold with OUT_OF_RANGE, listing the sizes', () => {
    for (const v of ['30', '5/8', 'DN700', 'DN0', 7, 0.3, '1/16']) {
      const err = expectHeadflowError(() => pipeSize(v, '40'), 'OUT_OF_RANGE');
      expect(err.message).toContain("'1-1/4'");
      expect(err.allowed).toContain("'24'");
    }
    expectHeadflowError(() => steelSchedules('30'), 'OUT_OF_RANGE');
    const num = expectHeadflowError(() => steelSchedules(30), 'OUT_OF_RANGE');
    expect(num.unit).toBe('in');
    expect(expectHeadflowError(() => pvcPipe(30, '40'), 'OUT_OF_RANGE').unit).toBe('in');
    expect(expectHeadflowError(() => copperTube(7, 'K'), 'OUT_OF_RANGE').unit).toBe('in');
    expectHeadflowError(() => pvcPipe('14', '40'), 'OUT_OF_RANGE');
    expectHeadflowError(() => copperTube('8', 'K'), 'OUT_OF_RANGE');
    expectHeadflowError(() => copperTube('DN50', 'K'), 'INVALID_ARGUMENT');
  });

  it('names an unknown schedule UNKNOWN_NAME and lists what the size has', () => {
    for (const s of ['Sch40', '40s', 'xs', '120', '', 'S40']) {
      const err = expectHeadflowError(() => pipeSize('2', s as SteelSchedule), 'UNKNOWN_NAME');
      expect(err.parameter).toBe('schedule');
      expect(err.message).toContain("For NPS 2 the tables list '5S', '10S', '10', '40'");
    }
    expectHeadflowError(() => pvcPipe('2', '120' as '40'), 'UNKNOWN_NAME');
    expectHeadflowError(() => copperTube('1', 'DWV' as CopperTubeType), 'UNKNOWN_NAME');
    expectHeadflowError(() => copperTube('1', 3 as unknown as CopperTubeType), 'UNKNOWN_NAME');
  });

  it('refuses a pair the standard does not list with OUT_OF_RANGE naming the available schedules', () => {
    const err = expectHeadflowError(() => pipeSize('22', '40'), 'OUT_OF_RANGE');
    expect(err.allowed).toBe("for NPS 22: '5S', '10S', '10', 'STD', '80', 'XS', '160'");
    expectHeadflowError(() => pipeSize('1/4', '5S'), 'OUT_OF_RANGE');
    expectHeadflowError(() => pipeSize('3-1/2', 'XXS'), 'OUT_OF_RANGE');
    expectHeadflowError(() => pipeSize('3-1/2', '160'), 'OUT_OF_RANGE');
    expectHeadflowError(() => pipeSize('16', '40S'), 'OUT_OF_RANGE');
    expectHeadflowError(() => pipeSize('14', 'XXS'), 'OUT_OF_RANGE');
    const cu = expectHeadflowError(() => copperTube('5', 'M'), 'OUT_OF_RANGE');
    expect(cu.allowed).toBe("for size 5: 'K', 'L'");
    expectHeadflowError(() => copperTube('1/4', 'M'), 'OUT_OF_RANGE');
  });

  it('rejects a non-positive or non-finite diameter in flowArea', () => {
    for (const d of [0, -0.1, Number.NaN, Number.POSITIVE_INFINITY]) {
      expectHeadflowError(() => flowArea(d as ReturnType<typeof q<'m'>>), 'INVALID_ARGUMENT');
    }
  });
});

describe('size notation', () => {
  it('accepts trade text, numbers of inches and DN for the same pipe', () => {
    const pairs: readonly (readonly [string, number, string])[] = [
      ['1/8', 0.125, 'DN6'],
      ['1/2', 0.5, 'DN15'],
      ['1-1/4', 1.25, 'DN32'],
      ['2-1/2', 2.5, 'DN65'],
      ['3-1/2', 3.5, 'DN90'],
      ['24', 24, 'DN600'],
    ];
    for (const [text, num, dn] of pairs) {
      const a = pipeSize(text, 'STD');
      expect(pipeSize(num, 'STD')).toEqual(a);
      expect(pipeSize(dn, 'STD')).toEqual(a);
      expect(a.nps).toBe(text);
    }
    expect(pipeSize('1 1/4', '40').nps).toBe('1-1/4');
    expect(pipeSize(' dn 50 ', '40').dn).toBe(50);
    expect(pipeSize('DN 50', '40').nps).toBe('2');
  });

  it('gives no DN for copper tube, and the size as trade text', () => {
    const t = copperTube(0.75, 'K');
    expect(t.dn).toBeUndefined();
    expect(t.nps).toBe('3/4');
    expect(t.schedule).toBe('K');
    expect(copperTube('5/8', 'L').nps).toBe('5/8');
  });

  it('names the standard and the wall basis of each family', () => {
    expect(pipeSize('2', '40').standard).toBe('ASME B36.10M Table 1');
    expect(pipeSize('2', 'XS').standard).toBe('ASME B36.10M Table 1');
    expect(pipeSize('2', '40S').standard).toBe('ASME B36.19M Table 1');
    expect(pipeSize('2', '5S').standard).toBe('ASME B36.19M Table 1');
    expect(copperTube('2', 'L').standard).toBe('ASTM B88 Table 1');
    expect(pvcPipe('2', '80').standard).toBe('ASTM D1785 Tables 1 and 2');
    expect(pvcPipe('2', '80').wallBasis).toBe('minimum');
    expect(pipeSize('2', '80').wallBasis).toBe('nominal');
  });

  it('returns frozen results', () => {
    expect(Object.isFrozen(pipeSize('2', '40'))).toBe(true);
  });
});

describe('every row: inside diameter = OD - 2 x wall (common practice)', () => {
  const rows = [...allSteel, ...allCopper, ...allPvc];
  it(`holds for all ${rows.length} rows, to rounding of the subtraction`, () => {
    // Tolerance: the subtraction is done once in doubles, so 4 ulp of the OD is ample.
    for (const r of rows) {
      const id = r.outsideDiameter - 2 * r.wallThickness;
      const tol = 4 * Number.EPSILON * r.outsideDiameter;
      expect(Math.abs(r.insideDiameter - id), `${r.standard} ${r.nps} ${r.schedule}`).toBeLessThan(
        tol,
      );
      expect(r.insideDiameter).toBeGreaterThan(0);
      expect(r.wallThickness).toBeGreaterThan(0);
    }
  });

  it('has the row counts the data files promise', () => {
    expect(allSteel.length).toBe(234);
    expect(allCopper.length).toBe(40);
    expect(allPvc.length).toBe(36);
  });

  it('converts the printed inches with the exact 0.0254 m/in', () => {
    const p = pipeSize('6', '40');
    expect(p.outsideDiameter).toBe(6.625 * 0.0254);
    expect(p.wallThickness).toBe(0.28 * 0.0254);
    expectRelative(to(p.outsideDiameter, 'in'), 6.625, 1e-15);
  });
});

describe('laws of the tables', () => {
  it('thicker designations have thicker walls at every size (common practice)', () => {
    const order: readonly SteelSchedule[][] = [
      ['5S', '10S', '40S', '80S'],
      ['10', '40', '80', '160'],
      ['STD', 'XS'],
    ];
    for (const n of STEEL_PIPE_SIZES) {
      const have = steelSchedules(n);
      for (const chain of order) {
        const walls = chain
          .filter((s) => have.includes(s))
          .map((s) => pipeSize(n, s).wallThickness);
        for (let i = 1; i < walls.length; i++) {
          expect(walls[i], `NPS ${n} ${chain.join('<')}`).toBeGreaterThan(walls[i - 1] ?? 0);
        }
      }
    }
  });

  it('STD equals schedule 40 up to NPS 10 and XS equals schedule 80 up to NPS 8 (ASME B36.10M, para. on wall designations)', () => {
    for (const n of STEEL_PIPE_SIZES) {
      const inches = pipeSize(n, 'STD').outsideDiameter / 0.0254;
      if (inches <= 10.75)
        expect(pipeSize(n, 'STD')).toEqual({ ...pipeSize(n, '40'), schedule: 'STD' });
      if (inches <= 8.625)
        expect(pipeSize(n, 'XS').wallThickness).toBe(pipeSize(n, '80').wallThickness);
      if (inches > 12.75) {
        expect(to(pipeSize(n, 'STD').wallThickness, 'in')).toBeCloseTo(0.375, 12);
        expect(to(pipeSize(n, 'XS').wallThickness, 'in')).toBeCloseTo(0.5, 12);
      }
    }
  });

  it('outside diameter grows with size and equals the size from NPS 14 up (ASME B36.10M para. 2)', () => {
    let last = 0;
    for (const n of STEEL_PIPE_SIZES) {
      const od = pipeSize(n, steelSchedules(n)[0] ?? 'STD').outsideDiameter;
      expect(od).toBeGreaterThan(last);
      last = od;
      const nominal = pipeSize(n, 'STD').nps;
      if (Number(nominal) >= 14) expectRelative(to(od, 'in'), Number(nominal), 1e-14, n);
    }
  });

  it('copper OD is the size plus 1/8 in, and K > L > M walls (ASTM B88; CDA Copper Tube Handbook)', () => {
    for (const r of allCopper) {
      const size = inchesOf(r.nps);
      expectRelative(to(r.outsideDiameter, 'in'), size + 0.125, 1e-14, r.nps);
    }
    for (const n of COPPER_TUBE_SIZES) {
      const k = copperTube(n, 'K').wallThickness;
      const l = copperTube(n, 'L').wallThickness;
      expect(k).toBeGreaterThan(l);
      if (n !== '1/4' && n !== '5/8' && n !== '3-1/2' && n !== '5' && n !== '6') {
        expect(l).toBeGreaterThan(copperTube(n, 'M').wallThickness);
      }
    }
  });

  it('PVC shares the steel OD series (ASTM D1785 Table 1)', () => {
    for (const n of PVC_PIPE_SIZES) {
      expect(pvcPipe(n, '40').outsideDiameter).toBe(pipeSize(n, '40').outsideDiameter);
      expect(pvcPipe(n, '80').wallThickness).toBeGreaterThan(pvcPipe(n, '40').wallThickness);
    }
  });

  it('property: any accepted spelling of a served size gives the same pipe', () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...STEEL_PIPE_SIZES),
        fc.constantFrom(...STEEL_SCHEDULES),
        (n, s) => {
          const have = steelSchedules(n);
          if (!have.includes(s)) {
            expectHeadflowError(() => pipeSize(n, s), 'OUT_OF_RANGE');
            return;
          }
          const a = pipeSize(n, s);
          expect(pipeSize(`DN${a.dn}`, s)).toEqual(a);
          expect(pipeSize(to(q(0, 'in'), 'in') + inchesOf(n), s)).toEqual(a);
        },
      ),
    );
  });
});

/** Trade text to inches, written independently of the module's parser. */
function inchesOf(text: string): number {
  const [whole, frac] = text.includes('-')
    ? text.split('-')
    : text.includes('/')
      ? ['0', text]
      : [text, undefined];
  const f = frac ? Number(frac.split('/')[0]) / Number(frac.split('/')[1]) : 0;
  return Number(whole) + f;
}

describe('flowArea', () => {
  it('is pi d^2 / 4 and scales with d^2', () => {
    expectRelative(flowArea(q(1, 'm')), Math.PI / 4, 1e-15);
    fc.assert(
      fc.property(
        fc.double({ min: 1e-4, max: 10, noNaN: true }),
        fc.double({ min: 0.1, max: 10, noNaN: true }),
        (d, k) => {
          const a = flowArea(q(d, 'm'));
          expectRelative(flowArea(q(d * k, 'm')), a * k * k, 1e-13, `d=${d} k=${k}`);
        },
      ),
    );
  });

  it('gives 12.73 in2 for NPS 4 schedule 40 (ID 4.026 in)', () => {
    // pi * 4.026^2 / 4 = 12.7303 in2 (common practice: the bore area of a published ID).
    expectRelative(to(flowArea(pipeSize('4', '40').insideDiameter), 'in2'), 12.7302643615, 1e-10);
  });
});
