// Guards that stop a wrong answer from leaving the program. Each returns what it measured (kept in
// design.json and shown in the report) or throws DesignError('GUARD_FAILED') with the numbers:
//  - contact consistency: no tension in a compression-only bearing, no penetration of an open one;
//  - re-analysis: a fresh analysis of the chosen design, from nothing cached, gives the utilisations
//    the design reports (the sizing forces are the forces of the design that is reported);
//  - mesh convergence: the governing check, re-analysed with twice the segments, changes by less
//    than MESH_TOLERANCE; otherwise the design stops and names the input that refines the mesh.
// The equilibrium guard (reactions against loads) runs after every analysis (design.ts).
import type { AnalysisResult, GirderModel } from '@binsupport/girder';
import type { SteelGrade, SteelSection } from '@binsupport/steel';
import { DesignError } from './errors.js';
import type { CheckEnvelope } from './evaluate.js';
import type { GuardReport } from './result.js';

/**
 * Largest relative change of the governing utilisation when the segments are doubled (common
 * practice for a first-pass design: 2 %; the straight-segment ring converges at second order).
 */
export const MESH_TOLERANCE = 0.02;
/** Largest relative difference between the reported and the freshly re-analysed utilisations. */
export const REANALYSIS_TOLERANCE = 1e-9;
/**
 * Contact consistency tolerance, relative to the largest bearing force (or elongation) of the
 * analysis: the contact iteration ends on a relative elongation tolerance of 1e-9, so 1e-6 leaves room
 * for round-off and none for a wrong state.
 */
export const CONTACT_TOLERANCE = 1e-6;

/** Every compression-only bearing in every analysis: pressing springs are compressed, lifted ones open. */
export function contactGuard(items: ReadonlyArray<{ scenario: string; model: GirderModel; analysis: AnalysisResult }>): GuardReport['contact'] {
  let springs = 0;
  let largestTension = 0;
  let largestPenetration = 0;
  for (const { scenario, model, analysis } of items) {
    const behaviour = new Map(model.springs?.map((spring) => [spring.id, spring.behaviour ?? 'bilateral']) ?? []);
    const forceScale = Math.max(...analysis.springForces.map((spring) => Math.abs(spring.force)), 1e-30);
    const elongationScale = Math.max(...analysis.springForces.map((spring) => Math.abs(spring.elongation)), 1e-30);
    for (const spring of analysis.springForces) {
      if (behaviour.get(spring.id) !== 'compression-only') continue;
      springs += 1;
      // Compression is a positive force and a negative elongation (the spring shortens).
      const tension = Math.max(0, -spring.force) / forceScale;
      const penetration = spring.state === 'open' ? Math.max(0, -spring.elongation) / elongationScale : 0;
      const stretchedInContact = spring.state === 'elastic' ? Math.max(0, spring.elongation) / elongationScale : 0;
      largestTension = Math.max(largestTension, tension, stretchedInContact);
      largestPenetration = Math.max(largestPenetration, penetration);
      if (tension > CONTACT_TOLERANCE || stretchedInContact > CONTACT_TOLERANCE) {
        throw new DesignError('GUARD_FAILED', `contact guard: in ${analysis.combination} / ${scenario} the compression-only bearing ${spring.id} pulls (force ${spring.force.toExponential(3)} N, elongation ${spring.elongation.toExponential(3)} m); a bearing that merely rests cannot`);
      }
      if (penetration > CONTACT_TOLERANCE) {
        throw new DesignError('GUARD_FAILED', `contact guard: in ${analysis.combination} / ${scenario} the bearing ${spring.id} is taken as lifted off but is pressed in (elongation ${spring.elongation.toExponential(3)} m)`);
      }
    }
  }
  return { analyses: items.length, compressionOnlySprings: springs, largestTension, largestPenetration, tolerance: CONTACT_TOLERANCE };
}

function finiteOrNull(value: number | null): number | null {
  return value !== null && Number.isFinite(value) ? value : null;
}

function relative(a: number, b: number): number {
  if (a === b) return 0;
  if (!Number.isFinite(a) || !Number.isFinite(b)) return Infinity;
  return Math.abs(a - b) / Math.max(Math.abs(a), Math.abs(b), 1e-12);
}

/** The reported utilisations against those of a fresh analysis; stops on any difference beyond REANALYSIS_TOLERANCE. */
export function reanalysisGuard(reported: { girder: number; column: number | null }, fresh: { girder: number; column: number | null }): GuardReport['reanalysis'] {
  const girderDifference = relative(reported.girder, fresh.girder);
  const columnDifference = reported.column === null || fresh.column === null ? (reported.column === fresh.column ? 0 : Infinity) : relative(reported.column, fresh.column);
  const difference = Math.max(girderDifference, columnDifference);
  if (!(difference <= REANALYSIS_TOLERANCE)) {
    throw new DesignError(
      'GUARD_FAILED',
      `re-analysis guard: a fresh analysis of the chosen design gives utilisations ${fresh.girder} (girder) and ${fresh.column ?? 'none'} (columns); the design reports ${reported.girder} and ${reported.column ?? 'none'}: the sizing forces are not those of the reported design`,
    );
  }
  return {
    girderUtilisation: finiteOrNull(reported.girder),
    freshGirderUtilisation: finiteOrNull(fresh.girder),
    columnUtilisation: finiteOrNull(reported.column),
    freshColumnUtilisation: finiteOrNull(fresh.column),
    relativeDifference: difference,
    tolerance: REANALYSIS_TOLERANCE,
  };
}

/**
 * The governing check of the girder with the segments doubled. `refined` analyses the governing
 * combination and scenario on the finer mesh and returns its envelopes; the same check is compared.
 */
export function meshGuard(
  governing: CheckEnvelope,
  segmentsPerSpan: number,
  refined: (segmentsPerSpan: number) => CheckEnvelope[],
  context: { section: SteelSection; grade: SteelGrade },
): GuardReport['meshConvergence'] {
  const doubled = 2 * segmentsPerSpan;
  const same = refined(doubled).filter((envelope) => envelope.check.id === governing.check.id && envelope.combination === governing.combination && envelope.scenario === governing.scenario);
  const refinedUtilisation = Math.max(...same.map((envelope) => envelope.check.utilisation));
  const utilisation = governing.check.utilisation;
  const change = relative(utilisation, refinedUtilisation);
  const report = {
    check: governing.check.id,
    combination: governing.combination,
    scenario: governing.scenario,
    segmentsPerSpan,
    refinedSegmentsPerSpan: doubled,
    utilisation: finiteOrNull(utilisation),
    refinedUtilisation: finiteOrNull(refinedUtilisation),
    relativeChange: change,
    tolerance: MESH_TOLERANCE,
  };
  // A check outside its scope (Infinity) on both meshes has nothing to converge.
  if (!Number.isFinite(utilisation) && !Number.isFinite(refinedUtilisation)) return { ...report, relativeChange: 0 };
  if (same.length === 0 || !(change <= MESH_TOLERANCE)) {
    throw new DesignError(
      'GUARD_FAILED',
      `mesh-convergence guard: ${governing.check.id} of ${context.section.designation} ${context.grade.name} in ${governing.combination} / ${governing.scenario} is ${utilisation.toFixed(4)} with ${segmentsPerSpan} segments per span and ${Number.isFinite(refinedUtilisation) ? refinedUtilisation.toFixed(4) : 'not found'} with ${doubled} (change ${(100 * change).toFixed(2)} %, more than ${100 * MESH_TOLERANCE} %): set support.segmentsPerSpan to at least ${doubled} and design again`,
      'support.segmentsPerSpan',
    );
  }
  return report;
}
