/**
 * Non-uniform (warping) torsion of a thin-walled open section, Vlasov theory:
 *
 *   E Iw φ'''' − G It φ'' = m_x,   λ = sqrt(G It / (E Iw)),   μ = λ L,
 *   T = Tsv + Tw,  Tsv = G It φ',  Tw = −E Iw φ''',  B = E Iw φ''  (bimoment),
 *
 * (Vlasov, Thin-walled elastic beams; the same notation as AISC Design Guide 9). The element
 * freedoms are (φ, φ') at each end, φ' being the warping freedom w. The stiffness is the exact one,
 * from the homogeneous solution φ = c0 + c1 x + c2 cosh λx + c3 sinh λx, written in τ = tanh(μ/2) so
 * that it stays finite for any μ. For small μ the closed form loses digits to cancellation
 * (μ − 2τ ≈ μ³/12), so its Taylor series is used there; its leading terms are the cubic Hermite
 * element (E Iw times the beam matrix plus G It times the string matrix).
 *
 * Iw = 0 (λ → ∞) is St Venant torsion: G It / L on φ, and no stiffness on the warping freedoms.
 * The numbering step then leaves out any warping freedom that no element stiffens (numbering.ts).
 */

/** Below this μ = λL the Taylor series replaces the closed form (both agree to ~1e-15 there). */
const SERIES_LIMIT = 0.5;

export interface TorsionConstants {
  /** G It, N·m2. */
  GIt: number;
  /** E Iw, N·m4 (0 for St Venant torsion only). */
  EIw: number;
  /** Element length, m. */
  L: number;
}

/** λ = sqrt(G It / (E Iw)) in 1/m; Infinity when E Iw = 0. */
export function torsionLambda({ GIt, EIw }: TorsionConstants): number {
  return EIw > 0 ? Math.sqrt(GIt / EIw) : Number.POSITIVE_INFINITY;
}

/**
 * Exact 4x4 stiffness on (φ_I, w_I, φ_J, w_J): end torques and end bimoments (the generalised
 * forces conjugate to φ and w = φ') that the nodes apply to the element.
 * Derived by inverting the homogeneous solution; in τ = tanh(μ/2), Δ = μ − 2τ:
 *   kφφ = G It μ / (L Δ),  kφw = G It τ / Δ,
 *   kww = G It L (μ (1 + τ²)/2 − τ) / (μ τ Δ),  kww' = G It L (τ − μ (1 − τ²)/2) / (μ τ Δ).
 */
export function warpingTorsionStiffness(c: TorsionConstants): number[][] {
  const { GIt, EIw, L } = c;
  let kff: number;
  let kfw: number;
  let kww: number;
  let kwc: number;
  if (EIw === 0) {
    kff = GIt / L;
    kfw = 0;
    kww = 0;
    kwc = 0;
  } else {
    const mu = torsionLambda(c) * L;
    if (mu < SERIES_LIMIT) {
      // Taylor series in μ of the closed form (leading terms: Hermite cubic element).
      const m2 = mu * mu;
      const m4 = m2 * m2;
      const m6 = m4 * m2;
      const m8 = m4 * m4;
      kff = (12 * EIw) / L ** 3 + (GIt / L) * (6 / 5 - m2 / 700 + m4 / 63000 - (37 * m6) / 194040000 + (59 * m8) / 25225200000);
      kfw = (6 * EIw) / L ** 2 + GIt * (1 / 10 - m2 / 1400 + m4 / 126000 - (37 * m6) / 388080000 + (59 * m8) / 50450400000);
      kww =
        (4 * EIw) / L +
        GIt * L * (2 / 15 - (11 * m2) / 6300 + m4 / 27000 - (509 * m6) / 582120000 + (14617 * m8) / 681080400000);
      kwc =
        (2 * EIw) / L +
        GIt * L * (-1 / 30 + (13 * m2) / 12600 - (11 * m4) / 378000 + (907 * m6) / 1164240000 - (27641 * m8) / 1362160800000);
    } else {
      const tau = Math.tanh(mu / 2);
      const delta = mu - 2 * tau;
      kff = (GIt * mu) / (L * delta);
      kfw = (GIt * tau) / delta;
      kww = (GIt * L * ((mu * (1 + tau * tau)) / 2 - tau)) / (mu * tau * delta);
      kwc = (GIt * L * (tau - (mu * (1 - tau * tau)) / 2)) / (mu * tau * delta);
    }
  }
  return [
    [kff, kfw, -kff, kfw],
    [kfw, kww, -kfw, kwc],
    [-kff, -kfw, kff, -kfw],
    [kfw, kwc, -kfw, kww],
  ];
}

