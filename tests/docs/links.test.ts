/**
 * Links between the guides lead somewhere: every relative Markdown link in README.md and
 * docs/*.md names a file that exists (and a heading that exists, when it has an anchor), and
 * every guide a page refers to by words is a link.
 */
import { existsSync, readdirSync, readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { describe, expect, it } from 'vitest';

const root = new URL('../../', import.meta.url).pathname;
const pages = [
  'README.md',
  ...readdirSync(join(root, 'docs'))
    .filter((f) => f.endsWith('.md'))
    .map((f) => `docs/${f}`),
];
const read = (page: string) => readFileSync(join(root, page), 'utf8');

/** GitHub's anchor of a heading: lower case, punctuation dropped, spaces to hyphens. */
function anchor(heading: string): string {
  return heading
    .trim()
    .toLowerCase()
    .replace(/[^a-z0-9 _-]/g, '')
    .replace(/ /g, '-');
}

describe('links between the guides', () => {
  it('every relative link names a file (and a heading) that exists', () => {
    const dead: string[] = [];
    for (const page of pages) {
      const text = read(page);
      for (const m of text.matchAll(/\]\(([^)\s]+)\)/g)) {
        const target = m[1] ?? '';
        if (/^[a-z]+:/.test(target) || target.startsWith('#')) continue;
        const [file = '', hash] = target.split('#');
        const path = join(dirname(join(root, page)), file);
        if (!existsSync(path)) {
          dead.push(`${page}: ${target}`);
          continue;
        }
        if (hash !== undefined && file.endsWith('.md')) {
          const headings = [...readFileSync(path, 'utf8').matchAll(/^#+ (.*)$/gm)].map((h) =>
            anchor(h[1] ?? ''),
          );
          if (!headings.includes(hash)) dead.push(`${page}: ${target} (no such heading)`);
        }
      }
    }
    expect(dead).toEqual([]);
  });

  it("the scenario guide's limits point to the guide that gives their defaults", () => {
    const guide = read('docs/scenario-format.md');
    const limits = guide.slice(guide.indexOf('### `limits`'));
    expect(limits).toContain('](design.md#checks-and-their-limits)');
    expect(limits).not.toContain("design module's guide");
    const design = read('docs/design.md');
    for (const field of [
      'npshMarginRatio',
      'npshMinimumMargin',
      'designPressure',
      'suctionVelocity',
      'dischargeVelocity',
      'nearBoilingRatio',
      'dutyFlowTolerance',
    ]) {
      expect(design, field).toContain(`\`${field}\``);
      expect(limits, field).toContain(`\`${field}\``);
    }
  });
});
