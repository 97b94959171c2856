import type { ScenarioSummary } from './result.js';

/** The support scenarios this version builds. Later versions add the bearing scenarios of DESIGN.md. */
export const COLUMNS_UNDER_WEB: ScenarioSummary = {
  id: 'columns-under-web',
  title: 'Columns under the web',
  description:
    'The girder bears on each column at a point under the web: vertical support only, free to twist and to warp there; columns braced tangentially. ' +
    'A column cap is in reality a contact across the flange width; that scenario follows in a later version.',
  credible: true,
};
