/**
 * The network guide's examples (docs/examples/network-*.ts): they run, and their results keep
 * the laws they illustrate.
 */
import { describe, expect, it, vi } from 'vitest';
import { STANDARD_ATMOSPHERE } from '../../src/units';
import { expectRelative } from '../helpers/expect';

describe('network examples', () => {
  it('two tanks: the pump delivers what the two tanks receive, at its curve head', async () => {
    const log = vi.spyOn(console, 'log').mockImplementation(() => undefined);
    const mod = await import('../../docs/examples/network-two-tanks');
    const lines = log.mock.calls.map((c) => String(c[0]));
    log.mockRestore();
    const r = mod.result;
    const pump = r.links['pump'];
    const lower = r.links['to lower']?.flow ?? 0;
    const upper = r.links['to upper']?.flow ?? 0;
    expectRelative(pump?.flow ?? 0, lower + upper, 1e-12);
    expect(lower).toBeGreaterThan(upper); // the lower tank is 8 m nearer the pump's head
    expect(r.nodes['lower tank']?.outflow).toBeCloseTo(lower, 15);
    expect(lines[0]).toMatch(/^pump: [\d.]+ m3\/h \(open\)$/);
    expect(lines).toHaveLength(5);
  });

  it('ring main: the reducing valve holds 4.5 bar (gauge) at its outlet in both cases', async () => {
    const log = vi.spyOn(console, 'log').mockImplementation(() => undefined);
    const mod = await import('../../docs/examples/network-ring');
    const lines = log.mock.calls.map((c) => String(c[0]));
    log.mockRestore();
    for (const s of [mod.cases.design, mod.cases.night]) {
      expect(s.links['reducing valve']?.state).toBe('active');
      expectRelative(s.nodes['valve out']?.pressure ?? 0, STANDARD_ATMOSPHERE + 4.5e5, 1e-12);
    }
    expect(mod.cases.night.links['north-east']?.state).toBe('closed');
    expect(lines).toHaveLength(2);
    expect(lines[0]).toMatch(/^design: valve active/);
  });
});
