/**
 * Hungarian: what is wrong with a file that is not well-formed XML (src/profiles/xmlProblem.ts), one set of words
 * shared by the railML reader's and the recording readers' namespaces (railmlText, review).
 */
export const xmlProblemsHu = {
  xmlUnexpectedEnd: "a fájl véget ér, mielőtt az elemei lezárulnának",
  xmlUnclosedTag: "a(z) <{tag}> elem nincs lezárva",
  xmlCloseTag: "a záró címke nem a nyitott elemhez tartozik",
  xmlUnmatchedTag: "a(z) </{tag}> záró címke nyitott elem nélkül",
  xmlCharacter: "XML-ben nem megengedett karakter",
  xmlAttribute: "hibás attribútum",
  xmlOutsideRoot: "szöveg vagy elem a gyökérelemen kívül",
  xmlNoRoot: "nincs gyökérelem",
  xmlOther: "az XML szabályai szerint hibás szerkezet",
} as const;
