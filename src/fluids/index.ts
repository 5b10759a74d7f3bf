/**
 * (module under construction)
 *
 * @module fluids
 */
export {};
