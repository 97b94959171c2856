import { z } from 'zod';
import table from './data/solids.json' with { type: 'json' };
import { SpecError } from './errors.js';
import { degToRad, knPerM3ToNPerM3 } from './units.js';

export type WallSurfaceCategory = 'D1' | 'D2' | 'D3';

const solidRow = z.object({
  id: z.string().regex(/^[a-z0-9-]+$/),
  name: z.string().min(1),
  unitWeightLowerKnM3: z.number().positive().max(30),
  unitWeightUpperKnM3: z.number().positive().max(30),
  angleOfReposeDeg: z.number().gt(0).lt(90),
  internalFrictionAngleDeg: z.number().gt(0).lt(90),
  internalFrictionFactor: z.number().min(1).max(2),
  lateralPressureRatio: z.number().gt(0).lt(1),
  lateralPressureRatioFactor: z.number().min(1).max(2),
  wallFriction: z.object({ D1: z.number().positive().lt(1.5), D2: z.number().positive().lt(1.5), D3: z.number().positive().lt(1.5) }),
  wallFrictionFactor: z.number().min(1).max(2),
  patchLoadFactor: z.number().min(0).max(2),
  source: z.string().min(1),
});
const solidTable = z.object({ source: z.string(), note: z.string(), solids: z.array(solidRow).min(1) });

export type StoredSolidRow = z.infer<typeof solidRow>;

/**
 * Characteristic properties of a stored solid in SI units: mean values and the conversion factors of
 * EN 1991-4 Annex E; the loads package picks the upper or lower value per load effect (Table 3.1).
 */
export interface StoredSolid {
  id: string;
  name: string;
  /** Upper characteristic unit weight, N/m3 (EN 1991-4 uses the upper value for every effect). */
  unitWeight: number;
  unitWeightLower: number;
  angleOfRepose: number;
  internalFrictionAngle: number;
  internalFrictionFactor: number;
  /** Mean lateral pressure ratio K_m. */
  lateralPressureRatio: number;
  lateralPressureRatioFactor: number;
  wallSurfaceCategory: WallSurfaceCategory;
  /** Mean wall friction coefficient mu_m for the wall surface category. */
  wallFrictionCoefficient: number;
  wallFrictionFactor: number;
  patchLoadFactor: number;
  /** Where each value came from: the table row, or 'user input'. */
  sources: Record<string, string>;
}

let cached: StoredSolidRow[] | undefined;

/** The built-in solids table, validated when first read. */
export function storedSolidTable(): StoredSolidRow[] {
  if (!cached) {
    const parsed = solidTable.safeParse(table);
    if (!parsed.success) {
      throw new Error(`built-in solids table is invalid: ${parsed.error.message}`);
    }
    cached = parsed.data.solids;
  }
  return cached;
}

export interface SolidOverrides {
  unitWeight?: number | undefined;
  wallFrictionCoefficient?: number | undefined;
  lateralPressureRatio?: number | undefined;
}

/** Resolve a solid by id, apply user overrides (already in SI), and record the source of each value. */
export function resolveStoredSolid(id: string, wallSurfaceCategory: WallSurfaceCategory, overrides: SolidOverrides, path = 'solid.name'): StoredSolid {
  const row = storedSolidTable().find((candidate) => candidate.id === id);
  if (!row) {
    const known = storedSolidTable().map((candidate) => candidate.id).join(', ');
    throw new SpecError('UNKNOWN_SOLID', [{ path, message: `${path} must be one of the built-in solids (${known}); got '${id}'` }]);
  }
  const fromTable = row.source;
  const user = 'user input (overrides the table)';
  return {
    id: row.id,
    name: row.name,
    unitWeight: overrides.unitWeight ?? knPerM3ToNPerM3(row.unitWeightUpperKnM3),
    unitWeightLower: overrides.unitWeight ?? knPerM3ToNPerM3(row.unitWeightLowerKnM3),
    angleOfRepose: degToRad(row.angleOfReposeDeg),
    internalFrictionAngle: degToRad(row.internalFrictionAngleDeg),
    internalFrictionFactor: row.internalFrictionFactor,
    lateralPressureRatio: overrides.lateralPressureRatio ?? row.lateralPressureRatio,
    lateralPressureRatioFactor: row.lateralPressureRatioFactor,
    wallSurfaceCategory,
    wallFrictionCoefficient: overrides.wallFrictionCoefficient ?? row.wallFriction[wallSurfaceCategory],
    wallFrictionFactor: row.wallFrictionFactor,
    patchLoadFactor: row.patchLoadFactor,
    sources: {
      unitWeight: overrides.unitWeight === undefined ? fromTable : user,
      lateralPressureRatio: overrides.lateralPressureRatio === undefined ? fromTable : user,
      wallFrictionCoefficient: overrides.wallFrictionCoefficient === undefined ? `${fromTable}, wall category ${wallSurfaceCategory}` : user,
      angleOfRepose: fromTable,
      internalFrictionAngle: fromTable,
      conversionFactors: fromTable,
    },
  };
}
