/**
 * Benchmark model: a closed ring of straight segments (radius 3 m, HE 300 B section properties
 * from EN 10365, REFERENCES.md section 5) bearing on a continuous support, represented by five
 * compression-only bearing points across the bottom flange width at every node. Vertical line load
 * varying around the ring, applied at a radial eccentricity inside the web line, so that the outer
 * part of the flange lifts off.
 */
import type { Dof, ElementLineLoad, GirderModel, PointSpring, SectionStiffness, Support } from '../src/index.js';

export const RADIUS = 3;
export const FLANGE_WIDTH = 0.3;
export const SECTION_DEPTH = 0.3;
/** Bedding modulus, N/m3: contact pressure per unit settlement, about E/t of a 0.1 m bed of E = 10 GPa (demo value). */
export const BEARING_MODULUS = 1e11;
export const heb300: SectionStiffness = { A: 149.1e-4, Iy: 25170e-8, Iz: 8563e-8, It: 185.0e-8, Iw: 1688e-9, E: 210e9, G: 81e9, density: 7850 };

export function ringOnBearings(segments: number, loadEccentricity = -0.1): GirderModel {
  const angle = (k: number): number => (2 * Math.PI * k) / segments;
  const chord = 2 * RADIUS * Math.sin(Math.PI / segments);
  const across = [-0.5, -0.25, 0, 0.25, 0.5].map((s) => s * FLANGE_WIDTH);
  const springs: PointSpring[] = [];
  for (let k = 0; k < segments; k++) {
    const c = Math.cos(angle(k));
    const s = Math.sin(angle(k));
    across.forEach((r, j) => {
      springs.push({
        id: `B${k}.${j}`,
        node: `R${k}`,
        direction: [0, 0, 1],
        // Each point stands for a fifth of the flange width over one segment length.
        stiffness: (BEARING_MODULUS * chord * FLANGE_WIDTH) / across.length,
        offset: [r * c, r * s, -SECTION_DEPTH / 2],
        behaviour: 'compression-only',
        group: `line ${j}`,
        tributaryLength: chord,
      });
    });
  }
  const supports: Support[] = [
    { node: 'R0', fix: ['ux', 'uy'] as Dof[] },
    { node: `R${segments / 2}`, fix: ['uy'] as Dof[] },
  ];
  const lineLoads: ElementLineLoad[] = Array.from({ length: segments }, (_, k) => {
    const mid = angle(k + 0.5);
    const q = 150e3 * (1 + 0.5 * Math.cos(mid));
    return { element: `S${k}`, q: [0, 0, -q], offset: [loadEccentricity * Math.cos(mid), loadEccentricity * Math.sin(mid), SECTION_DEPTH / 2] };
  });
  return {
    nodes: Array.from({ length: segments }, (_, k) => ({ id: `R${k}`, x: RADIUS * Math.cos(angle(k)), y: RADIUS * Math.sin(angle(k)), z: 0 })),
    elements: Array.from({ length: segments }, (_, k) => ({ id: `S${k}`, nodeI: `R${k}`, nodeJ: `R${(k + 1) % segments}`, section: 'HEB300' })),
    sections: { HEB300: heb300 },
    supports,
    springs,
    loadCases: [{ name: 'Q', lineLoads, nodalLoads: [] }],
  };
}
