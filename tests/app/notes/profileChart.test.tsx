/** The editor's live profile (inline SVG): the layout checked against the model, and what the drawing shows. */
import { render } from "@solidjs/testing-library";
import { describe, expect, it } from "vitest";
import { PALETTES } from "../../../src/app/charts/palette.js";
import { ProfileChart } from "../../../src/app/screens/LocationNotes/ProfileChart.js";
import { profileModel, VERTICAL_EXAGGERATION, type ProfileModel } from "../../../src/app/screens/LocationNotes/profileModel.js";
import { profilePlot, roundStep } from "../../../src/app/screens/LocationNotes/profilePlot.js";
import { referenceCase } from "../../../src/profiles/referenceTrain.js";
import { builtinLibrary, builtinLocations, builtinTrains } from "../../../src/profiles/builtin.js";
import { ProfileSketch } from "../../../src/app/screens/LocationNotes/ProfileSketch.js";

const lib = builtinLibrary();
/** Down 5 ‰ for 1 km, then up 10 ‰: a sag, so a train standing across it has stretched and bunched parts. */
const segs = [
  { from_m: 0, length_m: 1000, gradient_permille: -5, curveRadius_m: 0 },
  { from_m: 1000, length_m: 1000, gradient_permille: 10, curveRadius_m: 0 },
];

function model(frontAt_m: number, hazards: Array<{ kind: "points" | "signal"; at_m: number }> = []): ProfileModel {
  const note = { segments: segs, frontAt_m, clearAhead_m: 300, hazards };
  const c = referenceCase({ ...note, referenceTrain: { train: builtinTrains[0]!.id } }, builtinTrains, lib);
  if (!c.ok) throw new Error("reference train does not fit");
  return profileModel(note, c.value)!;
}

/** Numbers of an SVG path "Mx,y Lx,y …". */
const points = (d: string) => [...d.matchAll(/[ML](-?[\d.]+),(-?[\d.]+)/g)].map((m) => ({ x: Number(m[1]), y: Number(m[2]) }));

describe("profile layout", () => {
  it("picks round steps", () => {
    expect(roundStep(3000, 6)).toBe(500);
    expect(roundStep(24, 4)).toBe(10);
    expect(roundStep(9842, 5)).toBe(2000);
    expect(roundStep(0.6, 3)).toBe(0.2);
  });

  it("keeps the ground, the train and the labels inside the box, the train above the ground", () => {
    const m = model(1300, [{ kind: "points", at_m: 1400 }]);
    const g = profilePlot(m, "metric", 900, 300);
    const ground = points(g.ground);
    expect(ground[0]!.x).toBeCloseTo(g.left, 0);
    expect(ground[ground.length - 1]!.x).toBeCloseTo(g.right, 0);
    for (const p of ground) expect(p.y).toBeGreaterThanOrEqual(g.top - 0.5), expect(p.y).toBeLessThanOrEqual(g.bottom + 0.5);
    // The lowest ground leaves room under it for the hazard markers.
    expect(Math.max(...ground.map((p) => p.y))).toBeLessThanOrEqual(g.bottom - 31);
    // Every run lies 8 px above the ground line at the same chainage.
    const groundY = (x: number) => {
      for (let k = 1; k < ground.length; k++) {
        const a = ground[k - 1]!;
        const b = ground[k]!;
        if (x <= b.x + 1e-6) return a.y + ((b.y - a.y) * (x - a.x)) / (b.x - a.x);
      }
      return ground[ground.length - 1]!.y;
    };
    for (const r of g.train) for (const p of points(r.path)) expect(groundY(p.x) - p.y).toBeCloseTo(8, 0);
    // Front mark at 1300 m of 0–2000 m.
    expect(g.front!.x).toBeCloseTo(g.left + (1300 / 2000) * (g.right - g.left), 1);
    expect(g.front!.label.text).toBe("front 1,300 m");
    expect(g.clear!.label.text).toBe("clear 300 m →");
    for (const l of [g.front!.label, g.clear!.label]) expect(l.y).toBeGreaterThan(10), expect(l.y).toBeLessThan(g.bottom);
    expect(g.hazards).toEqual([{ x: expect.closeTo(g.left + (1400 / 2000) * (g.right - g.left), 1), y: expect.any(Number), n: 1 }]);
  });

  it("shows both slack states across a sag, and draws heights ×20 whatever the box, saying so", () => {
    const m = model(1300);
    for (const [w, h] of [[900, 300], [520, 300], [760, 300]] as const) {
      const g = profilePlot(m, "metric", w, h);
      expect(new Set(g.train.map((r) => r.state))).toEqual(new Set(m.train!.runs.map((r) => r.state)));
      expect(g.exaggeration).toBe(VERTICAL_EXAGGERATION);
      expect(g.xTitle).toBe("Distance along the line (m) · heights ×20");
      // Measured on the drawing: pixels per metre up ÷ pixels per metre along, from two ticks of each axis.
      const num = (t: string) => Number(t.replace(/,/g, "").replace("\u2212", "-"));
      const along = (g.xTicks[1]!.at - g.xTicks[0]!.at) / (num(g.xTicks[1]!.label) - num(g.xTicks[0]!.label));
      const up = (g.yTicks[0]!.at - g.yTicks[1]!.at) / (num(g.yTicks[1]!.label) - num(g.yTicks[0]!.label));
      expect(up / along).toBeCloseTo(20, 6);
    }
  });

  it("draws a relief too tall for the box at a smaller exaggeration, and says so", () => {
    // 2 km of 40 ‰ (80 m of climb) in a 520 px wide, 300 px tall box: ×20 would need over 400 px.
    const steep = profileModel({ segments: [{ from_m: 0, length_m: 2000, gradient_permille: 40, curveRadius_m: 0 }], frontAt_m: 1500, clearAhead_m: 200, hazards: [] }, undefined)!;
    const g = profilePlot(steep, "metric", 520, 300);
    expect(g.exaggeration).toBeLessThan(VERTICAL_EXAGGERATION);
    expect(g.xTitle).toBe(`Distance along the line (m) · heights ×${g.exaggeration} (×20 would not fit)`);
  });

  it("labels the axes in feet for US units, with the same drawing", () => {
    const m = model(1300);
    const metric = profilePlot(m, "metric", 900, 300);
    const us = profilePlot(m, "us", 900, 300);
    expect(us.xTitle.startsWith("Distance along the line (ft)")).toBe(true);
    expect(us.yTitle).toBe("Height (ft)");
    expect(us.front!.label.text).toBe("front 4,265 ft");
    expect(points(us.train[0]!.path)[0]!.x).toBeCloseTo(points(metric.train[0]!.path)[0]!.x, 1);
  });

  it("keeps the front's and the clear distance's labels inside narrow boxes", () => {
    // About 8 px a character at 15 px.
    const inside = (l: { x: number; text: string; anchor: "start" | "end" }, width: number) => (l.anchor === "end" ? l.x - l.text.length * 8.2 >= 0 : l.x + l.text.length * 8.2 <= width);
    for (const front of [450, 1300, 1990])
      for (const width of [300, 420, 900]) {
        const g = profilePlot(model(front), "us", width, 300);
        expect(inside(g.front!.label, width), `front at ${front} m in ${width} px`).toBe(true);
        expect(inside(g.clear!.label, width), `clear label, front at ${front} m in ${width} px`).toBe(true);
      }
  });
});

