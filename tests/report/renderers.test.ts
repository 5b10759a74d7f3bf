import fc from 'fast-check';
import { XMLValidator } from 'fast-xml-parser';
import { describe, expect, it, vi } from 'vitest';
import type { CandidateReport, DesignReport } from '../../src/design/index';
import { checkMessage, displayUnits } from '../../src/report';
import { chartSpecFromReport } from '../../src/report/chart-from-report';
import {
  formatGrouped,
  formatNumber,
  formatShort,
  formatWithUnit,
} from '../../src/report/format-values';
import { renderChart } from '../../src/report/index';
import {
  type JsonCurves,
  type JsonEnvelope,
  type JsonQuantity,
  renderJson,
  reportToPlain,
} from '../../src/report/json';
import { renderMarkdown } from '../../src/report/markdown';
import { renderText } from '../../src/report/text';
import { isUnit, q, si } from '../../src/units/index';
import { expectHeadflowError, expectRelative } from '../helpers/expect';
import { AGED_CASE, CURVES, DESIGN_CASE, REPORT } from './fixture';

// Conversion factors to SI written out here, independently of the units module (NIST SP 811,
// Appendix B: exact definitions of the foot, the US gallon, the pound and standard gravity).
const FT = 0.3048; // m
const GAL = 3.785411784e-3; // m3
const GPM = GAL / 60; // m3/s
const M3H = 1 / 3600; // m3/s
const HP = 550 * FT * 0.45359237 * 9.80665; // W (550 ft lbf/s)
const PSI = (0.45359237 * 9.80665) / (0.0254 * 0.0254); // Pa
const RPM = (2 * Math.PI) / 60; // rad/s

/** Every rendered output of a report, in both unit systems. */
function allOutputs(report: DesignReport): string[] {
  return (['si', 'us'] as const).flatMap((units) => [
    renderText(report, { units }),
    renderText(report, { units, width: 40 }),
    renderMarkdown(report, { units }),
    renderJson(report, { units }),
  ]);
}

/** The cells of a Markdown table row: splits on `|` that no backslash escapes. */
function markdownCells(line: string): string[] {
  const cells: string[] = [];
  let cell = '';
  for (let i = 0; i < line.length; i++) {
    const c = line[i];
    if (c === '\\') {
      cell += c + (line[i + 1] ?? '');
      i++;
    } else if (c === '|') {
      cells.push(cell);
      cell = '';
    } else cell += c;
  }
  cells.push(cell);
  return cells;
}

/** Each Markdown table as its rows' cell counts. */
function markdownTables(md: string): number[][] {
  const tables: number[][] = [];
  let current: number[] | undefined;
  for (const line of md.split('\n')) {
    if (line.startsWith('|')) {
      if (current === undefined) {
        current = [];
        tables.push(current);
      }
      current.push(markdownCells(line).length);
    } else current = undefined;
  }
  return tables;
}

/** Text with line breaks and runs of spaces folded, to find wrapped sentences. */
const folded = (text: string): string => text.replace(/\s+/g, ' ');
/** Markdown with its backslash escapes removed. */
const unescaped = (md: string): string => md.replace(/\\(.)/g, '$1').replace(/&amp;/g, '&');

/** A report variant with some candidate fields replaced. */
function withCandidate(index: number, change: Partial<CandidateReport>): DesignReport {
  return {
    ...REPORT,
    candidates: REPORT.candidates.map((c, i) => (i === index ? { ...c, ...change } : c)),
  };
}

/** The text table row that starts with a case name, split at runs of two or more spaces. */
function row(text: string, caseName: string, occurrence = 0): string[] {
  const rows = text.split('\n').filter((l) => l.startsWith(caseName));
  const line = rows[occurrence];
  if (line === undefined) return expect.fail(`no row '${caseName}' #${occurrence}`);
  return line
    .slice(caseName.length)
    .trim()
    .split(/\s{2,}/);
}

