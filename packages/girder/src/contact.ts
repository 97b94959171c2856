/**
 * Contact of unilateral springs (compression-only bearings, anchored bearings) with the girder.
 *
 * The equilibrium state minimises the convex, piecewise quadratic total potential energy
 *   Π(u) = ½ uᵀ K0 u − fᵀ u + Σ ψᵢ(δᵢ),   δᵢ = gᵢᵀ u (spring elongation, PointSpring),
 * with K0 the elements (and supports), and per spring ψ = ½kδ² (bilateral), ½k min(δ, 0)²
 * (compression-only), or ½kδ² up to δy = Nt/k and Nt δ − Nt²/(2k) beyond (anchored, tension
 * capacity Nt). The optimality condition ∇Π = 0 is the complementarity condition of tensionless
 * springs (F = −kδ ≥ 0 where in contact, δ ≥ 0 and F = 0 where open).
 *
 * Each spring is in one of three states: open (no stiffness), elastic (k), or at capacity (no
 * stiffness, a constant tension Nt). For a given state the energy is quadratic and its minimiser
 * solves H(s) u = f − Σ_capped Nt g. The solver is the semi-smooth Newton (primal–dual active
 * set) iteration on ∇Π (Hintermüller, Ito & Kunisch, SIAM J. Optim. 13, 2003): solve for the
 * state, re-classify each spring from its elongation, repeat until the state repeats. The state
 * converges in a few steps for bearing problems, but the pure iteration can cycle or pass through
 * a state that is a mechanism; then it falls back to a globalised Newton method on Π itself: the
 * same Newton direction (regularised where the state is singular) with an exact line search on
 * the convex energy, which decreases Π at every step.
 *
 * Factorisations are cached by state (a key of one character per spring), so a state met again,
 * in the same combination or another, costs no new factorisation.
 */
import type { LdltFactorisation } from './banded.js';
import { bandIndex, factorLdlt } from './banded.js';
import type { PreparedElement, PreparedSpring } from './assemble.js';
import { GirderError } from './errors.js';
import type { GirderModel } from './model.js';
import type { EquationNumbering } from './numbering.js';
import { inversePermutation, reverseCuthillMcKee } from './rcm.js';
import type { CsrMatrix } from './sparse.js';
import { adjacencyOfCsr, csrFromTriplets, csrIndex, multiplyCsr } from './sparse.js';

/** State of a spring in one solution. */
export const OPEN = 0;
export const ELASTIC = 1;
export const AT_CAPACITY = 2;

const BILATERAL = 0;
const COMPRESSION_ONLY = 1;
const ANCHORED = 2;

/** Stiffness factor on open and capped springs in a regularised (singular-state) Newton step. */
const REGULARISATION = 1e-3;
/** A line search that still descends at this step length means the energy has no minimum. */
const UNBOUNDED_STEP = 1e12;
/** Displacements this many times those of the first (all-closed) solve mean the girder flies off. */
const RUNAWAY = 1e8;
const DEFAULT_CACHE_LIMIT = 16;
/** Pivot / diagonal threshold for states with lifted-off bearings (see factorState). */
const LIFTED_PIVOT_TOLERANCE = 1e-12;
/** Consecutive globalised steps through singular states after which the girder counts as a mechanism. */
const SINGULAR_RUN = 8;

export interface ContactOptions {
  /** Cap on linear solves of the contact iteration, default 100. */
  maxIterations?: number;
  /**
   * Ids of unilateral springs that start in contact; the others start open. Default: all closed
   * (the bonded solution is the first iterate). Bilateral and anchored springs are always elastic
   * at the start.
   */
  initialActiveSprings?: readonly string[];
  /** On a cycle or a singular state, switch to the globalised method (default true) or fail. */
  robustFallback?: boolean;
  /**
   * Relative tolerance on elongations: a spring within tolerance × max|δ| of its kink (0, or Nt/k)
   * keeps its state; default 1e-9. Such a spring carries at most that fraction of the largest
   * spring force in tension (or penetrates by that fraction of the largest elongation).
   */
  tolerance?: number;
}

