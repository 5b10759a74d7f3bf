/**
 * The calculation sheet across every example scenario file: one unit system throughout, the
 * verdict, and numbers read back out of the reports and compared with the report object
 * (no snapshots). The scenarios are invented demos (docs/examples/*.json).
 */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { EXIT, runCli } from '../../src/cli/run';
import { evaluateDesign, readDesignFile, readScenario } from '../../src/design/index';
import { renderHtml, renderJson, renderMarkdown, renderText } from '../../src/report/index';
import { si, to } from '../../src/units/index';
import { scenarioExampleFiles } from '../helpers/examples';

const DIR = join(__dirname, '../../docs/examples');
const FILES = scenarioExampleFiles();

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
  'cSt',
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
    const design = readDesignFile(readFileSync(join(DIR, file), 'utf8'));
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
          ...(report.network?.nodes.map((n) => n.id) ?? []),
          ...(report.network?.links.map((l) => l.id) ?? []),
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

/** A printed cell (4 significant digits) against the value: relative error at most 5e-4. */
function expectPrinted(cell: string | undefined, value: number, what: string): void {
  const printed = Number(String(cell).replace(/,/g, ''));
  const tolerance = Math.max(5e-4 * Math.abs(value), 5e-7);
  expect(Math.abs(printed - value), `${what}: printed ${cell}, value ${value}`).toBeLessThanOrEqual(
    tolerance,
  );
}

/** The cells of the rows starting with `name` (cells split at two spaces or more). */
function rowsOf(text: string, name: string): string[][] {
  return text
    .split('\n')
    .filter((l) => l.startsWith(`${name} `))
    .map((l) =>
      l
        .slice(name.length)
        .trim()
        .split(/\s{2,}/),
    );
}

