/**
 * A sweep for English left on screen in Hungarian and German: every screen mounted with the demo, its
 * states walked (a plan shown and its charts' legends, a planner stopped, empty lists, Cab steps with a
 * helper's own driver, a note in the editor, a new note and its revision list, the printable card, Settings
 * with its rail tables and About, Start review), and every text and every aria-label, placeholder and title
 * read. A word of the English catalog (src/i18n/en) that is not also a word of the language's own catalog
 * (src/i18n/<lang>) is a leftover — "Start" is German as well as English, "Print" is not. Taken out first,
 * with reasons:
 *  - the demo's own texts (names, labels, the notes' practice lines): illustrative data, labelled as such on
 *    screen, kept as written (profiles/*);
 *  - the published works Settings cites, as they were published;
 *  - each language's own name in the language choice ("English" is how English is offered);
 *  - code elements (<code>): commands, file columns and ids, language-neutral by design.
 * What was found is written to the test's log. fake-indexeddb stands in for the browser's store.
 */
import "fake-indexeddb/auto";
import { cleanup, fireEvent, waitFor } from "@solidjs/testing-library";
import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";
import type { JSX } from "solid-js";
import { afterAll, afterEach, describe, expect, it } from "vitest";
import { appLang, setAppLanguage } from "../../src/app/i18n.js";
import { SETTINGS_KEY } from "../../src/app/state/createSettings.js";
import { NAMESPACES } from "../../src/i18n/en/index.js";
import type { Lang } from "../../src/i18n/language.js";
import { builtinCases, builtinLocations, builtinRailConditions } from "../../src/profiles/builtin.js";
import { wordsHu } from "../../src/i18n/hu/words.js";
import { wordsDe } from "../../src/i18n/de/words.js";
import { SCREENS } from "../../src/app/screens/registry.js";
import { notes } from "../../src/i18n/en/notes.js";
import { createTranslator } from "../../src/i18n/translator.js";
import { hu } from "../../src/i18n/hu/index.js";
import { huLater } from "../../src/i18n/hu/later.js";
import { de } from "../../src/i18n/de/index.js";
import { deLater } from "../../src/i18n/de/later.js";
import type { WorkerLike } from "../../src/worker/client.js";
import { fakePool } from "./dispatch/fakes.js";
import { memoryStorage, quickTablePool, renderWithApp } from "./harness.js";
import { CITED_WORKS } from "./citedWorks.js";

const WORD = /\p{L}+/gu;

/** Every word of a message text (its placeholders taken out), lower case. */
function wordsOf(text: string): string[] {
  return (text.replace(/\{[^{}]*\}/g, " ").match(WORD) ?? []).map((w) => w.toLowerCase());
}

/** Every string anywhere inside `x`. */
function stringsIn(x: unknown, out: string[] = []): string[] {
  if (typeof x === "string") out.push(x);
  else if (Array.isArray(x)) for (const v of x) stringsIn(v, out);
  else if (x && typeof x === "object") for (const v of Object.values(x)) stringsIn(v, out);
  return out;
}

/** The English catalog's words. */
const ENGLISH = new Set(NAMESPACES.flatMap((n) => stringsIn(n.en).flatMap(wordsOf)));

/** Every word of a language's catalogs (all its modules: the first chunk's and the later parts'). */
const OWN: Record<Exclude<Lang, "en">, Set<string>> = {
  hu: new Set(Object.values(import.meta.glob("../../src/i18n/hu/*.ts", { eager: true })).flatMap((m) => stringsIn(m).flatMap(wordsOf))),
  de: new Set(Object.values(import.meta.glob("../../src/i18n/de/*.ts", { eager: true })).flatMap((m) => stringsIn(m).flatMap(wordsOf))),
};