export interface ContactSystem {
  size: number;
  springs: PreparedSpring[];
  kind: Uint8Array;
  capacity: Float64Array;
  /** Equation of each of the 6 freedoms of each spring (−1 when fixed). */
  springEquation: Int32Array;
  order: Int32Array;
  halfBandwidth: number;
  /** Pattern of K0 and every spring; values of K0 (elements only). */
  K0: CsrMatrix;
  /** Position of each (a, b) entry of each spring's 6×6 block in K0's pattern, or −1. */
  springCsr: Int32Array;
  /** K0 in band form, in the RCM order. */
  baseBand: Float64Array;
  /** Band position of each (a, b) entry of a spring (lower triangle only; −1 otherwise). */
  springBand: Int32Array;
  describeEquation: (equation: number) => { text: string; path: string };
  cache: Map<string, LdltFactorisation>;
  cacheLimit: number;
  /** Factorisations performed so far (cache misses), for reports and tests. */
  factorisations: number;
}

export function prepareContactSystem(
  model: GirderModel,
  numbering: EquationNumbering,
  elements: readonly PreparedElement[],
  springs: PreparedSpring[],
  describeEquation: (equation: number) => { text: string; path: string },
  cacheLimit = DEFAULT_CACHE_LIMIT,
): ContactSystem {
  const m = springs.length;
  const kind = new Uint8Array(m);
  const capacity = new Float64Array(m);
  model.springs.forEach((spring, i) => {
    const behaviour = spring.behaviour ?? 'bilateral';
    if (behaviour === 'compression-only') kind[i] = COMPRESSION_ONLY;
    else if (behaviour !== 'bilateral') {
      kind[i] = ANCHORED;
      capacity[i] = behaviour.tensionCapacity;
    }
  });
  const springEquation = new Int32Array(6 * m);
  springs.forEach((spring, i) => {
    for (let a = 0; a < 6; a++) springEquation[6 * i + a] = numbering.equation[spring.slots[a] as number] as number;
  });

  // Pattern of every state: the elements, plus each spring's 6×6 block (values 0: K0 holds the
  // elements only; springs are added per state).
  let capacityOfTriplets = 0;
  for (let e = 0; e < elements.length; e++) capacityOfTriplets += 196;
  capacityOfTriplets += 36 * m;
  const rows = new Int32Array(capacityOfTriplets);
  const columns = new Int32Array(capacityOfTriplets);
  const values = new Float64Array(capacityOfTriplets);
  let count = 0;
  for (const element of elements) {
    const Ke = element.Ke;
    const eq = Int32Array.from(element.slots, (slot) => numbering.equation[slot] as number);
    for (let a = 0; a < 14; a++) {
      const p = eq[a] as number;
      if (p < 0) continue;
      for (let b = 0; b < 14; b++) {
        const q = eq[b] as number;
        const v = Ke[14 * a + b] as number;
        if (q < 0 || v === 0) continue;
        rows[count] = p;
        columns[count] = q;
        values[count] = v;
        count++;
      }
    }
  }
  springs.forEach((spring, i) => {
    for (let a = 0; a < 6; a++) {
      const p = springEquation[6 * i + a] as number;
      for (let b = 0; b < 6; b++) {
        const q = springEquation[6 * i + b] as number;
        if (p < 0 || q < 0 || (spring.g[a] as number) * (spring.g[b] as number) === 0) continue;
        rows[count] = p;
        columns[count] = q;
        values[count] = 0;
        count++;
      }
    }
  });
  const K0 = csrFromTriplets(numbering.equationCount, rows, columns, values, count);

  const order = reverseCuthillMcKee(adjacencyOfCsr(K0));
  const position = inversePermutation(order);
  let halfBandwidth = 0;
  for (let i = 0; i < K0.size; i++) {
    for (let k = K0.rowStart[i] as number; k < (K0.rowStart[i + 1] as number); k++) {
      halfBandwidth = Math.max(halfBandwidth, Math.abs((position[i] as number) - (position[K0.column[k] as number] as number)));
    }
  }
  const band = { size: K0.size, halfBandwidth, band: new Float64Array(K0.size * (halfBandwidth + 1)) };
  for (let i = 0; i < K0.size; i++) {
    const p = position[i] as number;
    for (let k = K0.rowStart[i] as number; k < (K0.rowStart[i + 1] as number); k++) {
      const q = position[K0.column[k] as number] as number;
      if (q <= p) band.band[bandIndex(band, p, q)] = K0.value[k] as number;
    }
  }
  const springCsr = new Int32Array(36 * m).fill(-1);
  const springBand = new Int32Array(36 * m).fill(-1);
  springs.forEach((_, i) => {
    for (let a = 0; a < 6; a++) {
      const p = springEquation[6 * i + a] as number;
      if (p < 0) continue;
      for (let b = 0; b < 6; b++) {
        const q = springEquation[6 * i + b] as number;
        if (q < 0) continue;
        springCsr[36 * i + 6 * a + b] = csrIndex(K0, p, q);
        const pp = position[p] as number;
        const qq = position[q] as number;
        if (qq <= pp) springBand[36 * i + 6 * a + b] = bandIndex(band, pp, qq);
      }
    }
  });
  return {
    size: K0.size,
    springs,
    kind,
    capacity,
    springEquation,
    order,
    halfBandwidth,
    K0,
    springCsr,
    baseBand: band.band,
    springBand,
    describeEquation,
    cache: new Map(),
    cacheLimit,
    factorisations: 0,
  };
}

