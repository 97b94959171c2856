import type { LoadSet } from '@binsupport/loads';
import type { BinSpec } from '@binsupport/spec';
import { listSections, sectionFamilies, SteelError, type SectionFamily, type SectionListing } from '@binsupport/steel';
import { loadsFor } from './design.js';
import { DesignError } from './errors.js';

export const LOADS_SCHEMA_VERSION = '1.0.0';

/** What `binsupport loads --json` prints: the load derivation of a spec, SI units. */
export interface LoadsReport {
  schemaVersion: string;
  cases: LoadSet['cases'];
  combinations: LoadSet['combinations'];
  profiles: LoadSet['profiles'];
  totals: LoadSet['totals'];
  derivation: LoadSet['derivation'];
  notes: string[];
}

export function loadsReport(spec: BinSpec): LoadsReport {
  const loads = loadsFor(spec);
  return {
    schemaVersion: LOADS_SCHEMA_VERSION,
    cases: loads.cases,
    combinations: loads.combinations,
    profiles: loads.profiles,
    totals: loads.totals,
    derivation: loads.derivation,
    notes: loads.notes ?? [],
  };
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
