/**
 * What the XML parser (saxes) found wrong, from its English message, as a code of our own, so a refusal of a
 * railML or GPX file reads whole in every language. The words of each code are in the railmlText and review
 * namespaces (the same keys). The place (line, column) is taken from the parser, not from the message.
 */
export type XmlProblemCode =
  | "xmlUnexpectedEnd"
  | "xmlUnclosedTag"
  | "xmlCloseTag"
  | "xmlUnmatchedTag"
  | "xmlCharacter"
  | "xmlAttribute"
  | "xmlOutsideRoot"
  | "xmlNoRoot"
  | "xmlOther";

/** The code of a saxes message ("line:column: what." or just "what."), with the tag it names where it names one. */
export function xmlProblemCode(message: string): { code: XmlProblemCode; tag?: string } {
  const what = message.replace(/^.*?\d+:\d+:\s*/s, "");
  const named = (re: RegExp) => re.exec(what)?.[1];
  let tag: string | undefined;
  if (/^unexpected end/.test(what)) return { code: "xmlUnexpectedEnd" };
  if ((tag = named(/^unclosed tag: (.+?)\.?$/))) return { code: "xmlUnclosedTag", tag };
  if ((tag = named(/^unmatched closing tag: (.+?)\.?$/))) return { code: "xmlUnmatchedTag", tag };
  if (/^(unexpected close tag|weird empty close tag)/.test(what)) return { code: "xmlCloseTag" };
  if (/^disallowed character/.test(what)) return { code: "xmlCharacter" };
  if (/attribute|value must be quoted|value required|no whitespace between attributes/.test(what)) return { code: "xmlAttribute" };
  if (/^(text data outside of root node|documents may contain only one root)/.test(what)) return { code: "xmlOutsideRoot" };
  if (/^document must contain a root element/.test(what)) return { code: "xmlNoRoot" };
  return { code: "xmlOther" };
}
