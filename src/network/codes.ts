/**
 * Internal codes of the network solver: node kinds, link kinds and link states.
 *
 * @module
 * @internal
 */
import type { LinkState } from './types';

export const JUNCTION = 0;
export const SURFACE = 1;
export const OUTLET = 2;

export const RUN = 0;
export const PUMP = 1;
export const PRV = 2;
export const PSV = 3;
export const FCV = 4;
export const EMITTER = 5;

export const OPEN = 0;
export const CLOSED = 1;
export const SHUT = 2;
export const ACTIVE = 3;
export const PINNED = 4;
export const STATE_NAMES: readonly LinkState[] = ['open', 'closed', 'shut', 'active', 'pinned'];
