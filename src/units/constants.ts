import type { Acceleration, Pressure } from './quantity';

/**
 * Standard acceleration of gravity, g_n = 9.80665 m/s^2 exactly (3rd CGPM, 1901; NIST SP 811
 * Appendix B.8 note). The default `g` wherever gravity enters a calculation.
 */
export const STANDARD_GRAVITY = 9.80665 as Acceleration;

/**
 * Standard atmosphere, 101 325 Pa exactly (10th CGPM, 1954; NIST SP 811 Appendix B.8).
 * The default atmospheric pressure for gauge/absolute conversion.
 */
export const STANDARD_ATMOSPHERE = 101325 as Pressure;
