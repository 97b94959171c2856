import { describe, expect, it } from 'vitest';
import { circularBinLoads, type CircularBinLoadInput } from './circular.js';
import { LoadsError } from './errors.js';
import { lineLoadAt } from './harmonics.js';
import { janssenProfile } from './janssen.js';
import { squatProfile } from './squat.js';

const DEG = Math.PI / 180;
// EN 1991-4:2006 Table E.1, wheat (read in the standard).
const wheat = { name: 'wheat', unitWeight: 9000, lateralPressureRatio: 0.54, lateralPressureRatioFactor: 1.11, wallFrictionCoefficient: 0.38, wallFrictionFactor: 1.16, angleOfRepose: 34 * DEG, internalFrictionAngle: 30 * DEG, internalFrictionFactor: 1.12, patchLoadFactor: 0.5 };

function input(bin: Partial<CircularBinLoadInput['bin']> = {}, extra: Partial<CircularBinLoadInput> = {}): CircularBinLoadInput {
  return {
    bin: { diameter: 6, cylinderHeight: 14, fillHeight: 12, wallThickness: 0.006, hopper: { apexHalfAngle: 30 * DEG, outletDiameter: 0.4, thickness: 0.008 }, steelDensity: 7850, ...bin },
    solid: wheat,
    partialFactors: { permanentFactor: 1.35, solidFactor: 1.5 },
    ...extra,
  };
}

const step = (loads: ReturnType<typeof circularBinLoads>, symbol: string) => loads.derivation.find((d) => d.symbol === symbol)?.value ?? Number.NaN;

