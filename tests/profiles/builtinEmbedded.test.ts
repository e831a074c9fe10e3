/**
 * The app's build puts src/app/builtinProfiles.ts's module in place of src/profiles/builtin.ts (the files
 * checked by their schemas at build time, without the schema code). It must export every name builtin.ts
 * exports, and hold the very files builtin.ts read: the JSON it embeds reads back equal, key for key.
 */
import { describe, expect, it } from "vitest";
import { builtinModuleCode } from "../../src/app/builtinProfiles.js";
import * as builtin from "../../src/profiles/builtin.js";

describe("the built-in profiles as the app's build embeds them", () => {
  const code = builtinModuleCode();

  it("exports every name builtin.ts exports", () => {
    for (const name of Object.keys(builtin)) expect(code, name).toMatch(new RegExp(`export (const|function|\\{) ?${name}\\b`));
  });

  it("holds the files builtin.ts read, equal after the JSON round trip (no undefined key, no lost number)", () => {
    const m = /JSON\.parse\((".*")\);/.exec(code);
    expect(m).not.toBeNull();
    const embedded = JSON.parse(JSON.parse(m![1]!) as string) as unknown;
    expect(embedded).toStrictEqual(JSON.parse(JSON.stringify(builtin.builtinFiles)));
    expect(JSON.parse(JSON.stringify(builtin.builtinFiles))).toStrictEqual(builtin.builtinFiles);
  });
});
