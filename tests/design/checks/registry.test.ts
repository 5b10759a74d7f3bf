/**
 * The checks' list: one entry per check file, each with its description, and docs/checks.md
 * has a row for every one of them with the same id.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { CANDIDATE_CHECKS, CASE_CHECKS, CHECKS } from '../../../src/design/checks/index';

describe('the checks list', () => {
  it('has unique ids and a full description for every check', () => {
    const ids = CHECKS.map((c) => c.id);
    expect(new Set(ids).size).toBe(ids.length);
    for (const c of CHECKS) {
      for (const field of [c.guards, c.inputs, c.severity, c.source]) {
        expect(field.length).toBeGreaterThan(4);
      }
    }
    for (const k of [...CASE_CHECKS, ...CANDIDATE_CHECKS]) expect(ids).toContain(k.info.id);
  });

  it('docs/checks.md has a table row for every check, and no other', () => {
    const doc = readFileSync('docs/checks.md', 'utf8');
    const rows = [...doc.matchAll(/^\| `([a-z-]+)` \|/gm)].map((m) => m[1]);
    expect([...rows].sort()).toEqual(CHECKS.map((c) => c.id).sort());
  });
});