const profiles = join(process.cwd(), "profiles");
/** The demo's texts (illustrative data, labelled so on screen), longest first so a name goes before its parts. */
const DEMO_TEXTS = (() => {
  const out = new Set<string>();
  for (const dir of ["cases", "locations", "locomotives", "trains", "wagons", "departures"]) {
    for (const f of readdirSync(join(profiles, dir))) if (f.endsWith(".json")) for (const s of stringsIn(JSON.parse(readFileSync(join(profiles, dir, f), "utf8")))) if (/\p{L}{3}.* /u.test(s)) out.add(s);
  }
  // Texts of two words and more only: a file's codes ("dry", "rear") are the app's words too, never taken out.
  // The rail conditions file is not demo data: it is the app's own table, so its texts are not taken out.
  return [...out].sort((a, b) => b.length - a.length);
})();

/** Pairs of words that stand next to each other in the demo's texts: a demo name drawn in parts (a case's
 * name and its detail, a locomotive's label split at its comma) is still known as data by its pairs. */
const DEMO_PAIRS = new Set(DEMO_TEXTS.flatMap((t) => {
  const w = (t.match(WORD) ?? []).map((x) => x.toLowerCase());
  return w.slice(1).map((b, i) => `${w[i]} ${b}`);
}));

const WORKS = CITED_WORKS;

/** The languages' own names, as the language choice offers them. */
const LANGUAGE_NAMES = ["English", "Magyar", "Deutsch"];

/**
 * The texts a person meets in `root`, by block (a paragraph, a cell, a button…: its text nodes outside <code>,
 * in order, so a name drawn in two spans is still read as one), then each aria-label, placeholder and title,
 * and what each text field holds.
 */
function textsOf(root: Element): string[][] {
  const blocks = new Map<Element, string[]>();
  const walker = document.createTreeWalker(root, NodeFilter.SHOW_TEXT);
  for (let n = walker.nextNode(); n; n = walker.nextNode()) {
    const p = n.parentElement;
    if (!p || p.closest("code, script, style") || !n.textContent?.trim()) continue;
    const block = p.closest("p, li, td, th, h1, h2, h3, h4, button, label, caption, legend, option, dt, dd, figcaption, div") ?? root;
    blocks.set(block, [...(blocks.get(block) ?? []), n.textContent]);
  }
  const out = [...blocks.values()];
  for (const e of root.querySelectorAll("[aria-label], [placeholder], [title]")) for (const a of ["aria-label", "placeholder", "title"]) if (e.getAttribute(a)) out.push([e.getAttribute(a)!]);
  // What a field already holds is on screen too (a revision entry's words filled in for the person).
  for (const e of root.querySelectorAll<HTMLInputElement | HTMLTextAreaElement>('input:not([type]), input[type="text"], textarea')) if (e.value.trim()) out.push([e.value]);
  return out;
}

/** English words in `root` that are not words of `lang`, each with the text it stands in. */
function leftovers(root: Element, lang: Exclude<Lang, "en">, extra: readonly string[] = []): string[] {
  const out = new Set<string>();
  for (const parts of textsOf(root)) {
    // Each part's words, the data in it taken out first; a pair of the demo's words may span two parts.
    const ws = parts.flatMap((t0) => {
      let t = t0;
      for (const d of [...extra, ...DEMO_TEXTS, ...WORKS, ...LANGUAGE_NAMES]) if (t.includes(d)) t = t.split(d).join(" | ");
      return t.split(" | ").flatMap((piece, k) => [...(k > 0 ? ["|"] : []), ...(piece.match(WORD) ?? [])]);
    });
    const lws = ws.map((x) => x.toLowerCase());
    const pair = (i: number) => i >= 0 && i + 1 < lws.length && DEMO_PAIRS.has(`${lws[i]} ${lws[i + 1]}`);
    const shown = parts.join("").trim().slice(0, 140);
    ws.forEach((w, i) => {
      const lw = lws[i]!;
      if (w === "|" || pair(i - 1) || pair(i)) return;
      if (ENGLISH.has(lw) && !OWN[lang].has(lw)) out.add(`${w}  ⟵  ${shown}`);
    });
  }
  return [...out];
}

const found: string[] = [];
afterEach(async () => {
  cleanup();
  await setAppLanguage("en");
});
afterAll(() => {
  process.stdout.write(`\nEnglish words on Hungarian and German screens:\n${found.join("\n") || "(none)"}\n`);
});

