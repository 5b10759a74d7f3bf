/**
 * Pipe friction: Reynolds number, laminar and Colebrook (exact) friction factors, explicit
 * approximations each with its source and range, the regime policy of `frictionFactor`,
 * array forms, and Darcy-Weisbach and Hazen-Williams head loss.
 *
 * @module friction
 */
export { colebrookInto, frictionFactorInto } from './arrays';
export { blasius } from './blasius';
export { chen } from './chen';
export { churchill } from './churchill';
export {
  COLEBROOK_MIN_REYNOLDS,
  type ColebrookSolution,
  colebrook,
  colebrookResidual,
  colebrookSolve,
} from './colebrook';
export { darcyHeadLoss, pressureDrop } from './darcy';
export {
  type FrictionFactorOptions,
  frictionFactor,
  LAMINAR_LIMIT,
  type TransitionRule,
  TURBULENT_LIMIT,
  TURBULENT_METHODS,
  type TurbulentMethod,
} from './friction-factor';
export { goudarSonnad } from './goudar-sonnad';
export { haaland } from './haaland';
export { HAZEN_WILLIAMS_SI, hazenWilliamsHeadLoss } from './hazen-williams';
export { laminar } from './laminar';
export { reynolds, reynoldsFromFlow } from './reynolds';
export { serghides } from './serghides';
export { swameeJain } from './swamee-jain';
export {
  LIMIT_RELATIVE_ROUGHNESS,
  MAX_RELATIVE_ROUGHNESS,
  MIN_APPROXIMATION_REYNOLDS,
  type RoughnessOptions,
} from './validate';
export { zigrangSylvester } from './zigrang-sylvester';
