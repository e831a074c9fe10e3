/**
 * The input fields of a start case: label, measure and file unit by field path, and how an issue written
 * as text (without a code) is put into the user's units ("must be at most 200 mm" reads "must be at most
 * 7.87 in"). Coded issues are rendered in the language on screen by fieldWords.ts, loaded with the
 * draft's checker; this module carries no words, so the first load stays small.
 */
import type { fields } from "../i18n/en/fields.js";
import type { FieldIssue } from "../profiles/issues.js";
import { decimalsOf, formatNumber, localiseText, toDisplay, unitSymbol, type MeasureKey, type UnitSystem } from "./format.js";

/** An issue as the app shows it: its message in the user's language and units, with its field's name. */
export interface LocalIssue extends FieldIssue {
  /** The field's name in the language on screen. */
  label?: string;
}

export interface FieldDef {
  /** The field's name: a key of the fields catalog. */
  label: keyof typeof fields.en & `label${string}`;
  measure?: MeasureKey;
  /** Unit of the value in the file (a unit id of the core's table). */
  fileUnit?: string;
}

const FIELDS: Record<string, FieldDef> = {
  "locomotives": { label: "labelLocomotives" },
  "locomotives[].profile": { label: "labelProfile" },
  "locomotives[].count": { label: "labelCount" },
  "locomotives[].position": { label: "labelPosition" },
  "locomotives[].position.afterWagon": { label: "labelAfterWagon" },
  "train.trailingMass_t": { label: "labelTrailingMass", measure: "mass", fileUnit: "t" },
  "train.wagons": { label: "labelWagons" },
  "train.length_m": { label: "labelLength", measure: "distance", fileUnit: "m" },
  "train.couplerSlack_mm": { label: "labelSlack", measure: "slack", fileUnit: "mm" },
  "train.couplerLimit_kN": { label: "labelCouplerLimit", measure: "force", fileUnit: "kN" },
  "train.bearing": { label: "labelBearing" },
  "train.coupling": { label: "labelCoupling" },
  "train.wagonType": { label: "labelWagonType" },
  "train.slackState": { label: "labelSlackState" },
  "location": { label: "labelLocation" },
  "location.frontAt_m": { label: "labelLocation" },
  "location.gradient_permille": { label: "labelGradient", measure: "grade", fileUnit: "permille" },
  "location.curveRadius_m": { label: "labelCurveRadius", measure: "radius", fileUnit: "m" },
  "location.clearAhead_m": { label: "labelClearAhead", measure: "distance", fileUnit: "m" },
  "conditions.rail": { label: "labelRail" },
  "conditions.sand": { label: "labelSand" },
  "conditions.temperature_C": { label: "labelTemperature", measure: "temperature", fileUnit: "C" },
  "target.speed_kmh": { label: "labelTargetSpeed", measure: "speed", fileUnit: "kmh" },
  "target.distance_m": { label: "labelTargetDistance", measure: "distance", fileUnit: "m" },
  "settings.couplerSafetyFactor": { label: "labelSafetyFactor" },
  "settings.slipRiskThreshold": { label: "labelSlipRisk" },
  "settings.marginalSlipRisk": { label: "labelMarginalSlipRisk" },
};

/** The field an issue path belongs to (list indices do not matter). */
export function fieldOf(path: string): FieldDef | undefined {
  return FIELDS[path.replace(/\[\d+\]/g, "[]")];
}

const NUM = "(-?\\d+(?:\\.\\d+)?(?:e[-+]?\\d+)?)";
// A bound may be followed by the file's own unit (" m"), which the display unit replaces.
const BOUND = new RegExp(`\\b(at least|at most|greater than|less than) ${NUM}(?: (?:mm|m|kN|t|km/h|‰|°C)(?![\\w/]))?`, "g");
const GOT = new RegExp(`\\(got ${NUM}\\)`, "g");
// A range with the file's unit after it ("from 5 to 60000 t"), and a figure per wagon ("(got 0.5 t per wagon").
const RANGE = new RegExp(`\\bfrom ${NUM} to ${NUM}(?: (?:mm|m|kN|t|km/h|‰|°C)(?![\\w/]))?`, "g");
const PER_WAGON = new RegExp(`\\(got ${NUM} (?:t|m) per wagon`, "g");

/**
 * An issue written as text (no code) as the user should read it: bounds and the value given in the display
 * units of the field, and "must be a number" for text that is not one.
 */
export function legacyLocaliseIssue(issue: FieldIssue, system: UnitSystem): FieldIssue {
  if (/\(got NaN\)|got null\)|must be a number \(got/.test(issue.message) || /is required \(a number\)/.test(issue.message)) {
    return { ...issue, message: "must be a number" };
  }
  const f = fieldOf(issue.path);
  // Rules without a unit of their own may still quote figures ("the 438 m train").
  if (!f?.measure || !f.fileUnit) return { ...issue, message: localiseText(issue.message, system) };
  const m = f.measure;
  const unit = f.fileUnit;
  // Rounded as the field shows it, without trailing zeros ("60 ‰", "7.87 in").
  const shown = (x: string) => `${formatNumber(toDisplay(m, Number(x), unit, system), decimalsOf(m, system)).replace(/(\.\d*?)0+$/, "$1").replace(/\.$/, "")} ${unitSymbol(m, system)}`;
  // A figure per wagon may be small: three significant figures rather than the field's decimals.
  const precise = (x: string) => {
    const v = toDisplay(m, Number(x), unit, system);
    const decimals = Math.max(0, 2 - Math.floor(Math.log10(Math.abs(v) || 1)));
    return `${formatNumber(v, decimals).replace(/(\.\d*?)0+$/, "$1").replace(/\.$/, "")} ${unitSymbol(m, system)}`;
  };
  const message = issue.message
    .replace(RANGE, (_all, a: string, b: string) => `from ${precise(a).slice(0, -(unitSymbol(m, system).length + 1))} to ${precise(b)}`)
    .replace(PER_WAGON, (_all, x: string) => `(got ${precise(x)} per wagon`)
    .replace(BOUND, (_all, word: string, x: string) => `${word} ${shown(x)}`)
    .replace(GOT, (_all, x: string) => `(got ${shown(x)})`);
  return { ...issue, message };
}

/** "Label message" for a list of issues away from their fields (the label localiseIssue gave, else the path). */
export function issueLine(issue: LocalIssue): string {
  return `${issue.label ?? (issue.path || "–")} ${issue.message}`;
}
