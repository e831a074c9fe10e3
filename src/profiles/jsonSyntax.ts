/**
 * Where and why JSON text fails to parse, in our words and without quoting the text: the engine's own
 * message can echo a piece of the file, and a file named by mistake (a password file, a key) must never
 * be shown. A small scanner of the JSON grammar (ECMA-404, "The JSON Data Interchange Syntax", 2nd ed.
 * 2017) finds the first place the text breaks it; it keeps its own stack, so deep nesting cannot
 * overflow the call stack.
 */

/** What breaks the grammar: a key of the fields catalog (i18n/en/fields.ts), its words in every language. */
export type JsonProblem = keyof typeof fields.en & `syntax${string}`;

export interface JsonSyntaxProblem {
  /** 1-based line and column (in UTF-16 code units) of the first character that breaks the grammar. */
  line: number;
  column: number;
  what: JsonProblem;
}
import type { fields } from "../i18n/en/fields.js";

const NUMBER = /-?(?:0|[1-9]\d*)(?:\.\d+)?(?:[eE][+-]?\d+)?/y;
const HEX4 = /[0-9a-fA-F]{4}/y;

/** The first syntax problem of `text`, or undefined when it is valid JSON. */
export function jsonSyntaxProblem(text: string): JsonSyntaxProblem | undefined {
  const at = scan(text);
  if (!at) return undefined;
  let line = 1;
  let lineStart = 0;
  for (let k = 0; k < at.offset && k < text.length; k++) {
    if (text.charCodeAt(k) === 10) {
      line++;
      lineStart = k + 1;
    }
  }
  return { line, column: at.offset - lineStart + 1, what: at.what };
}

function scan(s: string): { offset: number; what: JsonProblem } | undefined {
  const n = s.length;
  const stack: number[] = []; // 123 "{" or 91 "["
  let i = 0;
  type State = "value" | "firstValue" | "after" | "key" | "firstKey";
  let st: State = "value";
  const fail = (what: JsonProblem, offset = i) => ({ offset, what });
  const skipSpace = () => {
    while (i < n) {
      const c = s.charCodeAt(i);
      if (c !== 32 && c !== 9 && c !== 10 && c !== 13) break;
      i++;
    }
  };
  const ends = (): JsonProblem => (stack.length === 0 ? "syntaxEndsEarly" : stack[stack.length - 1] === 123 ? "syntaxEndsInObject" : "syntaxEndsInList");
  /** A string from the quote at i; undefined when it is well formed (i then just past it). */
  const string = (): { offset: number; what: JsonProblem } | undefined => {
    const start = i;
    i++;
    while (i < n) {
      const c = s.charCodeAt(i);
      if (c === 34) {
        i++;
        return undefined;
      }
      if (c === 92) {
        const e = s[i + 1];
        if (e === "u") {
          HEX4.lastIndex = i + 2;
          if (!HEX4.test(s)) return fail("syntaxHexEscape");
          i += 6;
        } else if (e !== undefined && '"\\/bfnrt'.includes(e)) i += 2;
        else return fail("syntaxBadEscape");
        continue;
      }
      if (c < 32) return fail("syntaxControl");
      i++;
    }
    return fail("syntaxOpenString", start);
  };
  for (;;) {
    skipSpace();
    if (st === "value" || st === "firstValue") {
      if (i >= n) return fail(ends());
      const c = s.charCodeAt(i);
      if (st === "firstValue" && c === 93) {
        stack.pop();
        i++;
        st = "after";
        continue;
      }
      if (c === 123) {
        stack.push(123);
        i++;
        st = "firstKey";
        continue;
      }
      if (c === 91) {
        stack.push(91);
        i++;
        st = "firstValue";
        continue;
      }
      if (c === 34) {
        const e = string();
        if (e) return e;
        st = "after";
        continue;
      }
      if (c === 45 || (c >= 48 && c <= 57)) {
        NUMBER.lastIndex = i;
        if (!NUMBER.test(s)) return fail("syntaxNumber");
        i = NUMBER.lastIndex;
        st = "after";
        continue;
      }
      const word = s.startsWith("true", i) ? 4 : s.startsWith("null", i) ? 4 : s.startsWith("false", i) ? 5 : 0;
      if (word > 0) {
        i += word;
        st = "after";
        continue;
      }
      if (c === 93 && st === "value" && stack[stack.length - 1] === 91) return fail("syntaxCommaList");
      return fail(c === 39 ? "syntaxSingleQuotes" : "syntaxValueHere");
    }
    if (st === "after") {
      if (stack.length === 0) return i < n ? fail("syntaxMoreText") : undefined;
      if (i >= n) return fail(ends());
      const top = stack[stack.length - 1]!;
      const c = s.charCodeAt(i);
      if (c === 44) {
        i++;
        st = top === 123 ? "key" : "value";
        continue;
      }
      if (c === (top === 123 ? 125 : 93)) {
        stack.pop();
        i++;
        continue;
      }
      return fail(top === 123 ? "syntaxCommaObject" : "syntaxCommaOrBracket");
    }
    // "key" or "firstKey"
    if (i >= n) return fail(ends());
    const c = s.charCodeAt(i);
    if (st === "firstKey" && c === 125) {
      stack.pop();
      i++;
      st = "after";
      continue;
    }
    if (c !== 34) return fail(st === "key" && c === 125 ? "syntaxCommaBrace" : "syntaxFieldName");
    const e = string();
    if (e) return e;
    skipSpace();
    if (s.charCodeAt(i) !== 58) return fail(i >= n ? ends() : "syntaxColon");
    i++;
    st = "value";
  }
}