function stateKey(state: Uint8Array, regularised: boolean): string {
  let key = regularised ? 'r' : 's';
  const chunk = 4096;
  for (let i = 0; i < state.length; i += chunk) key += String.fromCharCode(...state.subarray(i, i + chunk).map((s) => s + 48));
  return key;
}

/** Stiffness factor of spring i in a state (1 elastic; 0, or the regularisation, otherwise). */
function stiffnessFactor(state: Uint8Array, i: number, regularised: boolean): number {
  if (state[i] === ELASTIC) return 1;
  return regularised ? REGULARISATION : 0;
}

/** The factorisation of H(state) in equation order, from the cache or new. */
export function factorState(system: ContactSystem, state: Uint8Array, regularised = false): { solve(f: Float64Array): Float64Array; factor: LdltFactorisation } {
  const key = stateKey(state, regularised);
  let factor = system.cache.get(key);
  if (factor === undefined) {
    const band = Float64Array.from(system.baseBand);
    system.springs.forEach((spring, i) => {
      const k = spring.stiffness * stiffnessFactor(state, i, regularised);
      if (k === 0) return;
      for (let a = 0; a < 6; a++) {
        const ga = k * (spring.g[a] as number);
        if (ga === 0) continue;
        for (let b = 0; b < 6; b++) {
          const at = system.springBand[36 * i + 6 * a + b] as number;
          if (at >= 0) band[at] = (band[at] as number) + ga * (spring.g[b] as number);
        }
      }
    });
    const order = system.order;
    // A state with bearings lifted off may leave a stiff girder on few springs: its smallest pivot
    // ratio is then legitimately small (about k_spring / (12 EI / h³)), so such states are judged
    // with a tighter threshold; the model itself (every spring closed) keeps the default.
    const lifted = state.some((s, i) => s !== ELASTIC && system.kind[i] !== BILATERAL);
    factor = factorLdlt(
      { size: system.size, halfBandwidth: system.halfBandwidth, band },
      { describeRow: (row) => system.describeEquation(order[row] as number), pivotTolerance: lifted ? LIFTED_PIVOT_TOLERANCE : 1e-10 },
    );
    system.factorisations++;
    if (system.cache.size >= system.cacheLimit) {
      const oldest = system.cache.keys().next().value;
      if (oldest !== undefined) system.cache.delete(oldest);
    }
    system.cache.set(key, factor);
  } else {
    // Least recently used goes first: move this key to the end.
    system.cache.delete(key);
    system.cache.set(key, factor);
  }
  const ldlt = factor;
  const order = system.order;
  return {
    factor: ldlt,
    solve: (f: Float64Array): Float64Array => {
      const x = ldlt.solve(Float64Array.from(order, (equation) => f[equation] as number));
      const u = new Float64Array(system.size);
      order.forEach((equation, p) => {
        u[equation] = x[p] as number;
      });
      return u;
    },
  };
}

/** H(state) as a CSR matrix of K0's pattern (for residual checks). */
export function stateMatrix(system: ContactSystem, state: Uint8Array): CsrMatrix {
  const value = Float64Array.from(system.K0.value);
  system.springs.forEach((spring, i) => {
    if (state[i] !== ELASTIC) return;
    for (let a = 0; a < 6; a++) {
      for (let b = 0; b < 6; b++) {
        const at = system.springCsr[36 * i + 6 * a + b] as number;
        if (at >= 0) value[at] = (value[at] as number) + spring.stiffness * (spring.g[a] as number) * (spring.g[b] as number);
      }
    }
  });
  return { ...system.K0, value };
}

