export { SpecError, type SpecErrorCode, type SpecIssue } from './errors.js';
export { binSpecInput, steelGrades, sectionFamilies, wallSurfaceCategories, supportScenarios, type BinSpecInput, type BinSpecParsed } from './schema.js';
export { normaliseSpec, STEEL_DENSITY, type BinSpec } from './spec.js';
export { readSpecFile, readDocumentFile, readGirderModelFile, parseSpecText, specFormatOf, MAX_SPEC_BYTES, type SpecFormat } from './read.js';
export { storedSolidTable, resolveStoredSolid, type StoredSolid, type StoredSolidRow, type WallSurfaceCategory, type SolidOverrides } from './solids.js';
export { mmToM, degToRad, knPerM3ToNPerM3 } from './units.js';
export { girderModelFile, parseGirderModelFile, type GirderModelFile, type GirderModelFileSection } from './girder-model.js';
export { writeSpecTemplate, parseSpecWorkbook, readSpecWorkbook, normaliseSpecWorkbook, SPEC_SHEET, README_SHEET, TEMPLATE_EQUIPMENT_ROWS, type SpecSheetDocument } from './workbook.js';
export { specSheetFields, type SpecSheetField, type SheetFieldKind } from './sheet-fields.js';