describe("profile chart (SVG)", () => {
  it("draws stretched runs solid and bunched runs dashed, numbers the hazards, and says what it shows", () => {
    const m = model(1300, [
      { kind: "points", at_m: 1400 },
      { kind: "signal", at_m: 1550 },
    ]);
    render(() => <ProfileChart model={m} units="metric" palette={PALETTES.night} summary="A summary." />);
    const svg = document.querySelector("figure.notes-chart svg.notes-profile")!;
    expect(svg.getAttribute("role")).toBe("img");
    expect(svg.getAttribute("aria-label")).toBe("Profile. A summary.");
    const runs = [...svg.querySelectorAll(".notes-profile-train")];
    expect(runs.length).toBe(m.train!.runs.length);
    for (const r of runs) {
      const bunched = r.classList.contains("bunched");
      expect(r.getAttribute("stroke-dasharray") !== null).toBe(bunched);
      expect(r.getAttribute("stroke")).toBe(bunched ? PALETTES.night.second : PALETTES.night.main);
    }
    expect([...svg.querySelectorAll(".notes-profile-hazard text")].map((t) => t.textContent)).toEqual(["1", "2"]);
    expect(document.querySelector(".notes-legend")?.textContent).toContain("Hazards: 1. Points; 2. Signal");
    expect(document.querySelector(".notes-chart .chart-caption")?.textContent).toBe("A summary.");
  });

  it("shows only the sentence while there is no profile to draw", () => {
    render(() => <ProfileChart model={undefined} units="metric" palette={PALETTES.day} summary="Enter the segments to see the profile." />);
    expect(document.querySelector("svg.notes-profile")).toBeNull();
    expect(document.querySelector(".notes-chart .chart-caption")?.textContent).toBe("Enter the segments to see the profile.");
  });
});

describe("one exaggeration in every profile drawing", () => {
  it("the card's sketch and the editor's chart of every demo note draw heights ×20, and say so", () => {
    for (const note of builtinLocations) {
      const c = referenceCase(note, builtinTrains, lib);
      const hazards = note.hazards.map((h) => ({ kind: h.kind, ...(h.at_m !== undefined ? { at_m: h.at_m } : {}) }));
      const m = profileModel({ ...note, hazards }, c.ok ? c.value : undefined)!;
      const { unmount } = render(() => <ProfileSketch model={m} units="metric" />);
      const svg = document.querySelector(".notes-sketch")!;
      expect(svg.getAttribute("data-exaggeration"), note.id).toBe("20");
      expect(svg.textContent, note.id).toContain("heights ×20");
      unmount();
      for (const width of [520, 760, 1100]) expect(profilePlot(m, "metric", width, 300).exaggeration, `${note.id} at ${width} px`).toBe(20);
    }
  });
});
