import { z } from 'zod';
import gradeTable from './data/steel-grades.json' with { type: 'json' };
import { SteelError } from './errors.js';

/** Nominal strengths valid up to a nominal thickness. */
export interface StrengthBand {
  /** upper bound of the band's nominal thickness t [m] (the band covers previous bound < t <= this) */
  maxThickness: number;
  /** f_y [Pa] */
  yieldStrength: number;
  /** f_u [Pa] */
  ultimateStrength: number;
}

/** A structural steel grade with the material constants and partial factors used by the checks. */
export interface SteelGrade {
  name: string;
  productStandard: string;
  /** bands in increasing thickness */
  strengths: StrengthBand[];
  /** E [Pa], EN 1993-1-1 3.2.6 */
  youngsModulus: number;
  /** G [Pa], EN 1993-1-1 3.2.6 */
  shearModulus: number;
  /** gamma_M0, resistance of cross-sections */
  gammaM0: number;
  /** gamma_M1, resistance of members to instability */
  gammaM1: number;
  source: string;
}

/** Overrides, e.g. from a national annex. */
export interface SteelGradeOptions {
  gammaM0?: number;
  gammaM1?: number;
  youngsModulus?: number;
  shearModulus?: number;
}

const strengthRow = z
  .object({
    maxThicknessMm: z.number().finite().positive(),
    yieldStrengthMpa: z.number().finite().positive(),
    ultimateStrengthMpa: z.number().finite().positive(),
  })
  .strict()
  .refine((row) => row.ultimateStrengthMpa > row.yieldStrengthMpa, { message: 'f_u must exceed f_y' });

const gradeFile = z
  .object({
    schemaVersion: z.literal(1),
    title: z.string(),
    units: z.literal('mm, MPa'),
    grades: z
      .array(
        z
          .object({
            name: z.string().regex(/^S\d{3}$/),
            productStandard: z.string().min(1),
            strengths: z
              .array(strengthRow)
              .min(1)
              .refine((rows) => rows.every((row, i) => i === 0 || row.maxThicknessMm > (rows[i - 1]?.maxThicknessMm ?? 0)), {
                message: 'thickness bands must increase',
              }),
            source: z.string().min(1),
          })
          .strict(),
      )
      .min(1),
  })
  .strict();

/** EN 1993-1-1 3.2.6: E = 210 000 N/mm2, G = E / (2 (1 + nu)) ~ 81 000 N/mm2. */
const youngsModulus = 210e9;
const shearModulus = 81e9;
/** EN 1993-1-1 6.1(1) NOTE 2B recommended values; a national annex may change them. */
const recommendedGammaM0 = 1.0;
const recommendedGammaM1 = 1.0;

type GradeRow = Omit<SteelGrade, 'youngsModulus' | 'shearModulus' | 'gammaM0' | 'gammaM1'>;
let cachedGrades: readonly GradeRow[] | undefined;

function gradeRows(): readonly GradeRow[] {
  if (cachedGrades) return cachedGrades;
  const parsed = gradeFile.safeParse(gradeTable);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    const path = issue ? issue.path.join('.') : '';
    throw new SteelError('INVALID_GRADE_TABLE', `The steel-grade table is invalid at "${path}": ${issue?.message ?? 'unknown problem'}.`, path);
  }
  cachedGrades = parsed.data.grades.map((row) => ({
    name: row.name,
    productStandard: row.productStandard,
    strengths: row.strengths.map((band) => ({
      maxThickness: band.maxThicknessMm * 1e-3,
      yieldStrength: band.yieldStrengthMpa * 1e6,
      ultimateStrength: band.ultimateStrengthMpa * 1e6,
    })),
    source: row.source,
  }));
  return cachedGrades;
}

/** Names of the grades in the table. */
export function steelGradeNames(): string[] {
  return gradeRows().map((row) => row.name);
}

function positiveOption(name: keyof SteelGradeOptions, value: number | undefined, fallback: number): number {
  if (value === undefined) return fallback;
  if (!Number.isFinite(value) || value <= 0) {
    throw new SteelError('INVALID_OPTIONS', `Steel grade option ${name} must be a positive number; got ${value}.`, name);
  }
  return value;
}

/** A grade by name ("S355"), with the recommended partial factors unless overridden. */
export function steelGrade(name: string, options: SteelGradeOptions = {}): SteelGrade {
  const row = gradeRows().find((g) => g.name === name.trim().toUpperCase());
  if (!row) {
    throw new SteelError('UNKNOWN_GRADE', `Steel grade "${name}" is not known; use one of ${steelGradeNames().join(', ')}.`, 'grade');
  }
  return {
    ...row,
    strengths: row.strengths.map((band) => ({ ...band })),
    youngsModulus: positiveOption('youngsModulus', options.youngsModulus, youngsModulus),
    shearModulus: positiveOption('shearModulus', options.shearModulus, shearModulus),
    gammaM0: positiveOption('gammaM0', options.gammaM0, recommendedGammaM0),
    gammaM1: positiveOption('gammaM1', options.gammaM1, recommendedGammaM1),
  };
}

/** The strength band for a nominal thickness t [m] (EN 1993-1-1 Table 3.1: t <= 40 mm, 40 < t <= 80 mm). */
export function strengthsForThickness(grade: SteelGrade, thickness: number): StrengthBand {
  if (!Number.isFinite(thickness) || thickness <= 0) {
    throw new SteelError('THICKNESS_OUT_OF_RANGE', `Nominal thickness must be a positive length in metres; got ${thickness}.`, 'thickness');
  }
  // Bands are bounded by whole millimetres; a rounding tolerance keeps 0.040 m in the first band.
  const band = grade.strengths.find((b) => thickness <= b.maxThickness * (1 + 1e-9));
  if (!band) {
    const last = grade.strengths[grade.strengths.length - 1];
    throw new SteelError(
      'THICKNESS_OUT_OF_RANGE',
      `${grade.name}: nominal thickness ${(thickness * 1e3).toFixed(1)} mm exceeds ${((last?.maxThickness ?? 0) * 1e3).toFixed(0)} mm, the largest thickness EN 1993-1-1 Table 3.1 covers.`,
      'thickness',
    );
  }
  return band;
}
