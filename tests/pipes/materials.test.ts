import { describe, expect, it } from 'vitest';
import { MATERIAL_NAMES, type MaterialName, material } from '../../src/pipes';
import { expectHeadflowError } from '../helpers/expect';

describe('material: bad input', () => {
  it('refuses unknown names with UNKNOWN_NAME listing the names', () => {
    for (const n of ['steel', 'Commercial-Steel', '', 'toString', 'constructor']) {
      const err = expectHeadflowError(() => material(n as MaterialName), 'UNKNOWN_NAME');
      expect(err.parameter).toBe('name');
      expect(err.allowed).toContain("'ductile-iron-cement-lined'");
    }
    expectHeadflowError(() => material(3 as unknown as MaterialName), 'UNKNOWN_NAME');
    expectHeadflowError(() => material(undefined as unknown as MaterialName), 'UNKNOWN_NAME');
  });
});

describe('material: the table', () => {
  it('holds the eight materials of the issue, lowercase identifiers', () => {
    expect(MATERIAL_NAMES).toEqual([
      'commercial-steel',
      'galvanized-steel',
      'cast-iron',
      'ductile-iron-cement-lined',
      'copper',
      'pvc',
      'polyethylene',
      'concrete',
    ]);
    for (const n of MATERIAL_NAMES) expect(n).toMatch(/^[a-z]+(?:-[a-z]+)*$/);
  });

  it('has positive roughness, aged ranges reaching above the new value, C in the usual band', () => {
    for (const n of MATERIAL_NAMES) {
      const m = material(n);
      expect(m.name).toBe(n);
      expect(m.roughness).toBeGreaterThan(0);
      expect(m.roughness).toBeLessThan(0.01);
      if (m.agedRoughness) {
        // Ranges come from another source than the new value and may overlap it (galvanised:
        // Moody 0.1524 mm new, aged 0.15 to 0.3 mm), so only the upper end must exceed it.
        expect(m.agedRoughness.max).toBeGreaterThan(m.roughness);
        expect(m.agedRoughness.max).toBeGreaterThan(m.agedRoughness.min);
      }
      if (m.roughnessRange) expect(m.roughnessRange.min).toBe(m.roughness);
      // Common practice: C runs from about 60 (very rough) to about 150 (plastic).
      expect(m.hazenWilliamsC).toBeGreaterThanOrEqual(60);
      expect(m.hazenWilliamsC).toBeLessThanOrEqual(160);
      if (m.agedHazenWilliamsC !== undefined) {
        expect(m.agedHazenWilliamsC).toBeLessThan(m.hazenWilliamsC);
      }
      expect(Object.isFrozen(m)).toBe(true);
    }
  });

  it('orders smooth drawn tubing and plastics below steel below cast iron', () => {
    const k = (n: MaterialName) => material(n).roughness;
    expect(k('copper')).toBeLessThan(k('commercial-steel'));
    expect(k('pvc')).toBeLessThan(k('commercial-steel'));
    expect(k('commercial-steel')).toBeLessThan(k('galvanized-steel'));
    expect(k('galvanized-steel')).toBeLessThan(k('cast-iron'));
  });

  it('returns the same object each call (no allocation per lookup)', () => {
    expect(material('pvc')).toBe(material('pvc'));
  });
});

describe('elastic modulus and Poisson ratio (for the wave speed)', () => {
  it('every material has E > 0 inside its printed range, 0 < Poisson <= 0.5, and a source line', () => {
    for (const name of MATERIAL_NAMES) {
      const m = material(name);
      expect(m.elasticModulus, name).toBeGreaterThan(0);
      if (m.elasticModulusRange) {
        expect(m.elasticModulus, name).toBeGreaterThanOrEqual(m.elasticModulusRange.min);
        expect(m.elasticModulus, name).toBeLessThanOrEqual(m.elasticModulusRange.max);
      }
      expect(m.poissonRatio, name).toBeGreaterThan(0);
      expect(m.poissonRatio, name).toBeLessThanOrEqual(0.5);
      expect(
        m.sources.some((s) => s.startsWith("E and Poisson's ratio")),
        name,
      ).toBe(true);
    }
  });
  it('steel: 207 GPa, 0.3 (doc example); plastics far softer than metals', () => {
    expect(material('commercial-steel').elasticModulus).toBe(207e9);
    expect(material('commercial-steel').poissonRatio).toBe(0.3);
    expect(material('pvc').elasticModulus).toBeLessThan(material('copper').elasticModulus / 10);
  });
});
