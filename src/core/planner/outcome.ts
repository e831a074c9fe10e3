/** The words of an answer: whether a train starts, and which limits decide it. */

export type Verdict = "starts" | "marginal" | "needs-assistance";
export type Reason = "adhesion" | "power" | "coupler" | "distance";
