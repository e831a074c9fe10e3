/**
 * Why a file cannot be opened or read, as data (a code with its figures) and in words (the cliErrors
 * namespace). The command line says it in its run's language; a departures row keeps the English words in
 * its `error` (JSON and CSV) and the code beside them, so the printout can say it in any language.
 */
import { cliErrors } from "./en/cliErrors.js";
import type { Translator } from "./translator.js";

/** What a path that is not a regular file is. */
export type NotAFileKind = "folder" | "pipe" | "device" | "socket" | "other";

export type FileProblem =
  | { code: "noSuchFile" }
  | { code: "noPermission" }
  /** The system's error code (EIO, ELOOP…), as the system gives it. */
  | { code: "cannotRead"; errno: string }
  /** `jsonOrCsv`: the file was to be a JSON or CSV file (a departures file or a case file). */
  | { code: "notAFile"; kind: NotAFileKind; jsonOrCsv?: boolean }
  | { code: "tooLarge"; sizeMB: number; maxMB: number }
  | { code: "holdsMore"; maxMB: number }
  | { code: "isFolder" };

const KIND_KEY = { folder: "kindFolder", pipe: "kindPipe", device: "kindDevice", socket: "kindSocket", other: "kindOther" } as const;

/** A file's problem in a language. */
export function fileProblemText(tr: Translator, p: FileProblem): string {
  const t = tr.ns(cliErrors);
  switch (p.code) {
    case "noSuchFile":
      return t("noSuchFile");
    case "noPermission":
      return t("noPermission");
    case "cannotRead":
      return t("cannotRead", { code: p.errno });
    case "notAFile": {
      const why = t("notAFile", { kind: t(KIND_KEY[p.kind]) });
      return p.jsonOrCsv ? t("giveJsonOrCsv", { why }) : why;
    }
    case "tooLarge":
      return t("tooLarge", { size: String(p.sizeMB), max: String(p.maxMB) });
    case "holdsMore":
      return t("holdsMore", { max: String(p.maxMB) });
    case "isFolder":
      return t("isFolder");
  }
}
