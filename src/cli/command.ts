/**
 * The contract between the command line and its commands: what a command declares (name, help, options)
 * and where it writes. Commands import this, never `main.ts`, so that `main.ts` can import every command.
 */
import type { ParseArgsConfig } from "node:util";

export interface Command {
  name: string;
  summary: string;
  usage: string;
  help: string;
  options: NonNullable<ParseArgsConfig["options"]>;
  run(args: { values: Record<string, unknown>; positionals: string[] }, out: Output): number | Promise<number>;
}

/** Where commands write: stdout for results, stderr for progress and errors; and standard input, for `-`. */
export interface Output {
  out(text: string): void;
  err(text: string): void;
  /** All of standard input as text (a file named `-`); absent where there is none. */
  stdin?(): string;
}
