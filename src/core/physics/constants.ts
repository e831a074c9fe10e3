/**
 * Physical constants and exact unit factors. SI everywhere inside the core.
 * Sources: standard gravity (3rd CGPM, 1901); customary-unit factors from NIST SP 811 (2008), Appendix B.
 */

/** Standard gravity, m/s². */
export const GRAVITY_MPS2 = 9.80665;

/** One pound-force in newtons (NIST SP 811). */
export const NEWTONS_PER_LBF = 4.4482216152605;

/** One short ton (2000 lb) in kilograms (NIST SP 811). */
export const KG_PER_SHORT_TON = 907.18474;

/** One mile per hour in metres per second (NIST SP 811). */
export const MPS_PER_MPH = 0.44704;

/** One international foot in metres (NIST SP 811). */
export const M_PER_FT = 0.3048;

/** One kilometre per hour in metres per second (exact). */
export const MPS_PER_KMH = 1 / 3.6;

/** One mechanical horsepower (550 ft·lbf/s) in watts (NIST SP 811). */
export const W_PER_HP = 745.69987158227022;
