import { describe, expect, it } from 'vitest';
import { renderSelection, SELECTION_FORMAT } from '../../src/report/index';
import { selectPumps } from '../../src/select/index';
import { q } from '../../src/units/index';
import { expectHeadflowError } from '../helpers/expect';
import { catalogueOf, parabolicDesign, parabolicPump } from '../select/fixtures';

const selection = selectPumps(
  parabolicDesign(10, 0.002, 80, [4]),
  catalogueOf(
    parabolicPump('P', 40, 0.001, 110, {
      price: 3000,
      drive: { minSpeed: q(600, 'rpm'), maxSpeed: q(1750, 'rpm'), efficiency: 0.97 },
    }),
    parabolicPump('small', 20, 0.001, 60),
  ),
  { costs: { years: 10, discountRate: 0.07 } },
);

describe('renderSelection', () => {
  it('refuses what is not a selection, and bad options', () => {
    expectHeadflowError(() => renderSelection(null as never), 'INVALID_ARGUMENT');
    expectHeadflowError(
      () => renderSelection({ ...selection, ranked: [null] } as never),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(
      () => renderSelection(selection, { format: 'pdf' } as never),
      'INVALID_ARGUMENT',
    );
    expectHeadflowError(() => renderSelection(selection, { limit: -1 }), 'INVALID_ARGUMENT');
  });

  it('writes text in US units with every way, the failing ones explained', () => {
    const text = renderSelection(selection, { units: 'us' });
    expect(text).toContain('Duty: 352.2 gal/min');
    expect(text).toContain('present value over 10 years at 7 % discount');
    expect(text).toMatch(/P, trimmed to [\d.]+ mm +yes +[\d.]+ in \([\d.]+ %\)/);
    expect(text).toContain('Note: No energy price was given');
    expect(text).toContain('small, full impeller');
    expect(text).toContain('Why the failing ways fail (first error):');
    expect(text).toContain('licensed');
  });

  it('limits the rows, and writes Markdown and JSON', () => {
    const md = renderSelection(selection, { format: 'markdown', limit: 1 });
    expect(
      md.split('\n').filter((l) => l.startsWith('| 1 |') || l.startsWith('| 2 |')),
    ).toHaveLength(1);
    const doc = JSON.parse(renderSelection(selection, { format: 'json' }));
    expect(doc.format).toBe(SELECTION_FORMAT);
    expect(doc.ranked).toHaveLength(selection.ranked.length);
    expect(doc.ranked[0].cases[0].flow.unit).toBe('m3/h');
    expect(doc.rankedBy).toBe('life-cycle cost');
  });
});
