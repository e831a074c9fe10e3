/// <reference types="vite/client" />

/** The demo plan worked out at build time (src/app/firstPlan.ts): the plan, the demo case file and its checked case as text (the first request's key is JSON.stringify of the decoded case). */
declare module "virtual:taut/first-plan" {
  export const firstPlan: { plan: string; caseJson: string; startCase: string };
}