/** Right-hand side of a state: f − Σ_capped Nt g. */
export function stateLoad(system: ContactSystem, state: Uint8Array, f: Float64Array): Float64Array {
  const rhs = Float64Array.from(f);
  system.springs.forEach((spring, i) => {
    if (state[i] !== AT_CAPACITY) return;
    const Nt = system.capacity[i] as number;
    for (let a = 0; a < 6; a++) {
      const p = system.springEquation[6 * i + a] as number;
      if (p >= 0) rhs[p] = (rhs[p] as number) - Nt * (spring.g[a] as number);
    }
  });
  return rhs;
}

function elongations(system: ContactSystem, u: Float64Array): Float64Array {
  const delta = new Float64Array(system.springs.length);
  system.springs.forEach((spring, i) => {
    let s = 0;
    for (let a = 0; a < 6; a++) {
      const p = system.springEquation[6 * i + a] as number;
      if (p >= 0) s += (spring.g[a] as number) * (u[p] as number);
    }
    delta[i] = s;
  });
  return delta;
}

/** Elongation at which spring i changes state (0 for a bearing, Nt/k for an anchor). */
function kinkOf(system: ContactSystem, i: number): number {
  return system.kind[i] === ANCHORED ? (system.capacity[i] as number) / ((system.springs[i] as PreparedSpring).stiffness) : 0;
}

/**
 * State of each spring from its elongation; a spring within `band` of its kink keeps `current`.
 */
function classify(system: ContactSystem, delta: Float64Array, current: Uint8Array, band: number): Uint8Array {
  const next = new Uint8Array(delta.length);
  for (let i = 0; i < delta.length; i++) {
    const kind = system.kind[i];
    const d = delta[i] as number;
    if (kind === BILATERAL) {
      next[i] = ELASTIC;
      continue;
    }
    const kink = kinkOf(system, i);
    if (Math.abs(d - kink) <= band) {
      next[i] = current[i] as number;
      continue;
    }
    if (kind === COMPRESSION_ONLY) next[i] = d < 0 ? ELASTIC : OPEN;
    else next[i] = d < kink ? ELASTIC : AT_CAPACITY;
  }
  return next;
}

function sameState(a: Uint8Array, b: Uint8Array): boolean {
  for (let i = 0; i < a.length; i++) if (a[i] !== b[i]) return false;
  return true;
}

function maxAbs(v: Float64Array): number {
  let m = 0;
  for (const x of v) m = Math.max(m, Math.abs(x));
  return m;
}

/** dψᵢ/dδ: the spring's energy slope, −F (tension positive). */
function springSlope(system: ContactSystem, i: number, d: number): number {
  const k = (system.springs[i] as PreparedSpring).stiffness;
  const kind = system.kind[i];
  if (kind === BILATERAL) return k * d;
  if (kind === COMPRESSION_ONLY) return d < 0 ? k * d : 0;
  return Math.min(k * d, system.capacity[i] as number);
}

export interface ContactSolution {
  state: Uint8Array;
  /** Linear solves performed. */
  iterations: number;
  /** The globalised method was needed (cycle or singular intermediate state). */
  globalised: boolean;
  factorisation: { solve(f: Float64Array): Float64Array };
  /** The load of the final state, f − Σ_capped Nt g. */
  rhs: Float64Array;
}

function notConverged(system: ContactSystem, changes: Uint32Array, why: string): GirderError {
  const ranked = Array.from(changes, (count, i) => ({ count, i }))
    .filter((x) => x.count > 0)
    .sort((a, b) => b.count - a.count || a.i - b.i);
  const listed = ranked
    .slice(0, 12)
    .map((x) => `${(system.springs[x.i] as PreparedSpring).id} (${x.count} changes)`)
    .join(', ');
  const more = ranked.length > 12 ? ` and ${ranked.length - 12} more` : '';
  return new GirderError(
    'CONTACT_NOT_CONVERGED',
    `contact iteration did not converge: ${why}; springs that kept changing between contact and lift-off: ${listed || 'none'}${more}. Check for bearings at a knife edge (nearly zero load) or raise maxContactIterations`,
    'springs',
  );
}

