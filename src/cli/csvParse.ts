/** The CSV reader lives with the other file readers in src/profiles (the app reads departures files too). */
export { parseCsv, type CsvRecord } from "../profiles/csv.js";