/**
 * Bimoment at both ends of an element clamped against twist and warping (φ = φ' = 0) under a
 * uniform torque m (N·m/m): B(0) = B(L) = Bc with
 *   Bc = (m / λ²) ((μ/2) coth(μ/2) − 1) = m L² (μ − 2τ) / (2 τ μ²),
 * derived from B'' − λ² B = m with ∫B dx = 0; the limits are m L²/12 (μ → 0, the beam analogue)
 * and 0 (St Venant). The consistent nodal loads on (w_I, w_J) are (+Bc, −Bc).
 */
export function clampedEndBimoment(m: number, c: TorsionConstants): number {
  const { EIw, L } = c;
  if (EIw === 0) return 0;
  const mu = torsionLambda(c) * L;
  if (mu < SERIES_LIMIT) {
    const m2 = mu * mu;
    return m * L * L * (1 / 12 - m2 / 720 + (m2 * m2) / 30240 - (m2 * m2 * m2) / 1209600 + (m2 * m2 * m2 * m2) / 47900160);
  }
  const tau = Math.tanh(mu / 2);
  return (m * L * L * (mu - 2 * tau)) / (2 * tau * mu * mu);
}

/**
 * Bimoment B(x) and its slope B'(x) = −Tw(x) inside an element, from the end bimoments B0 = B(0),
 * BL = B(L) and a uniform torque m. B satisfies B'' − λ² B = m (the governing equation
 * differentiated twice), so
 *   B(x) = B0 S(L − x) + BL S(x) + m W(x),  S(x) = sinh λx / sinh λL,
 *   W(x) = (cosh λ(x − L/2) − cosh(λL/2)) / (λ² cosh(λL/2)).
 * Written with exponentials of non-positive arguments (and expm1) so that no term overflows or
 * cancels for any λL.
 */
export function bimomentAt(x: number, L: number, lambda: number, B0: number, BL: number, m: number): { B: number; dB: number } {
  if (!Number.isFinite(lambda)) return { B: 0, dB: 0 };
  const mu = lambda * L;
  if (mu < 1e-8) {
    // λ → 0: B'' = m, a parabola through B0 and BL.
    return {
      B: (B0 * (L - x)) / L + (BL * x) / L - (m * x * (L - x)) / 2,
      dB: (BL - B0) / L + m * (x - L / 2),
    };
  }
  const oneMinusE2mu = -Math.expm1(-2 * mu);
  const W = (-Math.expm1(-lambda * x) * Math.expm1(-lambda * (L - x))) / (lambda * lambda * (1 + Math.exp(-mu)));
  const s = x - L / 2;
  const a = Math.abs(s);
  // W'(x) = sinh λs / (λ cosh(λL/2)), s = x − L/2, |λs| ≤ λL/2.
  const dW = (Math.sign(s) * Math.exp(lambda * a - mu / 2) * -Math.expm1(-2 * lambda * a)) / (lambda * (1 + Math.exp(-mu)));
  return {
    B: B0 * sinhRatio(L - x, L, lambda, oneMinusE2mu) + BL * sinhRatio(x, L, lambda, oneMinusE2mu) + m * W,
    dB: -B0 * coshRatio(L - x, L, lambda, oneMinusE2mu) + BL * coshRatio(x, L, lambda, oneMinusE2mu) + m * dW,
  };
}

/** S(s) = sinh λs / sinh λL, written with exponentials of non-positive arguments (oneMinusE2mu = 1 − e^(−2λL)). */
function sinhRatio(s: number, L: number, lambda: number, oneMinusE2mu: number): number {
  return (Math.exp(-lambda * (L - s)) * -Math.expm1(-2 * lambda * s)) / oneMinusE2mu;
}

/** C(s) = dS/ds = λ cosh λs / sinh λL. */
function coshRatio(s: number, L: number, lambda: number, oneMinusE2mu: number): number {
  return (lambda * Math.exp(-lambda * (L - s)) * (1 + Math.exp(-2 * lambda * s))) / oneMinusE2mu;
}