describe('special values and bad options', () => {
  it('formats numbers to significant digits without exponents, and missing ones as a dash', () => {
    expect(formatNumber(undefined)).toBe('-');
    expect(formatNumber(Number.NaN)).toBe('-');
    expect(formatNumber(Number.NEGATIVE_INFINITY)).toBe('-');
    // Zero keeps the decimals of its column's neighbours.
    expect(formatNumber(0)).toBe('0.000');
    expect(formatNumber(-0)).toBe('0.000');
    expect(formatNumber(-1e-9)).toBe('0.000000'); // below the six decimals kept
    expect(formatNumber(12)).toBe('12.00');
    expect(formatNumber(9.9996)).toBe('10.00'); // rounding carries into a new digit
    expect(formatNumber(123456)).toBe('123456');
    expect(formatNumber(0.00012345)).toBe('0.000123');
    expect(formatNumber(-35.094)).toBe('-35.09');
    expect(formatGrouped(-1234567.4)).toBe('-1,234,567');
    expect(formatGrouped(999)).toBe('999');
    expect(formatShort(Number.NaN)).toBe('-');
    expect(formatShort(1 / 3)).toBe('0.3333');
    expect(formatWithUnit(undefined, 'm')).toBe('-');
    expect(formatWithUnit(si<'flow'>(Number.NaN), 'm3/h')).toBe('-');
  });

  it('missing values print as a dash and never as NaN or undefined', () => {
    for (const out of allOutputs(REPORT)) {
      expect(out).not.toMatch(/NaN|undefined|Infinity/);
    }
  });

  it('non-finite numbers in a report are treated as missing, not printed', () => {
    const broken: DesignReport = {
      ...REPORT,
      dutyFlow: q(1, 'm3/s') * Number.NaN,
      duty: REPORT.duty.map((d) => ({ ...d, head: q(1, 'm') * Number.POSITIVE_INFINITY })),
      candidates: REPORT.candidates.map((c) => ({
        ...c,
        energy: { kWh: Number.NaN, cost: { amount: Number.NaN, currency: 'EUR' } },
        cases: c.cases.map((r) => ({
          ...r,
          efficiency: Number.NaN,
          speed: q(1, 'rpm') * Number.NaN,
        })),
      })),
    } as unknown as DesignReport;
    for (const out of allOutputs(broken)) expect(out).not.toMatch(/NaN|undefined|Infinity/);
    const plain = reportToPlain(broken, 'si');
    expect(plain.report.dutyFlow).toBeNull();
    expect(plain.report.duty[0]?.head).toBeNull();
    expect(plain.report.candidates[0]?.cases[0]?.efficiency).toBeNull();
    expect(plain.report.candidates[0]?.energy).toEqual({
      yearly: null,
      cost: { amount: null, currency: 'EUR' },
    });
    expect(row(renderText(broken, { summary: true }), DESIGN_CASE)[2]).toBe('-'); // total head
  });

  it('refuses widths that are not integers >= 40 and unknown unit systems', () => {
    for (const width of [39, 0, -80, 40.5, Number.NaN, Number.POSITIVE_INFINITY]) {
      const err = expectHeadflowError(() => renderText(REPORT, { width }), 'INVALID_ARGUMENT');
      expect(err.parameter).toBe('options.width');
    }
    const bad = 'metric' as unknown as 'si';
    expectHeadflowError(() => renderText(REPORT, { units: bad }), 'INVALID_ARGUMENT');
    expectHeadflowError(() => renderMarkdown(REPORT, { units: bad }), 'INVALID_ARGUMENT');
    expectHeadflowError(() => renderJson(REPORT, { units: bad }), 'INVALID_ARGUMENT');
    expectHeadflowError(() => chartSpecFromReport(REPORT, { units: bad }), 'INVALID_ARGUMENT');
    expectHeadflowError(() => displayUnits(bad), 'INVALID_ARGUMENT');
    const notAReport = null as unknown as DesignReport;
    expectHeadflowError(() => renderText(notAReport), 'INVALID_ARGUMENT');
  });

  it('the narrowest width, 40, is accepted and every line fits it', () => {
    for (const line of renderText(REPORT, { width: 40 }).split('\n')) {
      expect(line.length, line).toBeLessThanOrEqual(40);
    }
  });
});

describe('display units', () => {
  it('SI uses m3/h (not L/s), US uses gal/min and ft', () => {
    expect(displayUnits('si')).toEqual({
      flow: 'm3/h',
      head: 'm',
      pressure: 'kPa',
      power: 'kW',
      velocity: 'm/s',
      speed: 'rpm',
      length: 'm',
    });
    expect(displayUnits('us')).toEqual({
      flow: 'gal/min',
      head: 'ft',
      pressure: 'psi',
      power: 'hp',
      velocity: 'ft/s',
      speed: 'rpm',
      length: 'ft',
    });
    for (const system of ['si', 'us'] as const) {
      for (const symbol of Object.values(displayUnits(system))) expect(isUnit(symbol)).toBe(true);
    }
  });
});

