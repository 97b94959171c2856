import { LoadsError, rectangularBinLoads, type LoadSet, type RectangularBin, type RectangularLoadSet } from '@binsupport/loads';
import type { BinSpec, RectangularBinSpec } from '@binsupport/spec';
import { listSections, sectionFamilies, SteelError, type SectionFamily, type SectionListing } from '@binsupport/steel';
import { commonActions, loadsFor } from './design.js';
import { DesignError } from './errors.js';

export const LOADS_SCHEMA_VERSION = '1.0.0';

/** What `binsupport loads --json` prints for a circular bin: the load derivation, SI units. */
export interface CircularLoadsReport {
  schemaVersion: string;
  shape: 'circular';
  cases: LoadSet['cases'];
  combinations: LoadSet['combinations'];
  profiles: LoadSet['profiles'];
  totals: LoadSet['totals'];
  derivation: LoadSet['derivation'];
  notes: string[];
}

/** What `binsupport loads --json` prints for a rectangular bin: cases, and their line loads along each edge of the support line. */
export interface RectangularLoadsReport {
  schemaVersion: string;
  shape: 'rectangular';
  cases: RectangularLoadSet['cases'];
  edges: RectangularLoadSet['edges'];
  combinations: RectangularLoadSet['combinations'];
  profiles: RectangularLoadSet['profiles'];
  totals: RectangularLoadSet['totals'];
  derivation: RectangularLoadSet['derivation'];
  classification: RectangularLoadSet['classification'];
  notes: string[];
}

export type LoadsReport = CircularLoadsReport | RectangularLoadsReport;

export function loadsReport(spec: BinSpec): LoadsReport {
  if (spec.bin.shape === 'rectangular') {
    const loads = rectangularLoadsFor(spec, spec.bin);
    return {
      schemaVersion: LOADS_SCHEMA_VERSION,
      shape: 'rectangular',
      cases: loads.cases,
      edges: loads.edges,
      combinations: loads.combinations,
      profiles: loads.profiles,
      totals: loads.totals,
      derivation: loads.derivation,
      classification: loads.classification,
      notes: loads.notes,
    };
  }
  const loads = loadsFor(spec);
  return {
    schemaVersion: LOADS_SCHEMA_VERSION,
    shape: 'circular',
    cases: loads.cases,
    combinations: loads.combinations,
    profiles: loads.profiles,
    totals: loads.totals,
    derivation: loads.derivation,
    notes: loads.notes ?? [],
  };
}

/**
 * The loads of a rectangular bin from its spec. Plan origin at the inner south-west corner; an
 * equipment item at (angle, radius) from the bin's centre stands at (a/2 + r cos, b/2 + r sin). A
 * wedge's slot runs along X (the spec's convention), its width bin.hopper.outletLengthY.
 */
function rectangularLoadsFor(spec: BinSpec, bin: RectangularBinSpec): RectangularLoadSet {
  const hopper: RectangularBin['hopper'] =
    bin.hopper.kind === 'wedge'
      ? { kind: 'wedge', slotAlong: 'x', height: bin.hopper.height, outletWidth: bin.hopper.outletLengthY, thickness: bin.hopper.thickness }
      : { kind: 'pyramid', height: bin.hopper.height, outletLengthX: bin.hopper.outletLengthX, outletLengthY: bin.hopper.outletLengthY, thickness: bin.hopper.thickness };
  try {
    return rectangularBinLoads({
      bin: { lengthX: bin.lengthX, lengthY: bin.lengthY, cylinderHeight: bin.cylinderHeight, fillHeight: bin.fillHeight, wallThickness: bin.wallThickness, steelDensity: bin.steelDensity, topSurface: bin.topSurface, hopper, ...(bin.actionAssessmentClass !== undefined ? { actionAssessmentClass: bin.actionAssessmentClass } : {}) },
      ...commonActions(spec),
      ...(spec.equipment.length > 0
        ? { equipment: spec.equipment.map((item) => ({ name: item.name, x: bin.lengthX / 2 + item.radius * Math.cos(item.angle), y: bin.lengthY / 2 + item.radius * Math.sin(item.angle), force: item.force, kind: item.kind })) }
        : {}),
    });
  } catch (error) {
    if (error instanceof LoadsError) throw new DesignError('BAD_INPUT', error.message, error.path);
    throw error;
  }
}

/** The rolled section families a listing can show (welded girders need limits and are left out). */
export function listedSectionFamilies(): SectionFamily[] {
  return sectionFamilies().filter((family) => family !== 'welded I');
}

export function sectionCatalogue(family: string): SectionListing[] {
  const known = listedSectionFamilies();
  const match = known.find((candidate) => candidate.replace(/\s+/g, '').toLowerCase() === family.replace(/\s+/g, '').toLowerCase());
  if (!match) throw new DesignError('BAD_INPUT', `section family '${family}' is not known; use one of ${known.join(', ')}`, 'family');
  try {
    return listSections(match);
  } catch (error) {
    if (error instanceof SteelError) throw new DesignError('BAD_INPUT', error.message, 'family');
    throw error;
  }
}
