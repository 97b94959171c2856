import { loadChannels } from './channels.js';
import { SteelError } from './errors.js';
import type { ISectionDimensions, SectionProperties } from './properties.js';
import { loadRolledSections } from './sections.js';
import type { SectionSeries } from './sections.js';
import { generateWeldedSections } from './welded.js';
import type { WeldedGirderLimits } from './welded.js';

export type SectionFamily = SectionSeries | 'UPE' | 'welded I';

/** One line of a section listing, SI units (m, m2, m3, m4, m6, kg/m). */
export interface SectionListing {
  designation: string;
  family: SectionFamily;
  /** 'secondary' for channels (no torsion or LTB checks; use checkChannelSecondaryMember) */
  role: 'main' | 'secondary';
  fabrication: 'rolled' | 'welded';
  dimensions: ISectionDimensions;
  area: number;
  massPerMetre: number;
  secondMomentOfAreaY: number;
  secondMomentOfAreaZ: number;
  elasticModulusY: number;
  plasticModulusY: number;
  torsionConstant: number;
  warpingConstant: number;
  source: string;
}

const rolledFamilies: readonly SectionSeries[] = ['IPE', 'HE A', 'HE B', 'HE M'];

/** The families listSections knows. */
export function sectionFamilies(): SectionFamily[] {
  return [...rolledFamilies, 'UPE', 'welded I'];
}

/** The properties a listing shows; both I sections and channels have them. */
type ListedProperties = Pick<
  SectionProperties,
  'area' | 'massPerMetre' | 'secondMomentOfAreaY' | 'secondMomentOfAreaZ' | 'elasticModulusY' | 'plasticModulusY' | 'torsionConstant' | 'warpingConstant'
>;

function listing(s: { designation: string; dimensions: ISectionDimensions; properties: ListedProperties; source: string }, family: SectionFamily): SectionListing {
  const p = s.properties;
  return {
    designation: s.designation,
    family,
    role: family === 'UPE' ? 'secondary' : 'main',
    fabrication: family === 'welded I' ? 'welded' : 'rolled',
    dimensions: { ...s.dimensions },
    area: p.area,
    massPerMetre: p.massPerMetre,
    secondMomentOfAreaY: p.secondMomentOfAreaY,
    secondMomentOfAreaZ: p.secondMomentOfAreaZ,
    elasticModulusY: p.elasticModulusY,
    plasticModulusY: p.plasticModulusY,
    torsionConstant: p.torsionConstant,
    warpingConstant: p.warpingConstant,
    source: s.source,
  };
}

/**
 * The sections of one family with their key properties, in table order (lightest first for rolled
 * series). The welded family is generated and needs `weldedLimits`.
 */
export function listSections(family: SectionFamily, weldedLimits?: WeldedGirderLimits): SectionListing[] {
  if (family === 'welded I') {
    if (!weldedLimits) throw new SteelError('INVALID_OPTIONS', 'Listing welded I sections needs the depth, flange width and thickness limits.', 'weldedLimits');
    return generateWeldedSections(weldedLimits).map((s) => listing(s, family));
  }
  if (family === 'UPE') return loadChannels().map((c) => listing(c, family));
  if (!rolledFamilies.includes(family)) {
    throw new SteelError('UNKNOWN_SECTION', `Section family "${String(family)}" is not known; use one of ${sectionFamilies().join(', ')}.`, 'family');
  }
  return loadRolledSections()
    .filter((s) => s.series === family)
    .map((s) => listing(s, family));
}
