/**
 * Component-test setup (jsdom): unmount after every test, a fresh localStorage and location, and the
 * browser pieces jsdom lacks (matchMedia; a canvas without a 2D context, which the Chart wrapper handles).
 */
import { cleanup, configure } from "@solidjs/testing-library";
import { afterEach, beforeEach } from "vitest";
import { loadDraftChecker } from "../../src/app/state/draftChecker.js";

// The page loads the draft's checker (the schemas) apart from its first screen; components under test
// check their drafts at once, as the page does once it has loaded (tests/app/draftChecker.test.tsx covers
// the moment before).
await loadDraftChecker();

// A wait for the page to show something gives up after 10 s, not the library's 1 s: the suite shares two
// cores with the planner's work, and a screen that draws in 1.2 s under load is not a failure.
configure({ asyncUtilTimeout: 10_000 });

beforeEach(() => {
  localStorage.clear();
  history.replaceState(null, "", "/");
  document.documentElement.removeAttribute("data-theme");
});

afterEach(() => {
  cleanup();
});

if (typeof window.matchMedia !== "function") {
  window.matchMedia = (query: string) =>
    ({
      matches: false,
      media: query,
      onchange: null,
      addEventListener: () => undefined,
      removeEventListener: () => undefined,
      addListener: () => undefined,
      removeListener: () => undefined,
      dispatchEvent: () => false,
    }) as MediaQueryList;
}

// jsdom has no canvas: answer "no context" quietly instead of printing "not implemented".
HTMLCanvasElement.prototype.getContext = (() => null) as typeof HTMLCanvasElement.prototype.getContext;
