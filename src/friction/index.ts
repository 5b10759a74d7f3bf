/**
 * (module under construction)
 *
 * @module friction
 */
export {};
