/**
 * The built-in rail table's notes on its sources in the language on screen. The file
 * (profiles/conditions/rail-conditions.json) writes each note in English; the catalog (i18n sources.ts)
 * holds the same note as a template whose English, filled with the figures and works below, is the file's
 * note word for word. A note the file changes (or a condition it adds) no longer matches and is shown as
 * the file gives it, so the screen never says something the table does not.
 */
import { fill } from "../../../i18n/messages.js";
import { sources } from "../../../i18n/en/sources.js";
import { appNumber, tr } from "../../i18n.js";

type NoteKey = "railNoteMemory" | "railNoteDry" | "railNoteDamp" | "railNoteWet" | "railNoteLeaves";
/** A figure in a note: its value and the decimals the file writes it with. */
type Figure = { x: number; decimals: number };

/** Each condition's note: its template, the published works as published, and its figures. */
const NOTES: Readonly<Record<string, { key: NoteKey; text?: Record<string, string>; figures?: Record<string, Figure> }>> = {
  dry: { key: "railNoteDry", text: { authors: "Curtius–Kniffler", work: "Elektrische Bahnen 20, 1950" }, figures: { mu: { x: 0.3315, decimals: 4 } } },
  damp: { key: "railNoteDamp", text: { work: "Fisk et al., IMechE Stephenson Conference 2015" } },
  wet: { key: "railNoteWet", text: { work: "Koffman 1948, J. Inst. Locomotive Engineers paper 479" }, figures: { factor: { x: 0.6, decimals: 1 } } },
  frost: { key: "railNoteMemory" },
  leaves: { key: "railNoteLeaves", text: { work: "Olofsson et al., Proc. IMechE F 218, 2004" } },
  greasy: { key: "railNoteMemory" },
};

const ts = tr.ns(sources);

/** The note as the catalog's English writes it (figures with a decimal point): equal to the file's when they agree. */
export function englishRailNote(rail: string): string | null {
  const n = NOTES[rail];
  if (!n) return null;
  const figures = Object.fromEntries(Object.entries(n.figures ?? {}).map(([k, f]) => [k, f.x.toFixed(f.decimals)]));
  return fill(sources.en[n.key], { ...n.text, ...figures }, String);
}

/** The note on `rail`'s source in the language on screen, or the file's own words when the catalog does not hold them. */
export function railNote(rail: string, fileNote: string): string {
  const n = NOTES[rail];
  if (!n || englishRailNote(rail) !== fileNote) return fileNote;
  const figures = Object.fromEntries(Object.entries(n.figures ?? {}).map(([k, f]) => [k, appNumber(f.x, f.decimals)]));
  return (ts as (k: string, p: Record<string, string>) => string)(n.key, { ...n.text, ...figures });
}
