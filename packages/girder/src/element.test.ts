import { Matrix, inverse } from 'ml-matrix';
import { describe, expect, it } from 'vitest';
import { consistentLoads, elementAxes, globalStiffness, localStiffness, transformation } from './element.js';
import { GirderError } from './errors.js';
import type { SectionStiffness, Vec3 } from './model.js';
import { bimomentAt, clampedEndBimoment, warpingTorsionStiffness } from './torsion.js';

// IPE 300 (EN 10365; REFERENCES.md section 5): I_t 20.12 cm4, I_w 125.9e3 cm6.
const ipe300: SectionStiffness = { A: 53.81e-4, Iy: 8356e-8, Iz: 603.8e-8, It: 20.12e-8, Iw: 125.9e-9, E: 210e9, G: 81e9, density: 7850 };

/**
 * Exact torsion stiffness by brute force: end freedoms d = H c and end forces p = F c of the
 * homogeneous solution phi = c0 + c1 x + c2 cosh(lambda x) + c3 sinh(lambda x), k = F H^-1, with the
 * inverse taken by ml-matrix (closed form, derived from Vlasov's equation; independent of the
 * tanh form and series used in torsion.ts).
 */
function bruteForceTorsion(GIt: number, EIw: number, L: number): number[][] {
  const l = Math.sqrt(GIt / EIw);
  const phi = (x: number) => [1, x, Math.cosh(l * x), Math.sinh(l * x)];
  const d1 = (x: number) => [0, 1, l * Math.sinh(l * x), l * Math.cosh(l * x)];
  const d2 = (x: number) => [0, 0, l * l * Math.cosh(l * x), l * l * Math.sinh(l * x)];
  const d3 = (x: number) => [0, 0, l ** 3 * Math.sinh(l * x), l ** 3 * Math.cosh(l * x)];
  const torque = (x: number) => d1(x).map((v, i) => GIt * v - EIw * (d3(x)[i] as number));
  const bimoment = (x: number) => d2(x).map((v) => EIw * v);
  const H = new Matrix([phi(0), d1(0), phi(L), d1(L)]);
  const F = new Matrix([torque(0).map((v) => -v), bimoment(0).map((v) => -v), torque(L), bimoment(L)]);
  return F.mmul(inverse(H)).to2DArray();
}

function expectMatrixClose(actual: number[][], expected: number[][], relative: number): void {
  const scale = Math.max(...expected.flat().map(Math.abs));
  actual.forEach((row, i) => row.forEach((v, j) => expect(Math.abs(v - ((expected[i] as number[])[j] as number))).toBeLessThan(relative * scale)));
}

