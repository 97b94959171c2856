import { z } from 'zod';

// The user-facing input schema, in the documented input units (docs/input-reference.md):
// lengths of the bin in m, plate thicknesses in mm, angles in degrees, unit weights in kN/m3.
// Every numeric field states its range and unit, so an error can name all three.

interface Quantity {
  min: number;
  max: number;
  unit: string;
  /** Whether the bounds are exclusive. */
  exclusive?: boolean;
}

function rangeText({ min, max, unit, exclusive }: Quantity): string {
  const unitText = unit === '' ? '' : ` ${unit}`;
  return exclusive ? `greater than ${min} and less than ${max}${unitText}` : `between ${min} and ${max}${unitText}`;
}

/** A finite number within a documented range; the message names the range and the unit. */
function quantity(range: Quantity) {
  const expected = `must be a number ${rangeText(range)}`;
  const base = z.number({ error: (issue) => (issue.input === undefined ? `is required (a number ${rangeText(range)})` : expected) });
  return range.exclusive
    ? base.gt(range.min, { error: expected }).lt(range.max, { error: expected })
    : base.gte(range.min, { error: expected }).lte(range.max, { error: expected });
}

function wholeNumber(min: number, max: number, what: string) {
  const expected = `must be a whole number of ${what} between ${min} and ${max}`;
  return z
    .number({ error: (issue) => (issue.input === undefined ? `is required (${expected.replace('must be ', '')})` : expected) })
    .int({ error: expected })
    .gte(min, { error: expected })
    .lte(max, { error: expected });
}

function text(maxLength: number) {
  return z.string({ error: 'must be text' }).max(maxLength, { error: `must be at most ${maxLength} characters` });
}

function choice<const T extends readonly [string, ...string[]]>(values: T) {
  return z.enum(values, { error: `must be one of ${values.join(', ')}` });
}

/** Ranges of generated welded sections (plate girders, boxes), mm: depths, flange widths up to `maxWidth`, plate lists. */
function plateLimits(maxWidth: number) {
  return {
    minDepth: quantity({ min: 150, max: 3000, unit: 'mm' }),
    maxDepth: quantity({ min: 150, max: 3000, unit: 'mm' }),
    depthStep: quantity({ min: 10, max: 500, unit: 'mm' }).default(50),
    minFlangeWidth: quantity({ min: 100, max: maxWidth, unit: 'mm' }),
    maxFlangeWidth: quantity({ min: 100, max: maxWidth, unit: 'mm' }),
    flangeWidthStep: quantity({ min: 10, max: 500, unit: 'mm' }).default(50),
    flangeThicknesses: z.array(quantity({ min: 5, max: 80, unit: 'mm' }), { error: 'must be a list of plate thicknesses in mm' }).min(1).max(20).optional(),
    webThicknesses: z.array(quantity({ min: 4, max: 50, unit: 'mm' }), { error: 'must be a list of plate thicknesses in mm' }).min(1).max(20).optional(),
  };
}

export const steelGrades = ['S235', 'S275', 'S355', 'S460'] as const;
export const sectionFamilies = ['IPE', 'HEA', 'HEB', 'HEM'] as const;
/** Bolt sizes with a tabulated tensile stress area (ISO 898-1), mm. */
export const boltDiameters = ['M12', 'M16', 'M20', 'M22', 'M24', 'M27', 'M30', 'M36'] as const;
/** Bolt property classes of EN 1993-1-8 Table 3.1. */
export const boltClasses = ['4.6', '5.6', '8.8', '10.9'] as const;
export const wallSurfaceCategories = ['D1', 'D2', 'D3'] as const;
/** Support scenarios of a ring on columns (docs/input-reference.md, "Support scenarios"). */
export const supportScenarios = ['column-cap-contact', 'column-cap-bolted', 'column-cap-bonded', 'columns-under-web', 'slab-contact', 'slab-bonded', 'slab-web-line', 'slab-inner-edge-line', 'slab-anchored'] as const;

