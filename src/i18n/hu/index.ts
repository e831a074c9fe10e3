/** The Hungarian catalog, a chunk of its own in the app (loaded when Hungarian is chosen). */
import type { Catalog } from "../messages.js";
import { shellHu } from "./shell.js";
import { cardHu } from "./card.js";
import { settingsHu } from "./settings.js";
import { stepsHu } from "./steps.js";
import { planHu } from "./plan.js";
import { inputsHu } from "./inputs.js";
import { dispatchHu } from "./dispatch.js";
import { cautionsHu } from "./cautions.js";
import { wordsHu } from "./words.js";
import { reasonsHu } from "./reasons.js";
import { guidanceHu } from "./guidance.js";
import { assistNotesHu } from "./assistNotes.js";
import { adviceHu } from "./advice.js";
import { trainHu } from "./train.js";
import { groupsHu } from "./groups.js";
import { cabHu } from "./cab.js";
import { tabsHu } from "./tabs.js";
import { chartHu } from "./chart.js";
import { sensitivityHu } from "./sensitivity.js";
import { readersHu } from "./readers.js";
import { unitsHu } from "./units.js";
import { printWaitsHu } from "./printWaits.js";

export const hu: Catalog = { shell: shellHu, words: wordsHu, settings: settingsHu, card: cardHu, steps: stepsHu, plan: planHu, inputs: inputsHu, dispatch: dispatchHu, cautions: cautionsHu, reasons: reasonsHu, guidance: guidanceHu, assistNotes: assistNotesHu, advice: adviceHu, train: trainHu, chart: chartHu, groups: groupsHu, cab: cabHu, tabs: tabsHu, sensitivity: sensitivityHu, readers: readersHu, units: unitsHu, printWaits: printWaitsHu };
