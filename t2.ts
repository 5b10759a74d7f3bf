import { swameeJainKernel } from './src/friction/swamee-jain';
import { haalandKernel } from './src/friction/haaland';
import { serghidesKernel } from './src/friction/serghides';
import { zigrangSylvesterKernel } from './src/friction/zigrang-sylvester';
import { goudarSonnadKernel } from './src/friction/goudar-sonnad';
import { chenKernel } from './src/friction/chen';
import { churchillKernel } from './src/friction/churchill';
import { colebrookKernel } from './src/friction/colebrook';
const ks = [0, 1e-8, 1e-6, 1e-4, 1e-3, 0.01, 0.05, 0.1, 0.2, 0.3, 0.4, 0.5];
for (const [name, fn] of Object.entries({ swameeJainKernel, haalandKernel, serghidesKernel, zigrangSylvesterKernel, goudarSonnadKernel, chenKernel, churchillKernel, colebrookKernel })) {
  let worst = 0;
  for (const k of ks) {
    // scan down from 1e4: find largest Re where result not finite/positive or non-monotone vs colebrook
    for (let lre = 4; lre > -3; lre -= 0.001) {
      const re = 10 ** lre;
      const f = fn(re, k);
      if (!(Number.isFinite(f) && f > 0)) { worst = Math.max(worst, re); break; }
    }
  }
  console.log(name, worst.toPrecision(4));
}
