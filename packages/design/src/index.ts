export * from './result.js';
export { designFromSpec, CAUTIONS, DEFAULT_COLUMN_SERIES, DEFAULT_PRICE_PER_KG, type DesignOptions, type DesignOutcome } from './design.js';
export { DEFAULT_SERVICEABILITY, type ServiceabilityLimits } from './girder-checks.js';
export { DesignError, type DesignErrorCode } from './errors.js';
export { stableJson } from './json.js';
export { buildRingModel, type RingLayout, type RingModelInput } from './ring.js';
export { TOOL_NAME, TOOL_VERSION } from './version.js';
export { analyseModelFile, girderModelDocument, GIRDER_MODEL_SCHEMA_VERSION, type GirderModelDocument, type ModelFileResult } from './model-file.js';
export { loadsReport, sectionCatalogue, listedSectionFamilies, LOADS_SCHEMA_VERSION, type LoadsReport } from './catalogue.js';
