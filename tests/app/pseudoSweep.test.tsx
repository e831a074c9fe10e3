/**
 * A sweep for words left out of the catalogs: the screens opened later (Settings, Departures with a bad
 * file, Location notes with damaged records, Load table, Assistance check with an option and a failure,
 * Start review) drawn in pseudo-localised English (src/i18n/pseudo.ts: every catalog word accented), where a
 * plain-lettered English word in the page's text is one that did not come from the catalog. Data (the demo
 * profiles' names and labels, the rail table's notes, the works cited, file names, ids, codes a file gives) is
 * plain too and is taken out first; nothing may be left. What was found is also written to the test's log.
 */
import "fake-indexeddb/auto";
import { waitFor, fireEvent, cleanup } from "@solidjs/testing-library";
import { openDB } from "idb";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import type { JSX } from "solid-js";
import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { CITED_WORKS } from "./citedWorks.js";

/** Words of data and of the trade's codes that are plain in every language (ids, units, file kinds, column names). */
const DATA = /^(taut|json|csv|id|case|rail|sand|kN|km|min|dry|damp|wet|frost|leaves|greasy|demo|mine|imported|elsewhere|spring|summer|autumn|winter|slimy|railML|illustrative|day|agg|ore)$/i;

/** Plain-lettered words (3+ ASCII letters with a letter pseudo-localisation accents) in the page's text and labels, with their text. */
function plainWords(root: Element, data: readonly string[]): string[] {
  const out: string[] = [];
  const texts: string[] = [];
  // The text of each block (a figure and its unit are a span of their own inside a sentence), in order.
  const blocks = new Map<Element, string>();
  const walker = document.createTreeWalker(root, NodeFilter.SHOW_TEXT);
  for (let n = walker.nextNode(); n; n = walker.nextNode()) {
    const p = n.parentElement;
    if (!p || p.closest("code, script, style")) continue;
    const block = p.closest("p, li, td, th, h1, h2, h3, h4, button, label, caption, legend, option, div") ?? root;
    blocks.set(block, (blocks.get(block) ?? "") + (n.textContent ?? ""));
  }
  texts.push(...blocks.values());
  for (const e of root.querySelectorAll("[aria-label], [placeholder], [title]")) for (const a of ["aria-label", "placeholder", "title"]) if (e.getAttribute(a)) texts.push(e.getAttribute(a)!);
  for (const t0 of texts) {
    let t = t0;
    for (const d of data) t = t.split(d).join(" ");
    for (const w of t.match(/[A-Za-z\u00C0-\u017F]+/g) ?? []) {
      if (w.length < 3 || !/^[A-Za-z]+$/.test(w) || !/[aeiouycnsz]/i.test(w) || DATA.test(w)) continue;
      out.push(`${w}  ⟵  ${t0.trim().slice(0, 160)}`);
    }
  }
  return [...new Set(out)];
}

let mods: {
  renderWithApp: typeof import("./harness.js").renderWithApp;
  quickTablePool: typeof import("./harness.js").quickTablePool;
};
const found: Record<string, string[]> = {};

beforeAll(async () => {
  // The app's modules read it once, when they load: load them afresh (the setup loaded them already).
  localStorage.setItem("taut.pseudo", "1");
  vi.resetModules();
  await (await import("../../src/app/state/draftChecker.js")).loadDraftChecker();
  const h = await import("./harness.js");
  mods = { renderWithApp: h.renderWithApp, quickTablePool: h.quickTablePool };
  const i18n = await import("../../src/app/i18n.js");
  const { pseudoText } = await import("../../src/i18n/pseudo.js");
  await waitFor(() => expect(i18n.tr.ns({ name: "x", en: { a: "Save" } })("a" as never)).toBe(pseudoText("Save")));
});
afterAll(() => {
  localStorage.removeItem("taut.pseudo");
  const all = Object.entries(found).map(([k, v]) => `== ${k} (${v.length})\n${v.join("\n")}`).join("\n");
  process.stdout.write(`\nPlain words on pseudo-localised screens:\n${all}\n`);
});

async function sweep(name: string, ui: () => JSX.Element, ready: () => void | Promise<void>, data: readonly string[] = [], pool?: unknown): Promise<string[]> {
  const { unmount, container } = mods.renderWithApp(ui, { pool: (pool ?? mods.quickTablePool()) as never });
  await waitFor(ready, { timeout: 15_000 });
  const words = plainWords(container, data);
  found[name] = words;
  unmount();
  cleanup();
  return words;
}

const read = (p: string) => readFileSync(join(process.cwd(), "profiles", p), "utf8");

/** Every text of the built-in profiles (the demo's names and labels, the rail table's notes on its sources): data, longest first. */
function profileTexts(): string[] {
  const out = new Set<string>();
  const walk = (x: unknown): void => {
    if (typeof x === "string") out.add(x);
    else if (Array.isArray(x)) x.forEach(walk);
    else if (x && typeof x === "object") Object.values(x).forEach(walk);
  };
  for (const dir of readdirSync(join(process.cwd(), "profiles"))) {
    for (const f of readdirSync(join(process.cwd(), "profiles", dir))) if (f.endsWith(".json")) walk(JSON.parse(read(`${dir}/${f}`)));
  }
  return [...out].filter((t) => t.length > 2).sort((a, b) => b.length - a.length);
}

