/**
 * The economic pipe size: the combination of run sizes and pump that costs least over the
 * life, with the life-cycle cost of every combination tried.
 *
 * @module
 */
import type { DesignInput } from '../design/index';
import { HeadflowError } from '../errors';
import {
  guardArray,
  guardField,
  guardInteger,
  guardRange,
  guardRecord,
  guardString,
} from '../guards';
import type { PipeDimensions } from '../pipes/index';
import type { LineElement, PipeRunInput } from '../system/index';
import { checkCatalogue } from './catalogue';
import { checkDesign, resolveSelectOptions, selectChecked } from './select-pumps';
import type {
  PipeSizeOptions,
  PipeSizeResult,
  PipeSizeRow,
  PumpCatalogue,
  SelectionEntry,
} from './types';

/** Default most combinations enumerated exhaustively. */
export const DEFAULT_MAX_COMBINATIONS = 64;

/** Rounds of coordinate descent at most. */
const MAX_ROUNDS = 10;

interface RunChoice {
  readonly name: string;
  readonly index: number;
  readonly run: PipeRunInput;
  readonly sizes: readonly { readonly pipe: PipeDimensions; readonly costPerLength: number }[];
}

function isRun(el: LineElement): el is PipeRunInput {
  return !('kind' in el && (el as { kind?: unknown }).kind === 'parallel');
}

function choicesOf(design: DesignInput, options: PipeSizeOptions): RunChoice[] {
  const runs = guardArray(
    'options.runs',
    guardField('options', guardRecord('options', options), 'runs'),
    {
      min: 1,
      max: 20,
    },
  );
  const line = design.system.runs;
  const seen = new Set<string>();
  return runs.map((raw, i) => {
    const where = `options.runs[${i}]`;
    const r = guardRecord(where, raw);
    const name = guardString(`${where}.run`, guardField(where, r, 'run'));
    const index = line.findIndex((el) => isRun(el) && el.name === name);
    if (index < 0 || seen.has(name)) {
      throw new HeadflowError(
        seen.has(name) ? 'INVALID_ARGUMENT' : 'UNKNOWN_NAME',
        `${where}.run = ${JSON.stringify(name)} is not allowed (allowed: the name of a run of the design's line, not in a parallel group, once).`,
        { parameter: `${where}.run`, value: name, allowed: "a run of the design's line, once" },
      );
    }
    seen.add(name);
    const sizes = guardArray(`${where}.sizes`, guardField(where, r, 'sizes'), {
      min: 1,
      max: 50,
    }).map((s, j) => {
      const at = `${where}.sizes[${j}]`;
      const o = guardRecord(at, s);
      const pipe = guardRecord(`${at}.pipe`, guardField(at, o, 'pipe'));
      guardRange(`${at}.pipe.insideDiameter`, pipe['insideDiameter'], {
        min: 0,
        minOpen: true,
        unit: 'm',
      });
      const costPerLength = guardRange(`${at}.costPerLength`, guardField(at, o, 'costPerLength'), {
        min: 0,
      });
      return { pipe: pipe as unknown as PipeDimensions, costPerLength };
    });
    return { name, index, run: line[index] as PipeRunInput, sizes };
  });
}

/**
 * Chooses the size of each listed run and the pump together, for the least life-cycle cost:
 * for each combination of sizes, the pipe's installed cost (cost per metre x run length, at
 * year 0) plus the least life-cycle cost of a passing way among the catalogue's pumps
 * ({@link selectPumps} with the same options) on the system with those sizes.
 *
 * Search: exhaustive when the number of combinations is at most `options.maxCombinations`
 * (default 64); otherwise coordinate descent from the first size listed for every run: run
 * after run, every size of that run is tried with the others held, and the best kept; rounds
 * repeat until one changes nothing (at most 10). Coordinate descent finds a combination no
 * single change of size improves, which need not be the cheapest of all.
 *
 * @throws HeadflowError `INVALID_ARGUMENT` for bad options (a run that is not in the line,
 *   sizes without an inside diameter, a negative cost), and what {@link selectPumps} throws.
 * @example
 * ```ts
 * const r = economicPipeSize(design, catalogue, { costs: { years: 20, discountRate: 0.05 },
 *   runs: [{ run: 'rising main', sizes: [{ pipe: pipeSize('5', '40'), costPerLength: 90 },
 *     { pipe: pipeSize('6', '40'), costPerLength: 120 }] }] });
 * r.best?.sizes[0]?.nps; // the economic size of the rising main
 * ```
 */
