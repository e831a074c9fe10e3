/**
 * The input fields of a start case: label, measure and file unit by field path. Issues are put into the
 * language and units on screen by fieldWords.ts (coded ones, and those written as text), loaded with the
 * draft's checker; this module carries no words and no message rewriting, so the first load stays small.
 */
import type { fields } from "../i18n/en/fields.js";
import type { FieldIssue } from "../profiles/issues.js";
import type { MeasureKey } from "./format.js";

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

/** "Label message" for a list of issues away from their fields (the label localiseIssue gave, else the path). */
export function issueLine(issue: LocalIssue): string {
  return `${issue.label ?? (issue.path || "–")} ${issue.message}`;
}
