/**
 * The chart's frame (components/Chart.tsx) before and after the charts' chunk: held until the page says
 * its verdict is painted, a box of the chart's height stands in (no legend, no "nothing to draw" sentence
 * for a chart not yet worked out); once released, the legend and canvas of the drawing half come.
 */
import { render, waitFor } from "@solidjs/testing-library";
import { describe, expect, it } from "vitest";
import { PALETTES } from "../../src/app/charts/palette.js";
import type { ChartSpec } from "../../src/app/charts/spec.js";
import { Chart, chartParts, holdChartsUntil } from "../../src/app/components/Chart.js";

const spec: ChartSpec = {
  series: [{ id: "v", label: "Speed", role: "main", points: [{ x: 0, y: 0 }, { x: 10, y: 5 }] }],
  x: { title: "Time (s)", min: 0, max: 10 },
  y: { title: "Speed (km/h)", min: 0, max: 5 },
  legend: [{ label: "Speed", role: "main" }],
} as ChartSpec;

describe("chart frame", () => {
  it("holds the drawing half until released, standing in a box of the chart's height", async () => {
    let release!: () => void;
    holdChartsUntil(new Promise<void>((r) => (release = r)));
    render(() => (
      <>
        <Chart title="Held" caption="c" spec={spec} palette={PALETTES.day} empty="none" height={200} />
        <Chart title="Not yet known" caption="c" spec={undefined} palette={PALETTES.day} empty="none" />
        <Chart title="Nothing" caption="c" spec={null} palette={PALETTES.day} empty="nothing to draw" />
      </>
    ));
    const held = document.querySelector('[data-chart="Held"]')!;
    const unknown = document.querySelector('[data-chart="Not yet known"]')!;
    await new Promise((r) => setTimeout(r, 50));
    expect(chartParts()).toBeNull();
    expect(held.getAttribute("data-empty")).toBe("no");
    expect((held.querySelector(".chart-box") as HTMLElement).style.height).toBe("200px");
    expect(held.querySelector(".legend")).toBeNull();
    expect(unknown.getAttribute("data-empty")).toBe("pending");
    expect((unknown.querySelector(".chart-box") as HTMLElement).style.height).toBe("280px");
    expect(unknown.querySelector(".chart-empty")).toBeNull();
    expect(document.querySelector('[data-chart="Nothing"] .chart-empty')?.textContent).toBe("nothing to draw");
    release();
    await waitFor(() => expect(held.querySelector(".legend")?.textContent).toBe("Speed"), { timeout: 15_000 });
    expect(chartParts()).not.toBeNull();
    // jsdom cannot hand a canvas to a worker: the drawing half says so, under the same box.
    expect(held.querySelector(".chart-box .chart-unsupported")).not.toBeNull();
    expect((held.querySelector(".chart-box") as HTMLElement).style.height).toBe("200px");
  });
});