export function economicPipeSize(
  design: DesignInput,
  catalogue: PumpCatalogue,
  options: PipeSizeOptions,
): PipeSizeResult {
  checkDesign(design);
  const pumps = checkCatalogue(catalogue);
  const choices = choicesOf(design, options);
  const settings = resolveSelectOptions(design, options);
  const maxCombinations =
    options.maxCombinations === undefined
      ? DEFAULT_MAX_COMBINATIONS
      : guardInteger('options.maxCombinations', options.maxCombinations, 1, 100_000);
  const table: PipeSizeRow[] = [];
  const cache = new Map<string, PipeSizeRow>();
  const evaluate = (pick: readonly number[]): PipeSizeRow => {
    const key = pick.join(',');
    const known = cache.get(key);
    if (known !== undefined) return known;
    const runs = [...design.system.runs];
    let pipeCost = 0;
    const sizes = choices.map((c, k) => {
      const size = c.sizes[pick[k] ?? 0] as RunChoice['sizes'][number];
      const { insideDiameter: _drop, ...rest } = c.run;
      runs[c.index] = { ...rest, pipe: size.pipe };
      pipeCost += size.costPerLength * c.run.length;
      return { run: c.name, nps: size.pipe.nps, schedule: size.pipe.schedule };
    });
    const sized: DesignInput = { ...design, system: { ...design.system, runs } };
    const selection = selectChecked(sized, catalogue, pumps, settings);
    let best: SelectionEntry | undefined;
    for (const e of selection.ranked) {
      if (!e.passed || e.lifeCycleCost === undefined) continue;
      if (best === undefined || e.lifeCycleCost.total < (best.lifeCycleCost?.total ?? 0)) best = e;
    }
    const row: PipeSizeRow = {
      sizes,
      pipeCost,
      best,
      lifeCycleCost:
        best?.lifeCycleCost === undefined ? undefined : pipeCost + best.lifeCycleCost.total,
    };
    cache.set(key, row);
    table.push(row);
    return row;
  };
  const better = (a: PipeSizeRow, b: PipeSizeRow | undefined): boolean =>
    a.lifeCycleCost !== undefined &&
    (b?.lifeCycleCost === undefined || a.lifeCycleCost < b.lifeCycleCost);
  let combinations = 1;
  for (const c of choices) combinations *= c.sizes.length;
  let best: PipeSizeRow | undefined;
  if (combinations <= maxCombinations) {
    const pick = choices.map(() => 0);
    for (let n = 0; n < combinations; n++) {
      let rest = n;
      for (let k = choices.length - 1; k >= 0; k--) {
        const size = (choices[k] as RunChoice).sizes.length;
        pick[k] = rest % size;
        rest = Math.floor(rest / size);
      }
      const row = evaluate(pick);
      if (better(row, best)) best = row;
    }
    return { best, table, search: 'exhaustive', evaluations: table.length };
  }
  const pick = choices.map(() => 0);
  best = evaluate(pick);
  for (let round = 0; round < MAX_ROUNDS; round++) {
    let changed = false;
    choices.forEach((c, k) => {
      for (let s = 0; s < c.sizes.length; s++) {
        if (s === pick[k]) continue;
        const trial = [...pick];
        trial[k] = s;
        const row = evaluate(trial);
        if (better(row, best)) {
          best = row;
          pick[k] = s;
          changed = true;
        }
      }
    });
    if (!changed) break;
  }
  return {
    best: best.lifeCycleCost === undefined ? undefined : best,
    table,
    search: 'coordinate descent',
    evaluations: table.length,
  };
}
