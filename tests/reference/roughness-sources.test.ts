/**
 * Material roughness and Hazen-Williams C against their published sources:
 * - Moody, L. F. (1944), "Friction factors for pipe flow", Trans. ASME 66, 671-684, Fig. 1
 *   (roughness in feet).
 * - The Colebrook-White roughness table of HR Wallingford and Barr, "Tables for the hydraulic
 *   design of pipes, sewers and channels" (Good / Normal / Poor columns; from memory: read
 *   from a reproduction, the book's edition and page not in hand).
 * - Fair, Geyer and Okun's Water and Wastewater Engineering (Shammas and Wang, 3rd ed.),
 *   Table 5.1 (C, New / Uncertain age).
 * - NFPA 13 and AWWA M41 for the C values marked 'from memory'.
 */
import { describe, expect, it } from 'vitest';
import { MATERIAL_NAMES, type MaterialName, material } from '../../src/pipes';
import { to } from '../../src/units';
import { expectRelative } from '../helpers/expect';

describe('Moody (1944) Fig. 1, feet, exact through 0.3048 m/ft', () => {
  const rows: readonly (readonly [MaterialName, number])[] = [
    ['commercial-steel', 0.00015],
    ['galvanized-steel', 0.0005],
    ['cast-iron', 0.00085],
    ['copper', 0.000005],
    ['pvc', 0.000005],
    ['polyethylene', 0.000005],
    ['concrete', 0.001],
  ];
  it.each(rows)('%s: %d ft', (name, ft) => {
    expectRelative(to(material(name).roughness, 'ft'), ft, 1e-14, name);
  });

  it('concrete carries the printed range 0.001 to 0.01 ft', () => {
    const r = material('concrete').roughnessRange;
    if (r === undefined) return expect.fail('concrete has no roughnessRange');
    expectRelative(to(r.min, 'ft'), 0.001, 1e-14);
    expectRelative(to(r.max, 'ft'), 0.01, 1e-14);
  });
});

describe('Colebrook-White roughness values, Table 5 (mm)', () => {
  it("aged ranges are the Normal to Poor columns of the rows named in 'sources'", () => {
    const ranges: readonly (readonly [MaterialName, number, number])[] = [
      ['commercial-steel', 0.15, 0.3], // 'Rusty steel'
      ['galvanized-steel', 0.15, 0.3], // 'Galvanised iron, coated cast iron generally'
      ['cast-iron', 0.3, 0.6], // 'Uncoated cast iron'
    ];
    for (const [name, lo, hi] of ranges) {
      const a = material(name).agedRoughness;
      if (a === undefined) return expect.fail(`${name} has no agedRoughness`);
      expectRelative(to(a.min, 'mm'), lo, 1e-14, name);
      expectRelative(to(a.max, 'mm'), hi, 1e-14, name);
    }
  });

  it("cement-lined ductile iron: 'Spun bitumen or concrete lined' Normal 0.03 mm", () => {
    expectRelative(to(material('ductile-iron-cement-lined').roughness, 'mm'), 0.03, 1e-14);
  });
});

describe('Hazen-Williams C', () => {
  const rows: readonly (readonly [MaterialName, number, number | undefined, string])[] = [
    ['commercial-steel', 140, 100, "FGO Table 5.1 'Steel, welded joints, coated'"],
    ['cast-iron', 130, 100, "FGO Table 5.1 'Cast-iron pipe, coated'"],
    ['concrete', 140, 130, "FGO Table 5.1 'Concrete'"],
    ['galvanized-steel', 120, undefined, "NFPA 13 'Galvanized (all)' 120 (from memory)"],
    [
      'ductile-iron-cement-lined',
      140,
      undefined,
      'AWWA M41 and NFPA 13, cement-mortar lined ductile iron 140 (from memory)',
    ],
    ['copper', 130, undefined, 'copper 130 to 140, lower end (from memory)'],
    ['pvc', 150, undefined, "NFPA 13 'Plastic (listed), all' 150 (from memory)"],
    ['polyethylene', 140, undefined, 'PE pipe 140 (from memory)'],
  ];
  it.each(rows)('%s: C = %d new, %s aged (%s)', (name, c, aged) => {
    const m = material(name);
    expect(m.hazenWilliamsC).toBe(c);
    expect(m.agedHazenWilliamsC).toBe(aged);
  });

  it('cites primary literature or says from memory: no vendor table or document-sharing copy', () => {
    const primary = /MOODY-1944|HRW-TABLE-5|FGO-5\.1|NFPA-13|AWWA-M41|from memory|common practice/;
    const weak = /toolbox|lmno|scribd|efunda|piping-designer|calculator/i;
    for (const n of MATERIAL_NAMES) {
      for (const source of material(n).sources) {
        expect(source, `${n}: ${source}`).toMatch(primary);
        expect(source, `${n}: ${source}`).not.toMatch(weak);
      }
    }
  });

  it('every material in the table is checked here and cites at least two sources', () => {
    expect([...MATERIAL_NAMES].sort()).toEqual(rows.map((r) => r[0]).sort());
    for (const n of MATERIAL_NAMES) expect(material(n).sources.length).toBeGreaterThanOrEqual(2);
  });
});
