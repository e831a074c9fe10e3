/**
 * A branch of the plan search: a dynamics run plus the log of the steps taken so far. Branches are
 * cloned to try alternatives (stretch notches, build pacing) from a shared starting point.
 */
import type { Observation, Run } from "../dynamics/runner.js";
import { notchAdhesion, notchEffortAllN, type PlannerContext } from "./context.js";
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
  /** Each control group's notch (several groups only; null: every unit in `notch`). */
  groupNotches: Int32Array | null;
  /** The highest wheel-climb L/V in the step (when the check is made), with where and under what buff. */
  wheelClimb: WheelClimbPeak | null;
}

/** The highest L/V a buff force on a curve put on a vehicle's flanging wheel. */
export interface WheelClimbPeak {
  ratio: number;
  /** The coupling (0: behind the first vehicle) and the vehicle whose wheel it is (head-to-tail index). */
  coupling: number;
  vehicle: number;
  forceN: number;
  radiusM: number;
  timeS: number;
}

export class Branch {
  /** Group notches still to come (a helper's driver follows the head's call a little later) and when. */
  pending: { atS: number; notches: Int32Array } | null = null;
  /** The context of the tick under way (for the receiver of a stretch's observations run again). */
  private tickCtx: PlannerContext | null = null;

  constructor(
    public run: Run,
    public steps: StepRecord[],
  ) {}

  clone(): Branch {
    const b = new Branch(
      this.run.clone(),
      this.steps.map((s) => ({ ...s, wheelClimb: s.wheelClimb ? { ...s.wheelClimb } : null })),
    );
    b.pending = this.pending;
    return b;
  }

  /**
   * Set the group notches now, except those in `follow`, which take theirs `afterS` later (a helper's
   * driver acting on the head's call); `notches` is what the step asks of every group.
   */
  setGroups(notches: Int32Array, follow: readonly boolean[], afterS: number): void {
    const now = Int32Array.from(notches);
    let later = false;
    for (let g = 0; g < notches.length; g++) {
      if (!follow[g]) continue;
      const before = this.appliedGroupNotch(g);
      if (before !== notches[g]) {
        now[g] = before;
        later = true;
      }
    }
    this.run.setGroupNotches(now);
    this.pending = later ? { atS: this.run.s.t + afterS, notches } : null;
  }

  /** The notch group g's units are in now. */
  private appliedGroupNotch(g: number): number {
    const m = this.run.m;
    for (let k = 0; k < m.nl; k++) if (m.unitGroup[k] === g) return this.run.s.notch[k]!;
    return 0;
  }

  get current(): StepRecord {
    return this.steps[this.steps.length - 1]!;
  }