describe('text report', () => {
  // The short form: the tables these checks read (the full sheet is tested in sheet.test.ts).
  const si = renderText(REPORT, { summary: true });
  const us = renderText(REPORT, { units: 'us', width: 120, summary: true });

  it('prints the duty flow and the duty table in the chosen units', () => {
    // 0.075 m3/s x 3600 = 270.0 m3/h; 0.075 / (3.785411784e-3 / 60) = 1188.8 gal/min.
    expect(si).toContain('Duty flow: 270.0 m3/h');
    expect(us).toContain('Duty flow: 1189 gal/min');
    expectRelative(0.075 / M3H, 270.0, 5e-4);
    expectRelative(0.075 / GPM, 1189, 5e-4);
    // Static, losses, total, NPSHa: 12, 18, 30, 9.5 m; in ft: / 0.3048.
    // Pump outlet: 101.325 + 30 x 9.767 = 394.3 kPa abs, 293.0 kPa gauge (the fixture's figure).
    expect(row(si, DESIGN_CASE)).toEqual(['12.00', '18.00', '30.00', '9.500', '394.3', '293.0']);
    // 394.3 kPa = 57.19 psia, 293.0 kPa = 42.50 psig (psi = 6.894757 kPa, NIST SP 811).
    expect(row(us, DESIGN_CASE)).toEqual(['39.37', '59.06', '98.43', '31.17', '57.19', '42.50']);
    expect(row(us, AGED_CASE).slice(0, 4)).toEqual(['47.57', '77.10', '124.7', '20.34']);
  });

  it('echoes the pressure of each end both ways, absolute and gauge against the atmosphere', () => {
    // The fixture: open suction at 101.325 kPa, discharge 301.325 kPa absolute, atmosphere
    // 101.325 kPa; 101.325 kPa = 14.696 psi (NIST SP 811: psi = 6.894757 kPa).
    const full = renderText(REPORT);
    expect(full).toContain('Atmosphere: 101.3 kPa abs');
    expect(full).toContain('Ends by operating case');
    expect(full).toMatch(/\(kPa abs\)\s+\(kPa gauge\)\s+\S+\s+\(kPa abs\)\s+\(kPa gauge\)/);
    // Ends: suction level, abs, gauge, discharge level, abs, gauge, pipe.
    expect(row(full, DESIGN_CASE, 1)).toEqual([
      '2.000',
      '101.3',
      '0.000',
      '14.00',
      '301.3',
      '200.0',
      'new',
    ]);
    expect(row(full, AGED_CASE, 1)).toEqual([
      '2.000',
      '101.3',
      '0.000',
      '14.00',
      '351.3',
      '250.0',
      'aged',
    ]);
    const fullUs = renderText(REPORT, { units: 'us', width: 120 });
    expect(fullUs).toMatch(/\(psia\)\s+\(psig\)\s+\S+\s+\(psia\)\s+\(psig\)/);
    expect(row(fullUs, DESIGN_CASE, 1).slice(1, 3)).toEqual(['14.70', '0.000']);
    expect(row(fullUs, DESIGN_CASE, 1).slice(4, 6)).toEqual(['43.70', '29.01']);
  });

  it('prints each case of each candidate with the expected numbers (SI)', () => {
    // candidate A, design case: 1480 rpm; 0.0782 m3/s = 281.52 m3/h; 31.57 m; 81.94 %;
    // 29 430 W = 29.43 kW; 97.26 % of BEP; NPSHa 9.456 m, NPSHr 4.068 m, ratio 2.324.
    expect(row(si, DESIGN_CASE, 1)).toEqual([
      '1480',
      '281.5',
      '31.57',
      '81.9',
      '29.43',
      '97.3',
      'preferred',
      '9.456',
      '4.068',
      '2.32',
    ]);
    // candidate B, design case: no NPSH required data -> dashes for NPSHr and the ratio.
    // A set of two: the set's figures, then each pump's (per pump: flow, eff., power, % of BEP).
    expect(row(si, DESIGN_CASE, 2)).toEqual(['1390', '270.0', '30.00', '29.92', '9.500']);
    expect(row(si, DESIGN_CASE, 3)).toEqual([
      '135.0',
      '73.4',
      '14.96',
      '75.8',
      'allowable',
      '-',
      '-',
    ]);
    // candidate B, aged case: no operating point -> a dash in every column and the reason.
    expect(row(si, AGED_CASE, 3)).toEqual(Array(7).fill('-'));
    expect(folded(si)).toContain(`Case "${AGED_CASE}": No operating point:`);
  });

  it('prints each case in US units, converted independently', () => {
    const a = REPORT.candidates[0]?.cases[0];
    if (a?.flow === undefined || a.head === undefined || a.shaftPower === undefined) {
      return expect.fail('fixture');
    }
    const cells = row(us, DESIGN_CASE, 1);
    // 0.0782 m3/s = 1239.5 gal/min; 31.57 m = 103.58 ft; 29 430 W = 39.466 hp;
    // NPSHa 9.456 m = 31.02 ft; NPSHr 4.068 m = 13.35 ft.
    expect(cells).toEqual([
      '1480',
      '1239',
      '103.6',
      '81.9',
      '39.47',
      '97.3',
      'preferred',
      '31.02',
      '13.35',
      '2.32',
    ]);
    // The printed numbers are the independent conversions to four significant digits.
    expectRelative(Number(cells[0]), a.speed === undefined ? 0 : a.speed / RPM, 5e-4);
    expectRelative(Number(cells[1]), a.flow / GPM, 5e-4);
    expectRelative(Number(cells[2]), a.head / FT, 5e-4);
    expectRelative(Number(cells[4]), a.shaftPower / HP, 5e-4);
  });

  it('prints motors with their load, energy and cost, and dashes where there are none', () => {
    // 30 020 W / 37 kW = 81.1 %; 29 430 W / 30 kW = 98.1 %.
    expect(si).toContain(
      'Non-overloading motor per pump: 37 kW, IEC 60072-1 series; load 81.1 % at the largest shaft power',
    );
    expect(si).toContain(
      'Duty-only motor per pump: 30 kW, IEC 60072-1 series; load 98.1 % at the duty',
    );
    // 25 hp = 18.64 kW; 17 800 W / 18 642 W = 95.5 %; 14 960 W / 14 914 W = 100.3 % within SF 1.15.
    expect(folded(si)).toContain('18.6 kW (25 hp), NEMA MG 1 series; load 95.5 %');
    expect(folded(si)).toContain('load 100.3 % at the duty, relying on service factor 1.15');
    // In US units the IEC motor is also given in hp: 37 kW / 745.7 W/hp = 49.62 hp.
    expect(folded(us)).toContain('49.6 hp (37 kW), IEC 60072-1 series');
    expectRelative(37000 / HP, 49.62, 5e-4);
    expect(si).toContain('Yearly energy: 274,260 kWh');
    expect(si).toContain('Yearly energy cost: 32,911 EUR');
    expect(si).toContain('Yearly energy: -');
    const unsized = renderText(withCandidate(1, { motor: undefined, maxShaftPower: undefined }));
    expect(unsized).toContain('Non-overloading motor per pump: - (not sized: no operating point)');
    expect(unsized).toContain('Largest shaft power per pump: -');
  });

  it('ranks the candidates and says which pass', () => {
    expect(si).toMatch(/^ {3}1 {2}candidate A {2}passes +274,260 +32,911 EUR +0 +0$/m);
    expect(si).toMatch(/^ {3}2 {2}candidate B {2}fails +- +- +1 +1$/m);
    expect(si).toContain('Verdict: 1 of 2 candidates passes; recommended: candidate A.');
    expect(si).toContain('Findings: 1 error, 2 warnings, 1 note');
  });

  it('lists every check with its source under its severity, then every caution', () => {
    const text = folded(si);
    const checks = [...REPORT.checks, ...REPORT.candidates.flatMap((c) => c.checks)];
    expect(checks.length).toBe(4);
    for (const c of checks) {
      expect(text).toContain(`[${c.id}]`);
      expect(text).toContain(folded(checkMessage(c, 'si')));
      expect(text).toContain(`(source: ${c.source})`);
    }
    const errors = text.indexOf('Errors (1)');
    const warnings = text.indexOf('Warnings (2)');
    const notes = text.indexOf('Notes (1)');
    expect(errors).toBeGreaterThan(0);
    expect(warnings).toBeGreaterThan(errors);
    expect(notes).toBeGreaterThan(warnings);
    expect(text.indexOf('[no-operating-point]')).toBeLessThan(warnings);
    expect(text.indexOf('[preferred-region]')).toBeGreaterThan(notes);
    const cautions = text.indexOf('Cautions');
    expect(cautions).toBeGreaterThan(notes);
    for (const c of REPORT.cautions) expect(text.indexOf(folded(c))).toBeGreaterThan(cautions);
  });

  it('uses ASCII only, no trailing spaces, and fits every width', () => {
    for (const width of [40, 41, 57, 60, 72, 80, 100, 132, 200]) {
      for (const units of ['si', 'us'] as const) {
        const text = renderText(REPORT, { units, width });
        expect(text.endsWith('\n')).toBe(true);
        for (const line of text.split('\n')) {
          expect(line.length, `${width}: ${line}`).toBeLessThanOrEqual(width);
          expect(line).toMatch(/^[\x20-\x7e]*$/);
          expect(line).toBe(line.trimEnd());
        }
      }
    }
  });

  it('splits a table too wide for the line into parts that repeat the case column', () => {
    const narrow = renderText(REPORT, { width: 60 });
    // Candidate A's design row appears once per part, each with a share of the columns.
    const parts = narrow.split('\n').filter((l) => l.startsWith('design, clean pipe'));
    expect(parts.length).toBeGreaterThan(3);
    expect(narrow).toContain('281.5');
    expect(narrow).toContain('preferred');
  });

  it('keeps names with line breaks on one line and wraps very long names within the width', () => {
    const long = `pump ${'x'.repeat(150)}`;
    const odd = withCandidate(0, { name: 'candidate\nA' });
    expect(renderText(odd)).toContain('Candidate 1: candidate A (passes)');
    const longName = withCandidate(1, { name: long });
    for (const width of [40, 80]) {
      for (const line of renderText(longName, { width }).split('\n')) {
        expect(line.length).toBeLessThanOrEqual(width);
      }
    }
  });

  it('a duty-only report (no candidates, no checks, no cautions) still carries a caution', () => {
    const dutyOnly: DesignReport = {
      ...REPORT,
      candidates: [],
      checks: [],
      cautions: [],
      duty: [],
      passed: true,
    };
    const text = renderText(dutyOnly);
    expect(text).toContain('Findings: 0 errors, 0 warnings, 0 notes');
    expect(text).toContain('No candidate pumps were given');
    expect(text).not.toContain('Ranking');
    expect(text).toContain('No operating case was evaluated.');
    expect(folded(text)).toContain('licensed engineering judgement and local codes');
    expect(text).toContain('Errors (0)\n\nNone.');
    const noCases = renderText(withCandidate(0, { cases: [] }));
    expect(noCases).toContain('No operating case was evaluated.');
  });

  it('a check about the whole system says so', () => {
    const report: DesignReport = {
      ...REPORT,
      checks: [{ ...(REPORT.checks[0] ?? expect.fail('fixture')), case: undefined }],
    };
    expect(folded(renderText(report))).toContain('[suction-velocity] system: Suction velocity');
  });

  it('defaults to the units of the report', () => {
    expect(renderText({ ...REPORT, units: 'us' })).toBe(renderText(REPORT, { units: 'us' }));
  });
});

