/**
 * What the railML reader and the stretch say (src/profiles/railml): refusals, warnings about the file, and
 * notes on what was assumed. The reader keeps its English sentences (the app shows them) made from these
 * messages; the command line renders the same codes in its language (railml/text.ts).
 */
import { namespace } from "../messages.js";

export const railmlText = namespace("railmlText", {
  // Where the front stands; {track} is the track's name and id as the file gives them.
  frontTrack: "track {track} at pos {pos} m",
  frontTrackAbs: "track {track} at pos {pos} m, absPos {absPos} m",
  frontOcp: "operational point \"{ocp}\", {place}",
  // Finding the front.
  noTrack: "There is no track \"{track}\" in the file.",
  posOutside: "pos {pos} m is outside track {track}, which runs from {from} to {to} m.",
  noTrackCovers: "No track{which} covers the line position {absPos} m (absPos).",
  noAbsPos: "The file gives no absPos at the tracks' ends, so a line position cannot be found: choose a track and a pos on it, or an operational point.",
  absPosOnSeveral: "The line position {absPos} m is on {count} tracks ({list}): choose one of them.",
  noOcp: "There is no operational point \"{ocp}\" in the file.",
  ocpNotPlaced: "The operational point \"{ocp}\" is not placed on any track{which} (no crossSection refers to it).",
  ocpOnSeveral: "The operational point \"{ocp}\" is on {count} tracks ({list}): choose one of them.",
  // Walking the line.
  trackEnds: "track {track} ends ({end}{closed}) {distance} m from the front",
  connectionNowhere: "the connection at the {end} of track {track} leads to no track's end (\"{ref}\"; a connection to points is not followed)",
  loop: "the tracks' connections form a loop at track {track}",
  giveBehindAhead: "Give how far behind the front to take (more than 0 m) and how far ahead (0 m or more).",
  nothingAround: "There is no track to take around {front}.",
  nothingBehind: "There is no track behind the front at {front} in the direction \"{direction}\": the train would not stand on the line.",
  onlyBehind: "Only {length} m behind the front could be taken: {why}.",
  onlyAhead: "Only {length} m ahead of the front could be taken: {why}.",
  noGradient: "No gradientChange applies to this stretch: it is taken as level.",
  gradientBackFilled: "The first {length} m have no gradientChange before them: the first gradient found is taken back to the start.",
  noRadius: "No radiusChange applies to this stretch: it is taken as straight.",
  radiusBackFilled: "The first {length} m have no radiusChange before them: the first radius found is taken back to the start.",
  speedLimit: "Speed limit: {speed} km/h, the lowest vMax in force from the front to the end of the stretch.",
  manyHazards: "{count} signals, points and other places are in the stretch; the {max} nearest the front are offered as hazards.",
  // The file.
  noNamespace: "The file names no railML namespace; it was read as railML 2.",
  otherVersion: "The file says it is railML version \"{version}\"; it was read as railML 2.",
  olderVersion: "railML {version} is older than 2.2; elements were read by their 2.2 names.",
  encoding: "The file says its encoding is {encoding}; it was read as UTF-8, so names with accents may read wrongly.",
  noProfile: "No track in the file has gradientChanges or radiusChanges: the profile would be level and straight.",
  noDir: "{count} gradient, radius or speed change(s) have no dir; they were taken as given towards increasing pos.",
  noAbs: "{count} of {all} track(s) give no absPos at both ends: positions on them are chosen by track and pos.",
  elementId: "<{tag} id=\"{id}\">",
  elementAtLine: "<{tag}> (line {line})",
  notNumber: "{element}: {name}=\"{value}\" is not a number.",
  notFinite: "{element}: {name}=\"{value}\" is not a finite number.",
  noAttribute: "{element} has no {name}.",
  notRailml: "This is not a railML file: its root element is <{tag}>{ns}.",
  inNamespace: " in the namespace {uri}",
  railml3: "This is a railML 3 file{version}. Taut reads the infrastructure of railML 2.2 to 2.5 (tracks with gradientChanges and radiusChanges); export the line as railML 2 to import it.",
  versionNamed: " (version {version})",
  notRailml2: "This is not a railML 2 file: the root element <{tag}> is in the namespace \"{uri}\", not railML's.",
  tooManyElements: "The file has more than {max} elements: too large to read.",
  entities: "The file's document type declares XML entities. Taut does not expand or fetch entities (they can hide huge or outside content), so it does not read this file.",
  notWellFormed: "The file is not well-formed XML ({detail} at line {line}).",
  couldNotRead: "The file could not be read: {detail}",
  tooLarge: "The file is larger than {max} MB: too large to read.",
  empty: "The file is empty.",
  noInfrastructure: "This railML file has no infrastructure (it may hold only timetables or rolling stock): there are no tracks to import.",
  noTracks: "This railML file's infrastructure has no tracks.",
});
