/** The verdict banner reads without colour: a word and a distinct icon shape for each verdict. */
import { render, screen } from "@solidjs/testing-library";
import { describe, expect, it } from "vitest";
import { VerdictBanner } from "../../src/app/components/VerdictBanner.js";
import type { Verdict } from "../../src/core/planner/outcome.js";

const cases: Array<[Verdict, string, string, string]> = [
  ["starts", "Starts", "circle", "circle"],
  ["marginal", "Marginal", "triangle", "path"],
  ["needs-assistance", "Needs assistance", "square", "rect"],
];

describe("VerdictBanner", () => {
  it.each(cases)("%s shows the word %s and a %s icon", (verdict, word, shape, element) => {
    const { container } = render(() => <VerdictBanner verdict={verdict} reasons={verdict === "starts" ? [] : ["adhesion", "coupler"]} detail="Smallest margin × 1.05" />);
    const banner = screen.getByLabelText(`Verdict: ${word}`);
    expect(banner.querySelector(".verdict-word")?.textContent).toBe(word);
    const icon = container.querySelector("svg.verdict-icon")!;
    expect(icon.getAttribute("data-shape")).toBe(shape);
    // The outline itself differs: a circle, a three-cornered path, a square.
    expect(icon.querySelector(".verdict-fill")?.tagName.toLowerCase()).toBe(element);
    expect(banner.getAttribute("data-verdict")).toBe(verdict);
    expect(screen.getByText("Smallest margin × 1.05")).toBeTruthy();
  });

  it("names the reasons in words", () => {
    render(() => <VerdictBanner verdict="needs-assistance" reasons={["coupler", "distance"]} />);
    const chips = [...document.querySelectorAll(".verdict-reasons .chip")].map((c) => c.textContent);
    expect(chips).toEqual(["coupler", "distance"]);
  });

  it("marks a verdict for earlier inputs as out of date", () => {
    render(() => <VerdictBanner verdict="starts" reasons={[]} stale />);
    expect(screen.getByText(/For the previous inputs/)).toBeTruthy();
    expect(document.querySelector(".verdict")?.classList.contains("stale")).toBe(true);
  });

  it("gives every verdict a different shape", () => {
    const shapes = cases.map(([v]) => {
      const { container, unmount } = render(() => <VerdictBanner verdict={v} reasons={[]} />);
      const s = container.querySelector("svg.verdict-icon .verdict-fill")!.outerHTML;
      unmount();
      return s;
    });
    expect(new Set(shapes).size).toBe(3);
  });
});
