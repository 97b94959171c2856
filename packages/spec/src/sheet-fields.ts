// The rows of the spec-sheet workbook: one per input of the schema. Kind, range, choices and default
// are read from the zod schema itself (so they cannot drift from it); the unit and the note of each
// input are kept in `fieldNotes` below, and workbook.test.ts checks that the two cover the same inputs.
import { z } from 'zod';
import { binSpecInput } from './schema.js';
import { storedSolidTable } from './solids.js';

export type SheetFieldKind = 'number' | 'whole number' | 'text' | 'choice' | 'true/false' | 'list of choices' | 'list of numbers';

/** One input of the spec sheet. */
export interface SpecSheetField {
  /** Input path with `[]` for an element of the equipment list, e.g. `equipment[].angle`. */
  path: string;
  kind: SheetFieldKind;
  /** Input unit as the sheet expects it ('' for a ratio, a count or text). */
  unit: string;
  min?: number;
  max?: number;
  /** Longest text accepted. */
  maxLength?: number;
  /** Allowed values of a choice or of each entry of a list of choices. */
  choices?: string[];
  /** Default as the sheet shows it ('' = required, or no default). */
  defaultText: string;
  required: boolean;
  note: string;
}

interface FieldNote {
  unit: string;
  note: string;
  /** Shown instead of the schema's default, e.g. when the default depends on another input. */
  defaultText?: string;
}

const degrees = 'degrees';

