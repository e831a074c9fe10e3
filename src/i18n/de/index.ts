/** The German catalog, a chunk of its own in the app (loaded when German is chosen). */
import type { Catalog } from "../messages.js";
import { shellDe } from "./shell.js";
import { cardDe } from "./card.js";
import { settingsDe } from "./settings.js";
import { stepsDe } from "./steps.js";
import { planDe } from "./plan.js";
import { inputsDe } from "./inputs.js";
import { dispatchDe } from "./dispatch.js";
import { cautionsDe } from "./cautions.js";
import { wordsDe } from "./words.js";
import { reasonsDe } from "./reasons.js";
import { guidanceDe } from "./guidance.js";
import { assistNotesDe } from "./assistNotes.js";
import { adviceDe } from "./advice.js";
import { trainDe } from "./train.js";
import { groupsDe } from "./groups.js";
import { cabDe } from "./cab.js";
import { tabsDe } from "./tabs.js";
import { chartDe } from "./chart.js";
import { sensitivityDe } from "./sensitivity.js";
import { readersDe } from "./readers.js";
import { unitsDe } from "./units.js";
import { printWaitsDe } from "./printWaits.js";

export const de: Catalog = { shell: shellDe, words: wordsDe, settings: settingsDe, card: cardDe, steps: stepsDe, plan: planDe, inputs: inputsDe, dispatch: dispatchDe, cautions: cautionsDe, reasons: reasonsDe, guidance: guidanceDe, assistNotes: assistNotesDe, advice: adviceDe, train: trainDe, chart: chartDe, groups: groupsDe, cab: cabDe, tabs: tabsDe, sensitivity: sensitivityDe, readers: readersDe, units: unitsDe, printWaits: printWaitsDe };
