/**
 * A branch of the plan search: a dynamics run plus the log of the steps taken so far. Branches are
 * cloned to try alternatives (stretch notches, build pacing) from a shared starting point.
 */
import type { Observation, Run } from "../dynamics/runner.js";
import { notchAdhesion, type PlannerContext } from "./context.js";
import type { Phase, Trigger } from "./types.js";

export interface StepRecord {
  phase: Phase;
  notch: number;
  startS: number;
  endS: number;
  startTravelM: number;
  endTravelM: number;
  startSpeedMps: number;
  endSpeedMps: number;
  maxRisk: number;
  maxUse: number;
  /** Locomotive speed and Σ effort the notch asked for when `maxUse` was reached (the basis of the figure). */
  maxUseSpeedMps: number;
  maxUseEffortN: number;
  peakTensionN: number;
  peakCompressionN: number;
  /** Σ effort the notch asks for at the step's end, N. */
  effortN: number;
  /** What ended the step. */
  trigger: Trigger;
}

export class Branch {
  constructor(
    public run: Run,
    public steps: StepRecord[],
  ) {}

  clone(): Branch {
    return new Branch(
      this.run.clone(),
      this.steps.map((s) => ({ ...s })),
    );
  }

  get current(): StepRecord {
    return this.steps[this.steps.length - 1]!;
  }

  /** Begin a new step at the run's present moment. */
  open(phase: Phase, notch: number): void {
    const s = this.run.s;
    this.run.setNotch(notch);
    this.steps.push({
      phase,
      notch,
      startS: s.t,
      endS: s.t,
      startTravelM: s.x[this.run.lead]!,
      endTravelM: s.x[this.run.lead]!,
      startSpeedMps: s.v[this.run.lead]!,
      endSpeedMps: s.v[this.run.lead]!,
      maxRisk: 0,
      maxUse: 0,
      maxUseSpeedMps: 0,
      maxUseEffortN: 0,
      peakTensionN: 0,
      peakCompressionN: 0,
      effortN: 0,
      trigger: "time",
    });
  }

  /** Fold an observation into the current step's records. */
  note(ctx: PlannerContext, obs: Observation): void {
    const st = this.current;
    const a = notchAdhesion(ctx, st.notch, Math.max(0, obs.leadSpeedMps));
    if (a.risk > st.maxRisk) st.maxRisk = a.risk;
    if (a.use > st.maxUse) {
      st.maxUse = a.use;
      st.maxUseSpeedMps = Math.max(0, obs.leadSpeedMps);
      st.maxUseEffortN = obs.effortTargetN;
    }
    if (obs.maxTensionN > st.peakTensionN) st.peakTensionN = obs.maxTensionN;
    if (obs.maxCompressionN > st.peakCompressionN) st.peakCompressionN = obs.maxCompressionN;
    st.endS = obs.timeS;
    st.endTravelM = obs.leadTravelM;
    st.endSpeedMps = obs.leadSpeedMps;
    st.effortN = obs.effortTargetN;
  }

  /** Advance one control interval and record it. */
  tick(ctx: PlannerContext): Observation {
    this.run.advanceInterval();
    const obs = this.run.observe();
    this.note(ctx, obs);
    return obs;
  }

  /** Largest coupler tension over all steps so far, N. */
  peakTensionN(): number {
    return this.steps.reduce((m, s) => Math.max(m, s.peakTensionN), 0);
  }
}