export const binSpecInput = z.strictObject(
  {
    schemaVersion: z.literal(1, { error: 'must be 1 (the only input format so far)' }).default(1),
    project: z.strictObject(
      {
        name: text(200).min(1, { error: 'must not be empty' }),
        client: text(200).default(''),
        site: text(200).default(''),
        reference: text(100).default(''),
        designer: text(100).default(''),
        date: text(40).default(''),
      },
      { error: 'must be a table of project fields' },
    ),
    bin: z.strictObject(
      {
        shape: choice(['circular', 'rectangular']).default('circular'),
        diameter: quantity({ min: 1, max: 60, unit: 'm' }).optional(),
        lengthX: quantity({ min: 1, max: 60, unit: 'm' }).optional(),
        lengthY: quantity({ min: 1, max: 60, unit: 'm' }).optional(),
        cylinderHeight: quantity({ min: 0.5, max: 100, unit: 'm' }),
        fillHeight: quantity({ min: 0.1, max: 100, unit: 'm' }).optional(),
        topSurface: choice(['level', 'pile']).default('level'),
        fillingEccentricity: quantity({ min: 0, max: 30, unit: 'm' }).default(0),
        outletEccentricity: quantity({ min: 0, max: 30, unit: 'm' }).default(0),
        eccentricityAngle: quantity({ min: -360, max: 360, unit: 'degrees' }).default(0),
        patchLoadMethod: choice(['patch', 'uniform-increase']).default('patch'),
        actionAssessmentClass: wholeNumber(1, 3, 'the action assessment class').optional(),
        wallThickness: quantity({ min: 2, max: 60, unit: 'mm' }),
        hopper: z.strictObject(
          {
            kind: choice(['cone', 'pyramid', 'wedge']).optional(),
            apexHalfAngle: quantity({ min: 5, max: 60, unit: 'degrees' }).optional(),
            outletDiameter: quantity({ min: 0.05, max: 20, unit: 'm' }).optional(),
            height: quantity({ min: 0.1, max: 60, unit: 'm' }).optional(),
            outletLengthX: quantity({ min: 0.05, max: 60, unit: 'm' }).optional(),
            outletLengthY: quantity({ min: 0.05, max: 60, unit: 'm' }).optional(),
            thickness: quantity({ min: 2, max: 60, unit: 'mm' }),
          },
          { error: 'must be a table with apexHalfAngle, outletDiameter and thickness (circular) or height, outletLengthX, outletLengthY and thickness (rectangular)' },
        ),
      },
      { error: 'must be a table describing the bin' },
    ),
    solid: z.strictObject(
      {
        name: text(60).min(1, { error: 'must name a built-in solid' }),
        wallSurface: choice(wallSurfaceCategories).default('D2'),
        unitWeight: quantity({ min: 1, max: 30, unit: 'kN/m3' }).optional(),
        wallFrictionCoefficient: quantity({ min: 0.05, max: 1.2, unit: '' }).optional(),
        lateralPressureRatio: quantity({ min: 0.1, max: 0.99, unit: '' }).optional(),
      },
      { error: 'must be a table naming the stored solid' },
    ),
    support: z.strictObject(
      {
        type: choice(['ring-on-columns', 'ring-on-slab']).default('ring-on-columns'),
        columns: wholeNumber(3, 36, 'columns').optional(),
        segments: wholeNumber(24, 2880, 'segments').default(192),
        bearingModulus: quantity({ min: 1, max: 100000, unit: 'MN/m3' }).default(200),
        anchorCapacity: quantity({ min: 0, max: 10000, unit: 'kN/m' }).default(0),
        girderDiameter: quantity({ min: 1, max: 62, unit: 'm' }).optional(),
        segmentsPerSpan: wholeNumber(2, 120, 'segments').default(24),
        grade: choice(steelGrades).default('S355'),
        sectionFamilies: z.array(choice(sectionFamilies), { error: 'must be a list of section families' }).min(1, { error: 'must name at least one section family' }).default(['IPE', 'HEB']),
        columnSection: text(40).default('HE 200 B'),
        columnHeight: quantity({ min: 0.5, max: 40, unit: 'm' }).default(5),
        capPlateLength: quantity({ min: 50, max: 2000, unit: 'mm' }).default(300),
        bearingStiffenerThickness: quantity({ min: 6, max: 50, unit: 'mm' }).optional(),
        bearingStiffenerWidth: quantity({ min: 30, max: 500, unit: 'mm' }).optional(),
        bearingStiffenerChamfer: quantity({ min: 0, max: 50, unit: 'mm' }).default(15),
        girderRestraint: choice(['shell', 'columns']).default('shell'),
        weldedGirders: z.strictObject(plateLimits(1000), { error: 'must be a table of welded-girder limits (minDepth, maxDepth, minFlangeWidth, maxFlangeWidth in mm)' }).optional(),
        weldedBoxes: z
          .strictObject(
            { ...plateLimits(1500), flangeOutstand: quantity({ min: 0, max: 200, unit: 'mm' }).default(20) },
            { error: 'must be a table of welded-box limits (minDepth, maxDepth, minFlangeWidth, maxFlangeWidth in mm)' },
          )
          .optional(),
        capBolts: z
          .strictObject(
            {
              perCap: wholeNumber(2, 16, 'bolts per column cap'),
              size: choice(boltDiameters).default('M20'),
              boltClass: choice(boltClasses).default('8.8'),
              gauge: quantity({ min: 20, max: 750, unit: 'mm' }).optional(),
            },
            { error: 'must be a table describing the bolts that hold the girder down on each column cap (perCap, size, boltClass, gauge)' },
          )
          .optional(),
        bearingPoints: wholeNumber(3, 11, 'bearing points across the flange').default(5),
        flangeFlexibility: z.boolean({ error: 'must be true or false' }).default(true),
        credibleScenarios: z
          .array(choice(supportScenarios), { error: 'must be a list of support scenarios' })
          .min(1, { error: 'must name at least one credible support scenario' })
          .optional(),
      },
      { error: 'must be a table describing the support' },
    ),
    actions: z
      .strictObject(
        {
          permanentFactor: quantity({ min: 1, max: 2, unit: '' }).default(1.35),
          solidFactor: quantity({ min: 1, max: 2, unit: '' }).default(1.5),
          variableFactor: quantity({ min: 1, max: 2, unit: '' }).default(1.5),
          combinationMethod: choice(['6.10', '6.10a/b']).default('6.10'),
        },
        { error: 'must be a table of partial factors' },
      )
      .default({ permanentFactor: 1.35, solidFactor: 1.5, variableFactor: 1.5, combinationMethod: '6.10' }),
    optimisation: z
      .strictObject(
        {
          grades: z.array(choice(steelGrades), { error: 'must be a list of steel grades' }).min(1, { error: 'must name at least one grade' }).optional(),
          pricePerKg: z
            .strictObject(
              {
                S235: quantity({ min: 0, max: 1000, unit: '(price per kg)' }).optional(),
                S275: quantity({ min: 0, max: 1000, unit: '(price per kg)' }).optional(),
                S355: quantity({ min: 0, max: 1000, unit: '(price per kg)' }).optional(),
                S460: quantity({ min: 0, max: 1000, unit: '(price per kg)' }).optional(),
              },
              { error: 'must be a table of prices per kg by grade' },
            )
            .optional(),
          costPerDistinctSection: quantity({ min: 0, max: 1e9, unit: '(price units)' }).default(0),
          maxDistinctSections: wholeNumber(1, 20, 'distinct sections').optional(),
          columnSeries: z.array(choice(['HEA', 'HEB', 'HEM']), { error: 'must be a list of column section families' }).min(1).default(['HEB']),
          weldedPriceFactor: quantity({ min: 0.5, max: 5, unit: '' }).default(1),
        },
        { error: 'must be a table of optimisation settings' },
      )
      .default({ costPerDistinctSection: 0, columnSeries: ['HEB'], weldedPriceFactor: 1 }),
    serviceability: z
      .strictObject(
        {
          deflectionLimitRatio: quantity({ min: 50, max: 5000, unit: '(span / limit)' }).default(500),
          twistLimit: quantity({ min: 0.0001, max: 0.2, unit: 'rad' }).default(0.01),
        },
        { error: 'must be a table with deflectionLimitRatio and twistLimit' },
      )
      .default({ deflectionLimitRatio: 500, twistLimit: 0.01 }),
    roof: z
      .strictObject(
        {
          deadLoad: quantity({ min: 0, max: 20, unit: 'kN/m2' }),
          imposedLoad: quantity({ min: 0, max: 20, unit: 'kN/m2' }).default(0),
          pitch: quantity({ min: 0, max: 60, unit: 'degrees' }).default(0),
        },
        { error: 'must be a table with deadLoad, imposedLoad, pitch' },
      )
      .optional(),
    snow: z
      .strictObject(
        {
          groundLoad: quantity({ min: 0, max: 20, unit: 'kN/m2' }),
          exposureCoefficient: quantity({ min: 0.5, max: 2, unit: '' }).default(1),
          thermalCoefficient: quantity({ min: 0.5, max: 1, unit: '' }).default(1),
        },
        { error: 'must be a table with groundLoad' },
      )
      .optional(),
    wind: z
      .strictObject(
        {
          basicVelocity: quantity({ min: 10, max: 60, unit: 'm/s' }),
          terrainCategory: choice(['0', 'I', 'II', 'III', 'IV']),
          supportLevelHeight: quantity({ min: 0, max: 100, unit: 'm' }),
          directions: z.array(quantity({ min: -360, max: 360, unit: 'degrees' })).min(1).max(36).optional(),
        },
        { error: 'must be a table with basicVelocity, terrainCategory, supportLevelHeight' },
      )
      .optional(),
    seismic: z
      .strictObject(
        {
          horizontalCoefficient: quantity({ min: 0, max: 2, unit: '' }),
          effectiveSolidMassFraction: quantity({ min: 0, max: 1, unit: '' }).default(0.8),
          directions: z.array(quantity({ min: -360, max: 360, unit: 'degrees' })).min(1).max(36).optional(),
        },
        { error: 'must be a table with horizontalCoefficient' },
      )
      .optional(),
    equipment: z
      .array(
        z.strictObject({
          name: text(60).min(1, { error: 'must not be empty' }),
          angle: quantity({ min: -360, max: 360, unit: 'degrees' }),
          radius: quantity({ min: 0, max: 30, unit: 'm' }),
          force: quantity({ min: 0, max: 10000, unit: 'kN' }),
          kind: choice(['permanent', 'variable']).default('permanent'),
        }),
        { error: 'must be a list of equipment loads' },
      )
      .max(100)
      .default([]),
  },
  { error: 'must be a table with project, bin, solid and support' },
);

/** The spec exactly as the user may write it (input units). */
export type BinSpecInput = z.input<typeof binSpecInput>;
/** The spec after validation and defaults, still in input units. */
export type BinSpecParsed = z.output<typeof binSpecInput>;
