/// <reference types="vite/client" />

/** The demo plan worked out at build time (src/app/firstPlan.ts): the first request's key and the plan as text. */
declare module "virtual:taut/first-plan" {
  export const firstPlan: { key: string; plan: string; caseJson: string; startCase: string };
}
