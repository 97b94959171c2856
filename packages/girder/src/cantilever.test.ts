import { describe, expect, it } from 'vitest';
import { analyse, sumReactions } from './analyse.js';
import { sumLoads } from './loads.js';
import type { GirderModel, LoadCase, SectionStiffness, Vec3 } from './model.js';
import { STANDARD_GRAVITY } from './model.js';

// HE 300 B, EN 10365 dimensions (REFERENCES.md section 5: A 149.1 cm2, I_y 25170 cm4, I_z 8563 cm4,
// I_t 185.0 cm4, I_w 1688e3 cm6); steel E = 210 GPa, G = 81 GPa, 7850 kg/m3.
const heb300: SectionStiffness = { A: 149.1e-4, Iy: 25170e-8, Iz: 8563e-8, It: 185.0e-8, Iw: 1688e-9, E: 210e9, G: 81e9, density: 7850 };
const L = 4;
const P = 20e3;

/** Cantilever along `axis` (unit) from the origin, fixed at N0, `segments` elements. */
function cantilever(axis: Vec3, segments: number, loadCase: LoadCase, up?: Vec3): GirderModel {
  const nodes = Array.from({ length: segments + 1 }, (_, i) => ({ id: `N${i}`, x: (axis[0] * L * i) / segments, y: (axis[1] * L * i) / segments, z: (axis[2] * L * i) / segments }));
  const elements = Array.from({ length: segments }, (_, i) => ({ id: `E${i}`, nodeI: `N${i}`, nodeJ: `N${i + 1}`, section: 'HEB300', ...(up ? { up } : {}) }));
  return {
    nodes,
    elements,
    sections: { HEB300: heb300 },
    supports: [{ node: 'N0', fix: ['ux', 'uy', 'uz', 'rx', 'ry', 'rz', 'w'] }],
    springs: [],
    loadCases: [loadCase],
  };
}

const tipLoad = (force: Vec3, moment?: Vec3): LoadCase => ({ name: 'P', lineLoads: [], nodalLoads: [{ node: 'N2', force, ...(moment ? { moment } : {}) }] });
const only = { name: 'P only', factors: { P: 1 } };

describe('cantilever under a tip load (closed form, elementary beam theory)', () => {
  const { E, A, Iy, Iz } = heb300;

  it('tip deflection P L^3/(3 E I) in both planes and axial P L/(E A)', () => {
    const vertical = analyse(cantilever([1, 0, 0], 2, tipLoad([0, 0, -P])), only);
    const lateral = analyse(cantilever([1, 0, 0], 2, tipLoad([0, P, 0])), only);
    const axial = analyse(cantilever([1, 0, 0], 2, tipLoad([P, 0, 0])), only);
    // Closed form, Euler-Bernoulli cantilever: w = P L^3 / (3 E I), slope P L^2 / (2 E I); bar: P L / (E A).
    const tip = (r: typeof vertical) => r.displacements.find((d) => d.node === 'N2');
    expect(tip(vertical)?.uz).toBeCloseTo((-P * L ** 3) / (3 * E * Iy), 12);
    // Sagging slope: the tip rotates about +Y (right hand: x-down tip turns z toward x) by P L^2/(2 E Iy).
    expect(tip(vertical)?.ry).toBeCloseTo((P * L ** 2) / (2 * E * Iy), 12);
    expect(tip(lateral)?.uy).toBeCloseTo((P * L ** 3) / (3 * E * Iz), 12);
    expect(tip(lateral)?.rz).toBeCloseTo((P * L ** 2) / (2 * E * Iz), 12);
    expect((tip(axial)?.ux ?? 0) / ((P * L) / (E * A))).toBeCloseTo(1, 12);
  });

  it('skew member (axis (1,1,1)/√3): deflection along local z is P L^3/(3 E Iy) and along local y P L^3/(3 E Iz)', () => {
    const s = 1 / Math.sqrt(3);
    const ex: Vec3 = [s, s, s];
    // Local z = part of +Z normal to x: Z − (Z·x) x, normalised; local y = z × x.
    const zRaw: Vec3 = [-s * s, -s * s, 1 - s * s];
    const zn = Math.hypot(...zRaw);
    const ez: Vec3 = [zRaw[0] / zn, zRaw[1] / zn, zRaw[2] / zn];
    const ey: Vec3 = [ez[1] * ex[2] - ez[2] * ex[1], ez[2] * ex[0] - ez[0] * ex[2], ez[0] * ex[1] - ez[1] * ex[0]];
    const along = (r: ReturnType<typeof analyse>, e: Vec3) => {
      const d = r.displacements.find((x) => x.node === 'N2');
      return (d?.ux ?? 0) * e[0] + (d?.uy ?? 0) * e[1] + (d?.uz ?? 0) * e[2];
    };
    const rz = analyse(cantilever(ex, 2, tipLoad([P * ez[0], P * ez[1], P * ez[2]])), only);
    const ry = analyse(cantilever(ex, 2, tipLoad([P * ey[0], P * ey[1], P * ey[2]])), only);
    // Closed form, elementary beam theory (principal axes decouple).
    expect(along(rz, ez) / ((P * L ** 3) / (3 * E * Iy))).toBeCloseTo(1, 10);
    expect(along(rz, ey) / ((P * L ** 3) / (3 * E * Iy))).toBeCloseTo(0, 10);
    expect(along(ry, ey) / ((P * L ** 3) / (3 * E * Iz))).toBeCloseTo(1, 10);
  });

  it('uniform load: tip q L^4/(8 E Iy), root moment q L^2/2 (hogging: My > 0), shear and moment along the span', () => {
    const q = 15e3;
    const model = cantilever([1, 0, 0], 2, { name: 'P', lineLoads: [{ element: 'E0', q: [0, 0, -q] }, { element: 'E1', q: [0, 0, -q] }], nodalLoads: [] });
    const result = analyse(model, only, { stationsPerElement: 5 });
    const tip = result.displacements.find((d) => d.node === 'N2');
    // Closed form, elementary beam theory: cantilever under UDL, w_tip = q L^4/(8 E I) (Roark, Table 8.1 case 2a; case number from memory).
    expect((tip?.uz ?? 0) / ((-q * L ** 4) / (8 * E * Iy))).toBeCloseTo(1, 12);
    for (const station of result.stations) {
      const x = station.element === 'E0' ? station.x : station.x + L / 2;
      // Statics of the part beyond x: Vz = −q (L − x) (the load acts along −z), My = q (L − x)²/2.
      expect(station.Vz / (q * L)).toBeCloseTo((-q * (L - x)) / (q * L), 12);
      expect(station.My / (q * L * L)).toBeCloseTo((q * (L - x) ** 2) / 2 / (q * L * L), 12);
      expect(Math.abs(station.N) + Math.abs(station.T) + Math.abs(station.Mz) + Math.abs(station.B)).toBeLessThan(1e-6 * q * L);
    }
  });

  it('self weight: applied sum −ρ A g L Ẑ, balanced by the root reaction', () => {
    const model = cantilever([1, 0, 0], 4, { name: 'G', lineLoads: [], nodalLoads: [], selfWeightFactor: 1 });
    const result = analyse(model, { name: 'G', factors: { G: 1 } });
    const weight = heb300.density * heb300.A * STANDARD_GRAVITY * L;
    expect(result.appliedSum[2] / weight).toBeCloseTo(-1, 12);
    expect(result.reactionSum[2] / weight).toBeCloseTo(1, 12);
    // Statics: the weight W acts at x = L/2, so its moment about the root is (L/2 x̂) × (−W ẑ) = +W L/2 ŷ;
    // the support balances it with −W L/2 ŷ.
    const root = result.reactions.find((r) => r.node === 'N0');
    expect((root?.moment[1] ?? 0) / (weight * L)).toBeCloseTo(-0.5, 12);
    const applied = sumLoads(model, { name: 'G', factors: { G: 1 } });
    const reacted = sumReactions(model, result);
    for (const k of [0, 1, 2] as const) {
      expect(Math.abs(applied.force[k] + reacted.force[k])).toBeLessThan(1e-8 * weight);
      expect(Math.abs(applied.momentAboutOrigin[k] + reacted.momentAboutOrigin[k])).toBeLessThan(1e-8 * weight * L);
    }
  });
});

