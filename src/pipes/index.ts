/**
 * (module under construction)
 *
 * @module pipes
 */
export {};
