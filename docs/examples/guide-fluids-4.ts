// example: docs/examples/guide-fluids-4.ts
import { constantFluid, q, to } from 'headflow';

const oil = constantFluid({
  name: 'light oil',
  density: q(870, 'kg/m3'),
  dynamicViscosity: q(30, 'cP'),
});
to(oil.at(q(40, 'degC')).kinematicViscosity, 'cSt'); // 34.48...
