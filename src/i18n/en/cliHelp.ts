/**
 * Each command's one-line summary and its --help text (after the usage line). English here is the same
 * text as each command's own `summary` and `help` with its figures as placeholders (src/cli/help.ts fills
 * them; tests/cli/helpLanguages.test.ts checks the two are equal); option names and values are never
 * translated (INTERFACE.md: the command line is a stable contract).
 */
import { namespace } from "../messages.js";

export const cliHelp = namespace("cliHelp", {
  planSummary: "start plan for one train: verdict, resistance, adhesion, steps, assistance",
  planHelp: `Computes whether the locomotives can start the train at the location, and how.
When the verdict is not "starts", it also searches for assistance: one or two more units of the
lead unit's profile (or --helper) at the head, at the rear or mid-train, each option checked by the
planner's dynamics; options that start are listed cheapest first. When no option works it gives the
largest first part of the train that starts (dividing the train). To keep \`plan\` to a few seconds the
search is capped here at {budget} planner runs for the options ({fullPlans} of them fully verified) and {divide}
for dividing; the output says when the cap cut the search short.

CASE.json is a start-case file (taut/start-case@1); "-" reads it from standard input.

Overrides (what changes between departures; the case file is left as it is):
  --rail R            rail condition: {rails}
  --sand, --no-sand   sand on or off
  --mass T            trailing mass, tonnes
  --grade PERMILLE    gradient under the whole train, per mille (positive rises ahead); a case that
                      stands on a track profile or a location note becomes a uniform grade with the
                      profile's sharpest curve under the train and its distance clear ahead

Options:
  --json              print the plan as JSON instead of a table: the same figures, each field named
                      with its unit (trailingMass_t, peakCouplerForce_kN, ...), for scripts
  --demo              use the built-in illustrative demo case instead of a file
  --notes FILE        location notes (a taut/location@1 note or a taut/notes-bundle@2 bundle)
                      the case's "location" may name by id; may be given more than once
  --location NOTE-ID  start at this location note instead of the case's own location
  --helper ID         locomotive profile the assistance options add (default: the lead unit's)
  --helper-control C  how units added mid-train or at the rear are driven: remote (own notch from the
                      head cab; default) or helper (own driver, coordinated by radio)
  --no-assistance     do not search for assistance
  --conditions        also give the verdict and margins for every rail condition, without and with
                      sand (12 more plans: several seconds)`,
  checkSummary: "batch check of departures: verdict, margin, largest mass, cheapest assistance",
  checkHelp: `Checks many departures at once: one row each with the verdict, its reasons, the margin (allowance ÷
demand) of the limit that binds, the largest trailing masses that start and that are at least marginal
(the same figures \`taut plan\` gives), and the cheapest assistance that makes it start (one or two more
units of the lead unit's profile, or --helper; when none works and the train needs assistance, dividing
it into no more than three parts).

Input:
  CSV   a header line naming the columns id,case,rail,sand (and optionally location); \`case\` is a
        start-case file relative to the CSV (in its folder or below), \`rail\` and \`sand\` (yes/no)
        override its conditions, \`location\` (a location note id) its location. Empty cells keep
        the case's own values.
  JSON  a list of start cases ({jsonList}), each with an optional "id".
A case's location may name a location note by id (built-in, or from --notes).

A row that cannot be read is reported with its line (CSV, the header is line 1) or its index (JSON,
from 0); the other rows are still answered. Identical departures are worked out once.

Options:
  --sort risk   most at risk first, as the app's Departures screen: needs assistance, then marginal,
                then starts, each by margin (smallest first), rows not answered last; ties in file
                order. --sort file (the default) keeps the file's order.
  --json        rows as JSON: {json}
  --csv         rows as CSV
  --notes FILE  location notes (a taut/location@1 note or a taut/notes-bundle@2 bundle); repeatable
  --helper ID   locomotive profile the assistance options add (default: each train's lead unit's)
  --jobs N      worker threads (default: the available cores, here {jobs}; 1 runs on this thread)
  --shard K/N   answer only every N-th departure of the file, from the K-th (K = 1…N): N jobs of a
                batch scheduler's job array split a day among machines; join their CSV outputs after
                (README: Splitting a day among machines)
  --quiet       no progress lines on stderr
  --allow-outside
                also read case files outside the CSV's folder (by default only that folder and the
                folders below it)

Each departure's assistance search is capped at {budget} planner runs for the options and {divide} for dividing
the train; \`taut plan\` on the case lists every option that starts.

Exit codes: 0 when every row was answered; 2 when some rows were bad input (they are listed, the
others still answered) or the file itself cannot be read; 1 when the calculation failed on a row.`,
  tableSummary: "load table of a location: largest startable mass per rail condition, with and without sand",
  tableHelp: `The largest trailing mass the locomotives start at a location, for every rail condition, without and
with sand. Every figure is a bisection over the start planner's verdict (below the static limit), so a
train just lighter than the figure starts and one just heavier does not. Twelve mass searches, run in
parallel worker threads: expect some seconds.

LOCATION.json is a location note (taut/location@1), or a bundle (taut/notes-bundle@2) with --note ID;
a built-in note may be named by its id instead of a file.

The train the table is for: the note's reference train — the one the app's Location notes card uses —
or, for a note that names none, the first train preset ({firstTrain}); --loco and --count replace its
locomotives. Any train option (--wagons, --wagon-type, --slack, --limit) makes it a train of --wagons
wagons of --wagon-type instead (default {wagons} × {wagonType}) with roller bearings.

Options:
  --note ID          which note of a bundle
  --loco ID          locomotive profile at the head (default: the reference train's; needed with train options)
  --count N          how many of them (default: the reference train's, or 1)
  --wagons N         wagons in the train (default {wagons})
  --wagon-type ID    wagon type (default {wagonType})
  --slack MM         free slack per coupling (default: the wagon type's)
  --limit KN         coupling working limit, 100 to 5000 (default 970 kN knuckle, 850 kN screw)
  --temperature C    air temperature (default {temperature} °C, or the reference train's)
  --target-kmh V     speed the start must reach (default {target} km/h, at most the note's speed limit)
  --jobs N           worker threads (default: the available cores; 1 runs on this thread)
  --quiet            no progress lines on stderr
  --json | --csv     machine-readable output`,
  simulateSummary: "run a given notch sequence through the train dynamics model",
  simulateHelp: `Runs the notches you give (notch@seconds) and reports when the last vehicle moves, coupler forces
along the train, take-up speeds, wheel slips and the final speed and distance. A run in which the
wheels slip opens with a WARNING (and \`warnings\` in the JSON): try lower notches or later steps.
The brakes come off as the plan takes them off: the train brake's release starts at 0 s and runs to the
rear (on a falling grade the locomotive brake cannot hold, it is eased in stages); the locomotive brake
holds until --release-at (default: the plan's moment, and at least 3 s after the first notch).
Without --duration the run goes on until the case's target is reached, and says why it stopped first:
the time cap ({cap} s), a stall, or wheels held slipping at a standstill.

Options:
  --sequence S          notch@seconds, comma separated (required)
  --duration S          simulate exactly S seconds
  --release-at S        when the locomotive brake is eased off, s
  --brake-released      the train brake is already released at 0 s (the locomotive brake then holds
                        until 3 s after the first notch unless --release-at says otherwise)
  --adhesion-quantile Q adhesion the run assumes: 0.5 median (default), 0.1 the 10 % worst
  --json                JSON output
  --series              with --json, include the decimated time series`,
  reviewSummary: "hold a recorded start (GPX or CSV) against the plan and fit the observed factors",
  reviewHelp: `Lays a recorded start over the case's plan at the moment of start (the speed first stays above 2 km/h
for 5 s) and fits, by re-running the dynamics model, the factor on the trailing mass that reproduces it
("behaved as if 12 % heavier"), with a 95 % interval. With the notch logged it also fits the units'
effort, and says when the recording cannot tell the two apart; with notch and current, it finds slips
(the current falls while the notch holds). It then re-plans with the fitted values: would the verdict change?

RECORDING: a GPX 1.1 track (time and position; speed from the positions, or the speed logged with the
points) or a CSV log with the header time_s,speed_kmh[,notch][,current_A][,distance_m].

Options:
  --json     JSON output (the fitted factors are massFactor and effortFactor, each with low and high)
  --series   with --json, include the plan, the recording and the fitted run at 1 s`,
  notesSummary: "location notes from other files: from-railml (a stretch of a railML 2.x line)",
  notesHelp: `from-railml: a location note from a railML 2.2–2.5 infrastructure file. The tracks' gradientChanges and
radiusChanges are followed through their trackBegin / trackEnd connections for --behind metres behind
the front of the standing train and --ahead metres ahead of it, and laid end to end: chainage 0 at the
rear end of the stretch, gradients rising positive in the direction of travel, radius 0 for straight.
Signals facing the train, points, level crossings, tunnels, bridges and platform edges in the stretch
become the note's hazards; the lowest vMax ahead of the front its speed limit.

Options:
  --at POS           where the front stands: a line position in metres (railML absPos), a pos on the
                     track given with --track, or the name, id or code of an operational point
  --direction D      up: towards increasing pos of the front's track (railML dir="up"); down: the other way
  --behind M         metres of line behind the front (default {behind}; at least the train's length)
  --ahead M          metres of line ahead of the front (default {ahead}); the note's clear distance
  --track ID         the track the front stands on (needed where a line position is on several tracks)
  --name TEXT        the note's name (default: the operational point or track and position)
  --id ID            the note's id (default: made from the name)
  --initials XX      initials for the note's first revision entry (default: railML)
  --no-hazards       leave out the hazards
  --out FILE         write the note to FILE
  --json             print the note (taut/location@1) on standard output

railML 3 files are recognised and refused. XML entity declarations are refused, never expanded.`,
  // The --lang option, which every command's --help lists last among its options (src/cli/help.ts withLangOption).
  langOption: "the language of the text: en English, hu Hungarian, de German (default: from LC_ALL, LC_MESSAGES or LANG); JSON and CSV are the same in every language",
  // The usage lines' placeholders that are words (src/cli/help.ts usageText): in capitals, no spaces. Single letters
  // and abbreviations (N, M, ID, POS, KN) are symbols and stay as they are.
  metaFile: "FILE",
  metaCase: "CASE",
  metaDepartures: "DEPARTURES",
  metaLocation: "LOCATION",
  metaRecording: "RECORDING",
  metaText: "TEXT",
  metaPermille: "PERMILLE",
  metaNoteId: "NOTE-ID",
});
