/** A reference train in the words of the screen (Load table, a location note's editor and card). */
import type { Library } from "../../../profiles/library.js";
import { referenceLocomotives } from "../../../profiles/referenceTrain.js";
import type { ReferenceTrainFile, TrainPresetFile } from "../../../profiles/schemas.js";
import { placeWords } from "./words.js";

/**
 * A reference train's locomotives in the language on screen: "1 × <profile> at the head" (the profiles'
 * summary gives them in English, for the command line and the files).
 */
export function referenceLocomotiveWords(ref: ReferenceTrainFile, presets: readonly TrainPresetFile[], lib: Library): string | undefined {
  const preset = presets.find((p) => p.id === ref.train);
  if (!preset) return undefined;
  return referenceLocomotives(ref, preset)
    .map((g) => {
      const label = typeof g.profile === "string" ? (lib.locomotives.get(g.profile)?.file.label ?? g.profile) : g.profile.label;
      return `${g.count} × ${label} ${placeWords(g.position)}`;
    })
    .join(", ");
}