describe('stored solid on the support line (EN 1991-4 5, 6)', () => {
  const loads = circularBinLoads(input());
  const rs = 3.003;

  it('classifies the 6 m x 12 m wheat bin: slender, AAC 2 (about 370 t, Table 2.1), thin-walled (d_c/t = 1000 > 200)', () => {
    expect(loads.classification).toMatchObject({ slenderness: 'slender', actionAssessmentClass: 2, thinWalled: true, hopper: 'steep' });
  });

  it('filling patch: C_pf, z_p = min(z_o, 0.5 h_c), F_pf = (pi/2) s d_c p_pf and M = F_pf (h_c - z_p) by hand (EN 1991-4 5.2.1.2-5.2.1.3, from memory)', () => {
    const K = 0.54 * 1.11; // max normal pressure: K upper, mu lower (Table 3.1)
    const mu = 0.38 / 1.16;
    const z0 = 1.5 / (K * mu);
    const zp = Math.min(z0, 6);
    const phf = (9000 * 1.5 / mu) * (1 - Math.exp(-zp / z0)); // (5.1)
    const Cpf = 0.21 * 0.5 * (1 - Math.exp(-1.5 * (2 - 1))); // e_f = 0
    const s = (Math.PI * 6) / 16;
    const F = (Math.PI / 2) * s * 6 * Cpf * phf;
    const M = F * (12 - zp);
    const patch = loads.cases.find((c) => c.name === 'Q_s,pf');
    expect(patch?.horizontalResultant?.x).toBeCloseTo(F, 6);
    expect(patch?.verticalLineLoad).toBe(0);
    // Beam theory of the shell: q(theta) = (M / (pi r^2)) cos(theta), eccentricity toward +X.
    expect(patch ? lineLoadAt(patch, 0).vertical : Number.NaN).toBeCloseTo(M / (Math.PI * rs * rs), 6);
    expect(patch ? lineLoadAt(patch, Math.PI / 2).vertical : Number.NaN).toBeCloseTo(0, 6);
    expect(patch ? lineLoadAt(patch, Math.PI / 2).tangential : Number.NaN).toBeCloseTo(-F / (Math.PI * rs), 6);
  });

  it('discharge keeps the weight and moves load from the hopper to the wall: F_w,e = C_w pi d_c n_zSk (max wall friction), C_w = 1.10', () => {
    const K = 0.54 * 1.11;
    const mu = 0.38 * 1.16; // max wall friction: K upper, mu upper (Table 3.1)
    const p = janssenProfile({ unitWeight: 9000, lateralPressureRatio: K, wallFrictionCoefficient: mu, hydraulicRadius: 1.5 });
    const z0 = p.z0;
    const nzSk = mu * 9000 * K * z0 * (12 - z0 * (1 - Math.exp(-12 / z0))); // (5.7)
    expect(step(loads, 'F_w,e')).toBeCloseTo(1.1 * Math.PI * 6 * nzSk, 4);
    const f = loads.cases.find((c) => c.name === 'Q_s,f');
    const e = loads.cases.find((c) => c.name === 'Q_s,e');
    expect(e?.verticalResultant).toBeCloseTo(f?.verticalResultant ?? Number.NaN, 4);
    expect(e?.radialLineLoad ?? Infinity).toBeLessThan(f?.radialLineLoad ?? 0);
  });

  it('an AAC 1 bin uses C_b = 1.3 as a case of its own, (C_b - 1) p_vf A along the meridian, and no patch loads', () => {
    const small = circularBinLoads(input({ diameter: 2.5, cylinderHeight: 6, fillHeight: 5, wallThickness: 0.004, hopper: { apexHalfAngle: 30 * DEG, outletDiameter: 0.3, thickness: 0.005 } }));
    expect(small.classification?.actionAssessmentClass).toBe(1);
    const b = small.cases.find((c) => c.name === 'Q_s,b');
    const pvf = step(small, 'p_vf(h_c)');
    const A = Math.PI * 1.25 * 1.25;
    expect(b?.verticalResultant).toBeCloseTo(0.3 * pvf * A, 6);
    expect(b ? b.radialLineLoad / b.verticalLineLoad : Number.NaN).toBeCloseTo(Math.tan(30 * DEG), 10);
    expect(small.cases.some((c) => c.name === 'Q_s,pf' || c.name === 'Q_s,pe')).toBe(false);
    expect(small.combinations.find((c) => c.leading === 'Q_s')?.factors['Q_s,b']).toBe(1.5);
  });

  it('a thick-walled bin (d_c/t <= 200) puts no patch on the support line (self-equilibrated patch)', () => {
    const thick = circularBinLoads(input({ wallThickness: 0.04 }));
    expect(thick.cases.some((c) => c.name === 'Q_s,pf')).toBe(false);
    expect(thick.notes?.some((n) => n.includes('self-equilibrated'))).toBe(true);
  });

  it('reports the steep hopper closure: wall pressures plus outlet force = p_vft A + gamma V_hop (statics)', () => {
    expect(Math.abs(step(loads, 'delta_hop'))).toBeLessThan(1e-6);
    expect(loads.profiles.filter((p) => p.part === 'hopper')).toHaveLength(2);
  });

  it('an eccentric top pile puts its moment on Q_s,f and Q_s,e without changing the total', () => {
    const pile = circularBinLoads(input({ topSurface: 'pile', fillingEccentricity: 1, eccentricityAngle: Math.PI / 2 }));
    const f = pile.cases.find((c) => c.name === 'Q_s,f');
    const M = step(pile, 'M_pile');
    expect(M).toBeGreaterThan(0);
    expect(f ? lineLoadAt(f, Math.PI / 2).vertical - f.verticalLineLoad : Number.NaN).toBeCloseTo(M / (Math.PI * rs * rs), 6);
    expect(f?.verticalResultant).toBeCloseTo(loads.cases.find((c) => c.name === 'Q_s,f')?.verticalResultant ?? Number.NaN, 3);
  });
});

describe('squat filling with a top pile (EN 1991-4 5.3.1.1)', () => {
  it('reproduces (5.71)-(5.80) evaluated by hand with h_o = (d_c/6) tan(phi_r) (REFERENCES.md §1, from memory)', () => {
    const gamma = 9000;
    const K = 0.5;
    const mu = 0.4;
    const AoverU = 1.5;
    const phiR = 34 * DEG;
    const h0 = (6 / 6) * Math.tan(phiR);
    const z0 = AoverU / (K * mu);
    const n = -(1 + Math.tan(phiR)) * (1 - h0 / z0);
    const profile = squatProfile({ unitWeight: gamma, lateralPressureRatio: K, wallFrictionCoefficient: mu, hydraulicRadius: AoverU, angleOfRepose: phiR, h0 });
    for (const z of [0.5 * h0, 2, 5]) {
      const state = profile.at(z);
      if (z <= h0) {
        expect(state.ph).toBe(0);
        continue;
      }
      const YR = 1 - Math.pow((z - h0) / (z0 - h0) + 1, n);
      const zV = h0 - (1 / (n + 1)) * (z0 - h0 - Math.pow(z + z0 - 2 * h0, n + 1) / Math.pow(z0 - h0, n));
      expect(state.ph).toBeCloseTo(gamma * K * z0 * YR, 8);
      expect(state.pv).toBeCloseTo(gamma * zV, 8);
    }
  });
});

