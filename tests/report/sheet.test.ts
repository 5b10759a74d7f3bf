/**
 * The calculation sheet across every example scenario file: one unit system throughout, the
 * verdict, and numbers read back out of the reports and compared with the report object
 * (no snapshots). The scenarios are invented demos (docs/examples/*.json).
 */
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { EXIT, runCli } from '../../src/cli/run';
import { evaluateDesign, readScenario } from '../../src/design/index';
import { renderHtml, renderMarkdown, renderText } from '../../src/report/index';
import { to } from '../../src/units/index';

const DIR = join(__dirname, '../../docs/examples');
const FILES = readdirSync(DIR).filter((f) => f.endsWith('.json'));

/** Symbols of the other system that must never follow a number (the test's list). */
const US_SYMBOLS = [
  'ft',
  'gal/min',
  'gpm',
  'psi',
  'psia',
  'psig',
  'hp',
  'degF',
  '°F',
  'in',
  'lb/ft3',
  'ft/s',
  'ft2/s',
  'kWh/kgal',
];
const SI_SYMBOLS = [
  'm',
  'm3/h',
  'm³/h',
  'L/s',
  'kPa',
  'kW',
  'degC',
  '°C',
  'mm',
  'kg/m3',
  'kg/m³',
  'm/s',
  'mm2/s',
  'kWh/m3',
  'kWh/m³',
];

function leaks(text: string, symbols: readonly string[], bracketed: string): string[] {
  // A motor's nameplate of the other series is shown in brackets after its rating: allowed.
  const cleaned = text.replace(new RegExp(`\\(\\d+(\\.\\d+)? ${bracketed}\\)`, 'g'), '');
  const found: string[] = [];
  for (const sym of symbols) {
    const escaped = sym.replace(/[.*+?^${}()|[\]\\/]/g, '\\$&');
    // "2 in parallel" is words, not inches: 'in' counts only when no word follows.
    const after = sym === 'in' ? '(?![\\w/²³]| [a-z])' : '(?![\\w/²³])';
    const re = new RegExp(`\\d\\s?${escaped}${after}`, 'g');
    for (const m of cleaned.matchAll(re)) {
      const at = m.index ?? 0;
      found.push(cleaned.slice(Math.max(0, at - 30), at + 20));
    }
  }
  return found;
}

describe('every example file speaks one unit system', () => {
  it('has example files to test', () => expect(FILES.length).toBeGreaterThan(1));
  for (const file of FILES) {
    const design = readScenario(readFileSync(join(DIR, file), 'utf8'));
    const report = evaluateDesign(design, { curves: true });
    for (const units of ['si', 'us'] as const) {
      it(`${file} in ${units}: text, Markdown and HTML`, () => {
        const outputs = [
          renderText(report, { units }),
          renderMarkdown(report, { units }),
          // The page's own style sheet (margins in mm) is not report content.
          renderHtml(report, { units }).replace(/<style>[\s\S]*<\/style>/, ''),
        ];
        // Names print as the user wrote them ("hot water, 80 degC"): they are not scanned.
        const names = [
          ...report.duty.map((d) => d.case),
          ...report.candidates.map((c) => c.name),
          ...report.inputs.runs.map((r) => r.name),
        ].sort((a, b) => b.length - a.length);
        for (const raw of outputs) {
          let out = raw;
          for (const n of names) {
            out = out.split(n).join('<name>');
            out = out.split(n.replace(/&/g, '&amp;')).join('<name>');
          }
          const bad = units === 'si' ? leaks(out, US_SYMBOLS, 'hp') : leaks(out, SI_SYMBOLS, 'kW');
          expect(bad, `${file} (${units})`).toEqual([]);
        }
      });
    }
  }
});