function liftOffMechanism(system: ContactSystem, state: Uint8Array, cause: GirderError | undefined): GirderError {
  const unilateral = Array.from(system.kind).filter((k) => k !== BILATERAL).length;
  const open = Array.from(state).filter((s, i) => s === OPEN && system.kind[i] === COMPRESSION_ONLY).length;
  const freedom = cause?.freedom;
  const where = freedom !== undefined ? `${freedom} is unrestrained` : 'the girder is unrestrained';
  return new GirderError(
    'MECHANISM',
    `mechanism: ${where} after bearings lifted off (${open} of ${unilateral} unilateral springs in tension released); the load lifts the girder off its bearings: add supports, anchors or bilateral bearings`,
    cause?.path ?? 'springs',
    freedom,
  );
}

function isMechanism(error: unknown): error is GirderError {
  return error instanceof GirderError && error.code === 'MECHANISM';
}

/** Solves the contact problem of load f (equation numbering). */
export function solveContact(system: ContactSystem, f: Float64Array, options: ContactOptions = {}): ContactSolution {
  const m = system.springs.length;
  const cap = options.maxIterations ?? 100;
  if (!Number.isInteger(cap) || cap < 1) {
    throw new GirderError('BAD_MODEL', `options.maxContactIterations must be a positive integer; got ${cap}`, 'options.maxContactIterations');
  }
  const relativeBand = options.tolerance ?? 1e-9;
  let state: Uint8Array = new Uint8Array(m).fill(ELASTIC);
  if (options.initialActiveSprings !== undefined) {
    const active = new Set(options.initialActiveSprings);
    system.springs.forEach((spring, i) => {
      if (system.kind[i] === COMPRESSION_ONLY && !active.has(spring.id)) state[i] = OPEN;
    });
  }
  const changes = new Uint32Array(m);
  const visited = new Set<string>();
  let iterations = 0;
  let u: Float64Array | undefined;
  let scale = 0;
  let fallbackReason = '';
  let singular: GirderError | undefined;

  while (iterations < cap) {
    visited.add(stateKey(state, false));
    let factorisation;
    try {
      factorisation = factorState(system, state);
    } catch (error) {
      if (!isMechanism(error)) throw error;
      // A state with every spring closed that is a mechanism: the model itself is one.
      if (!state.some((s, i) => s !== ELASTIC && system.kind[i] !== BILATERAL)) throw error;
      singular = error;
      fallbackReason = 'a contact state on the way was a mechanism';
      break;
    }
    const rhs = stateLoad(system, state, f);
    u = factorisation.solve(rhs);
    iterations++;
    const delta = elongations(system, u);
    if (scale === 0) scale = maxAbs(u);
    const next = classify(system, delta, state, relativeBand * maxAbs(delta));
    if (sameState(next, state)) return { state, iterations, globalised: false, factorisation, rhs };
    for (let i = 0; i < m; i++) if (next[i] !== state[i]) changes[i] = (changes[i] as number) + 1;
    if (visited.has(stateKey(next, false))) {
      fallbackReason = 'the contact state cycles';
      state = next;
      break;
    }
    state = next;
  }
  if (fallbackReason === '') throw notConverged(system, changes, `no stable contact state after ${cap} solves (the cap)`);
  if (options.robustFallback === false) {
    if (singular !== undefined) throw liftOffMechanism(system, state, singular);
    throw notConverged(system, changes, `${fallbackReason} (globalised fallback switched off)`);
  }
  return globalised(system, f, u ?? new Float64Array(system.size), { cap, iterations, changes, relativeBand, scale, singular, fallbackReason });
}

/**
 * Newton's method on Π with an exact line search: from u, the state s(u), the step d = −H⁻¹∇Π(u)
 * (H regularised if H(s) is singular), and the exact minimiser of the convex Π(u + t d) over t > 0.
 */
