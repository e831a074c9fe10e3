/** The location notes the Start plan can pick from, re-read when the source says they changed. */
import { createMemo, createSignal, onCleanup, type Accessor } from "solid-js";
import { builtinLibrary } from "../../profiles/builtin.js";
import { withLocations, type Library } from "../../profiles/library.js";
import { builtinLocationSource, locationSource, onLocationsChanged, type LocationChoice } from "../locations.js";

export interface LocationsStore {
  choices: Accessor<readonly LocationChoice[]>;
  /** The built-in library with every listed note. */
  library: Accessor<Library>;
  /** A message when the source failed. */
  error: Accessor<string | null>;
  refresh(): Promise<void>;
}

export function createLocations(base: Library = builtinLibrary()): LocationsStore {
  const [choices, setChoices] = createSignal<readonly LocationChoice[]>([]);
  const [error, setError] = createSignal<string | null>(null);
  let generation = 0;
  const refresh = async () => {
    const g = ++generation;
    try {
      const list = await locationSource()();
      if (g === generation) {
        setChoices(list);
        setError(null);
      }
    } catch (e) {
      if (g !== generation) return;
      setError(e instanceof Error ? e.message : String(e));
      // Keep planning possible: the built-in notes are part of the program.
      if (choices().length === 0) setChoices(await builtinLocationSource());
    }
  };
  void refresh();
  onCleanup(onLocationsChanged(() => void refresh()));
  const library = createMemo(() => withLocations(base, choices().map((c) => c.note)));
  return { choices, library, error, refresh };
}
