/** Run the command line in-process with its output captured (fast: no process, no loader). */
import type { Output } from "../../src/cli/command.js";
import { main } from "../../src/cli/main.js";

export interface Run {
  code: number;
  stdout: string;
  stderr: string;
}

export async function taut(...argv: string[]): Promise<Run> {
  return tautWithInput(undefined, ...argv);
}

/** The same in an environment of locale variables (LANG, LC_ALL...); the others run as under LANG=C. */
export async function tautWithEnv(env: Readonly<Record<string, string>>, ...argv: string[]): Promise<Run> {
  const out: string[] = [];
  const err: string[] = [];
  const code = await main(argv, { out: (t) => out.push(t), err: (t) => err.push(t) }, env);
  return { code, stdout: out.join("\n"), stderr: err.join("\n") };
}

/** The same, with `stdin` as standard input (a command reading "-" gets it); undefined: no standard input. */
export async function tautWithInput(stdin: string | undefined, ...argv: string[]): Promise<Run> {
  const out: string[] = [];
  const err: string[] = [];
  const io: Output = { out: (t) => out.push(t), err: (t) => err.push(t), ...(stdin !== undefined ? { stdin: () => stdin } : {}) };
  const code = await main(argv, io, { LANG: "C" });
  return { code, stdout: out.join("\n"), stderr: err.join("\n") };
}