/** A screen in `lang`, mounted with a fresh app state; `walk` brings it to each state, `look` sweeps the page there. */
async function inLanguage(lang: Exclude<Lang, "en">, ui: (() => JSX.Element) | undefined, opts: { pool?: unknown; start?: "en"; createWorker?: () => WorkerLike } = {}) {
  const storage = memoryStorage();
  if (opts.start !== "en") storage.setItem(SETTINGS_KEY, JSON.stringify({ language: lang }));
  const r = renderWithApp(ui, { storage, pool: (opts.pool ?? quickTablePool()) as never, ...(opts.createWorker ? { createWorker: opts.createWorker } : {}) });
  if (opts.start !== "en") await waitFor(() => expect(appLang()).toBe(lang), { timeout: 10_000 });
  const words: string[] = [];
  return {
    ...r,
    /** Sweep the whole page as it is now, under `state`. */
    look(state: string, extra: readonly string[] = []) {
      const w = leftovers(document.body, lang, extra).map((x) => `[${lang}] ${state}: ${x}`);
      found.push(...w);
      words.push(...w);
    },
    words,
  };
}

const click = (el: Element | null | undefined) => {
  if (!el) throw new Error("nothing to click");
  fireEvent.click(el);
};
const buttonWith = (text: string) => [...document.querySelectorAll("button")].find((b) => b.textContent?.includes(text));

const LANGS = ["hu", "de"] as const;

