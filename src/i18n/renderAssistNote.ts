/** An assistance option's note (src/core/dispatch/assistance.ts) in the translator's language and the reader's units. */
import type { AssistanceNote } from "../core/dispatch/assistance.js";
import type { AddedUnits } from "../core/dispatch/assistPlacement.js";
import { assistNotes } from "./en/assistNotes.js";
import type { Quantities } from "./renderLines.js";
import type { Translator } from "./translator.js";

/** An assistance option's note: how the added units are driven, the peak compression, shoving from the rear. */
export function assistanceNoteText(tr: Translator, q: Quantities, n: AssistanceNote): string {
  const t = tr.ns(assistNotes);
  if (n.code === "all-at-head") return t("noteAllAtHead");
  const place = (a: AddedUnits) => (a.position === "head" ? t("atHead") : a.position === "rear" ? t("atRear") : t("atAfterWagon", { wagon: String(a.position.afterWagon) }));
  const control = t(n.control === "with-head" ? "controlWithHead" : n.control === "remote" ? "controlRemote" : "controlHelper");
  const units = n.added.reduce((s, a) => s + a.count, 0);
  const who =
    n.added.length > 1
      ? t("noteUnitsMany", { list: n.added.map((a) => t("noteCountAt", { count: String(a.count), place: place(a) })).join(", "), control })
      : units === 1
        ? t("noteUnitOne", { place: place(n.added[0]!), control })
        : t("noteUnitsSame", { count: String(units), place: place(n.added[0]!), control });
  const where = n.where === null ? "" : t(n.where === "head" ? "nearHead" : n.where === "mid" ? "midTrain" : "nearRear");
  return [who, t("notePeak", { peak: q.force(n.peakN), where, coupling: String(n.coupling), couplings: String(n.couplings) }), n.rear ? t("noteShoving") : ""].filter((s) => s.length > 0).join(" ");
}