describe('Markdown report', () => {
  const md = renderMarkdown(REPORT, { summary: true });

  it('has the same sections and numbers as the text report', () => {
    expect(
      md.startsWith('# Pump selection report: Process cooling loop, invented test bay\n'),
    ).toBe(true);
    for (const heading of [
      '## Duty by operating case',
      '## Candidate 1: candidate A (passes)',
      '## Candidate 2: candidate B (fails)',
      '## Ranking',
      '## Checks',
      '### Errors (1)',
      '### Warnings (2)',
      '### Notes (1)',
      '## Cautions',
    ]) {
      expect(md).toContain(`${heading}\n`);
    }
    expect(md).toContain(
      '| design, clean pipe | 1480 | 281.5 | 31.57 | 81.9 | 29.43 | 97.3 | preferred | 9.456 | 4.068 | 2.32 |',
    );
    expect(md).toContain('| low level \\| aged pipe | - | - | - | - | - |');
    expect(md).toContain('| Case | Speed (rpm) | Flow (m³/h) |');
    expect(md).toContain('NPSH ratio |');
    expect(md).toContain('- **Duty flow:** 270.0 m³/h');
  });

  it('lists every check and caution', () => {
    const plain = unescaped(md);
    for (const c of [...REPORT.checks, ...REPORT.candidates.flatMap((k) => k.checks)]) {
      expect(plain).toContain(`[${c.id}]`);
      expect(plain).toContain(checkMessage(c, 'si', 'unicode'));
      expect(plain).toContain(`(source: ${c.source})`);
    }
    for (const c of REPORT.cautions) expect(plain).toContain(`- ${c}`);
  });

  it('writes paragraphs for empty sections', () => {
    const out = renderMarkdown({ ...REPORT, candidates: [], checks: [], duty: [], cautions: [] });
    expect(out).toContain('## Duty by operating case\n\nNo operating case was evaluated.\n');
    expect(out).toContain('### Errors (0)\n\nNone.\n');
    expect(out).toMatch(
      /## Cautions\n\n- Results support, and do not replace, licensed engineering/,
    );
  });

  it('every table row has as many cells as its header, and a rule row', () => {
    const tables = markdownTables(md);
    expect(tables.length).toBe(5); // duty, candidate A, candidate B (set and pump), ranking
    for (const t of tables) {
      expect(new Set(t).size, JSON.stringify(t)).toBe(1);
    }
  });

  it('escapes | and line breaks in names, and Markdown markup in text', () => {
    const odd: DesignReport = {
      ...withCandidate(0, { name: 'A | B\nC' }),
      fluid: { ...REPORT.fluid, name: 'brine *25 %* <mixed> & [cold]' },
    };
    const out = renderMarkdown(odd);
    expect(out).toContain('## Candidate 1: A \\| B C (passes)');
    expect(out).toContain('| 1 | A \\| B<br>C | passes |');
    expect(out).toContain('- **Fluid:** brine \\*25 %\\* \\<mixed\\> &amp; \\[cold\\]');
    for (const t of markdownTables(out)) expect(new Set(t).size).toBe(1);
  });

  it('keeps tables whole for any names (property)', () => {
    fc.assert(
      fc.property(fc.string({ maxLength: 30 }), fc.string({ maxLength: 30 }), (name, caseName) => {
        const report: DesignReport = {
          ...withCandidate(1, { name }),
          duty: REPORT.duty.map((d, i) => (i === 0 ? { ...d, case: caseName } : d)),
        };
        const out = renderMarkdown(report);
        for (const t of markdownTables(out)) expect(new Set(t).size).toBe(1);
        expect(out).not.toMatch(/NaN|undefined/);
      }),
      { numRuns: 200 },
    );
  });
});

