/**
 * Unit names written out where a unit has no symbol a reader would know (the app's US mass unit). SI and
 * customary symbols (t, kN, km/h, m, mm, ‰, %, °C, klbf, mph, ft, in, °F) are the same in every language
 * and stay symbols (app/format.ts).
 */
import { namespace } from "../messages.js";

export const units = namespace("units", {
  shortTon: "short tons",
});
