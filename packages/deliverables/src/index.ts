export { atomicWrite, abandonPendingWrites, outputPath, WriteAbandonedError } from './atomic-write.js';
export { renderDesignXlsx, writeDesignXlsx, DEFAULT_STEEL_PRICE_PER_TONNE, type WorkbookOptions } from './xlsx-report.js';
export { renderDesignPdf, writeDesignPdf } from './pdf-report.js';
export type { ReportOptions } from './report-data.js';
export {
  formatAngle,
  formatBimoment,
  formatForce,
  formatLengthM,
  formatLengthMm,
  formatLineLoad,
  formatMass,
  formatMoment,
  formatPressure,
  formatTonnes,
  formatUtilisation,
} from './units.js';
export { renderCompareXlsx, writeCompareXlsx, renderComparePdf, writeComparePdf, compareWorkbook, cheapestSentence, changesText, COMPARE_SHEET, COMPARE_SUMMARY_SHEET, type CompareWorkbookOptions } from './compare-report.js';