describe('roof, equipment, snow, wind and seismic on the support line', () => {
  const rs = 3.003;
  const roofArea = Math.PI * 3.006 * 3.006;
  const loads = circularBinLoads(
    input({}, {
      roof: { deadLoad: 400, imposedLoad: 600, pitch: 15 * DEG },
      equipment: [{ name: 'conveyor head', angle: Math.PI / 4, radius: 2, force: 30e3 }],
      snow: { groundLoad: 1500 },
      wind: { basicVelocity: 26, terrainCategory: 'II', supportLevelHeight: 8, directions: [0, Math.PI / 2] },
      seismic: { horizontalCoefficient: 0.2 },
    }),
  );
  const find = (name: string) => loads.cases.find((c) => c.name === name);

  it('snow s = mu_1 C_e C_t s_k on plan with mu_1 = 0.8 below 30 degrees (EN 1991-1-3 (5.1), Table 5.2, from memory)', () => {
    expect(find('S')?.verticalResultant).toBeCloseTo(0.8 * 1500 * roofArea, 6);
    expect(find('G_roof')?.verticalLineLoad).toBeCloseTo((400 * roofArea) / (2 * Math.PI * rs), 8);
  });

  it('equipment: resultant F and moment F r about the axis (statics)', () => {
    const eq = find('G_eq');
    expect(eq?.verticalResultant).toBe(30e3);
    const amplitude = (30e3 * 2) / (Math.PI * rs * rs);
    expect(eq ? lineLoadAt(eq, Math.PI / 4).vertical - eq.verticalLineLoad : Number.NaN).toBeCloseTo(amplitude, 8);
  });

  it('wind: F_w = c_f,0 psi_lambda q_p(z_e) b h and M = F_w h/2 by hand (EN 1991-1-4 (4.8), (7.19), Figure 7.36; from memory)', () => {
    const b = 6.012;
    const h = 14;
    const ze = 8 + 14;
    const kr = 0.19;
    const vm = kr * Math.log(ze / 0.05) * 26;
    const Iv = 1 / Math.log(ze / 0.05);
    const qp = (1 + 7 * Iv) * 0.5 * 1.25 * vm * vm;
    const Re = (b * Math.sqrt((2 * qp) / 1.25)) / 15e-6;
    const cf0 = 1.2 + (0.18 * Math.log10((10 * 0.2e-3) / b)) / (1 + 0.4 * Math.log10(Re / 1e6));
    const lambda = (2 * h) / b; // Table 7.16, l <= 15 m
    const psi = 0.6 + 0.1 * Math.log10(lambda); // Figure 7.36 between lambda 1 and 10
    const F = cf0 * psi * qp * b * h;
    const w = find('W_90');
    expect(w?.horizontalResultant?.y).toBeCloseTo(F, 4);
    expect(w?.horizontalResultant?.x).toBeCloseTo(0, 6);
    expect(w ? lineLoadAt(w, Math.PI / 2).vertical : Number.NaN).toBeCloseTo((F * h) / 2 / (Math.PI * rs * rs), 5);
    expect(w?.verticalResultant).toBe(0);
  });

  it('seismic: F_E = a (plates + roof + equipment + 0.8 solid) (equivalent static; mass fraction from memory)', () => {
    const e = find('E_0');
    const W = loads.totals.structureWeight + (loads.totals.roofDeadLoad ?? 0) + (loads.totals.permanentEquipment ?? 0) + 0.8 * loads.totals.solidWeight;
    expect(e?.horizontalResultant?.x).toBeCloseTo(0.2 * W, 4);
    expect(loads.combinations.some((c) => c.verification === 'seismic' && c.factors['E_0'] === 1)).toBe(true);
  });

  it('keeps the closure combination first among the characteristic ones', () => {
    expect(loads.combinations.find((c) => Object.values(c.factors).every((f) => f === 1))?.factors).toEqual({ G: 1, 'Q_s,f': 1 });
  });
});

