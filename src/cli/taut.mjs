#!/usr/bin/env node
// The `taut` command: registers the TypeScript loader, then runs the command line.
import { register } from "tsx/esm/api";

register();
const { main } = await import("./main.ts");
process.exitCode = await main(process.argv.slice(2));