describe('exact warping torsion element', () => {
  const GIt = ipe300.G * ipe300.It;
  const EIw = ipe300.E * ipe300.Iw;

  it('matches the brute-force inverse of the homogeneous solution for lambda L = 0.6 .. 12', () => {
    const lambda = Math.sqrt(GIt / EIw);
    for (const mu of [0.6, 1, 2.5, 6, 12]) {
      const L = mu / lambda;
      expectMatrixClose(warpingTorsionStiffness({ GIt, EIw, L }), bruteForceTorsion(GIt, EIw, L), 1e-9);
    }
  });

  it('both branches (series below lambda L = 0.5, tanh form above) match the closed form evaluated in 50-digit arithmetic', () => {
    // k00 L/GIt = mu sinh mu / D, k01/GIt = (cosh mu - 1)/D, k11/(GIt L) = (mu cosh mu - sinh mu)/(mu D),
    // k13/(GIt L) = (sinh mu - mu)/(mu D), D = mu sinh mu - 2 cosh mu + 2 (closed form, derived from the
    // homogeneous solution), evaluated with mpmath at 50 digits; the plain double evaluation of
    // these expressions loses about 1e-16/mu^4 to cancellation, which is why the series exists.
    const reference: [number, [number, number, number, number]][] = [
      [0.01, [120001.19999985714, 60000.099999928572, 40000.133333158731, 19999.966666769841]],
      [0.3, [134.53320489033734, 66.766602445168668, 44.577620934284609, 22.188981510884059]],
      [0.49, [51.178833256023069, 25.089416628011535, 16.792641348726415, 8.2967752792851192]],
      [0.51, [47.335730998491525, 23.167865499245763, 15.511582180625527, 7.6562833186202355]],
    ];
    const lambda = Math.sqrt(GIt / EIw);
    for (const [mu, [k00, k01, k11, k13]] of reference) {
      const L = mu / lambda;
      const k = warpingTorsionStiffness({ GIt, EIw, L });
      expect(((k[0] as number[])[0] as number) / ((GIt / L) * k00)).toBeCloseTo(1, 13);
      expect(((k[0] as number[])[1] as number) / (GIt * k01)).toBeCloseTo(1, 13);
      expect(((k[1] as number[])[1] as number) / (GIt * L * k11)).toBeCloseTo(1, 13);
      expect(((k[1] as number[])[3] as number) / (GIt * L * k13)).toBeCloseTo(1, 13);
    }
  });

  it('tends to the cubic Hermite element E Iw [12/L^3 ...] when G It -> 0 and to St Venant G It/L when Iw = 0', () => {
    const L = 2;
    const k = warpingTorsionStiffness({ GIt: 0, EIw, L });
    // Closed form: the beam-bending matrix with E I -> E Iw (phi, phi') in place of (w, w').
    const hermite = [
      [12 / L ** 3, 6 / L ** 2, -12 / L ** 3, 6 / L ** 2],
      [6 / L ** 2, 4 / L, -6 / L ** 2, 2 / L],
      [-12 / L ** 3, -6 / L ** 2, 12 / L ** 3, -6 / L ** 2],
      [6 / L ** 2, 2 / L, -6 / L ** 2, 4 / L],
    ].map((row) => row.map((v) => v * EIw));
    expectMatrixClose(k, hermite, 1e-14);
    const sv = warpingTorsionStiffness({ GIt, EIw: 0, L });
    expectMatrixClose(sv, [
      [GIt / L, 0, -GIt / L, 0],
      [0, 0, 0, 0],
      [-GIt / L, 0, GIt / L, 0],
      [0, 0, 0, 0],
    ], 1e-15);
    // Very large lambda L (1e4) stays finite and approaches St Venant on phi.
    const stiff = warpingTorsionStiffness({ GIt, EIw: EIw * 1e-12, L: 20 });
    expect((stiff[0] as number[])[0]).toBeCloseTo(GIt / 20, 3);
    expect(stiff.flat().every(Number.isFinite)).toBe(true);
  });

  it('clamped-end bimoment under uniform torque: m L^2/12 for small lambda L, (m/lambda^2)((mu/2)coth(mu/2) - 1) otherwise', () => {
    const m = 1e3;
    // Closed form, derived from B'' - lambda^2 B = m with zero end rotations (torsion.ts).
    const lambda = Math.sqrt(GIt / EIw);
    for (const mu of [1e-4, 0.3, 0.7, 3, 40]) {
      const L = mu / lambda;
      const expected = mu < 1e-3 ? (m * L * L) / 12 : (m / lambda ** 2) * ((mu / 2) / Math.tanh(mu / 2) - 1);
      expect(clampedEndBimoment(m, { GIt, EIw, L }) / expected).toBeCloseTo(1, 9);
    }
  });

  it('bimoment along an element: fork-fork uniform torque and a boundary layer at lambda L = 800 (no overflow)', () => {
    const m = 2e3;
    const lambda = 0.9;
    const L = 5;
    // Fork ends B(0) = B(L) = 0: B(x) = (m/lambda^2)(cosh(lambda(x - L/2))/cosh(lambda L/2) - 1) (derived).
    for (const x of [0, 0.7, 2.5, 4.1, 5]) {
      const { B, dB } = bimomentAt(x, L, lambda, 0, 0, m);
      expect(B).toBeCloseTo((m / lambda ** 2) * (Math.cosh(lambda * (x - L / 2)) / Math.cosh((lambda * L) / 2) - 1), 8);
      expect(dB).toBeCloseTo(((m / lambda) * Math.sinh(lambda * (x - L / 2))) / Math.cosh((lambda * L) / 2), 8);
    }
    // lambda L = 800: an end bimoment decays as exp(-lambda x) (sinh(lambda(L - x))/sinh(lambda L) asymptotically).
    const big = bimomentAt(0.5, 10, 80, 1e4, 0, 0);
    expect(big.B / (1e4 * Math.exp(-40))).toBeCloseTo(1, 12);
    expect(big.dB / (-80 * 1e4 * Math.exp(-40))).toBeCloseTo(1, 12);
  });
});

