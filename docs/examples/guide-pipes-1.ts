// example: docs/examples/guide-pipes-1.ts
import { copperTube, flowArea, material, pipeSize, pvcPipe } from 'headflow/pipes';
import { to } from 'headflow/units';

const p = pipeSize('2', '40'); // ASME B36.10M
to(p.insideDiameter, 'in'); // 2.067  (2.375 - 2 x 0.154)
to(p.insideDiameter, 'mm'); // 52.5018
p.dn; // 50

pipeSize(1.25, '80S').standard; // 'ASME B36.19M Table 1'
pipeSize('DN50', 'STD').nps; // '2'

to(copperTube('1', 'L').insideDiameter, 'in'); // 1.025
to(pvcPipe('4', '40').insideDiameter, 'in'); // 4.026 (minimum wall, see below)
to(flowArea(pipeSize('4', '40').insideDiameter), 'in2'); // 12.730...

const steel = material('commercial-steel');
to(steel.roughness, 'mm'); // 0.04572 (0.00015 ft)
steel.hazenWilliamsC; // 140
