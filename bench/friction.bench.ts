import {
  chen,
  churchill,
  colebrook,
  colebrookInto,
  frictionFactor,
  frictionFactorInto,
  goudarSonnad,
  haaland,
  serghides,
  swameeJain,
  zigrangSylvester,
} from '../src/friction/index';
import { type BenchSuite, draw } from './harness';

const N = 1000;
// Turbulent inputs, log-uniform: Re 4e3..1e8, eps/D 1e-6..0.05 (drawn once, fixed seeds).
const re = draw(N, 11, (u) => 4000 * 25000 ** u());
const rr = draw(N, 12, (u) => 1e-6 * 50000 ** u());
// All regimes for frictionFactor: Re 500..1e8.
const reAll = draw(N, 13, (u) => 500 * 2e5 ** u());
const out = new Float64Array(N);

function loop(fn: (re: number, k: number) => number, res: Float64Array = re): () => number {
  return () => {
    let s = 0;
    for (let i = 0; i < N; i++) s += fn(res[i] ?? 1e5, rr[i] ?? 0);
    return s;
  };
}

export const suites: readonly BenchSuite[] = [
  {
    title: 'friction: per-call friction factors against Swamee-Jain (turbulent inputs)',
    baseline: 'swameeJain',
    callsPerRun: N,
    cases: [
      { name: 'swameeJain', run: loop(swameeJain) },
      { name: 'colebrook (exact)', run: loop(colebrook) },
      { name: 'haaland', run: loop(haaland) },
      { name: 'churchill', run: loop(churchill) },
      { name: 'serghides', run: loop(serghides) },
      { name: 'zigrangSylvester', run: loop(zigrangSylvester) },
      { name: 'goudarSonnad', run: loop(goudarSonnad) },
      { name: 'chen', run: loop(chen) },
      { name: 'frictionFactor (Re 500..1e8)', run: loop(frictionFactor, reAll) },
      {
        name: 'colebrookInto (array)',
        run: () => {
          colebrookInto(re, rr, out);
          return out[N - 1] ?? 0;
        },
      },
      {
        name: 'frictionFactorInto (array, Re 500..1e8)',
        run: () => {
          frictionFactorInto(reAll, rr, out);
          return out[N - 1] ?? 0;
        },
      },
    ],
    notes: () => [
      'colebrook makes 2 correction steps (Clamond 2009) on every input: 3 natural logarithms, no powers.',
    ],
  },
];
