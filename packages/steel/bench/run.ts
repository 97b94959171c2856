/**
 * Benchmark of the steel checks: every rolled I/H section through the cross-section checks and the
 * member checks, and a welded-girder catalogue generated and checked. Prints wall-clock times.
 */
import {
  checkBendingAndAxialCompression,
  checkLateralTorsionalBuckling,
  checkPatchLoading,
  checkSection,
  generateWeldedSections,
  governingCheck,
  loadRolledSections,
  steelGrade,
} from '../src/index.js';

const grade = steelGrade('S355');
const forces = { N: -150e3, Vy: 5e3, Vz: 120e3, Tsv: 1.5e3, Tw: 2e3, My: 180e3, Mz: 8e3, B: 3e3 };

function time(label: string, run: () => number): void {
  const start = performance.now();
  const count = run();
  const ms = performance.now() - start;
  console.log(`${label.padEnd(58)} ${count.toString().padStart(6)} sections  ${ms.toFixed(1).padStart(8)} ms  ${((1000 * ms) / count).toFixed(1).padStart(7)} us/section`);
}

const rolled = loadRolledSections();
time('rolled: checkSection (8 cross-section checks)', () => {
  for (const s of rolled) governingCheck(checkSection(s, grade, forces));
  return rolled.length;
});
time('rolled: LTB + Annex B interaction + patch loading', () => {
  for (const s of rolled) {
    checkLateralTorsionalBuckling(s, grade, forces.My, { length: 6, momentShape: 'uniformLoad' });
    checkBendingAndAxialCompression(s, grade, forces, { length: 6, lateralTorsional: { length: 6 } });
    checkPatchLoading(s, grade, { force: 300e3, stiffBearingLength: 0.1 });
  }
  return rolled.length;
});
let welded = generateWeldedSections({ minDepth: 0.4, maxDepth: 1.2, minFlangeWidth: 0.2, maxFlangeWidth: 0.5 });
time('welded: generate 400-1200 x 200-500 mm, standard plates', () => {
  welded = generateWeldedSections({ minDepth: 0.4, maxDepth: 1.2, minFlangeWidth: 0.2, maxFlangeWidth: 0.5 });
  return welded.length;
});
time('welded: checkSection + LTB', () => {
  for (const s of welded) {
    governingCheck(checkSection(s, grade, forces));
    checkLateralTorsionalBuckling(s, grade, forces.My, { length: 6 });
  }
  return welded.length;
});
