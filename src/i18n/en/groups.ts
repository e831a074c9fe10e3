/** A mixed train's wagon groups on Start plan (loaded with their form). */
import { namespace } from "../messages.js";

export const groups = namespace("groups", {
  wagonGroups: "Wagon groups, from the head",
  groupMass: "Mass of the group",
  addWagonGroup: "Add a wagon group",
  totals: { one: "In all: {count} wagon, {mass}", other: "In all: {count} wagons, {mass}" },
  totalsLength: ", {length} long",
  totalsNote: ". The largest-mass figures scale every group's load above tare in proportion.",
});
