/**
 * The HTML report in a real browser: headless Chromium (the Debian package, driven by
 * playwright-core) loads the page, prints it to PDF on A4 and on Letter, and the test checks
 * the page count and that no element overflows the printed page; a screenshot of the demo
 * page checks a few pixel facts (its size, that it is not blank, the candidates' colours).
 *
 * Without Chromium at CHROMIUM_PATH (default /usr/bin/chromium) the test is skipped with a
 * message, except under CI (`CI` set), where a missing browser fails it.
 */
import { existsSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { type Browser, chromium, type Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { evaluateDesign, readScenario } from '../../src/design/index';
import { renderHtml } from '../../src/report/index';

const CHROMIUM = process.env['CHROMIUM_PATH'] ?? '/usr/bin/chromium';
const HAVE = existsSync(CHROMIUM);
const CI = Boolean(process.env['CI']);

/** 1 mm in CSS px (96 px to the inch, 25.4 mm to the inch). */
const MM = 96 / 25.4;
/** The page margins of the print style sheet: 14 mm top and bottom, 12 mm left and right. */
const PAPER = {
  A4: { width: 210, height: 297 },
  Letter: { width: 215.9, height: 279.4 },
} as const;

const DEMO = join(__dirname, '../../docs/examples/canal-lift.json');

function demoPage(units: 'si' | 'us'): string {
  const design = readScenario(readFileSync(DEMO, 'utf8'));
  return renderHtml(evaluateDesign(design, { curves: true }), { units });
}

/** Pages of a PDF: its page objects (`/Type /Page`, not `/Pages`). */
function pageCount(pdf: Buffer): number {
  return (pdf.toString('latin1').match(/\/Type\s*\/Page(?![a-z])/g) ?? []).length;
}

/** What overflows a printed page of this width and height (CSS px), in words. */
function overflowOf(page: Page, pageWidth: number, pageHeight: number): Promise<string[]> {
  // Runs in the page (plain JavaScript: the project's TypeScript has no DOM types).
  return page.evaluate(`(() => {
    const pageWidth = ${pageWidth};
    const pageHeight = ${pageHeight};
    const bad = [];
    for (const el of Array.from(document.body.querySelectorAll('*'))) {
      const r = el.getBoundingClientRect();
      if (r.width === 0 && r.height === 0) continue;
      const name = el.tagName.toLowerCase() + '.' + (el.getAttribute('class') ?? '');
      if (r.left < -0.5 || r.right > pageWidth + 0.5) {
        bad.push(name + ' runs off the page: ' + r.left.toFixed(1) + '..' + r.right.toFixed(1) + ' of ' + pageWidth);
      }
      const whole = getComputedStyle(el).breakInside === 'avoid' || el.tagName === 'TR' || el.tagName === 'svg';
      if (whole && r.height > pageHeight) {
        bad.push(name + ' is taller than a page: ' + r.height.toFixed(0) + ' > ' + pageHeight);
      }
    }
    if (document.documentElement.scrollWidth > pageWidth + 0.5) {
      bad.push('the page scrolls sideways: ' + document.documentElement.scrollWidth + ' > ' + pageWidth);
    }
    return bad;
  })()`);
}

/** Pixel facts of a PNG, counted in the page: share of inked pixels, pixels near two colours. */
function pixelFacts(
  page: Page,
  png: Buffer,
): Promise<{ ink: number; blue: number; vermilion: number }> {
  return page.evaluate(`(async () => {
    const img = new Image();
    img.src = 'data:image/png;base64,${png.toString('base64')}';
    await img.decode();
    const canvas = document.createElement('canvas');
    canvas.width = img.width;
    canvas.height = img.height;
    const ctx = canvas.getContext('2d');
    ctx.drawImage(img, 0, 0);
    const data = ctx.getImageData(0, 0, img.width, img.height).data;
    let ink = 0, blue = 0, vermilion = 0;
    const near = (i, r, g, b) =>
      Math.abs(data[i] - r) < 24 && Math.abs(data[i + 1] - g) < 24 && Math.abs(data[i + 2] - b) < 24;
    for (let i = 0; i < data.length; i += 4) {
      if (data[i] < 200 || data[i + 1] < 200 || data[i + 2] < 200) ink++;
      if (near(i, 0x00, 0x72, 0xb2)) blue++;
      if (near(i, 0xd5, 0x5e, 0x00)) vermilion++;
    }
    return { ink: ink / (data.length / 4), blue, vermilion };
  })()`);
}

if (!HAVE && CI) {
  describe('HTML report in Chromium', () => {
    it('needs Chromium under CI', () => {
      expect.fail(
        `no Chromium at ${CHROMIUM}: .ci/run installs it (apt-get install -y chromium), or set CHROMIUM_PATH`,
      );
    });
  });
} else if (!HAVE) {
  console.warn(
    `HTML report in Chromium: skipped, no Chromium at ${CHROMIUM} (apt-get install -y chromium, or set CHROMIUM_PATH); under CI this fails.`,
  );
  describe('HTML report in Chromium', () => {
    it.skip(`skipped: no Chromium at ${CHROMIUM} (apt-get install -y chromium, or set CHROMIUM_PATH)`, () => {});
  });
} else {
  describe('HTML report in Chromium', () => {
    let browser: Browser;
    const dir = mkdtempSync(join(tmpdir(), 'headflow-html-'));

    beforeAll(async () => {
      browser = await chromium.launch({
        executablePath: CHROMIUM,
        args: ['--no-sandbox', '--disable-gpu', '--font-render-hinting=none'],
      });
    }, 20_000);
    afterAll(async () => {
      await browser?.close();
    });

    for (const units of ['si', 'us'] as const) {
      it(`prints the ${units} page to A4 and Letter: page breaks between candidates, nothing overflows`, async () => {
        const file = join(dir, `demo-${units}.html`);
        writeFileSync(file, demoPage(units));
        const page = await browser.newPage();
        const external: string[] = [];
        await page.route('**/*', (route) => {
          const url = route.request().url();
          if (url.startsWith('file:')) return route.continue();
          external.push(url);
          return route.abort();
        });
        await page.goto(pathToFileURL(file).href);
        await page.emulateMedia({ media: 'print' });
        const candidates = await page.locator('section.candidate').count();
        expect(candidates).toBe(2);
        for (const [format, size] of Object.entries(PAPER)) {
          // The printable box: the paper less the print style sheet's margins.
          const width = Math.floor((size.width - 24) * MM);
          const height = Math.floor((size.height - 28) * MM);
          await page.setViewportSize({ width, height });
          const overflow = await overflowOf(page, width, height);
          expect(overflow, `${units} on ${format}`).toEqual([]);
          const pdf = await page.pdf({ format: format as 'A4' | 'Letter', printBackground: true });
          const pages = pageCount(pdf);
          // Each candidate starts a page, and so does the part after them: at least 4 pages;
          // the whole sheet of the demo fits well within 14.
          expect(pages, `${units} on ${format}`).toBeGreaterThanOrEqual(candidates + 2);
          expect(pages, `${units} on ${format}`).toBeLessThanOrEqual(14);
        }
        expect(external).toEqual([]);
        await page.close();
      }, 30_000);
    }

    it('the overflow check finds a table wider than the page and a block taller than it', async () => {
      const page = await browser.newPage({ viewport: { width: 700, height: 1000 } });
      await page.setContent(
        '<body style="margin:0"><table><tr><td><div style="width:900px">wide</div></td></tr></table>' +
          '<figure style="break-inside:avoid;height:1200px;margin:0">tall</figure></body>',
      );
      const found = await overflowOf(page, 700, 1000);
      expect(found.some((f) => f.startsWith('td. runs off the page'))).toBe(true);
      expect(found.some((f) => f.startsWith('the page scrolls sideways'))).toBe(true);
      expect(found.some((f) => f.startsWith('figure. is taller than a page'))).toBe(true);
      await page.close();
    });

    it('a screenshot of the demo page: its size, not blank, the candidates in their colours', async () => {
      const page = await browser.newPage({ viewport: { width: 1000, height: 900 } });
      await page.setContent(demoPage('si'));
      const png = await page.screenshot({ fullPage: false });
      // PNG header: the width and height are the big-endian words at bytes 16 and 20.
      expect(png.readUInt32BE(16)).toBe(1000);
      expect(png.readUInt32BE(20)).toBe(900);
      const facts = await pixelFacts(page, png);
      // Text, rules and curves cover a few per cent of the page; a blank page has none.
      expect(facts.ink).toBeGreaterThan(0.02);
      expect(facts.ink).toBeLessThan(0.6);
      // The chart is on the first screen: both candidates' colours are drawn (Okabe-Ito).
      expect(facts.blue).toBeGreaterThan(100);
      expect(facts.vermilion).toBeGreaterThan(100);
      await page.close();
    }, 20_000);
  });
}
