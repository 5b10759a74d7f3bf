// example: docs/examples/guide-friction-1.ts
import { colebrook, darcyHeadLoss, frictionFactor, q, reynolds, to } from 'headflow';

const v = q(2, 'm/s');
const d = q(100, 'mm');
const re = reynolds(v, d, q(1, 'cSt')); // 200000
const f = frictionFactor(re, 0.045e-3 / 0.1); // eps 0.045 mm in a 100 mm bore -> Colebrook
const h = darcyHeadLoss(f, q(100, 'm'), d, v);
to(h, 'm'); // 3.79... m of fluid
colebrook(1e5, 1e-4); // 0.018513866077471648
