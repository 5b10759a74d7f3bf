/**
 * The HTML page without a browser: its shape, escaping, options and the chart's presence;
 * and checkMessage's and evaluateDesign's option checks. (The printed page is tested in
 * html-browser.test.ts.)
 */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { XMLValidator } from 'fast-xml-parser';
import { describe, expect, it } from 'vitest';
import { checkMessage, evaluateDesign, readScenario } from '../../src/design/index';
import { renderHtml } from '../../src/report/index';
import { expectHeadflowError } from '../helpers/expect';
import { CURVES, REPORT } from './fixture';

const design = readScenario(
  readFileSync(join(__dirname, '../../docs/examples/canal-lift.json'), 'utf8'),
);

describe('renderHtml', () => {
  const html = renderHtml(REPORT);
  it('is one self-contained page: doctype, inline style, inline SVG, no scripts or links', () => {
    expect(html.startsWith('<!doctype html>\n<html lang="en">')).toBe(true);
    expect(html).toContain('<style>');
    expect(html).toContain('<svg xmlns="http://www.w3.org/2000/svg"');
    expect(html).not.toMatch(/<script|<link|src="http|href="http|@import|url\(/);
    expect(html).toContain('@media print');
    expect(html).toContain('section.candidate { break-before: page; }');
  });
  it('puts each candidate in its own section, in rank order, and the verdict first', () => {
    const names = [...html.matchAll(/<section class="candidate" data-name="([^"]*)">/g)].map(
      (m) => m[1],
    );
    expect(names).toEqual([
      'Candidate 1: candidate A (passes)',
      'Candidate 2: candidate B (fails)',
    ]);
    expect(html).toMatch(
      /<p class="verdict[^"]*">1 of 2 candidates passes; recommended: candidate A\.<\/p>/,
    );
    expect(html.indexOf('class="verdict')).toBeLessThan(html.indexOf('<section class="candidate"'));
  });
  it('escapes names and writes Unicode symbols', () => {
    const odd = { ...REPORT, name: '<b>A & "B"</b>' };
    const out = renderHtml(odd);
    expect(out).toContain('&lt;b&gt;A &amp; &quot;B&quot;&lt;/b&gt;');
    expect(out).not.toContain('<b>A');
    expect(out).toContain('m³/h');
    // The body, with the SVG taken out, is well-formed XML apart from the void elements.
    const body = /<main>([\s\S]*)<\/main>/.exec(out)?.[1] ?? '';
    expect(XMLValidator.validate(`<main>${body.replace(/<br>/g, '<br/>')}</main>`)).toBe(true);
  });
  it('replaces what HTML cannot carry and keeps surrogate pairs', () => {
    const out = renderHtml(
      { ...REPORT, name: 'a\u0001b\ud800c\udc00d \u{1F600}' },
      { chart: false },
    );
    expect(out).toContain('Pump selection report: a\ufffdb\ufffdc\ufffdd \u{1F600}');
  });
  it('draws the chart only when the report has its curves, or refuses when asked for it', () => {
    const bare = { ...REPORT, curves: undefined };
    expect(renderHtml(bare)).not.toContain('<svg');
    expect(renderHtml(REPORT, { chart: false })).not.toContain('<svg');
    expectHeadflowError(() => renderHtml(bare, { chart: true }), 'INVALID_ARGUMENT');
    expect(renderHtml({ ...REPORT, curves: CURVES }, null)).toContain('<svg');
  });
  it('the summary leaves the inputs out', () => {
    expect(renderHtml(REPORT, { summary: true })).not.toContain('<h2>Inputs</h2>');
    expect(renderHtml(REPORT)).toContain('<h2>Inputs</h2>');
  });
  it('refuses bad options', () => {
    expectHeadflowError(() => renderHtml(REPORT, { units: 'metric' as never }), 'INVALID_ARGUMENT');
    expectHeadflowError(() => renderHtml(REPORT, { summary: 1 as never }), 'INVALID_ARGUMENT');
    expectHeadflowError(() => renderHtml(REPORT, 'x' as never), 'INVALID_ARGUMENT');
    expectHeadflowError(() => renderHtml(null as never), 'INVALID_ARGUMENT');
  });
});

describe('checkMessage', () => {
  const report = evaluateDesign(design);
  const checks = [...report.checks, ...report.candidates.flatMap((c) => c.checks)];
  it('rebuilds every stored message in the report units, and says it in the other', () => {
    for (const c of checks) {
      expect(checkMessage(c, 'si')).toBe(c.message);
      // An IEC nameplate stays in brackets after the rating in hp: "40.2 hp (30 kW)".
      const us = checkMessage(c, 'us').replace(/\(\d+(\.\d+)? kW\)/g, '');
      expect(us).not.toMatch(/\d (m|m3\/h|kW|kPa)\b/);
    }
  });
  it('keeps the message of a check it does not know', () => {
    const own = { ...checks[0], id: 'my-check', message: 'as written' } as (typeof checks)[0];
    expect(checkMessage(own, 'us')).toBe('as written');
  });
  it('refuses what is not a check, and bad units or style', () => {
    const c = checks[0] as (typeof checks)[0];
    expectHeadflowError(() => checkMessage(null as never, 'si'), 'INVALID_ARGUMENT');
    expectHeadflowError(() => checkMessage({} as never, 'si'), 'INVALID_ARGUMENT');
    expectHeadflowError(() => checkMessage(c, 'metric' as never), 'INVALID_ARGUMENT');
    expectHeadflowError(() => checkMessage(c, 'si', 'html' as never), 'INVALID_ARGUMENT');
    expectHeadflowError(() => checkMessage({ ...c, values: 3 } as never, 'si'), 'INVALID_ARGUMENT');
  });
  it('says every reason for a missing operating point in both systems', () => {
    const base = checks.find((k) => k.id === 'duty-flow') as (typeof checks)[0];
    const reasons = ['cannot-reach', 'run-out', 'beyond-curve', 'too-little-head', 'below-curve'];
    for (const reason of reasons) {
      const k = {
        ...base,
        id: 'no-operating-point',
        values: { dutyFlow: 0.04, maxFlow: 0.03, pumpHead: 30, systemHead: 40, maxSpeed: 190 },
        words: { reason },
      };
      expect(checkMessage(k, 'us')).toMatch(/^No operating point: /);
      expect(checkMessage(k, 'us')).not.toMatch(/\d m\b|m3/);
    }
  });
});

describe('evaluateDesign options', () => {
  it('samples the curves only when asked', () => {
    expect(evaluateDesign(design).curves).toBeUndefined();
    expect(evaluateDesign(design, null).curves).toBeUndefined();
    expect(evaluateDesign(design, { curves: true }).curves?.dutyPoints).toHaveLength(3);
  });
  it('refuses bad options and units', () => {
    expectHeadflowError(
      () => evaluateDesign(design, { curves: 'yes' as never }),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(() => evaluateDesign(design, 5 as never), 'INVALID_ARGUMENT');
    expectHeadflowError(
      () => evaluateDesign({ ...design, units: 'metric' as never }),
      'INVALID_ARGUMENT',
    );
  });
});
