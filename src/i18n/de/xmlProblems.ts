/**
 * German: what is wrong with a file that is not well-formed XML (src/profiles/xmlProblem.ts), one set of words
 * shared by the railML reader's and the recording readers' namespaces (railmlText, review).
 */
export const xmlProblemsDe = {
  xmlUnexpectedEnd: "die Datei endet, bevor ihre Elemente geschlossen sind",
  xmlUnclosedTag: "das Element <{tag}> wird nie geschlossen",
  xmlCloseTag: "ein schließendes Tag, das nicht zum offenen Element passt",
  xmlUnmatchedTag: "das schließende Tag </{tag}> ohne offenes Element",
  xmlCharacter: "ein in XML nicht erlaubtes Zeichen",
  xmlAttribute: "ein fehlerhaftes Attribut",
  xmlOutsideRoot: "Text oder Elemente außerhalb des Wurzelelements",
  xmlNoRoot: "kein Wurzelelement",
  xmlOther: "eine Struktur, die XML nicht erlaubt",
} as const;
