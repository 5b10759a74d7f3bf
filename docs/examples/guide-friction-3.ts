// example: docs/examples/guide-friction-3.ts
import { hazenWilliamsHeadLoss, q, to } from 'headflow';

const h = hazenWilliamsHeadLoss(q(10, 'L/s'), q(100, 'm'), q(100, 'mm'), 130);
to(h, 'm'); // 1.90... m of water
