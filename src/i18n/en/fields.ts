/**
 * Field messages: what a file or a form breaks, by the code the schema checks give (profiles/issues.ts,
 * schemas.ts, parse.ts) with its figures. The English here is the one source of the English messages, so
 * `taut` prints them byte for byte as before; other languages render the code. `{got}` is the value given,
 * filled in by the renderer (profiles/issueText.ts). Numbers are written by the renderer in the language's
 * digits; a `{unit}` is a unit symbol, the same in every language. Also the command line's headlines of
 * a file that does not pass its checks.
 */
import { namespace } from "../messages.js";

export const fields = namespace("fields", {
  // What a value should be, inside a message ("is required (a number)").
  expectNumber: "a number",
  expectInt: "a whole number",
  expectString: "text",
  expectBoolean: "true or false",
  expectArray: "a list",
  expectDatetime: "a date and time",
  expectObject: "an object",
  expectValue: "a value",
  // The value given, when it is not a figure or a text.
  gotNothing: "nothing",
  gotList: "a list",
  gotObject: "an object",
  gotTooLarge: "a number too large to hold",
  gotTooSmall: "a number too far below zero to hold",
  got: "(got {value})",
  // The rules.
  required: "is required ({expected})",
  mustBe: "must be {expected}",
  minItems: { one: "must have at least {count} item", other: "must have at least {count} items" },
  maxItems: "must have at most {max} items",
  notEmpty: "must not be empty",
  minChars: "must be at least {min} characters",
  maxChars: "must be at most {max} characters",
  atLeast: "must be at least {min}",
  greaterThan: "must be greater than {min}",
  atMost: "must be at most {max}",
  lessThan: "must be less than {max}",
  oneValue: "must be {value}",
  oneOf: "must be one of {values}",
  multipleOf: "must be a whole multiple of {divisor}",
  badForm: "is not in the expected form",
  unknownFields: { one: "has unknown field {keys}", other: "has unknown fields {keys}" },
  notValid: "is not valid",
  range: "must be from {min} to {max}",
  rangeIn: "must be from {min} to {max} {unit}",
  idForm: "must be lower-case letters, digits, hyphens, dots or underscores, starting with a letter or digit",
  straightOrRadius: "must be 0 (straight) or at least {min} {unit}",
  notchOrder: "must not decrease from one notch to the next",
  notchEnd: "must end with 1 (full notch)",
  notExceed: "must not exceed {field}",
  perNotch: "must have one entry per notch",
  sandLowers: "sand must not lower adhesion",
  segmentGap: "leaves a gap of {gap} {unit} after the previous segment (which ends at {end} {unit})",
  segmentOverlap: "overlaps the previous segment by {overlap} {unit} (it ends at {end} {unit})",
  dateForm: "must be a date as YYYY-MM-DD",
  perWagon: {
    one: "must give from {min} to {max} {unit} per wagon (got {value} {unit} per wagon over {count} wagon)",
    other: "must give from {min} to {max} {unit} per wagon (got {value} {unit} per wagon over {count} wagons)",
  },
  trainNeeded: "is needed (or give the train as wagon groups)",
  groupsMaxWagons: "must hold at most {max} wagons (got {wagons})",
  groupsWagons: "must match the groups' {wagons} wagons (got {value})",
  groupsMass: "must match the groups' {mass} {unit} (got {value} {unit})",
  unknownLocomotive: 'names no known locomotive profile ("{id}"; known: {known})',
  unknownWagonType: 'names no known wagon type ("{id}"; known: {known})',
  unknownLocation: 'names no known location note ("{id}"; known: {known})',
  unknownLocationNone: 'names no known location note ("{id}"; known: none)',
  afterWagon: "must be less than the number of wagons ({wagons}) (got {value})",
  rearBeforeProfile: "puts the rear of the {length} {unit} train at {rear} {unit}, before the profile starts ({start} {unit})",
  beyondProfile: "is beyond the end of the profile ({end} {unit})",
  jsonEmpty: "is not valid JSON: the file is empty",
  // A list of issues cut short.
  andMore: "…and {count} more",
  // The fields of a start case as a list of issues names them (app/fields.ts).
  labelLocomotives: "Locomotives",
  labelProfile: "Locomotive profile",
  labelCount: "Number of locomotives",
  labelPosition: "Position",
  labelAfterWagon: "After wagon",
  labelTrailingMass: "Trailing mass",
  labelWagons: "Wagons",
  labelLength: "Train length",
  labelSlack: "Free slack per coupling",
  labelCouplerLimit: "Coupler working limit",
  labelBearing: "Bearings",
  labelCoupling: "Coupling",
  labelWagonType: "Wagon type",
  labelSlackState: "Slack at the start",
  labelLocation: "Location",
  labelGradient: "Gradient",
  labelCurveRadius: "Curve radius",
  labelClearAhead: "Clear ahead",
  labelRail: "Rail condition",
  labelSand: "Sand",
  labelTemperature: "Temperature",
  labelTargetSpeed: "Target speed",
  labelTargetDistance: "Target distance",
  labelSafetyFactor: "Coupler safety factor (Settings)",
  labelSlipRisk: "Slip-risk threshold (Settings)",
  labelMarginalSlipRisk: "Marginal slip-risk bound (Settings)",
  labelTheCase: "The case",
  // The command line's headline over a file's issues.
  notValidFile: "{name}: not a valid file",
  caseNotValid: "{name}: the start case is not valid",
  noteNotValid: "{name}: the location note is not valid",
});

/** A field message's code: a key of the rules above. */
export type FieldCode = Exclude<
  keyof typeof fields.en,
  `expect${string}` | `got${string}` | `label${string}` | "got" | "andMore" | "notValidFile" | "caseNotValid" | "noteNotValid"
>;
