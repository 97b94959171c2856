import { z } from 'zod';
import rolledSectionTable from './data/rolled-sections.json' with { type: 'json' };
import type { BoxGeometry } from './box.js';
import { SteelError } from './errors.js';
import { sectionProperties } from './properties.js';
import type { ISectionDimensions, SectionProperties } from './properties.js';

export type SectionSeries = 'IPE' | 'HE A' | 'HE B' | 'HE M';

/** A rolled section ready for design: SI dimensions, computed properties and where the row came from. */
export interface SteelSection {
  /** e.g. "IPE 300", "HE 300 B", "WI 800x300x10x25" for a welded girder or "WB 600x400x10x20" for a welded box */
  designation: string;
  series: SectionSeries | 'welded I' | 'welded box';
  /** 'welded' for a plate girder (its shear area and torsion constant differ); rolled when absent */
  fabrication?: 'rolled' | 'welded';
  /** for a box, webThickness is that of one web */
  dimensions: ISectionDimensions;
  /** present for a welded box girder (two webs); absent for an I section */
  box?: BoxGeometry;
  properties: SectionProperties;
  /** provenance of the dimensions */
  source: string;
}

const positiveMm = z.number().finite().positive();

const rolledSectionRow = z
  .object({
    designation: z.string().regex(/^(IPE \d+|HE \d+ [ABM])$/, 'designation must read like "IPE 300", "HE 300 A", "HE 300 B" or "HE 300 M"'),
    series: z.enum(['IPE', 'HE A', 'HE B', 'HE M']),
    depthMm: positiveMm,
    flangeWidthMm: positiveMm,
    webThicknessMm: positiveMm,
    flangeThicknessMm: positiveMm,
    rootRadiusMm: z.number().finite().nonnegative(),
    source: z.string().min(1),
  })
  .strict()
  .refine((row) => (row.series === 'IPE' ? row.designation.startsWith('IPE ') : row.designation.startsWith('HE ') && row.designation.endsWith(row.series.slice(-1))), {
    message: 'designation does not belong to the stated series',
  })
  .refine((row) => row.depthMm - 2 * row.flangeThicknessMm - 2 * row.rootRadiusMm > 0, {
    message: 'depth leaves no straight web between flanges and root fillets',
  })
  .refine((row) => row.webThicknessMm + 2 * row.rootRadiusMm < row.flangeWidthMm, {
    message: 'flange width leaves no outstand beyond web and root fillets',
  });

const rolledSectionFile = z
  .object({
    schemaVersion: z.literal(1),
    title: z.string(),
    units: z.literal('mm'),
    sections: z.array(rolledSectionRow).min(1),
  })
  .strict()
  .refine((file) => new Set(file.sections.map((row) => row.designation)).size === file.sections.length, {
    message: 'designations must be unique',
  });

const metresPerMm = 1e-3;

/** Validate a section table (the shape of src/data/rolled-sections.json) and convert it to SI. */
export function parseRolledSectionTable(data: unknown): SteelSection[] {
  const parsed = rolledSectionFile.safeParse(data);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    const path = issue ? issue.path.join('.') : '';
    throw new SteelError(
      'INVALID_SECTION_TABLE',
      `The rolled-section table is invalid at "${path}": ${issue?.message ?? 'unknown problem'}.`,
      path,
    );
  }
  return parsed.data.sections.map((row) => {
    const dimensions: ISectionDimensions = {
      depth: row.depthMm * metresPerMm,
      flangeWidth: row.flangeWidthMm * metresPerMm,
      webThickness: row.webThicknessMm * metresPerMm,
      flangeThickness: row.flangeThicknessMm * metresPerMm,
      rootRadius: row.rootRadiusMm * metresPerMm,
    };
    return {
      designation: row.designation,
      series: row.series,
      dimensions,
      properties: sectionProperties(dimensions),
      source: row.source,
    };
  });
}

let cachedSections: readonly SteelSection[] | undefined;

/** The EN 10365 IPE, HE B, HE A and HE M sections shipped with the package (in that order), lightest first within each series. */
export function loadRolledSections(): SteelSection[] {
  cachedSections ??= Object.freeze(
    parseRolledSectionTable(rolledSectionTable).map((section) =>
      Object.freeze({
        ...section,
        dimensions: Object.freeze(section.dimensions),
        properties: Object.freeze(section.properties),
      }),
    ),
  );
  // A fresh array of shared rows: callers may sort or filter without affecting each other.
  return [...cachedSections];
}

function normaliseDesignation(name: string): string {
  return name.toUpperCase().replace(/\s+/g, '');
}

/** Look a section up by designation; spacing and case are ignored ("HE300B" finds "HE 300 B"). */
export function rolledSection(designation: string): SteelSection {
  const wanted = normaliseDesignation(designation);
  const found = loadRolledSections().find((s) => normaliseDesignation(s.designation) === wanted);
  if (!found) {
    throw new SteelError(
      'UNKNOWN_SECTION',
      `Section "${designation}" is not in the rolled-section table (IPE 80 to IPE 600; HE 100 A/B/M to HE 1000 A/B/M).`,
      'section',
    );
  }
  return found;
}