/** Unit and note of every input, by path (an equipment item's fields under `equipment[]`). */
export const fieldNotes: Record<string, FieldNote> = {
  schemaVersion: { unit: '', note: 'Version of this input format.' },
  'project.name': { unit: '', note: 'Title of the design.' },
  'project.client': { unit: '', note: 'For the title block.' },
  'project.site': { unit: '', note: 'For the title block.' },
  'project.reference': { unit: '', note: 'For the title block.' },
  'project.designer': { unit: '', note: 'For the title block.' },
  'project.date': { unit: '', note: 'Date of issue printed on the report, kept as typed (e.g. 2026-12-01).' },
  'bin.shape': { unit: '', note: 'Plan shape of the bin.' },
  'bin.diameter': { unit: 'm', note: 'Circular bin: internal diameter of the cylinder d_c.', defaultText: 'required for a circular bin' },
  'bin.lengthX': { unit: 'm', note: 'Rectangular bin: internal plan length of the box along X.', defaultText: 'required for a rectangular bin' },
  'bin.lengthY': { unit: 'm', note: 'Rectangular bin: internal plan length of the box along Y.', defaultText: 'required for a rectangular bin' },
  'bin.cylinderHeight': { unit: 'm', note: 'Height of the vertical wall above the transition.' },
  'bin.fillHeight': { unit: 'm', note: 'Height of the solid surface above the transition; at most bin.cylinderHeight.', defaultText: 'bin.cylinderHeight' },
  'bin.topSurface': { unit: '', note: 'Shape of the top surface of the stored solid.' },
  'bin.fillingEccentricity': { unit: 'm', note: 'Eccentricity of the filling point from the bin axis.' },
  'bin.outletEccentricity': { unit: 'm', note: 'Eccentricity of the outlet from the bin axis.' },
  'bin.eccentricityAngle': { unit: degrees, note: 'Direction of the eccentricities, from +X counter-clockwise seen from above.' },
  'bin.patchLoadMethod': { unit: '', note: 'Unsymmetrical solid loads: patch loads, or (action assessment class 2 only) the substitute uniform pressure increase of EN 1991-4 5.2.3 (its expressions are from memory, not yet confirmed).' },
  'bin.actionAssessmentClass': { unit: '', note: 'Action assessment class (EN 1991-4 2.5); may raise, never lower, the class of Table 2.1 (a large outlet eccentricity needs class 3 for the flow-channel cases).', defaultText: 'from Table 2.1' },
  'bin.wallThickness': { unit: 'mm', note: 'Cylinder plate thickness.' },
  'bin.hopper.kind': { unit: '', note: 'cone (circular bin), pyramid (four sloping faces) or wedge (two faces sloping toward a slot along X, vertical end walls) for a rectangular bin.', defaultText: 'cone, or pyramid for a rectangular bin' },
  'bin.hopper.apexHalfAngle': { unit: degrees, note: 'Circular bin: hopper half angle beta, from the vertical.', defaultText: 'required for a circular bin' },
  'bin.hopper.outletDiameter': { unit: 'm', note: 'Circular bin: outlet diameter (concentric outlet); less than 0.9 bin.diameter.', defaultText: 'required for a circular bin' },
  'bin.hopper.height': { unit: 'm', note: 'Rectangular bin: vertical height of the hopper from the outlet to the transition.', defaultText: 'required for a rectangular bin' },
  'bin.hopper.outletLengthX': { unit: 'm', note: 'Rectangular pyramid hopper: outlet length along X (centred); a wedge has its slot over the whole of bin.lengthX.', defaultText: 'required for a pyramid hopper' },
  'bin.hopper.outletLengthY': { unit: 'm', note: 'Rectangular bin: outlet (or slot) width along Y (centred); less than 0.9 bin.lengthY.', defaultText: 'required for a rectangular bin' },
  'bin.hopper.thickness': { unit: 'mm', note: 'Hopper plate thickness.' },
  'solid.name': { unit: '', note: 'A built-in stored solid (EN 1991-4 Annex E properties).' },
  'solid.wallSurface': { unit: '', note: 'Wall surface category (EN 1991-4 Table 4.1), chooses the wall friction coefficient.' },
  'solid.unitWeight': { unit: 'kN/m3', note: 'Overrides the characteristic unit weight of the table.', defaultText: 'from the solids table' },
  'solid.wallFrictionCoefficient': { unit: '', note: 'Overrides the mean wall friction coefficient mu_m.', defaultText: 'from the solids table' },
  'solid.lateralPressureRatio': { unit: '', note: 'Overrides the mean lateral pressure ratio K_m.', defaultText: 'from the solids table' },
  'support.type': { unit: '', note: 'The girder layout.' },
  'support.columns': { unit: '', note: 'Ring on columns: number of equally spaced columns; column C1 stands at 0 degrees (+X). Leave empty for a ring on a slab.', defaultText: 'required for ring-on-columns' },
  'support.segments': { unit: '', note: 'Ring on a slab: straight segments of the whole ring in the girder model.' },
  'support.bearingModulus': { unit: 'MN/m3', note: 'Ring on a slab: bearing modulus of the slab under the bottom flange.' },
  'support.anchorCapacity': { unit: 'kN/m', note: 'Holding-down capacity of the anchors per metre of girder (0: no anchors).' },
  'support.girderDiameter': { unit: 'm', note: "Diameter of the girder's centroid line, within 0.5 m of the wall centre line.", defaultText: 'wall centre line (d_c + t)' },
  'support.segmentsPerSpan': { unit: '', note: 'Straight segments per span in the girder model.' },
  'support.grade': { unit: '', note: 'Steel grade of the girder.' },
  'support.sectionFamilies': { unit: '', note: 'Rolled section families the optimiser may choose from, separated by commas.' },
  'support.columnSection': { unit: '', note: 'Column section (EN 10365 designation, e.g. HE 200 B).' },
  'support.columnHeight': { unit: 'm', note: 'Column height H.' },
  'support.capPlateLength': { unit: 'mm', note: 'Length of the column cap plate along the girder.' },
  'support.bearingStiffenerThickness': { unit: 'mm', note: 'Bearing stiffeners over the columns: thickness of each plate of the pair (leave empty: no stiffeners).' },
  'support.bearingStiffenerWidth': { unit: 'mm', note: 'Width of each bearing stiffener from the web (empty: the flange outstand less 10 mm, for each section).' },
  'support.girderRestraint': { unit: '', note: "Lateral restraint of the girder: 'shell' (the shell holds the top flange along its length; no lateral-torsional buckling) or 'columns' (held only at the columns: LTB between them is checked)." },
  'support.weldedGirders.minDepth': { unit: 'mm', note: 'Welded plate girders as girder candidates: smallest overall depth (leave the weldedGirders rows empty for rolled sections only).' },
  'support.weldedGirders.maxDepth': { unit: 'mm', note: 'Largest overall depth of the welded girders.' },
  'support.weldedGirders.depthStep': { unit: 'mm', note: 'Depth increment of the welded girders.' },
  'support.weldedGirders.minFlangeWidth': { unit: 'mm', note: 'Smallest flange width of the welded girders.' },
  'support.weldedGirders.maxFlangeWidth': { unit: 'mm', note: 'Largest flange width of the welded girders.' },
  'support.weldedGirders.flangeWidthStep': { unit: 'mm', note: 'Flange width increment of the welded girders.' },
  'support.weldedGirders.flangeThicknesses': { unit: 'mm', note: 'Flange plate thicknesses, separated by commas (default 8, 10, 12, 15, 20, 25, 30, 35, 40).', defaultText: '8, 10, 12, 15, 20, 25, 30, 35, 40' },
  'support.weldedGirders.webThicknesses': { unit: 'mm', note: 'Web plate thicknesses, separated by commas (default 6, 8, 10, 12, 15, 20); a web is never thicker than its flanges.', defaultText: '6, 8, 10, 12, 15, 20' },
  'support.weldedBoxes.minDepth': { unit: 'mm', note: 'Welded box girders (two webs between two flanges) as girder candidates: smallest overall depth (leave the weldedBoxes rows empty for none).' },
  'support.weldedBoxes.maxDepth': { unit: 'mm', note: 'Largest overall depth of the welded boxes.' },
  'support.weldedBoxes.depthStep': { unit: 'mm', note: 'Depth increment of the welded boxes.' },
  'support.weldedBoxes.minFlangeWidth': { unit: 'mm', note: 'Smallest flange width of the welded boxes.' },
  'support.weldedBoxes.maxFlangeWidth': { unit: 'mm', note: 'Largest flange width of the welded boxes.' },
  'support.weldedBoxes.flangeWidthStep': { unit: 'mm', note: 'Flange width increment of the welded boxes.' },
  'support.weldedBoxes.flangeThicknesses': { unit: 'mm', note: 'Flange plate thicknesses of the boxes, separated by commas (default 8, 10, 12, 15, 20, 25, 30, 35, 40).', defaultText: '8, 10, 12, 15, 20, 25, 30, 35, 40' },
  'support.weldedBoxes.webThicknesses': { unit: 'mm', note: 'Web plate thicknesses of the boxes, separated by commas (default 6, 8, 10, 12, 15, 20); a web is never thicker than the flanges.', defaultText: '6, 8, 10, 12, 15, 20' },
  'support.weldedBoxes.flangeOutstand': { unit: 'mm', note: 'Projection of each flange beyond the outer face of its web, for the fillet welds (0: flush webs).' },
  'support.capBolts.perCap': { unit: '', note: 'Bolts holding the bottom flange down on each column cap, half each side of the web (leave the capBolts rows empty for a plain bearing). With bolts the credible scenario becomes column-cap-bolted.' },
  'support.capBolts.size': { unit: '', note: 'Bolt size of the cap bolts.' },
  'support.capBolts.boltClass': { unit: '', note: 'Property class of the cap bolts (EN 1993-1-8 Table 3.1).' },
  'support.capBolts.gauge': { unit: 'mm', note: 'Distance of each bolt line from the web centre line (empty: the middle of the flange outstand, for each section).', defaultText: 'middle of the flange outstand' },
  'support.bearingStiffenerChamfer': { unit: 'mm', note: 'Corner chamfer of the bearing stiffeners at the web-flange fillet (not in bearing).' },
  'support.bearingPoints': { unit: '', note: 'Bearing points across the flange width on each cap.' },
  'support.flangeFlexibility': { unit: '', note: "Put the flange outstand's bending stiffness in series with each bearing point." },
  'support.credibleScenarios': { unit: '', note: 'Support scenarios the design envelope takes, separated by commas; the others are reported beside it. Scenarios column-* apply to a ring on columns, slab-* to a ring on a slab.', defaultText: 'the contact scenario of the support type' },
  'optimisation.grades': { unit: '', note: 'Steel grades the optimiser may choose from, one grade for all members, separated by commas (default: support.grade).', defaultText: 'support.grade' },
  'optimisation.pricePerKg.S235': { unit: 'per kg', note: 'Price per kg of S235 (relative prices S235 1.00, S275 1.03, S355 1.06, S460 1.15 when not given: an assumption, not a market price).', defaultText: '1.00' },
  'optimisation.pricePerKg.S275': { unit: 'per kg', note: 'Price per kg of S275.', defaultText: '1.03' },
  'optimisation.pricePerKg.S355': { unit: 'per kg', note: 'Price per kg of S355.', defaultText: '1.06' },
  'optimisation.pricePerKg.S460': { unit: 'per kg', note: 'Price per kg of S460.', defaultText: '1.15' },
  'optimisation.costPerDistinctSection': { unit: '(price)', note: 'Cost added once for each distinct section and grade used (ordering, handling); 0 minimises mass times price only.' },
  'optimisation.maxDistinctSections': { unit: '', note: 'At most this many distinct sections over the girder and the columns (empty: no cap).' },
  'optimisation.weldedPriceFactor': { unit: '', note: 'Price per kg of a welded girder relative to a rolled section of the same grade (fabrication); 1 compares mass only.' },
  'optimisation.columnSeries': { unit: '', note: 'Rolled series the columns may be chosen from, separated by commas (HEA, HEB, HEM).' },
  'serviceability.deflectionLimitRatio': { unit: '', note: 'Deflection of the girder between columns limited to span / this ratio (500 is common practice for a bin support girder).' },
  'serviceability.twistLimit': { unit: 'rad', note: 'Twist of the girder about its axis at serviceability (0.01 rad is common practice).' },
  'actions.permanentFactor': { unit: '', note: 'gamma_G for unfavourable permanent actions (EN 1990 Table A1.2(B)).' },
  'actions.solidFactor': { unit: '', note: 'gamma_F for stored-solid actions.' },
  'actions.variableFactor': { unit: '', note: 'gamma_Q for other variable actions (roof imposed, snow, wind, variable equipment).' },
  'actions.combinationMethod': { unit: '', note: 'EN 1990 expression for the fundamental combinations.' },
  'roof.deadLoad': { unit: 'kN/m2', note: 'Roof dead load on plan. Leave every roof row empty for no roof load.' },
  'roof.imposedLoad': { unit: 'kN/m2', note: 'Roof imposed load on plan.' },
  'roof.pitch': { unit: degrees, note: 'Roof pitch.' },
  'snow.groundLoad': { unit: 'kN/m2', note: 'Characteristic ground snow load (EN 1991-1-3). Leave every snow row empty for no snow.' },
  'snow.exposureCoefficient': { unit: '', note: 'Exposure coefficient C_e.' },
  'snow.thermalCoefficient': { unit: '', note: 'Thermal coefficient C_t.' },
  'wind.basicVelocity': { unit: 'm/s', note: 'Basic wind velocity v_b (EN 1991-1-4). Leave every wind row empty for no wind.' },
  'wind.terrainCategory': { unit: '', note: 'Terrain category (EN 1991-1-4 Table 4.1).' },
  'wind.supportLevelHeight': { unit: 'm', note: 'Height of the support level above ground.' },
  'wind.directions': { unit: degrees, note: 'Wind directions from +X, separated by commas (e.g. 0, 22.5).', defaultText: 'chosen by the program' },
  'seismic.horizontalCoefficient': { unit: '', note: 'Equivalent static horizontal coefficient. Leave every seismic row empty for no seismic action.' },
  'seismic.effectiveSolidMassFraction': { unit: '', note: 'Fraction of the stored solid mass that acts with the structure.' },
  'seismic.directions': { unit: degrees, note: 'Seismic directions from +X, separated by commas.', defaultText: 'chosen by the program' },
  'equipment[].name': { unit: '', note: 'Name of an equipment load. Rows equipment[0], equipment[1], ... are one item each.' },
  'equipment[].angle': { unit: degrees, note: 'Position of the equipment load around the bin, from +X.' },
  'equipment[].radius': { unit: 'm', note: 'Distance of the equipment load from the bin axis.' },
  'equipment[].force': { unit: 'kN', note: 'Vertical force of the equipment.' },
  'equipment[].kind': { unit: '', note: 'Permanent or variable action.' },
};

