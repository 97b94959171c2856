import { describe, expect, it } from 'vitest';
import { channelProperties, channelSection, checkChannelSecondaryMember, loadChannels } from './channels.js';
import { steelGrade } from './grades.js';

/** Brute-force midpoint integration of a channel (web at 0 <= y <= t_w, flanges towards +y, fillets exact). */
function integrate(d: { depth: number; flangeWidth: number; webThickness: number; flangeThickness: number; rootRadius: number }, n: number) {
  const { depth: h, flangeWidth: b, webThickness: tw, flangeThickness: tf, rootRadius: r } = d;
  const dy = b / n;
  const dz = h / (2 * n);
  const inside = (y: number, z: number): boolean => {
    const az = Math.abs(z);
    if (y <= tw || az >= h / 2 - tf) return true;
    if (y <= tw + r && az >= h / 2 - tf - r) return (y - (tw + r)) ** 2 + (az - (h / 2 - tf - r)) ** 2 >= r * r;
    return false;
  };
  const column = new Array<number>(n).fill(0);
  let A = 0;
  let Sy = 0;
  let Iy = 0;
  let Szz = 0;
  for (let i = 0; i < n; i++) {
    const y = (i + 0.5) * dy;
    for (let j = 0; j < 2 * n; j++) {
      const z = -h / 2 + (j + 0.5) * dz;
      if (!inside(y, z)) continue;
      const dA = dy * dz;
      A += dA;
      Sy += y * dA;
      Szz += y * y * dA;
      Iy += z * z * dA;
      column[i] = (column[i] ?? 0) + dA;
    }
  }
  const yc = Sy / A;
  let cumulative = 0;
  let yp = 0;
  for (let i = 0; i < n; i++) {
    const c = column[i] ?? 0;
    if (cumulative + c >= A / 2) {
      yp = i * dy + ((A / 2 - cumulative) / c) * dy;
      break;
    }
    cumulative += c;
  }
  let Wplz = 0;
  column.forEach((c, i) => (Wplz += c * Math.abs((i + 0.5) * dy - yp)));
  return { A, yc, Iy, Iz: Szz - A * yc * yc, Wplz };
}

describe('UPE channels (secondary members)', () => {
  it('holds UPE 80 to UPE 400 of EN 10365 (from memory), each with a source', () => {
    const names = loadChannels().map((c) => c.designation);
    expect(names).toEqual([80, 100, 120, 140, 160, 180, 200, 220, 240, 270, 300, 330, 360, 400].map((n) => `UPE ${n}`));
    expect(loadChannels().every((c) => c.role === 'secondary' && c.source.length > 0)).toBe(true);
  });

  it('closed-form properties agree with brute-force integration of the exact outline (UPE 200)', () => {
    const c = channelSection('upe200');
    const num = integrate(c.dimensions, 1600);
    const p = c.properties;
    expect(p.area / num.A).toBeCloseTo(1, 3);
    expect(p.centroidFromWebBack / num.yc).toBeCloseTo(1, 3);
    expect(p.secondMomentOfAreaY / num.Iy).toBeCloseTo(1, 3);
    expect(p.secondMomentOfAreaZ / num.Iz).toBeCloseTo(1, 3);
    // W_pl,z lumps each fillet at its centroid when locating the equal-area axis: 1 % agreement.
    expect(Math.abs(p.plasticModulusZ / num.Wplz - 1)).toBeLessThan(0.01);
  });

  it('mass per metre matches the producer table for five sizes (from memory)', () => {
    // Producer's UPE table (EN 10365), from memory: 7.90, 9.82, 22.8, 44.4, 72.2 kg/m.
    const printed: Array<[string, number, number]> = [
      ['UPE 80', 7.9, 0.005],
      ['UPE 100', 9.82, 0.005],
      ['UPE 200', 22.8, 0.05],
      ['UPE 300', 44.4, 0.05],
      ['UPE 400', 72.2, 0.05],
    ];
    for (const [name, mass, tolerance] of printed) expect(Math.abs(channelSection(name).properties.massPerMetre - mass), name).toBeLessThanOrEqual(tolerance);
  });

  it('shear centre lies behind the web by the thin-walled formula e = 3 b^2 t_f / (6 b t_f + h t_w)', () => {
    // Mid-line dimensions b' = b - t_w/2, h' = h - t_f (Timoshenko and Gere, thin-walled channel; from memory).
    const d = { depth: 0.2, flangeWidth: 0.08, webThickness: 0.006, flangeThickness: 0.011, rootRadius: 0 };
    const p = channelProperties(d);
    const bm = 0.08 - 0.003;
    const hm = 0.2 - 0.011;
    expect(p.shearCentreFromWebCentre).toBeCloseTo((3 * bm ** 2 * 0.011) / (6 * bm * 0.011 + hm * 0.006), 12);
    expect(p.shearCentreFromCentroid).toBeGreaterThan(p.shearCentreFromWebCentre);
  });

  it('restricted checks: linear interaction with plastic moduli for a class 1 channel, by hand', () => {
    const c = channelSection('UPE 200');
    const p = c.properties;
    const fy = 235e6;
    const results = checkChannelSecondaryMember(c, steelGrade('S235'), { N: 50e3, Vz: 20e3, My: 10e3, Mz: 1e3 });
    const interaction = results.find((r) => r.id === 'channel-interaction');
    expect(interaction?.intermediate['sectionClass']).toBe(1);
    expect(interaction?.utilisation ?? 0).toBeCloseTo(50e3 / (p.area * fy) + 10e3 / (p.plasticModulusY * fy) + 1e3 / (p.plasticModulusZ * fy), 9);
    expect(interaction?.notes?.[0]).toMatch(/no torsion or lateral-torsional buckling checks/);
    // A_v = A - 2 b t_f + (t_w + r) t_f, EN 1993-1-1 6.2.6(3)c.
    expect(p.shearAreaZ).toBeCloseTo(p.area - 2 * 0.08 * 0.011 + (0.006 + 0.013) * 0.011, 12);
  });
});
