/**
 * Material roughness and Hazen-Williams C against their published sources:
 * - Moody, L. F. (1944), "Friction factors for pipe flow", Trans. ASME 66, 671-684, Fig. 1
 *   (roughness in feet), and two reproductions of the same figures: efunda "Absolute Pipe
 *   Roughness" (after Binder 1973, in microns) and LMNO Engineering "Table of Surface
 *   Roughnesses" (in metres).
 * - The "Colebrook-White roughness values" table (Table 5; Good / Normal / Poor columns).
 * - Fair, Geyer and Okun's Water and Wastewater Engineering (Shammas and Wang, 3rd ed.),
 *   Table 5.1 (C, New / Uncertain age).
 * - Engineering ToolBox "Hazen-Williams Coefficients"; LMNO Engineering "Table of
 *   Hazen-Williams Coefficients".
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

describe('reproductions of Moody (1944) agree to their printed rounding', () => {
  // efunda (microns): commercial steel 45, galvanized iron 150, cast iron 260, drawn copper 1.5.
  // 0.00015 ft = 45.72 um, printed 45: tolerance 2 % covers the rounding to 2 digits.
  const efunda: readonly (readonly [MaterialName, number])[] = [
    ['commercial-steel', 45],
    ['galvanized-steel', 150],
    ['cast-iron', 260],
    ['copper', 1.5],
  ];
  it.each(efunda)('efunda %s: %d um', (name, um) => {
    expectRelative(to(material(name).roughness, 'mm') * 1000, um, 0.02, name);
  });

  // LMNO (metres): 4.5e-5, 1.5e-4, 2.6e-4, drawn tubing 1.5e-6; same 2-digit rounding.
  const lmno: readonly (readonly [MaterialName, number])[] = [
    ['commercial-steel', 4.5e-5],
    ['galvanized-steel', 1.5e-4],
    ['cast-iron', 2.6e-4],
    ['copper', 1.5e-6],
  ];
  it.each(lmno)('LMNO %s: %d m', (name, m) => {
    expectRelative(material(name).roughness, m, 0.02, name);
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
    ['cast-iron', 130, 100, "FGO Table 5.1 'Cast-iron pipe, coated'; LMNO new unlined 130"],
    ['concrete', 140, 130, "FGO Table 5.1 'Concrete'"],
    ['galvanized-steel', 120, undefined, "Engineering ToolBox and LMNO 'Galvanized iron' 120"],
    [
      'ductile-iron-cement-lined',
      140,
      undefined,
      "Engineering ToolBox 'Cast-Iron, cement lined' 140",
    ],
    ['copper', 130, undefined, "Engineering ToolBox and LMNO 'Copper' 130-140, lower end"],
    ['pvc', 150, undefined, "Engineering ToolBox 'Polyvinyl chloride, PVC, CPVC' 150"],
    ['polyethylene', 140, undefined, "Engineering ToolBox 'Polyethylene, PE, PEH' 140"],
  ];
  it.each(rows)('%s: C = %d new, %s aged (%s)', (name, c, aged) => {
    const m = material(name);
    expect(m.hazenWilliamsC).toBe(c);
    expect(m.agedHazenWilliamsC).toBe(aged);
  });

  it('every material in the table is checked here and cites at least two sources', () => {
    expect([...MATERIAL_NAMES].sort()).toEqual(rows.map((r) => r[0]).sort());
    for (const n of MATERIAL_NAMES) expect(material(n).sources.length).toBeGreaterThanOrEqual(2);
  });
});
