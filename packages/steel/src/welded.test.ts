import { describe, expect, it } from 'vitest';
import { generateWeldedSections, weldedISection } from './welded.js';
import { listSections, sectionFamilies } from './catalogue.js';
import { checkSection } from './checks.js';
import { checkFlexuralBuckling } from './buckling.js';
import { steelGrade } from './grades.js';
import { SteelError } from './errors.js';

describe('welded plate I-girders', () => {
  it('properties of WI 800x300x10x25 by the three-rectangle formulas (evaluated here by hand)', () => {
    const h = 0.8;
    const b = 0.3;
    const tw = 0.01;
    const tf = 0.025;
    const hw = h - 2 * tf;
    const s = weldedISection({ depth: h, flangeWidth: b, webThickness: tw, flangeThickness: tf });
    expect(s.designation).toBe('WI 800x300x10x25');
    expect(s.fabrication).toBe('welded');
    const p = s.properties;
    // Textbook I of three rectangles (no fillets, weld throats ignored).
    expect(p.area).toBeCloseTo(2 * b * tf + hw * tw, 12);
    expect(p.secondMomentOfAreaY / ((b * h ** 3 - (b - tw) * hw ** 3) / 12)).toBeCloseTo(1, 12);
    expect(p.plasticModulusY / (b * tf * (h - tf) + (tw * hw ** 2) / 4)).toBeCloseTo(1, 12);
    expect(p.warpingConstant / ((tf * b ** 3 * (h - tf) ** 2) / 24)).toBeCloseTo(1, 12);
    // I_t of thin rectangles with the flange end correction (common practice), A_vz = h_w t_w (EN 1993-1-1 6.2.6(3)d).
    expect(p.torsionConstant / ((2 / 3) * (b - 0.63 * tf) * tf ** 3 + (hw * tw ** 3) / 3)).toBeCloseTo(1, 12);
    expect(p.shearAreaZ).toBeCloseTo(hw * tw, 12);
    // By hand: A = 2*0.3*0.025 + 0.75*0.01 = 0.0225 m2 -> 176.6 kg/m.
    expect(p.massPerMetre).toBeCloseTo(0.0225 * 7850, 9);
  });

  it('checkSection uses the welded shear area and the buckling curves of the welded rows', () => {
    const s = weldedISection({ depth: 0.5, flangeWidth: 0.25, webThickness: 0.01, flangeThickness: 0.02 });
    const grade = steelGrade('S355');
    const shear = checkSection(s, grade, { N: 0, Vy: 0, Vz: 300e3, Tsv: 0, Tw: 0, My: 0, Mz: 0, B: 0 }).find((r) => r.id === 'shear-z');
    // V_pl,Rd = h_w t_w f_y / sqrt 3 (EN 1993-1-1 6.2.6(2), (3)d).
    expect(shear?.intermediate['V_pl_Rd'] ?? 0).toBeCloseTo((0.46 * 0.01 * 355e6) / Math.sqrt(3), 3);
    // Table 6.2 welded I, t_f <= 40 mm: curve c about z (alpha 0.49).
    expect(checkFlexuralBuckling(s, grade, -1e6, { length: 5 }).intermediate['alpha_z']).toBe(0.49);
  });

  it('generates every plate combination within the limits, skipping webs thicker than flanges', () => {
    const all = generateWeldedSections({ minDepth: 0.6, maxDepth: 0.8, minFlangeWidth: 0.25, maxFlangeWidth: 0.3, flangeThicknesses: [0.012, 0.02], webThicknesses: [0.01, 0.015] });
    // By enumeration: 5 depths x 2 widths x (t_f 12: t_w 10 only; t_f 20: t_w 10, 15) = 30.
    expect(all).toHaveLength(30);
    expect(all[0]?.designation).toBe('WI 600x250x10x12');
    expect(all.every((s) => s.dimensions.depth <= 0.8 + 1e-12 && s.dimensions.flangeWidth >= 0.25 - 1e-12)).toBe(true);
    expect(() => generateWeldedSections({ minDepth: 0.8, maxDepth: 0.6, minFlangeWidth: 0.2, maxFlangeWidth: 0.3 })).toThrowError(SteelError);
  });
});

describe('section listings', () => {
  it('lists each family with its key properties', () => {
    expect(sectionFamilies()).toEqual(['IPE', 'HE A', 'HE B', 'HE M', 'UPE', 'welded I']);
    const upe = listSections('UPE');
    expect(upe.map((r) => r.role)).toEqual(new Array<string>(14).fill('secondary'));
    const heb = listSections('HE B');
    expect(heb).toHaveLength(24);
    const row = heb.find((r) => r.designation === 'HE 300 B');
    // REFERENCES section 5: A = 149.1 cm2, I_y = 25170 cm4.
    expect((row?.area ?? 0) / 1e-4).toBeCloseTo(149.1, 1);
    expect((row?.secondMomentOfAreaY ?? 0) / 1e-8 / 25170).toBeCloseTo(1, 3);
    expect(listSections('IPE').every((r) => r.fabrication === 'rolled' && r.source.length > 0)).toBe(true);
    expect(listSections('welded I', { minDepth: 0.5, maxDepth: 0.5, minFlangeWidth: 0.2, maxFlangeWidth: 0.2, flangeThicknesses: [0.02], webThicknesses: [0.01] })).toHaveLength(1);
    expect(() => listSections('welded I')).toThrowError(/needs the depth/);
  });
});
