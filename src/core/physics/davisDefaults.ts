/**
 * The Davis equation's default coefficients and frontal areas by vehicle kind, apart from the resistance
 * code (resistance.ts) and the consist (train/consist.ts): reading a profile file fills its defaults from
 * them (profiles/convert.ts), and the app's first load then needs only these few numbers.
 */
import { M_PER_FT } from "./constants.js";

/** Default Davis b and K by vehicle kind [M: W. J. Davis Jr., General Electric Review 29, 1926]. */
export const DAVIS_DEFAULTS = {
  wagon: { b: 0.045, k: 0.0005, frontalAreaFt2: 88 },
  locomotive: { b: 0.03, k: 0.0024, frontalAreaFt2: 110 },
} as const;

/** Default locomotive frontal area, m² (110 ft²) [M: Davis 1926]. */
export const DEFAULT_LOCO_FRONTAL_AREA_M2 = DAVIS_DEFAULTS.locomotive.frontalAreaFt2 * M_PER_FT * M_PER_FT;
/** Default wagon frontal area, m² (88 ft²) [M: Davis 1926]. */
export const DEFAULT_WAGON_FRONTAL_AREA_M2 = DAVIS_DEFAULTS.wagon.frontalAreaFt2 * M_PER_FT * M_PER_FT;