describe('numbers read back from the sheet match the report object', () => {
  const file = join(DIR, 'canal-lift.json');
  const report = evaluateDesign(readScenario(readFileSync(file, 'utf8')));
  const text = renderText(report, { width: 140 });
  it('the duty table: static head, losses and total head of every case, in m', () => {
    for (const d of report.duty) {
      const line = text.split('\n').find((l) => l.startsWith(`${d.case} `) && /\d/.test(l));
      const cells = (line ?? '')
        .slice(d.case.length)
        .trim()
        .split(/\s{2,}/);
      // The first table that starts with the case's name is the liquid table; find the duty row.
      const dutyLine = text
        .split('\n')
        .filter((l) => l.startsWith(d.case))
        .map((l) =>
          l
            .slice(d.case.length)
            .trim()
            .split(/\s{2,}/),
        )
        .find((c) => Math.abs(Number(c[2]) - d.head) < 0.01);
      expect(cells.length).toBeGreaterThan(0);
      expect(dutyLine, d.case).toBeDefined();
      expect(Number(dutyLine?.[0])).toBeCloseTo(d.staticHead, 1);
      expect(Number(dutyLine?.[1])).toBeCloseTo(d.lossHead, 1);
    }
  });
  it('the operating points of the recommended candidate in US units', () => {
    const us = renderText(report, { units: 'us', width: 140 });
    const c = report.candidates[0];
    for (const r of c?.cases ?? []) {
      const rows = us
        .split('\n')
        .filter((l) => l.startsWith(r.case))
        .map((l) =>
          l
            .slice(r.case.length)
            .trim()
            .split(/\s{2,}/),
        );
      const match = rows.find((cells) => Number(cells[0]) === Math.round(to(r.speed ?? 0, 'rpm')));
      expect(match, r.case).toBeDefined();
      expect(Number(match?.[1])).toBeCloseTo(to(r.flow ?? 0, 'gal/min'), 0);
      expect(Number(match?.[2])).toBeCloseTo(to(r.head ?? 0, 'ft'), 1);
    }
  });
});

describe('the verdict and the exit code', () => {
  const base = JSON.parse(readFileSync(join(DIR, 'canal-lift.json'), 'utf8')) as {
    candidates: { name: string }[];
  };
  const io = (files: Record<string, string>) => {
    let out = '';
    let err = '';
    return {
      io: {
        stdout: (t: string) => {
          out += t;
        },
        stderr: (t: string) => {
          err += t;
        },
        readFile: async (p: string) => {
          const f = files[p];
          if (f === undefined) throw Object.assign(new Error('no'), { code: 'ENOENT' });
          return f;
        },
        writeFile: async () => undefined,
      },
      out: () => out,
      err: () => err,
    };
  };
  it('the best passes and another fails: exit 0, "1 of 2 candidates passes"', async () => {
    const c = io({ 'a.json': JSON.stringify(base) });
    expect(await runCli(['a.json'], c.io)).toBe(EXIT.passed);
    expect(c.out()).toContain('Verdict: 1 of 2 candidates passes; recommended: pump B with drive.');
  });
  it('all pass: exit 0, "1 of 1 candidate passes"', async () => {
    const only = { ...base, candidates: base.candidates.filter((k) => k.name !== 'pump A') };
    const c = io({ 'a.json': JSON.stringify(only) });
    expect(await runCli(['a.json'], c.io)).toBe(EXIT.passed);
    expect(c.out()).toContain('Verdict: 1 of 1 candidate passes; recommended: pump B with drive.');
  });
  it('none passes: exit 1, "No candidate passes (0 of 1)"', async () => {
    const only = { ...base, candidates: base.candidates.filter((k) => k.name === 'pump A') };
    const c = io({ 'a.json': JSON.stringify(only) });
    expect(await runCli(['a.json'], c.io)).toBe(EXIT.checkFailed);
    expect(c.out()).toContain(
      'Verdict: No candidate passes (0 of 1); none is recommended (the best ranked is pump A).',
    );
    expect(c.err()).toContain('no candidate passes every check');
  });
  it('--format html writes one self-contained page with the chart', async () => {
    const c = io({ 'a.json': JSON.stringify(base) });
    expect(await runCli(['a.json', '--format', 'html'], c.io)).toBe(EXIT.passed);
    expect(c.out().startsWith('<!doctype html>')).toBe(true);
    expect(c.out()).toContain('<svg');
    expect(c.out()).not.toMatch(/(src|href)="https?:/);
  });
  it('--summary gives the short form', async () => {
    const c = io({ 'a.json': JSON.stringify(base) });
    expect(await runCli(['a.json', '--summary'], c.io)).toBe(EXIT.passed);
    expect(c.out()).not.toContain('Run losses at the duty flow');
    expect(c.out()).toContain('Verdict:');
  });
});