describe('numbers read back from the sheet match the report object', () => {
  const file = join(DIR, 'canal-lift.json');
  const report = evaluateDesign(readScenario(readFileSync(file, 'utf8')));
  const siText = renderText(report, { width: 160 });
  const usText = renderText(report, { units: 'us', width: 160 });

  it('the duty table: heads, NPSH available and the pump outlet pressure, abs and gauge', () => {
    for (const d of report.duty) {
      // The liquid, the ends, then the duty: the duty row is the third starting with the case.
      const cells = rowsOf(siText, d.case)[2];
      expectPrinted(cells?.[0], d.staticHead, 'static head');
      expectPrinted(cells?.[1], d.lossHead, 'losses');
      expectPrinted(cells?.[2], d.head, 'total head');
      expectPrinted(cells?.[3], d.npshAvailable ?? Number.NaN, 'NPSHa');
      expectPrinted(cells?.[4], (d.pumpDischargePressure ?? 0) / 1000, 'outlet kPa abs');
      expectPrinted(
        cells?.[5],
        ((d.pumpDischargePressure ?? 0) - report.atmosphere) / 1000,
        'outlet kPa gauge',
      );
      const usCells = rowsOf(usText, d.case)[2];
      expectPrinted(usCells?.[2], to(d.head, 'ft'), 'total head, ft');
      expectPrinted(usCells?.[4], to(d.pumpDischargePressure ?? si<'pressure'>(0), 'psi'), 'psia');
    }
  });

  it('the run losses and the NPSH terms of every case', () => {
    for (const d of report.duty) {
      for (const r of d.runs) {
        // Every run row of the loss tables; the one of this case is at the case's position.
        const k = report.duty.indexOf(d);
        const cells = rowsOf(siText, r.name).filter((c) => c.length === 9)[k];
        expectPrinted(cells?.[1], to(r.velocity, 'm/s'), `${r.name} velocity`);
        expectPrinted(cells?.[2], Math.round(r.reynolds), `${r.name} Re`);
        expect(cells?.[3]).toBe(r.regime);
        expect(r.frictionFactor).toBeDefined();
        expect(Math.abs(Number(cells?.[4]) - (r.frictionFactor ?? 0))).toBeLessThanOrEqual(5e-5);
        expectPrinted(cells?.[5], r.pipeLoss, `${r.name} pipe loss`);
        expectPrinted(cells?.[6], r.fittingsLoss, `${r.name} fittings loss`);
        expectPrinted(cells?.[8], r.totalLoss, `${r.name} total loss`);
      }
      const t = d.npshTerms;
      const cells = rowsOf(siText, d.case)[3];
      expectPrinted(cells?.[0], t?.surfacePressureHead ?? Number.NaN, 'surface pressure head');
      expectPrinted(cells?.[1], t?.vaporPressureHead ?? Number.NaN, 'vapour pressure head');
      expectPrinted(cells?.[2], t?.staticHeight ?? Number.NaN, 'static height');
      expectPrinted(cells?.[3], t?.suctionLoss ?? Number.NaN, 'suction loss');
      expectPrinted(cells?.[5], t?.total ?? Number.NaN, 'NPSHa');
      // The terms add up to the NPSH available the checks use.
      const sum =
        (t?.surfacePressureHead ?? 0) -
        (t?.vaporPressureHead ?? 0) +
        (t?.staticHeight ?? 0) -
        (t?.suctionLoss ?? 0) +
        (t?.velocityHead ?? 0);
      expect(Math.abs(sum - (d.npshAvailable ?? 0))).toBeLessThan(1e-9);
    }
  });

  it('the operating points of every candidate, in US units', () => {
    for (const c of report.candidates) {
      for (const r of c.cases) {
        const match = rowsOf(usText, r.case).find(
          (cells) =>
            Number(cells[0]) === Math.round(to(r.speed ?? si<'rotationalSpeed'>(0), 'rpm')),
        );
        expect(match, `${c.name} / ${r.case}`).toBeDefined();
        expectPrinted(match?.[1], to(r.flow ?? si<'flow'>(0), 'gal/min'), 'flow');
        expectPrinted(match?.[2], to(r.head ?? si<'length'>(0), 'ft'), 'head');
        expectPrinted(match?.[4], to(r.shaftPower ?? si<'power'>(0), 'hp'), 'shaft power');
      }
    }
  });

  it('the JSON carries the same numbers in its units', () => {
    const doc = JSON.parse(renderJson(report, { units: 'us' }));
    const d0 = report.duty[0];
    expect(doc.report.duty[0].pumpDischargePressure.absolute.unit).toBe('psi');
    expectPrinted(
      String(doc.report.duty[0].pumpDischargePressure.absolute.value),
      to(d0?.pumpDischargePressure ?? si<'pressure'>(0), 'psi'),
      'JSON psia',
    );
    expect(doc.report.verdict).toEqual({
      candidates: 2,
      passing: 1,
      recommended: 'pump B with drive',
      passed: true,
    });
    expect(doc.report.fluid.temperature.unit).toBe('degF');
    // 15 degC = 59 degF.
    expect(doc.report.fluid.temperature.value).toBeCloseTo(59, 9);
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
  it('the operating-point table of one pump fits 100 columns: NPSH ratio beside the speed', () => {
    const report = evaluateDesign(readScenario(readFileSync(join(DIR, 'canal-lift.json'), 'utf8')));
    const text = renderText(report);
    const header = text.split('\n').filter((l) => l.startsWith('Case') && l.includes('(rpm)'));
    expect(header.length).toBe(2);
    for (const h of header) expect(h).toContain('ratio');
    for (const l of text.split('\n')) expect(l.length).toBeLessThanOrEqual(100);
  });
  it('--summary gives the short form', async () => {
    const c = io({ 'a.json': JSON.stringify(base) });
    expect(await runCli(['a.json', '--summary'], c.io)).toBe(EXIT.passed);
    expect(c.out()).not.toContain('Run losses at the duty flow');
    expect(c.out()).toContain('Verdict:');
  });
});