  /** Begin a new step at the run's present moment; with several control groups, each group's notch. */
  open(phase: Phase, notch: number, groupNotches: Int32Array | null = null): void {
    const s = this.run.s;
    if (groupNotches) this.run.setGroupNotches(groupNotches);
    else this.run.setNotch(notch);
    this.pending = null;
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
      groupNotches,
      wheelClimb: null,
    });
  }

  /**
   * Fold an observation into the current step's records (or into `st`, a step it falls in: a settled stretch
   * run again with the full chain; its end figures then only when the observation is at the step's end).
   */
  note(ctx: PlannerContext, obs: Observation, st: StepRecord = this.current): void {
    const atEnd = st === this.current || obs.timeS >= st.endS - 1e-9;
    // The plan ends at its target speed; the control interval in which the train passes it carries a light
    // train some way beyond (0.2 s at 0.4 m/s² is 0.3 km/h). The step's adhesion figures are taken up to
    // the target, where the plan's own rule judged the notch (search.ts notchRiskAhead): a notch that asks
    // more with speed would otherwise read above the plan's quantile only for that overshoot.
    const v = Math.max(0, obs.leadSpeedMps);
    const top = ctx.c.target.kind === "speed" ? ctx.c.target.speedMps : Infinity;
    const at = v < top ? v : top;
    const notch = st.groupNotches ?? st.notch;
    const a = notchAdhesion(ctx, notch, at);
    if (a.risk > st.maxRisk) st.maxRisk = a.risk;
    if (a.use > st.maxUse) {
      st.maxUse = a.use;
      st.maxUseSpeedMps = at;
      st.maxUseEffortN = at === v ? obs.effortTargetN : notchEffortAllN(ctx, notch, at);
    }
    if (obs.maxTensionN > st.peakTensionN) st.peakTensionN = obs.maxTensionN;
    if (obs.maxCompressionN > st.peakCompressionN) st.peakCompressionN = obs.maxCompressionN;
    if (atEnd) {
      st.endS = obs.timeS;
      st.endTravelM = obs.leadTravelM;
      st.endSpeedMps = obs.leadSpeedMps;
      st.effortN = obs.effortTargetN;
    }
    if (ctx.wheelClimb.active && obs.maxCompressionN > 0) this.noteWheelClimb(ctx, st);
  }

  /** An observation of a settled stretch run again with the full chain, into the step it falls in (called by againReceiver). */
  noteAgain(ctx: PlannerContext, obs: Observation): void {
    const steps = this.steps;
    let k = steps.length - 1;
    while (k > 0 && steps[k]!.startS >= obs.timeS) k--;
    this.note(ctx, obs, steps[k]!);
  }

  /** The wheel-climb L/V of every coupling in buff on a curve now; the step keeps the highest. */
  private noteWheelClimb(ctx: PlannerContext, st: StepRecord): void {
    const s = this.run.s;
    const wc = ctx.wheelClimb;
    for (let j = 0; j < s.couplerF.length; j++) {
      const f = -s.couplerF[j]!;
      if (f <= 0) continue;
      const r = ctx.segRadiusM[s.seg[j]!] ?? 0;
      if (r <= 0) continue;
      const ratio = (f * wc.ratioPerNPerInvR[j]!) / r;
      if (!st.wheelClimb || ratio > st.wheelClimb.ratio) st.wheelClimb = { ratio, coupling: j, vehicle: wc.vehicle[j]!, forceN: f, radiusM: r, timeS: s.t };
    }
  }

  /** The highest wheel-climb L/V over all steps so far (null: none in buff on a curve). */
  wheelClimbPeak(): WheelClimbPeak | null {
    let best: WheelClimbPeak | null = null;
    for (const st of this.steps) if (st.wheelClimb && (!best || st.wheelClimb.ratio > best.ratio)) best = st.wheelClimb;
    return best;
  }

  /** Advance one control interval and record it. */
  tick(ctx: PlannerContext): Observation {
    if (this.pending && this.run.s.t >= this.pending.atS - 1e-9) {
      this.run.setGroupNotches(this.pending.notches);
      this.pending = null;
    }
    this.tickCtx = ctx;
    this.run.advanceInterval(againReceiver(this));
    const obs = this.run.observe();
    this.note(ctx, obs);
    return obs;
  }

  /** The context of the tick under way (for againReceiver). */
  tickCtxNow(): PlannerContext {
    return this.tickCtx!;
  }

  /** Largest coupler tension over all steps so far, N. */
  peakTensionN(): number {
    return this.steps.reduce((m, s) => Math.max(m, s.peakTensionN), 0);
  }
}

/**
 * Each branch's receiver of a settled stretch's observations run again, made once per branch and kept beside
 * it rather than on it: a branch is plain state (searches compare branches figure for figure, and a closure
 * of its own would make two equal branches differ).
 */
const againReceivers = new WeakMap<Branch, (obs: Observation) => void>();
function againReceiver(b: Branch): (obs: Observation) => void {
  let f = againReceivers.get(b);
  if (f === undefined) {
    f = (obs: Observation): void => b.noteAgain(b.tickCtxNow(), obs);
    againReceivers.set(b, f);
  }
  return f;
}