describe('text width property', () => {
  it('every line fits for any width >= 40 and any names', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 40, max: 160 }),
        fc.string({ maxLength: 80 }),
        fc.string({ maxLength: 80 }),
        (width, name, message) => {
          const report: DesignReport = {
            ...withCandidate(0, { name }),
            checks: [{ ...(REPORT.checks[0] ?? expect.fail('fixture')), message }],
          };
          for (const line of renderText(report, { width }).split('\n')) {
            expect(line.length).toBeLessThanOrEqual(width);
          }
        },
      ),
      { numRuns: 200 },
    );
  });
});

describe('JSON report', () => {
  const text = renderJson(REPORT);
  const doc = JSON.parse(text) as JsonEnvelope;
  const usDoc = JSON.parse(renderJson(REPORT, { units: 'us' })) as JsonEnvelope;

  /** Back to SI with this file's own factors. */
  const toSI: Record<string, number> = {
    'm3/h': M3H,
    'gal/min': GPM,
    m: 1,
    ft: FT,
    kW: 1000,
    hp: HP,
    kPa: 1000,
    psi: PSI,
    'm/s': 1,
    'ft/s': FT,
    rpm: RPM,
  };
  const back = (x: JsonQuantity | null | undefined): number => {
    if (x === null || x === undefined) return expect.fail('missing quantity');
    const f = toSI[x.unit];
    if (f === undefined) return expect.fail(`unit ${x.unit}`);
    return x.value * f;
  };
  // Six significant digits: a relative rounding error of at most 5e-6 (plus float noise).
  const TOL = 5.1e-6;

  it('is a versioned, pretty, stable envelope', () => {
    expect(Object.keys(doc)).toEqual(['format', 'units', 'report']);
    expect(doc.format).toBe('headflow-report/2');
    expect(doc.units).toEqual({ ...displayUnits('si'), energy: 'kWh' });
    expect(usDoc.units).toEqual({ ...displayUnits('us'), energy: 'kWh' });
    expect(text.startsWith('{\n  "format": "headflow-report/2",\n')).toBe(true);
    expect(text.endsWith('}\n')).toBe(true);
    expect(renderJson(REPORT)).toBe(text);
    expect(renderJson({ ...REPORT })).toBe(text);
    expect(reportToPlain(REPORT)).toEqual(doc);
  });

  it('writes quantities as { value, unit } in the display units', () => {
    // 0.075 m3/s = 270 m3/h; 4.5 / 3.785411784e-3 = 1188.7725 gal/min -> 1188.77 (six digits).
    expect(doc.report.dutyFlow).toEqual({ value: 270, unit: 'm3/h' });
    expect(usDoc.report.dutyFlow).toEqual({ value: 1188.77, unit: 'gal/min' });
    expect(usDoc.report.duty[0]?.head).toEqual({ value: 98.4252, unit: 'ft' }); // 30 / 0.3048
    const motor = usDoc.report.candidates[0]?.motor;
    expect(motor?.nameplate).toEqual({ value: 37, unit: 'kW' });
    expect(motor?.rating).toEqual({ value: 49.6178, unit: 'hp' }); // 37 000 / 745.700
    expect(usDoc.report.candidates[0]?.energy?.yearly).toEqual({ value: 274260, unit: 'kWh' });
    expect(usDoc.report.candidates[0]?.energy?.cost).toEqual({ amount: 32911.2, currency: 'EUR' });
  });

  it('round-trips every quantity back to SI within the rounding', () => {
    for (const d of [doc, usDoc]) {
      const r = d.report;
      expectRelative(back(r.dutyFlow), REPORT.dutyFlow, TOL, 'dutyFlow');
      REPORT.duty.forEach((duty, i) => {
        const j = r.duty[i];
        expectRelative(back(j?.head), duty.head, TOL, 'duty head');
        expectRelative(back(j?.staticHead), duty.staticHead, TOL, 'static head');
        expectRelative(back(j?.lossHead), duty.lossHead, TOL, 'loss head');
        expectRelative(back(j?.npshAvailable), duty.npshAvailable ?? 0, TOL, 'NPSHa');
        duty.runs.forEach((run, k) => {
          const jr = j?.runs[k];
          expectRelative(back(jr?.insideDiameter), run.insideDiameter, TOL, 'diameter');
          expectRelative(back(jr?.velocity), run.velocity, TOL, 'velocity');
          expectRelative(back(jr?.flow), run.flow, TOL, 'run flow');
          expectRelative(back(jr?.pressureDrop), run.pressureDrop, TOL, 'pressure drop');
          expectRelative(back(jr?.totalLoss), run.totalLoss, TOL, 'total loss');
          expectRelative(back(jr?.elevationChange), run.elevationChange ?? 0, TOL, 'rise');
          expectRelative(jr?.reynolds ?? 0, run.reynolds, TOL, 'Re');
        });
      });
      REPORT.candidates.forEach((c, i) => {
        const jc = r.candidates[i];
        expect(jc?.name).toBe(c.name);
        expectRelative(back(jc?.maxShaftPower), c.maxShaftPower ?? 0, TOL, 'max power');
        expectRelative(back(jc?.motor?.rating), c.motor?.rating ?? 0, TOL, 'motor');
        expectRelative(back(jc?.dutyOnlyMotor?.rating), c.dutyOnlyMotor?.rating ?? 0, TOL, 'motor');
        c.cases.forEach((cr, k) => {
          const jk = jc?.cases[k];
          const pairs: [JsonQuantity | null | undefined, number | undefined][] = [
            [jk?.speed, cr.speed],
            [jk?.flow, cr.flow],
            [jk?.head, cr.head],
            [jk?.shaftPower, cr.shaftPower],
            [jk?.npshAvailable, cr.npshAvailable],
            [jk?.npshRequired, cr.npshRequired],
          ];
          for (const [j, si] of pairs) {
            if (si === undefined) expect(j).toBeNull();
            else expectRelative(back(j), si, TOL, `${c.name} ${cr.case}`);
          }
          expect(jk?.failure).toBe(cr.failure ?? null);
          expect(jk?.efficiency).toBe(cr.efficiency ?? null);
          cr.velocities.forEach((v, m) => {
            expectRelative(back(jk?.velocities[m]?.velocity), v.velocity, TOL, 'velocity');
          });
        });
      });
      CURVES.points.forEach((p, i) => {
        expectRelative(back((r.curves as JsonCurves).points[i]?.flow), p.flow, TOL, 'point flow');
        expectRelative(back((r.curves as JsonCurves).points[i]?.head), p.head, TOL, 'point head');
      });
      CURVES.pumps.forEach((c, i) => {
        const jc = (r.curves as JsonCurves).pumps[i];
        const fu = toSI[jc?.flow.unit ?? ''] ?? Number.NaN;
        const hu = toSI[jc?.value.unit ?? ''] ?? Number.NaN;
        c.flows.forEach((f, k) => {
          expectRelative((jc?.flow.values[k] ?? Number.NaN) * fu, f, TOL, 'curve flow');
          expectRelative((jc?.value.values[k] ?? Number.NaN) * hu, c.values[k] ?? 0, TOL, 'head');
        });
      });
      expect((r.curves as JsonCurves).efficiency[0]?.value.unit).toBe('1');
      expectRelative(
        back((r.curves as JsonCurves).preferredRegions[0]?.maxFlow),
        CURVES.preferredRegions[0]?.maxFlow ?? 0,
        TOL,
        'region',
      );
    }
  });

  it('writes null for every missing value, keeps the failure text, checks and cautions', () => {
    const b = doc.report.candidates[1];
    const aged = b?.cases[1];
    expect(aged?.failure).toMatch(/^at its maximum speed of 1480 rpm/);
    for (const key of ['speed', 'flow', 'head', 'efficiency', 'shaftPower'] as const) {
      expect(aged?.[key]).toBeNull();
    }
    expect(b?.cases[0]?.npshRequired).toBeNull();
    expect(b?.energy).toBeNull();
    expect(doc.report.duty[0]?.runs[0]?.group).toBeNull();
    expect(doc.report.checks[0]).toEqual({
      id: 'suction-velocity',
      severity: 'warning',
      candidate: null,
      case: AGED_CASE,
      message: REPORT.checks[0]?.message,
      source: 'common practice',
      siValues: { velocity: 2.6, max: 2.4 },
      words: {},
    });
    expect(b?.checks.map((c) => c.id)).toEqual(['no-operating-point', 'npsh-data']);
    expect(doc.report.cautions).toEqual(REPORT.cautions);
    const bare = reportToPlain(withCandidate(1, { motor: undefined }), 'si');
    expect(bare.report.candidates[1]?.motor).toBeNull();
    const noCost = reportToPlain(
      withCandidate(0, { energy: { kWh: 1, cost: undefined, control: 'throttle', hours: 8760 } }),
      'si',
    );
    expect(noCost.report.candidates[0]?.energy).toEqual({
      control: 'throttle',
      hours: 8760,
      yearly: { value: 1, unit: 'kWh' },
      cost: null,
    });
  });

  it('every { value, unit } holds a finite number and a catalogue unit', () => {
    const seen: string[] = [];
    const walk = (x: unknown): void => {
      if (Array.isArray(x)) x.forEach(walk);
      else if (typeof x === 'object' && x !== null) {
        const o = x as Record<string, unknown>;
        const value = o['value'];
        const unit = o['unit'];
        if (typeof value === 'number' && unit !== undefined) {
          expect(Number.isFinite(value)).toBe(true);
          expect(isUnit(unit) || unit === 'kWh').toBe(true);
          seen.push(String(unit));
        }
        Object.values(o).forEach(walk);
      }
    };
    walk(usDoc);
    // kW only as the IEC nameplate of a motor, in brackets after its rating in hp.
    expect(new Set(seen)).toEqual(
      new Set(['gal/min', 'ft', 'rpm', 'hp', 'kW', 'ft/s', 'psi', 'kWh', 'degF', 'lb/ft3', 'cSt']),
    );
  });
});

