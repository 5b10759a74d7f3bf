/**
 * The design module without its scenario-file reader: what evaluating a design and rendering
 * its report need. `headflow/report` imports this face, so loading the renderers does not
 * load the file reader (and its schema library).
 *
 * @module
 * @internal
 */
export { CAUTIONS } from './cautions';
export { checkMessage } from './check-message';
export { displayUnits } from './display-units';
export { DESIGN_DEFAULTS, evaluateDesign } from './evaluate';
export type * from './types';