function globalised(
  system: ContactSystem,
  f: Float64Array,
  start: Float64Array,
  run: { cap: number; iterations: number; changes: Uint32Array; relativeBand: number; scale: number; singular: GirderError | undefined; fallbackReason: string },
): ContactSolution {
  const u = Float64Array.from(start);
  let iterations = run.iterations;
  let previous: Uint8Array | undefined;
  let lastSingular = run.singular;
  let singularRun = 0;
  const m = system.springs.length;
  while (iterations < run.cap) {
    const delta = elongations(system, u);
    const state = classify(system, delta, previous ?? new Uint8Array(m).fill(ELASTIC), 0);
    if (previous !== undefined) for (let i = 0; i < m; i++) if (state[i] !== previous[i]) run.changes[i] = (run.changes[i] as number) + 1;
    previous = state;
    let regularised = false;
    let factorisation;
    try {
      factorisation = factorState(system, state);
    } catch (error) {
      if (!isMechanism(error)) throw error;
      lastSingular = error;
      regularised = true;
      // The energy keeps falling along a mechanism of the lifted-off state: nothing holds the girder.
      if (++singularRun >= SINGULAR_RUN) throw liftOffMechanism(system, state, error);
      try {
        factorisation = factorState(system, state, true);
      } catch (again) {
        // Singular even with every spring stiffened: a mechanism that no bearing restrains.
        if (isMechanism(again)) throw error;
        throw again;
      }
    }
    // ∇Π(u) = K0 u − f + Σ ψ'(δ) g.
    if (!regularised) singularRun = 0;
    const gradient = multiplyCsr(system.K0, u);
    for (let p = 0; p < gradient.length; p++) gradient[p] = (gradient[p] as number) - (f[p] as number);
    system.springs.forEach((spring, i) => {
      const slope = springSlope(system, i, delta[i] as number);
      if (slope === 0) return;
      for (let a = 0; a < 6; a++) {
        const p = system.springEquation[6 * i + a] as number;
        if (p >= 0) gradient[p] = (gradient[p] as number) + slope * (spring.g[a] as number);
      }
    });
    const step = factorisation.solve(gradient);
    const d = Float64Array.from(step, (x) => -x);
    iterations++;
    if (!regularised) {
      const trial = Float64Array.from(u, (x, p) => x + (d[p] as number));
      const trialDelta = elongations(system, trial);
      const next = classify(system, trialDelta, state, run.relativeBand * maxAbs(trialDelta));
      if (sameState(next, state)) return { state, iterations, globalised: true, factorisation, rhs: stateLoad(system, state, f) };
    }
    const t = exactLineSearch(system, f, u, d, delta);
    if (t === undefined) throw liftOffMechanism(system, state, lastSingular);
    // No descent left along the Newton direction: u is the minimiser (up to rounding).
    if (t === 0 && !regularised) return { state, iterations, globalised: true, factorisation, rhs: stateLoad(system, state, f) };
    for (let p = 0; p < u.length; p++) u[p] = (u[p] as number) + t * (d[p] as number);
    if (run.scale > 0 && maxAbs(u) > RUNAWAY * run.scale) throw liftOffMechanism(system, state, lastSingular);
  }
  if (singularRun > 0) throw liftOffMechanism(system, previous ?? new Uint8Array(m), lastSingular);
  throw notConverged(system, run.changes, `${run.fallbackReason}, and the globalised Newton method found no stable state within ${run.cap} solves (the cap)`);
}

/**
 * argmin over t > 0 of Π(u + t d), a convex piecewise quadratic: the root of the nondecreasing
 * φ'(t) = dᵀ(K0 u − f) + t dᵀ K0 d + Σ ψ'(δᵢ + t γᵢ) γᵢ, γᵢ = gᵢᵀ d, by bracketing and bisection.
 * Undefined when φ' < 0 up to UNBOUNDED_STEP (no minimum along d: the girder can run away).
 */
function exactLineSearch(system: ContactSystem, f: Float64Array, u: Float64Array, d: Float64Array, delta: Float64Array): number | undefined {
  const K0d = multiplyCsr(system.K0, d);
  const K0u = multiplyCsr(system.K0, u);
  let A = 0;
  let B = 0;
  for (let p = 0; p < d.length; p++) {
    A += (d[p] as number) * ((K0u[p] as number) - (f[p] as number));
    B += (d[p] as number) * (K0d[p] as number);
  }
  const gamma = elongations(system, d);
  const slope = (t: number): number => {
    let s = A + t * B;
    for (let i = 0; i < gamma.length; i++) {
      const g = gamma[i] as number;
      if (g !== 0) s += springSlope(system, i, (delta[i] as number) + t * g) * g;
    }
    return s;
  };
  if (!(slope(0) < 0)) return 0;
  let lo = 0;
  let hi = 1;
  while (slope(hi) < 0) {
    lo = hi;
    hi *= 4;
    if (hi > UNBOUNDED_STEP) return undefined;
  }
  for (let k = 0; k < 200 && hi - lo > 1e-15 * hi; k++) {
    const mid = 0.5 * (lo + hi);
    if (slope(mid) < 0) lo = mid;
    else hi = mid;
  }
  return 0.5 * (lo + hi);
}
