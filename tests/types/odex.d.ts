// Minimal types for the parts of the odex package the reference tests use (its shipped TypeScript source
// does not compile under this project's strict settings).
declare module "odex" {
  type Derivative = (x: number, y: number[]) => number[];
  type Callback = (n: number, xOld: number, x: number, y: number[], dense?: (c: number, x: number) => number) => boolean | void;
  export class Solver {
    constructor(n: number);
    absoluteTolerance: number | number[];
    relativeTolerance: number | number[];
    denseOutput: boolean;
    maxSteps: number;
    solve(f: Derivative, x: number, y0: number[], xEnd: number, callback?: Callback): { y: number[]; outcome: number; nStep: number; nAccept: number; nReject: number; nEval: number };
    grid(dt: number, out: (x: number, y: number[]) => void): Callback;
  }
  const odex: { Solver: typeof Solver };
  export default odex;
}