/** The innermost schema under optional/default wrappers, with the default (if any). */
function unwrap(schema: z.ZodType): { inner: z.ZodType; defaultValue?: unknown; optional: boolean } {
  let inner = schema;
  let defaultValue: unknown;
  let optional = false;
  for (;;) {
    if (inner instanceof z.ZodDefault) {
      defaultValue ??= inner.def.defaultValue;
      optional = true;
      inner = inner.unwrap() as z.ZodType;
    } else if (inner instanceof z.ZodOptional) {
      optional = true;
      inner = inner.unwrap() as z.ZodType;
    } else {
      return defaultValue === undefined ? { inner, optional } : { inner, defaultValue, optional };
    }
  }
}

function defaultAsText(value: unknown): string {
  if (value === undefined) return '';
  if (Array.isArray(value)) return value.map(String).join(', ');
  return String(value);
}

interface Leaf {
  path: string;
  schema: z.ZodType;
  defaultValue?: unknown;
  required: boolean;
  /** Required within its table, which may itself be optional (roof.deadLoad, equipment[].force). */
  requiredInTable: boolean;
}

/** Every leaf input of an object schema; `required` is false when a parent table is optional. */
function leavesOf(schema: z.ZodType, prefix: string, parentRequired: boolean): Leaf[] {
  const { inner, defaultValue, optional } = unwrap(schema);
  const required = parentRequired && !optional;
  if (inner instanceof z.ZodObject) {
    return Object.entries(inner.shape as Record<string, z.ZodType>).flatMap(([key, child]) => leavesOf(child, prefix === '' ? key : `${prefix}.${key}`, required));
  }
  if (inner instanceof z.ZodArray && unwrap(inner.element as z.ZodType).inner instanceof z.ZodObject) {
    return leavesOf(inner.element as z.ZodType, `${prefix}[]`, false);
  }
  return [{ path: prefix, schema: inner, required, requiredInTable: !optional, ...(defaultValue === undefined ? {} : { defaultValue }) }];
}

