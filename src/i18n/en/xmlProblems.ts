/**
 * English: what is wrong with a file that is not well-formed XML (src/profiles/xmlProblem.ts), one set of words
 * shared by the railML reader's and the recording readers' namespaces (railmlText, review).
 */
export const xmlProblems = {
  xmlUnexpectedEnd: "the file ends before its elements are closed",
  xmlUnclosedTag: "the element <{tag}> is never closed",
  xmlCloseTag: "a closing tag that does not match the element open",
  xmlUnmatchedTag: "the closing tag </{tag}> with no element open",
  xmlCharacter: "a character XML does not allow",
  xmlAttribute: "a malformed attribute",
  xmlOutsideRoot: "text or elements outside the root element",
  xmlNoRoot: "no root element",
  xmlOther: "a structure XML does not allow",
} as const;