describe('springs at the tip', () => {
  const { E, Iy, G, It } = heb300;

  it('spring under the tip: compression force k P/(k + 3 E I/L^3) (springs in series, closed form)', () => {
    const k = 5e6;
    const model = cantilever([1, 0, 0], 2, tipLoad([0, 0, -P]));
    model.springs.push({ id: 'S1', node: 'N2', direction: [0, 0, 1], stiffness: k });
    const result = analyse(model, only);
    const kBeam = (3 * E * Iy) / L ** 3;
    // Closed form: the tip spring and the cantilever's tip stiffness 3EI/L^3 act in parallel.
    const force = result.springForces.find((s) => s.id === 'S1')?.force ?? 0;
    expect(force / P).toBeCloseTo(k / (k + kBeam), 12);
    expect(force).toBeGreaterThan(0); // compression: the spring pushes up (+d) while the tip moves down
    expect(result.reactionSum[2] / P).toBeCloseTo(1, 12);
    expect(result.appliedSum[2] / P).toBeCloseTo(-1, 12);
  });

  it('spring at a lateral offset e resists a tip torque: two-freedom closed form (St Venant, Iw = 0)', () => {
    const k = 2e7;
    const e = 0.15;
    const T = 8e3;
    const model = cantilever([1, 0, 0], 1, { name: 'P', lineLoads: [], nodalLoads: [{ node: 'N1', force: [0, 0, 0], moment: [T, 0, 0] }] });
    model.sections.HEB300 = { ...heb300, Iw: 0 };
    model.springs.push({ id: 'S1', node: 'N1', direction: [0, 0, 1], stiffness: k, offset: [0, e, 0] });
    const result = analyse(model, only);
    // Derived: the point moves δ = uz + e φ (θ × r with θ = φ x̂, r = e ŷ). Tip condensed stiffnesses
    // 3EI/L^3 (bending, slope free) and GIt/L (St Venant) give
    //   [3EI/L^3 + k, k e; k e, GIt/L + k e^2] [uz; φ] = [0; T].
    const a = (3 * E * Iy) / L ** 3 + k;
    const b = k * e;
    const c = (G * It) / L + k * e * e;
    const det = a * c - b * b;
    const uz = (-b * T) / det;
    const phi = (a * T) / det;
    const tip = result.displacements.find((d) => d.node === 'N1');
    expect((tip?.uz ?? 0) / uz).toBeCloseTo(1, 10);
    expect((tip?.rx ?? 0) / phi).toBeCloseTo(1, 10);
    const F = result.springForces[0]?.force ?? 0;
    expect(F / (-k * (uz + e * phi))).toBeCloseTo(1, 10);
    expect(F).toBeLessThan(0); // the +φ torque lifts the point at +y: the spring is in tension
  });
});