/** Paths of every leaf input of the schema (equipment fields under `equipment[]`). */
export function schemaLeafPaths(): string[] {
  return leavesOf(binSpecInput, '', true).map((leaf) => leaf.path);
}

function describeLeaf(leaf: Leaf): Pick<SpecSheetField, 'kind' | 'min' | 'max' | 'maxLength' | 'choices'> {
  const schema = leaf.schema;
  // solid.name is text in the schema (checked against the solids table when resolved), so its
  // drop-down comes from the table itself.
  if (leaf.path === 'solid.name') {
    return { kind: 'choice', choices: storedSolidTable().map((row) => row.id) };
  }
  if (schema instanceof z.ZodNumber) {
    return { kind: schema.isInt ? 'whole number' : 'number', min: schema.minValue ?? Number.NEGATIVE_INFINITY, max: schema.maxValue ?? Number.POSITIVE_INFINITY };
  }
  if (schema instanceof z.ZodLiteral) {
    const values = [...schema.values];
    const numbers = values.filter((value): value is number => typeof value === 'number');
    // A numeric literal (schemaVersion) is a whole number whose range is that one value.
    if (numbers.length === values.length && numbers.length > 0) return { kind: 'whole number', min: Math.min(...numbers), max: Math.max(...numbers) };
    return { kind: 'choice', choices: values.map(String) };
  }
  if (schema instanceof z.ZodEnum) {
    return { kind: 'choice', choices: schema.options.map(String) };
  }
  if (schema instanceof z.ZodBoolean) {
    return { kind: 'true/false', choices: ['true', 'false'] };
  }
  if (schema instanceof z.ZodString) {
    return schema.maxLength === null ? { kind: 'text' } : { kind: 'text', maxLength: schema.maxLength };
  }
  if (schema instanceof z.ZodArray) {
    const element = unwrap(schema.element as z.ZodType).inner;
    if (element instanceof z.ZodEnum) return { kind: 'list of choices', choices: element.options.map(String) };
    if (element instanceof z.ZodNumber) return { kind: 'list of numbers', min: element.minValue ?? Number.NEGATIVE_INFINITY, max: element.maxValue ?? Number.POSITIVE_INFINITY };
  }
  throw new Error(`spec sheet: no sheet row for the input ${leaf.path}`);
}

