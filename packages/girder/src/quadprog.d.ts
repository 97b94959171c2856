// Types of the quadprog package (a dev dependency, used by the independent QP cross-check in the
// tests). Arrays are 1-based as in the package's README: index 0 is unused.
declare module 'quadprog' {
  export interface QuadprogResult {
    solution: number[];
    value: number[];
    unconstrained_solution: number[];
    iterations: number[];
    iact: number[];
    message: string;
  }
  export function solveQP(Dmat: number[][], dvec: number[], Amat: number[][], bvec: number[], meq?: number, factorized?: number[]): QuadprogResult;
}
