// example: docs/examples/guide-fluids-3.ts
import { HeadflowError, q, water } from 'headflow';

try {
  water().at(q(100, 'degC')); // boils at 99.97 degC at 1 atm
} catch (e) {
  if (e instanceof HeadflowError) console.log(e.code, e.message);
  // OUT_OF_RANGE water at 373.15 K (100 degC) and 101325 Pa (101.325 kPa) absolute is not
  // liquid: it boils at 373.124 K (99.9743 degC) at this pressure (IAPWS-IF97 region 4).
  // Raise the pressure above the saturation pressure 101418 Pa (101.418 kPa), or lower the
  // temperature below the boiling point. Pressures are absolute: ...
}