describe('chart from a report', () => {
  it('maps the curves, points and regions in order, with the axes in display units', () => {
    const spec = chartSpecFromReport(REPORT, { units: 'us' });
    expect(spec.title).toBe(REPORT.name);
    expect(spec.units).toEqual({ flow: 'gal/min', head: 'ft' });
    expect(chartSpecFromReport(REPORT).units).toEqual({ flow: 'm3/h', head: 'm' });
    expect(spec.pumpCurves.map((s) => s.name)).toEqual(CURVES.pumps.map((c) => c.name));
    expect(spec.systemCurves.map((s) => s.name)).toEqual([DESIGN_CASE, AGED_CASE]);
    expect(spec.efficiencyCurves.length).toBe(2);
    expect(spec.npshRequired.length).toBe(1);
    expect(spec.npshAvailable?.length).toBe(2);
    expect(spec.operatingPoints).toEqual(CURVES.points);
    expect(spec.preferredRegions).toEqual(CURVES.preferredRegions);
    const first = CURVES.systems[0];
    expect(spec.systemCurves[0]?.points[3]).toEqual({
      flow: first?.flows[3],
      value: first?.values[3],
    });
  });

  it('draws as a well-formed SVG with every curve named', () => {
    const svg = renderChart(chartSpecFromReport(REPORT));
    expect(XMLValidator.validate(svg)).toBe(true);
    expect(svg).not.toMatch(/NaN|undefined/);
    for (const c of CURVES.pumps) expect(svg).toContain(c.name);
  });

  it('refuses a sampled curve with fewer values than flows', () => {
    const bad: DesignReport = {
      ...REPORT,
      curves: { ...CURVES, systems: [{ name: 'x', flows: [0, 1], values: [1] }] },
    };
    const err = expectHeadflowError(() => chartSpecFromReport(bad), 'INVALID_ARGUMENT');
    expect(err.parameter).toBe('curves.systems[0].values');
  });
});

