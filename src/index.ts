/**
 * headflow: pump selection for piping systems, with physical units checked by the type
 * system. Every module's public names, flat. Subpaths (`headflow/units`, ...) give the same
 * names module by module.
 *
 * @packageDocumentation
 */

export * from './design/index';
export { HeadflowError, type HeadflowErrorCode, type HeadflowErrorDetails } from './errors';
export * from './fluids/index';
export * from './friction/index';
export * from './losses/index';
export * from './network/index';
export * from './pipes/index';
export * from './pumps/index';
export * from './report/index';
export * from './select/index';
export * from './system/index';
export * from './units/index';
