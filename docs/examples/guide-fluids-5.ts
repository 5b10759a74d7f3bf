// example: docs/examples/guide-fluids-5.ts
import { HeadflowError, q, tabulatedFluid, to } from 'headflow';

const brine = tabulatedFluid({
  name: 'demo brine (invented numbers)',
  source: 'invented for this guide',
  rows: [
    { temperature: q(0, 'degC'), density: q(1100, 'kg/m3'), dynamicViscosity: q(4, 'cP') },
    { temperature: q(20, 'degC'), density: q(1090, 'kg/m3'), dynamicViscosity: q(2, 'cP') },
  ],
});
to(brine.at(q(10, 'degC')).dynamicViscosity, 'cP'); // 2.828... (log interpolation)
try {
  brine.at(q(30, 'degC'));
} catch (e) {
  // tables are never extrapolated
  if (e instanceof HeadflowError) console.log(e.code); // OUT_OF_RANGE
}
