/** Start plan inputs: presets, locomotives, train, location, rail condition and sand, target — one section each. */
import type { JSX } from "solid-js";
import type { Library } from "../../../profiles/library.js";
import type { StartCaseFile, TrainPresetFile } from "../../../profiles/schemas.js";
import type { CaseSettings } from "../../state/caseDraft.js";
import { ErrorList } from "../../components/ErrorList.js";
import type { UnitSystem } from "../../format.js";
import type { LocationChoice } from "../../locations.js";
import type { CaseDraftStore } from "../../state/createCaseDraft.js";
import { ConditionsSection } from "./ConditionsSection.js";
import { LocationSection } from "./LocationSection.js";
import { LocomotivesSection } from "./LocomotivesSection.js";
import { PresetsSection } from "./PresetsSection.js";
import { TargetSection } from "./TargetSection.js";
import { TrainSection } from "./TrainSection.js";

import { inputs } from "../../../i18n/en/inputs.js";
import { tr } from "../../i18n.js";

const t = tr.ns(inputs);

export interface InputsViewProps {
  store: CaseDraftStore;
  units: UnitSystem;
  library: Library;
  locations: readonly LocationChoice[];
  /** Why the saved notes could not be read, if they could not. */
  locationsError?: string | null;
  presets: readonly TrainPresetFile[];
  /** The demo cases the quick fill recreates whole. */
  cases?: readonly StartCaseFile[];
  /** The app's safety settings (an opened file's are replaced by them). */
  settings?: CaseSettings;
}

export function InputsView(props: InputsViewProps): JSX.Element {
  return (
    <form class="inputs" onSubmit={(e) => e.preventDefault()} aria-label={t("inputsLabel")}>
      <ErrorList issues={props.store.issues()} />
      <PresetsSection store={props.store} presets={props.presets} cases={props.cases ?? []} library={props.library} {...(props.settings ? { settings: props.settings } : {})} />
      <LocomotivesSection store={props.store} units={props.units} library={props.library} />
      <TrainSection store={props.store} units={props.units} library={props.library} />
      <LocationSection store={props.store} units={props.units} locations={props.locations} locationsError={props.locationsError} />
      <ConditionsSection store={props.store} units={props.units} />
      <TargetSection store={props.store} units={props.units} />
    </form>
  );
}
