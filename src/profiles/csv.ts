/** A small RFC 4180 reader and writer (no I/O, used by the command line and the app): quoted fields (with "" for a quote, and line breaks inside quotes), each record with its line number. */

export interface CsvRecord {
  /** Line of the file the record starts on, 1-based. */
  line: number;
  fields: string[];
}

/** A CSV text whose quoted field is not closed: the line it starts on (the message is English; a reader says it in any language from the line). */
export class CsvQuoteError extends RangeError {
  constructor(readonly line: number) {
    super(`line ${line}: a quoted field is not closed`);
  }
}

/** Split CSV text into records; blank lines are skipped. Throws a CsvQuoteError naming the line of an unclosed quote. */
export function parseCsv(text: string): CsvRecord[] {
  const out: CsvRecord[] = [];
  let fields: string[] = [];
  let field = "";
  let quoted = false;
  let line = 1;
  let start = 1;
  let i = 0;
  const s = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  const endRecord = () => {
    fields.push(field);
    if (!(fields.length === 1 && fields[0]!.trim() === "")) out.push({ line: start, fields });
    fields = [];
    field = "";
  };
  while (i < s.length) {
    const ch = s[i]!;
    if (quoted) {
      if (ch === '"') {
        if (s[i + 1] === '"') {
          field += '"';
          i += 2;
          continue;
        }
        quoted = false;
      } else {
        if (ch === "\n") line++;
        field += ch;
      }
      i++;
      continue;
    }
    if (ch === '"' && field.trim() === "") {
      quoted = true;
      field = "";
    } else if (ch === ",") {
      fields.push(field);
      field = "";
    } else if (ch === "\n" || ch === "\r") {
      endRecord();
      if (ch === "\r" && s[i + 1] === "\n") i++;
      line++;
      start = line;
    } else field += ch;
    i++;
  }
  if (quoted) throw new CsvQuoteError(start);
  if (field !== "" || fields.length > 0) endRecord();
  return out;
}

/**
 * Text a spreadsheet would read as a formula: it starts with =, +, -, @, a tab or a carriage return
 * (OWASP, "CSV Injection", the characters its guidance lists).
 */
const FORMULA_START = /^[=+\-@\t\r]/;

/**
 * A CSV field, quoted when needed (RFC 4180). Text that a spreadsheet would take for a formula is
 * neutralised as the OWASP guidance advises: an apostrophe before it, inside a quoted field, so the cell
 * shows the text and runs nothing. Numbers are written as numbers (a negative number is not text).
 */
export function csvField(v: unknown): string {
  if (v === null || v === undefined) return "";
  if (typeof v === "number" || typeof v === "boolean") return String(v);
  const s = String(v);
  if (FORMULA_START.test(s)) return `"'${s.replace(/"/g, '""')}"`;
  return /[",\n\r]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
}

/** A header and rows as CSV text, one record a line, ending with a line break. */
export function toCsv(header: readonly string[], rows: ReadonlyArray<ReadonlyArray<unknown>>): string {
  return [header, ...rows].map((r) => r.map(csvField).join(",")).join("\n") + "\n";
}

/** The columns of `taut check --csv` and of the app's Departures export (INTERFACE.md: add freely, never rename). */
export const CHECK_CSV_HEADER = [
  "id",
  "line",
  "index",
  "rail",
  "sand",
  "trailingMass_t",
  "verdict",
  "reasons",
  "margin",
  "maxStartableMass_t",
  "peakCouplerForce_kN",
  "timeToTarget_s",
  "assistance",
  "assistanceVerdict",
  "assistancePeakCouplerForce_kN",
  "divideFirstWagons",
  "divideFirstMass_t",
  "error",
  "binding",
  "largestMarginalMass_t",
] as const;
