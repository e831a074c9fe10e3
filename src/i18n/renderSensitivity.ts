/**
 * What a row of the sensitivity table changes, in words (src/core/planner/sensitivity.ts gives a code and
 * its size in SI): "+10 % trailing mass", "−10 % adhesion", "+1 ‰ gradient", "+25 mm slack per coupling".
 * The sign is the typographic minus; percent, per mille and mm are symbols in every language.
 */
import type { SensitivityChange } from "../core/planner/types.js";
import { sensitivity } from "./en/sensitivity.js";
import type { Translator } from "./translator.js";

/** A signed figure: "+10", "−10" (in the language's digits, to `d` decimals). */
function signed(tr: Translator, x: number, d: number): string {
  const v = tr.num(Math.abs(x), d);
  return x < 0 ? `−${v}` : `+${v}`;
}

/** A figure with no more decimals than it needs (1, 2.5, 0.25). */
function decimals(x: number): number {
  for (let d = 0; d < 4; d++) if (Math.abs(Number(x.toFixed(d)) - x) < 1e-9) return d;
  return 4;
}

export function sensitivityChangeText(tr: Translator, c: SensitivityChange): string {
  const t = tr.ns(sensitivity);
  // The unit's spacing follows the English the table has always printed ("+10 %", "+1 ‰", "+25 mm").
  // Hungarian writes a percentage without the space ("+10%").
  const fig = (x: number, unit: string) => `${signed(tr, x, decimals(x))}${unit === "%" && tr.lang === "hu" ? "" : " "}${unit}`;
  switch (c.code) {
    case "mass":
      return t("mass", { change: fig(c.fraction * 100, "%") });
    case "adhesion":
      return t("adhesion", { change: fig(c.fraction * 100, "%") });
    case "grade":
      return t("grade", { change: fig(c.gradient * 1000, "‰") });
    case "slack":
      return t("slack", { change: fig(c.perCouplingM * 1000, "mm") });
  }
}
