/**
 * Field messages as codes: every issue the schema checks and the case's resolution give carries a code and
 * its figures, the English words made from them are the message itself (so `taut` prints what it always
 * printed), and Hungarian and German render every code with every figure filled — no placeholder left, the
 * figures the same numbers written with a decimal comma.
 */
import { readFileSync, readdirSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { fieldsDe } from "../../src/i18n/de/fields.js";
import { fields, type FieldCode } from "../../src/i18n/en/fields.js";
import { fieldsHu } from "../../src/i18n/hu/fields.js";
import { createTranslator } from "../../src/i18n/translator.js";
import { englishField, issueMessage } from "../../src/profiles/issueText.js";
import type { FieldIssue } from "../../src/profiles/issues.js";
import { builtinLibrary } from "../../src/profiles/builtin.js";
import { parseJsonText, parseLocationNote, parseLocomotiveFile, parseStartCase, parseWagonFile } from "../../src/profiles/parse.js";

const hu = createTranslator("hu", { fields: fieldsHu });
const de = createTranslator("de", { fields: fieldsDe });
const lib = builtinLibrary();
const demo = JSON.parse(readFileSync("profiles/cases/demo-goods-cinderfield.json", "utf8")) as Record<string, unknown>;
const dir = "tests/fixtures/in/invalid";

/** Issues of many kinds: the invalid fixtures, and hand-made breaks of every rule with a code of its own. */
function sampleIssues(): FieldIssue[] {
  const out: FieldIssue[] = [];
  for (const f of readdirSync(dir).filter((x) => x.endsWith(".json"))) {
    const text = readFileSync(`${dir}/${f}`, "utf8");
    const j = parseJsonText(text);
    if (!j.ok) {
      out.push(...j.issues);
      continue;
    }
    const schema = (j.value as { schema?: string }).schema;
    const r = schema === "taut/locomotive@1" ? parseLocomotiveFile(j.value) : schema === "taut/location@1" ? parseLocationNote(j.value) : parseStartCase(j.value, lib);
    if (!r.ok) out.push(...r.issues);
  }
  const c = (patch: (x: Record<string, any>) => void) => {
    const x = structuredClone(demo) as Record<string, any>;
    patch(x);
    const r = parseStartCase(x, lib);
    if (!r.ok) out.push(...r.issues);
  };
  c((x) => (x.train.trailingMass_t = 10)); // per wagon
  c((x) => (x.train.wagons = "many")); // a type
  c((x) => delete x.conditions.sand); // required
  c((x) => (x.locomotives = [])); // too few items
  c((x) => (x.location = "nowhere")); // unknown note
  c((x) => (x.locomotives[0].profile = "Bad Id")); // id form
  c((x) => (x.target = { speed_kmh: 0 })); // greater than
  c((x) => (x.settings = { couplerSafetyFactor: 9 })); // at most
  c((x) => (x.train = { groups: [{ wagons: 2, wagonType: "nope", mass_t: 100 }], couplerSlack_mm: 10, bearing: "roller", couplerLimit_kN: 900, wagons: 3, trailingMass_t: 1 }));
  c((x) => (x.train.wagonType = "no-such-wagon")); // unknown wagon type
  c((x) => (x.conditions.temperature_C = Infinity)); // a number too large to hold
  const w = parseWagonFile({ schema: "taut/wagon@1", id: "w", label: "W", axles: 4, length_m: 15, tare_t: 90, maxGross_t: 80, frontalArea_m2: 9, coupling: "screw", defaultSlack_mm: 20, davisK: 0.5 });
  if (!w.ok) out.push(...w.issues);
  return out;
}

describe("field messages as codes", () => {
  const issues = sampleIssues();
  const codes = new Set(issues.map((i) => i.code));

  it("the checks give codes for the rules a driver or a script author breaks most", () => {
    for (const c of ["rangeIn", "range", "perWagon", "mustBe", "required", "minItems", "unknownLocation", "idForm", "greaterThan", "atMost", "straightOrRadius", "segmentGap", "segmentOverlap", "afterWagon", "unknownLocomotive", "oneOf", "notExceed", "groupsWagons", "groupsMass", "unknownWagonType", "rearBeforeProfile", "perNotch"] as FieldCode[]) {
      expect(codes, c).toContain(c);
    }
  });

  it("the English message of each coded issue is its code's English words (one source)", () => {
    for (const i of issues) if (i.code) expect(englishField({ code: i.code, ...(i.figures ? { figures: i.figures } : {}), ...(i.got !== undefined ? { got: i.got } : {}) }), i.path).toBe(i.message);
  });

  it("Hungarian and German render every coded issue with every placeholder filled, and the same numbers", () => {
    const numbers = (s: string) => [...s.matchAll(/-?\d+(?:[.,]\d+)?/g)].map((m) => Number(m[0].replace(",", "."))).sort((a, b) => a - b);
    for (const i of issues.filter((x) => x.code)) {
      for (const tr of [hu, de]) {
        const m = issueMessage(tr, i);
        expect(m, `${tr.lang} ${i.code}`).not.toMatch(/\{[A-Za-z]+\}/);
        expect(m, `${tr.lang} ${i.code}`).not.toBe(i.message);
        // The figures a message quotes are the English ones (word order may move them; ids may hold digits).
        if (!/known/.test(i.code!)) expect(numbers(m), `${tr.lang} ${i.code}: ${m}`).toEqual(numbers(i.message));
      }
    }
  });

  it("a decimal figure keeps its decimals and takes the language's decimal comma", () => {
    const i: FieldIssue = { path: "davisK", message: "", code: "range", figures: { min: 0, max: 0.025 }, got: 0.5 };
    expect(issueMessage(de, i)).toBe("muss zwischen 0 und 0,025 liegen (angegeben: 0,5)");
    expect(issueMessage(hu, i)).toBe("0 és 0,025 között kell legyen (megadva: 0,5)");
  });

  it("every code's words in every language hold the same placeholders (the catalog's parity, checked per code)", () => {
    const holes = (m: unknown) => JSON.stringify(m).match(/\{[a-z]+\}/gi)?.sort() ?? [];
    for (const k of Object.keys(fields.en) as (keyof typeof fields.en)[]) {
      expect(holes(fieldsHu[k]), `hu ${k}`).toEqual(holes(fields.en[k]));
      expect(holes(fieldsDe[k]), `de ${k}`).toEqual(holes(fields.en[k]));
    }
  });
});