let cachedFields: SpecSheetField[] | undefined;

/** The inputs of the spec sheet in schema order, with kind, unit, range, choices, default and note. */
export function specSheetFields(): SpecSheetField[] {
  if (cachedFields === undefined) {
    cachedFields = leavesOf(binSpecInput, '', true).map((leaf) => {
      const notes = fieldNotes[leaf.path];
      if (notes === undefined) throw new Error(`spec sheet: no unit and note for the input ${leaf.path}`);
      const described = describeLeaf(leaf);
      const required = leaf.required && leaf.defaultValue === undefined && notes.defaultText === undefined;
      const table = leaf.path.slice(0, leaf.path.lastIndexOf('.'));
      const conditional = !required && leaf.requiredInTable && leaf.defaultValue === undefined && notes.defaultText === undefined;
      return {
        path: leaf.path,
        ...described,
        unit: notes.unit,
        defaultText: notes.defaultText ?? (conditional ? (table.endsWith('[]') ? 'required for each item' : `required for ${table}`) : defaultAsText(leaf.defaultValue)),
        required,
        note: notes.note,
      };
    });
  }
  return cachedFields.map((field) => ({ ...field, ...(field.choices ? { choices: [...field.choices] } : {}) }));
}

/** The allowed range or values as the sheet shows them. */
export function allowedText(field: SpecSheetField): string {
  const unit = field.unit === '' ? '' : ` ${field.unit}`;
  switch (field.kind) {
    case 'number':
      return `${field.min} to ${field.max}${unit}`;
    case 'whole number':
      return `whole number ${field.min} to ${field.max}`;
    case 'list of numbers':
      return `each ${field.min} to ${field.max}${unit}, separated by commas`;
    case 'text':
      return field.maxLength === undefined ? 'text' : `text, up to ${field.maxLength} characters`;
    case 'choice':
    case 'true/false':
      return (field.choices ?? []).join(', ');
    case 'list of choices':
      return `one or more of ${(field.choices ?? []).join(', ')}, separated by commas`;
  }
}
