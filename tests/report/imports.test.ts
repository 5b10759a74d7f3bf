/**
 * `headflow/report` does not load the scenario-file reader (and with it the schema library):
 * the static imports reachable from src/report/index.ts never reach src/design/scenario-*.ts
 * or valibot. (The load-time ratio is in bench/report.bench.ts.)
 */
import { existsSync, readFileSync } from 'node:fs';
import { dirname, join, relative } from 'node:path';
import { describe, expect, it } from 'vitest';

const SRC = join(__dirname, '../../src');

/** Every source file reachable from `entry` by static imports, and the packages it imports. */
function graph(entry: string): { files: Set<string>; packages: Set<string> } {
  const files = new Set<string>();
  const packages = new Set<string>();
  const walk = (file: string): void => {
    if (files.has(file)) return;
    files.add(file);
    const text = readFileSync(file, 'utf8');
    for (const m of text.matchAll(/^(?:import|export)\s+(?!type\b)[^'"]*?from\s+'([^']+)'/gm)) {
      const spec = m[1] ?? '';
      if (!spec.startsWith('.')) {
        packages.add(spec);
        continue;
      }
      const base = join(dirname(file), spec);
      const candidates = [`${base}.ts`, join(base, 'index.ts')];
      const found = candidates.find((c) => existsSync(c));
      if (found === undefined) throw new Error(`cannot resolve ${spec} from ${file}`);
      walk(found);
    }
  };
  walk(entry);
  return { files, packages };
}

describe('what headflow/report loads', () => {
  const report = graph(join(SRC, 'report/index.ts'));
  it('not the scenario reader, nor valibot', () => {
    const names = [...report.files].map((f) => relative(SRC, f));
    expect(names.filter((n) => n.startsWith('design/scenario'))).toEqual([]);
    expect([...report.packages].filter((p) => p.startsWith('valibot'))).toEqual([]);
    expect(names).toContain('design/evaluate.ts');
  });
  it('while headflow/design does load it (the test can see it)', () => {
    const design = graph(join(SRC, 'design/index.ts'));
    expect([...design.files].some((f) => f.endsWith('scenario-file.ts'))).toBe(true);
    expect(design.packages.has('valibot')).toBe(true);
  });
});