describe('input errors name the field, the range and the unit', () => {
  const cases: Array<[string, CircularBinLoadInput, string, RegExp]> = [
    ['diameter', input({ diameter: 70 }), 'bin.diameter', /bin\.diameter must be greater than 0 and less than 60 m/],
    ['fill height', input({ fillHeight: 15 }), 'bin.fillHeight', /bin\.fillHeight must be greater than 0 and at most 14 m/],
    ['wall thickness', input({ wallThickness: -0.001 }), 'bin.wallThickness', /bin\.wallThickness must be greater than 0 and at most 0\.3 m/],
    ['apex half-angle', input({ hopper: { apexHalfAngle: 88 * DEG, outletDiameter: 0.4, thickness: 0.008 } }), 'bin.hopper.apexHalfAngle', /bin\.hopper\.apexHalfAngle must be between 5 and 85 degrees; got 88/],
    ['outlet', input({ hopper: { apexHalfAngle: 30 * DEG, outletDiameter: 6, thickness: 0.008 } }), 'bin.hopper.outletDiameter', /bin\.hopper\.outletDiameter must be at least 0 and less than 6 m/],
    ['C_b', input({ hopper: { apexHalfAngle: 30 * DEG, outletDiameter: 0.4, thickness: 0.008, bottomLoadMagnifier: 0.9 } }), 'bin.hopper.bottomLoadMagnifier', /between 1 and 2/],
    ['filling eccentricity', input({ fillingEccentricity: 3.5 }), 'bin.fillingEccentricity', /bin\.fillingEccentricity must be at least 0 and less than 3 m/],
    ['AAC lowered', input({ actionAssessmentClass: 1 }), 'bin.actionAssessmentClass', /must be at least 2/],
    ['unit weight', { ...input(), solid: { ...wheat, unitWeight: 50 } }, 'solid.unitWeight', /solid\.unitWeight must be between 1000 and 30000 N\/m3; got 50/],
    ['K', { ...input(), solid: { ...wheat, lateralPressureRatio: 1.2 } }, 'solid.lateralPressureRatio', /greater than 0 and less than 1/],
    ['C_op', { ...input(), solid: { ...wheat, patchLoadFactor: 3 } }, 'solid.patchLoadFactor', /between 0 and 2/],
    ['roof', input({}, { roof: { deadLoad: -1 } }), 'roof.deadLoad', /roof\.deadLoad must be between 0 and 50000 Pa/],
    ['equipment', input({}, { equipment: [{ name: 'x', angle: 0, radius: 4, force: 1 }] }), 'equipment[0].radius', /equipment\[0\]\.radius must be between 0 and 3\.006 m/],
    ['snow', input({}, { snow: { groundLoad: 1000, exposureCoefficient: 2 } }), 'snow.exposureCoefficient', /between 0\.8 and 1\.2/],
    ['wind speed', input({}, { wind: { basicVelocity: 90, terrainCategory: 'II', supportLevelHeight: 5 } }), 'wind.basicVelocity', /wind\.basicVelocity must be greater than 0 and at most 70 m\/s/],
    ['seismic', input({}, { seismic: { horizontalCoefficient: 3 } }), 'seismic.horizontalCoefficient', /between 0 and 2/],
  ];
  for (const [label, bad, path, message] of cases) {
    it(`rejects a bad ${label}`, () => {
      let error: unknown;
      try {
        circularBinLoads(bad);
      } catch (caught) {
        error = caught;
      }
      expect(error).toBeInstanceOf(LoadsError);
      expect(error).toMatchObject({ code: 'BAD_INPUT', path });
      expect((error as LoadsError).message).toMatch(message);
    });
  }

  it('reports large-eccentricity discharge (e_o > 0.25 d_c) as not covered (EN 1991-4 5.2.4)', () => {
    expect(() => circularBinLoads(input({ outletEccentricity: 1.6 }))).toThrowError(/bin\.outletEccentricity must be at most 0\.25 bin\.diameter \(1\.500 m\); got 1\.6: large-eccentricity discharge/);
    try {
      circularBinLoads(input({ outletEccentricity: 1.6 }));
    } catch (error) {
      expect(error).toMatchObject({ code: 'OUT_OF_SCOPE', path: 'bin.outletEccentricity' });
    }
  });
});