describe('the guide (docs/reports.md)', () => {
  it('runs and prints what its comments say', async () => {
    const log = vi.spyOn(console, 'log').mockImplementation(() => undefined);
    await import('../../docs/examples/reports');
    const lines = log.mock.calls.map((c) =>
      c.map((x) => (typeof x === 'string' ? x : JSON.stringify(x))).join(' '),
    );
    log.mockRestore();
    // The first lines come from the cooling-loop example it imports; the guide prints the last six.
    expect(lines.slice(-6)).toEqual([
      'Pump selection report: process cooling loop',
      '# Pump selection report: process cooling loop',
      'headflow-report/2',
      '{"value":105,"unit":"m3/h"}',
      'true',
      'true',
    ]);
  });
  it("the doc comments' examples hold for the cooling-loop report", async () => {
    const log = vi.spyOn(console, 'log').mockImplementation(() => undefined);
    const { report } = await import('../../docs/examples/cooling-loop');
    log.mockRestore();
    // 105 m3/h = 105 / 3600 m3/s = 462.301 gal/min (US gallon 3.785411784e-3 m3).
    expectRelative((105 * M3H) / GPM, 462.301, 5e-6);
    expect(reportToPlain(report, 'si').report.dutyFlow).toEqual({ value: 105, unit: 'm3/h' });
    expect(reportToPlain(report, 'us').report.dutyFlow).toEqual({
      value: 462.301,
      unit: 'gal/min',
    });
    const spec = chartSpecFromReport(report, { units: 'us' });
    expect(spec.units).toEqual({ flow: 'gal/min', head: 'ft' });
    expect(spec.systemCurves.map((s) => s.name)).toEqual(['cold loop', 'hot water, 80 degC']);
    expect(renderText(report, { units: 'us', width: 80 }).split('\n')[0]).toBe(
      'Pump selection report: process cooling loop',
    );
    expect(renderMarkdown(report).split('\n')[0]).toBe(
      '# Pump selection report: process cooling loop',
    );
    for (const out of allOutputs(report)) expect(out).not.toMatch(/NaN|undefined|Infinity/);
    for (const line of renderText(report, { width: 40 }).split('\n')) {
      expect(line.length).toBeLessThanOrEqual(40);
    }
    for (const t of markdownTables(renderMarkdown(report))) expect(new Set(t).size).toBe(1);
  });
});