describe.each(LANGS)("no English left on screen in %s", (lang) => {
  it("Start plan: the demo's plan with its step cards and the charts' legends, also after a switch from English", async () => {
    const { default: StartPlan } = await import("../../src/app/screens/StartPlan/index.js");
    const s = await inLanguage(lang, () => <StartPlan />, { start: "en" });
    await waitFor(() => expect(document.querySelector(".verdict:not(.stale)")).not.toBeNull(), { timeout: 20_000 });
    await waitFor(() => expect(document.querySelectorAll(".legend li").length).toBeGreaterThan(4), { timeout: 20_000 });
    await setAppLanguage(lang);
    await waitFor(() => expect(appLang()).toBe(lang));
    s.look("Start plan, switched from English");
    expect(s.words).toEqual([]);
  });

  it("Start plan: the planner stopped (its worker failed without a word)", async () => {
    const { default: StartPlan } = await import("../../src/app/screens/StartPlan/index.js");
    const s = await inLanguage(lang, () => <StartPlan />, { createWorker: () => new StoppingWorker() });
    await waitFor(() => expect(document.querySelector(".problem[role=alert]")).not.toBeNull(), { timeout: 20_000 });
    s.look("Start plan, the planner stopped");
    expect(s.words).toEqual([]);
  });

  it("Start plan with inputs that break a rule: the plan withdrawn, each field's message", async () => {
    const { default: StartPlan } = await import("../../src/app/screens/StartPlan/index.js");
    const s = await inLanguage(lang, () => <StartPlan />);
    await waitFor(() => expect(document.querySelector(".verdict:not(.stale)")).not.toBeNull(), { timeout: 20_000 });
    s.harness.state.draft.set("train", "trailingMass_t", -10);
    s.harness.state.draft.set("train", "couplerSlack_mm", 900);
    s.harness.state.draft.set("conditions", "temperature_C", 200);
    await waitFor(() => expect(s.harness.state.run.status()).toBe("invalid"), { timeout: 20_000 });
    await waitFor(() => expect(document.querySelectorAll(".field-issue").length).toBeGreaterThanOrEqual(3), { timeout: 20_000 });
    s.look("Start plan, inputs that break a rule");
    expect(s.words).toEqual([]);
  });

  it("the whole app: each tab with the top bar, the tabs and the print stamp", async () => {
    const s = await inLanguage(lang, undefined);
    await waitFor(() => expect(document.querySelector(".verdict:not(.stale)")).not.toBeNull(), { timeout: 20_000 });
    for (const screen of SCREENS.filter((x) => !x.noTab && !x.fullScreen)) {
      location.hash = `#/${screen.id}`;
      await waitFor(() => expect(document.querySelector(`[data-screen="${screen.id}"]`)).not.toBeNull(), { timeout: 15_000 });
      await waitFor(() => expect(document.querySelector(".print-stamp")).not.toBeNull(), { timeout: 15_000 });
      s.look(`the app on ${screen.id}`);
    }
    expect(s.words).toEqual([]);
  }, 90_000);

  it("Cab steps with a helper's own driver", async () => {
    const { default: CabSteps } = await import("../../src/app/screens/CabSteps/index.js");
    const s = await inLanguage(lang, () => <CabSteps />);
    const mixed = builtinCases.find((c) => c.id?.includes("mixed"))!;
    s.harness.state.draft.loadCase(mixed);
    // The rear unit as a helper with its own driver: Cab steps then offers the choice of whose steps to show.
    s.harness.state.draft.set("locomotives", 1, "control" as never, "helper" as never);
    await waitFor(() => expect(document.querySelector(".cab-driver")).not.toBeNull(), { timeout: 30_000 });
    s.look("Cab steps, head driver");
    const drivers = document.querySelectorAll(".cab-driver button");
    click(drivers[drivers.length - 1]);
    s.look("Cab steps, helper's driver");
    click(document.querySelector(".slip-button"));
    s.look("Cab steps, If wheels slip");
    expect(s.words).toEqual([]);
  }, 60_000);

  it("Assistance check", async () => {
    const { default: AssistanceCheck } = await import("../../src/app/screens/AssistanceCheck/index.js");
    const s = await inLanguage(lang, () => <AssistanceCheck />);
    await waitFor(() => expect(document.body.textContent!.length).toBeGreaterThan(200), { timeout: 20_000 });
    await waitFor(() => expect(document.querySelectorAll(".legend li").length).toBeGreaterThan(0), { timeout: 20_000 });
    s.look("Assistance check");
    expect(s.words).toEqual([]);
  });

  it("Departures: empty, then the demo day", async () => {
    const { default: Departures } = await import("../../src/app/screens/Departures/index.js");
    const s = await inLanguage(lang, () => <Departures />);
    await waitFor(() => expect(document.querySelector('input[type="file"]')).not.toBeNull());
    s.look("Departures, empty");
    const day = readFileSync(join(profiles, "departures/demo-day.json"), "utf8");
    fireEvent.change(document.querySelector('input[type="file"]')!, { target: { files: [new File([day], "demo-day.json")] } });
    await waitFor(() => expect(document.querySelectorAll("tbody tr").length).toBeGreaterThan(0), { timeout: 20_000 });
    s.look("Departures, the demo day", ["demo-day.json"]);
    expect(s.words).toEqual([]);
  }, 60_000);

  it("Load table with its chart's legend", async () => {
    const { default: LoadTable } = await import("../../src/app/screens/LoadTable/index.js");
    const s = await inLanguage(lang, () => <LoadTable />);
    await waitFor(() => expect(document.querySelectorAll(".load-table-grid td").length).toBeGreaterThan(0), { timeout: 20_000 });
    await waitFor(() => expect(document.querySelectorAll(".legend li").length).toBeGreaterThan(0), { timeout: 20_000 });
    s.look("Load table");
    expect(s.words).toEqual([]);
  });

  it("Load table and Assistance check while they work, and cancelled", async () => {
    // A pool that holds every request: the screens stay at work until cancelled.
    const { default: LoadTable } = await import("../../src/app/screens/LoadTable/index.js");
    const s = await inLanguage(lang, () => <LoadTable />, { pool: fakePool({}) });
    await waitFor(() => expect(document.querySelector(".panel-head .button")).not.toBeNull(), { timeout: 20_000 });
    s.look("Load table, at work");
    click(document.querySelector(".panel-head .button"));
    await waitFor(() => expect(document.querySelector(".panel-head .button.primary")).not.toBeNull());
    s.look("Load table, cancelled");
    cleanup();
    const { default: AssistanceCheck } = await import("../../src/app/screens/AssistanceCheck/index.js");
    const { forgetAssistanceChecks } = await import("../../src/app/screens/AssistanceCheck/createAssistanceCheck.js");
    forgetAssistanceChecks();
    const a = await inLanguage(lang, () => <AssistanceCheck />, { pool: fakePool({}) });
    await waitFor(() => expect(document.querySelector(".dispatch-run-row .button")).not.toBeNull(), { timeout: 20_000 });
    a.look("Assistance check, at work");
    click(document.querySelector(".dispatch-run-row .button"));
    await waitFor(() => expect(document.querySelector(".dispatch-run-row .button.primary")).not.toBeNull());
    a.look("Assistance check, cancelled");
    expect([...s.words, ...a.words]).toEqual([]);
  });

  it("Location notes: the library, a note in the editor, a new note, the printable card", async () => {
    const { default: LocationNotes } = await import("../../src/app/screens/LocationNotes/index.js");
    const s = await inLanguage(lang, () => <LocationNotes />);
    // The store outlives a test: a note saved in the other language's run may be there too.
    await waitFor(() => expect(document.querySelectorAll(".notes-item-open").length).toBeGreaterThanOrEqual(builtinLocations.length), { timeout: 15_000 });
    s.look("Location notes, the library");
    click(document.querySelector(".notes-item-open"));
    await waitFor(() => expect(document.querySelector('[data-field="revision.date"]')).not.toBeNull(), { timeout: 15_000 });
    await waitFor(() => expect(document.querySelector(".notes-loadtable")).not.toBeNull(), { timeout: 15_000 });
    s.look("Location notes, the demo note in the editor");
    const tn = createTranslator(lang, lang === "hu" ? { ...hu, ...huLater } : { ...de, ...deLater }).ns(notes);
    // Its card, as it prints.
    click(buttonWith(tn("edCardPrint")));
    await waitFor(() => expect(document.querySelector(".notes-card .card-foot")).not.toBeNull(), { timeout: 15_000 });
    await waitFor(() => expect(document.querySelector(".notes-card .notes-loadtable")).not.toBeNull(), { timeout: 15_000 });
    s.look("Location notes, the card");
    // Its foot's rail-condition line in the language, with the language's decimal comma (the table's dry 0.33 / 0.36).
    const dry = builtinRailConditions.conditions.dry!;
    const comma = (x: number) => x.toFixed(2).replace(".", ",");
    expect(document.querySelector(".notes-card .card-computed")?.textContent).toContain(`${(lang === "hu" ? wordsHu : wordsDe).railInlineDry} ${comma(dry.median)} / ${comma(dry.sanded)}`);
    // A new note: its empty lists, its revision entry, then saved with its revision list.
    cleanup();
    const s2 = await inLanguage(lang, () => <LocationNotes />);
    await waitFor(() => expect(buttonWith(tn("newNote"))).toBeDefined(), { timeout: 15_000 });
    click(buttonWith(tn("newNote")));
    await waitFor(() => expect(document.querySelector('[data-field="name"] input')).not.toBeNull(), { timeout: 15_000 });
    s2.look("Location notes, a new note");
    fireEvent.input(document.querySelector('[data-field="name"] input')!, { target: { value: `Próba ${lang}` } });
    fireEvent.input(document.querySelector('[data-field="revision.initials"] input')!, { target: { value: "QA" } });
    await waitFor(() => expect((buttonWith(tn("edSave")) as HTMLButtonElement).disabled).toBe(false), { timeout: 15_000 });
    click(buttonWith(tn("edSave")));
    await waitFor(() => expect(document.querySelectorAll(".notes-revisions tbody tr").length).toBe(1), { timeout: 15_000 });
    s2.look("Location notes, the new note saved, its revision list", [`Próba ${lang}`, "QA"]);
    expect([...s.words, ...s2.words]).toEqual([]);
  }, 60_000);

  it("Settings with the rail tables and About", async () => {
    const { default: Settings } = await import("../../src/app/screens/Settings/index.js");
    const s = await inLanguage(lang, () => <Settings />);
    await waitFor(() => expect(document.querySelectorAll(".sources li").length).toBeGreaterThan(5));
    s.look("Settings");
    expect(s.words).toEqual([]);
  });

  it("Start review at a note: a recording reviewed", async () => {
    const { default: StartReview } = await import("../../src/app/screens/StartReview/index.js");
    const { setReviewTarget } = await import("../../src/app/state/reviewTarget.js");
    const { planSequence, planStart, scaledCase } = await import("../../src/core/index.js");
    const { locationFromNote } = await import("../../src/profiles/convert.js");
    const { csvText, simulatedStart } = await import("../tools/recordings.js");
    const note = builtinLocations[0]!;
    setReviewTarget(note.id);
    const s = await inLanguage(lang, () => <StartReview />);
    await waitFor(() => expect(document.querySelector(".review-screen input[type=file]")).not.toBeNull(), { timeout: 15_000 });
    s.look("Start review, before a recording");
    const checked = s.harness.state.draft.checked();
    if (!checked.ok) throw new Error("the default case is not valid");
    const c = { ...checked.value, location: locationFromNote(note) };
    const run = simulatedStart(scaledCase(c, { massFactor: 1.15, effortFactor: 1 }), planSequence(planStart(c, { skipMassSearch: true, skipVerification: true })), { extraS: 10 });
    fireEvent.change(document.querySelector(".review-screen input[type=file]")!, { target: { files: [new File([csvText(run)], "start.csv")] } });
    await waitFor(() => expect(document.querySelectorAll(".review-result li").length).toBeGreaterThan(0), { timeout: 30_000 });
    s.look("Start review, a recording reviewed", ["start.csv"]);
    // Its sketch's three lines (recorded, planned, re-run) are told apart without colour, as its caption says.
    const dashes = [...document.querySelectorAll(".review-result .review-sketch polyline")].map((p) => p.getAttribute("stroke-dasharray") ?? "solid");
    expect(new Set(dashes).size).toBe(3);
    expect(s.words).toEqual([]);
  }, 90_000);

  it("Start review, nothing to review yet", async () => {
    const { default: StartReview } = await import("../../src/app/screens/StartReview/index.js");
    const s = await inLanguage(lang, () => <StartReview />);
    await waitFor(() => expect(document.body.textContent!.length).toBeGreaterThan(50));
    s.look("Start review");
    expect(s.words).toEqual([]);
  });
});