describe('3D beam element', () => {
  const L = 3.2;
  const ke = localStiffness(ipe300, L);

  it('is symmetric and stores no energy in the six rigid-body motions (closed form: rigid motion has no strain)', () => {
    expect(ke.isSymmetric()).toBe(true);
    // Rigid motion u(x) = u0 + theta × (x e_x); rotation about x keeps phi constant, so phi' = w = 0.
    const rigid = (u0: Vec3, theta: Vec3): number[] => {
      const tip: Vec3 = [u0[0], u0[1] + theta[2] * L, u0[2] - theta[1] * L];
      return [...u0, ...theta, 0, ...tip, ...theta, 0];
    };
    for (const [u0, theta] of [
      [[1, 0, 0], [0, 0, 0]],
      [[0, 1, 0], [0, 0, 0]],
      [[0, 0, 1], [0, 0, 0]],
      [[0, 0, 0], [1, 0, 0]],
      [[0, 0, 0], [0, 1, 0]],
      [[0, 0, 0], [0, 0, 1]],
    ] as [Vec3, Vec3][]) {
      const forces = ke.mmul(Matrix.columnVector(rigid(u0, theta))).getColumn(0);
      for (const f of forces) expect(Math.abs(f)).toBeLessThan(1e-6 * ke.max());
    }
  });

  it('reversing an element gives the same global stiffness with the node blocks swapped (warping freedom keeps its sign)', () => {
    const a: Vec3 = [1, 2, 0.5];
    const b: Vec3 = [3.4, 0.2, 1.7];
    const forward = elementAxes(a, b);
    const backward = elementAxes(b, a);
    const kf = localStiffness(ipe300, forward.length);
    const Kf = globalStiffness(kf, transformation(forward.R));
    const Kb = globalStiffness(localStiffness(ipe300, backward.length), transformation(backward.R));
    const swap = (i: number) => (i + 7) % 14;
    for (let i = 0; i < 14; i++) {
      for (let j = 0; j < 14; j++) expect(Math.abs(Kb.get(swap(i), swap(j)) - Kf.get(i, j))).toBeLessThan(1e-9 * Kf.max());
    }
  });

  it('axes: z is the part of up normal to x, y = z × x; up parallel to x is rejected', () => {
    const axes = elementAxes([0, 0, 0], [0, 4, 0], [0, 1, 1]);
    expect(axes.length).toBe(4);
    // x = +Y; up (0,1,1) minus its x part is +Z; y = Z × Y = −X.
    expect(axes.R[0]).toEqual([0, 1, 0]);
    expect(axes.R[2]).toEqual([0, 0, 1]);
    expect(axes.R[1]).toEqual([-1, 0, 0]);
    expect(() => elementAxes([0, 0, 0], [0, 0, 3], undefined, 'elements[4]')).toThrowError(GirderError);
    try {
      elementAxes([0, 0, 0], [0, 0, 3], undefined, 'elements[4]');
    } catch (error) {
      expect((error as GirderError).code).toBe('BAD_MODEL');
      expect((error as GirderError).path).toBe('elements[4].up');
      expect((error as GirderError).message).toBe(
        'elements[4].up [0, 0, 1] is parallel to the element axis, so it cannot fix the local z axis; give an up vector across the element',
      );
    }
  });

  it('consistent loads of uniform q and m balance the applied resultant (statics)', () => {
    const q: Vec3 = [1e3, -2e3, 3e3];
    const m: Vec3 = [400, -500, 600];
    const fe = consistentLoads(ipe300, L, q, m);
    // Sum of end forces = q L; sum of end moments about node I = (L/2 e_x) × q L + m L (moments
    // about x: mx L, carried by the torques; bimoments are self-equilibrated and add nothing).
    for (const k of [0, 1, 2] as const) expect((fe[k] as number) + (fe[7 + k] as number)).toBeCloseTo(q[k] * L, 9);
    const momentAboutI: Vec3 = [
      (fe[3] as number) + (fe[10] as number),
      (fe[4] as number) + (fe[11] as number) - L * (fe[9] as number),
      (fe[5] as number) + (fe[12] as number) + L * (fe[8] as number),
    ];
    const expected: Vec3 = [m[0] * L, -(L / 2) * q[2] * L + m[1] * L, (L / 2) * q[1] * L + m[2] * L];
    for (const k of [0, 1, 2] as const) expect(momentAboutI[k]).toBeCloseTo(expected[k], 9);
  });
});
