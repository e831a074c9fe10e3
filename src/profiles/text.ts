/**
 * Text that came from a file or a command line, made safe to show: control characters (which can move a
 * terminal's cursor, clear its screen or recolour it), bidirectional overrides (which reorder what is
 * shown, so a line reads differently from what it holds), line separators and invisible marks are written
 * as visible escapes (`\n`, `\u001b`, `\u202e`). The escapes are JSON's own, so JSON text stays JSON.
 */

/**
 * Characters never shown raw: C0 controls, DEL, C1 controls, the Arabic letter mark, the left-to-right and
 * right-to-left marks, the bidirectional embeddings, overrides and isolates, the zero-width space, the line
 * and paragraph separators and the byte-order mark (Unicode Standard Annex #9, "Unicode Bidirectional
 * Algorithm", table 4 lists the explicit formatting characters; ECMA-48 defines C0 and C1).
 */
const UNSAFE = /[\u0000-\u001f\u007f-\u009f\u061c\u200b\u200e\u200f\u2028\u2029\u202a-\u202e\u2066-\u2069\ufeff]/g;

const SHORT: Record<string, string> = { "\n": "\\n", "\r": "\\r", "\t": "\\t" };

function escapeOne(ch: string): string {
  return SHORT[ch] ?? `\\u${ch.charCodeAt(0).toString(16).padStart(4, "0")}`;
}

/** Input text on one line: every unsafe character (line breaks and tabs too) as a visible escape. */
export function printable(s: string): string {
  return s.replace(UNSAFE, escapeOne);
}

/**
 * Whole output text for a terminal: as `printable`, but the line breaks and tabs of the output's own layout
 * are kept. The last line of defence; input text inside the output is escaped with `printable` where it
 * is put in, so that a line break in a label cannot start a line of its own.
 */
export function terminalSafe(s: string): string {
  return s.replace(UNSAFE, (ch) => (ch === "\n" || ch === "\t" ? ch : escapeOne(ch)));
}

/** Input text quoted for a message, unsafe characters escaped and long text cut to `max` characters. */
export function quoted(s: string, max = 60): string {
  const cut = s.length > max ? `${s.slice(0, max)}…` : s;
  return `"${printable(cut).replace(/"/g, '\\"')}"`;
}