/** A planner whose worker fails at the first request, as a worker whose script dies says nothing (no message). */
class StoppingWorker implements WorkerLike {
  onmessage: WorkerLike["onmessage"] = null;
  onerror: WorkerLike["onerror"] = null;
  postMessage() {
    setTimeout(() => this.onerror?.({}), 0);
  }
  terminate() {}
}

describe("the sweep itself", () => {
  it("finds an English word of the catalog, passes a word both languages share, the demo's names and the works cited", () => {
    const div = document.createElement("div");
    div.innerHTML = `<p>Start</p><button>Nyomtatás</button><p title="Print">x</p><p><span>Aggregate block</span><span>leaving Ashvale Loop on a dry afternoon</span></p><li>Koffman 1948, J. Inst. Locomotive Engineers paper 479</li><label>None recorded.</label><input type="text" value="New note.">`;
    document.body.append(div);
    const got = leftovers(div, "hu").map((x) => x.split("  ")[0]);
    div.remove();
    // "Start" is Hungarian too ("start"); "Print" (a title) and the filled-in field are not.
    expect(got.sort()).toEqual(["New", "None", "Print", "recorded"].sort());
  });
});

describe("the rail table's notes on their sources", () => {
  it("the catalog's English of each note is the file's note word for word, so the translated note says what the file says", async () => {
    const { englishRailNote, railNote } = await import("../../src/app/screens/Settings/railNotes.js");
    for (const [rail, c] of Object.entries(builtinRailConditions.conditions)) expect([rail, englishRailNote(rail)]).toEqual([rail, c.source]);
    // A note the catalog does not hold is shown as the file gives it.
    await setAppLanguage("de");
    expect(railNote("dry", "Measured on our own line (2026).")).toBe("Measured on our own line (2026).");
    expect(railNote("wet", builtinRailConditions.conditions.wet.source)).toContain("0,6 × trocken");
  });
});
