/**
 * The friction module's unchecked kernels for the modules above it (the network's run laws
 * need the friction factor with its slope in Re). Not public.
 *
 * @module
 * @internal
 */
export {
  type FrictionPolicy,
  type FrictionSlope,
  frictionPolicy,
  frictionWithSlope,
} from './slope';