const WORKS = CITED_WORKS;

describe("pseudo-localised screens: no word outside the catalogs", () => {
  it("Departures with a bad file: its errors and rows", async () => {
    const { default: Departures } = await import("../../src/app/screens/Departures/index.js");
    const { fakePool } = await import("./dispatch/fakes.js");
    const demoDay = JSON.parse(read("departures/demo-day.json")) as Array<Record<string, unknown>>;
    const pool = fakePool({ check: () => ({ ok: false, kind: "internal", issues: [], message: "RangeError: offset 7" }) });
    const words = await sweep(
      "Departures",
      () => <Departures />,
      async () => {
        if (!document.querySelector(".bad-rows")) {
          const input = document.querySelector('input[type="file"]') as HTMLInputElement;
          const bad = { ...demoDay[0]!, id: "d-broken", train: { ...(demoDay[0]!.train as object), trailingMass_t: -10 } };
          fireEvent.change(input, { target: { files: [new File([JSON.stringify([demoDay[1], bad])], "day.json")] } });
        }
        expect(document.querySelectorAll(".bad-rows li")).toHaveLength(2);
      },
      // A field message is written from its code by issueMessage, which gives the code's own English in
      // English (pseudo-localised too); its Hungarian and German are checked in departuresLanguages.test.tsx.
      ["RangeError: offset 7", "d-broken", "day.json", "train.trailingMass_t: must be from 5 to 60000 t (got -10)", String(demoDay[1]!.id)],
      pool,
    );
    expect(words).toEqual([]);
  });

  it("Location notes with damaged records", async () => {
    const { openNotesStore, DEFAULT_NOTES_DB } = await import("../../src/notes/index.js");
    const { builtinLocations } = await import("../../src/profiles/builtin.js");
    (await openNotesStore({ demos: builtinLocations })).close();
    const db = await openDB(DEFAULT_NOTES_DB);
    const demo = builtinLocations[0]!;
    await db.put("notes", { id: "odd-origin", origin: "elsewhere", savedAt: "2026-03-01T10:00:00.000Z", rev: 1, note: { ...demo, id: "odd-origin" } } as never);
    await db.put("notes", { id: "half-written", origin: "mine", savedAt: "2026-03-01T10:00:00.000Z", rev: 1, note: { ...demo, id: "half-written", clearAhead_m: 250000 } } as never);
    await db.put("notes", { id: "steep", title: "Steep", profile: { segments: [{ start_m: 0, length_m: 900, grade_permille: 90, radius_m: 0 }], front_m: 100, clear_m: 200 }, hazards: [3], rail: { autumn: "slimy" }, practice: "", revised: "2024-10-01", by: "OLD" } as never);
    await db.put("meta", String(Number((await db.get("meta", "changes")) ?? "0") + 1), "changes");
    db.close();
    const { default: LocationNotes } = await import("../../src/app/screens/LocationNotes/index.js");
    const names = builtinLocations.flatMap((n) => [n.name, n.line ?? "", n.direction ?? "", n.id]).filter(Boolean);
    const words = await sweep("Location notes", () => <LocationNotes />, () => expect(document.querySelectorAll(".notes-damaged > ul > li")).toHaveLength(3), [
      ...names,
      "odd-origin",
      "half-written",
      "steep",
      "clearAhead_m",
      "segments[0].gradient_permille",
    ]);
    expect(words).toEqual([]);
  });

  it("Settings, Load table, Assistance check (failed), Start review: only data is plain", async () => {
    // The version (" dev " from the sources) and the languages' own names are data too.
    const data = [...profileTexts(), ...WORKS, " dev ", "English", "Magyar", "Deutsch", "RangeError: offset 7", "RangeError: offset 9"];
    const { default: Settings } = await import("../../src/app/screens/Settings/index.js");
    expect(await sweep("Settings", () => <Settings />, () => expect(document.querySelectorAll(".sources li").length).toBeGreaterThan(7), data)).toEqual([]);
    const { default: LoadTable } = await import("../../src/app/screens/LoadTable/index.js");
    expect(await sweep("Load table", () => <LoadTable />, () => expect(document.querySelectorAll(".load-table-grid td").length).toBeGreaterThan(0), data)).toEqual([]);
    const { default: StartReview } = await import("../../src/app/screens/StartReview/index.js");
    expect(await sweep("Start review", () => <StartReview />, () => expect(document.body.textContent!.length).toBeGreaterThan(100), data)).toEqual([]);
    const { default: AssistanceCheck } = await import("../../src/app/screens/AssistanceCheck/index.js");
    const { fakePool } = await import("./dispatch/fakes.js");
    const pool = fakePool({ assistance: () => ({ ok: false, kind: "internal", issues: [], message: "RangeError: offset 7" }), conditionMargins: () => ({ ok: false, kind: "internal", issues: [], message: "RangeError: offset 9" }) });
    expect(await sweep("Assistance check (failed)", () => <AssistanceCheck />, () => expect(document.body.textContent).toContain("RangeError"), data, pool)).toEqual([]);
  });
});
