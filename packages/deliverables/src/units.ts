// Conversions from the SI base units of a DesignResult to the units engineers read, and the text
// formatters used by the report. Nothing outside this package formats numbers for people.
//
// Conversions (to*) return numbers for spreadsheet cells, where a number format does the rounding;
// formatters (format*) return text with the unit attached, for the PDF.

/** N -> kN */
export function toKilonewtons(force: number): number {
  return force / 1e3;
}

/** N m -> kNm */
export function toKilonewtonMetres(moment: number): number {
  return moment / 1e3;
}

/** N m^2 -> kNm^2 */
export function toKilonewtonSquareMetres(bimoment: number): number {
  return bimoment / 1e3;
}

/** N/m -> kN/m */
export function toKilonewtonsPerMetre(lineLoad: number): number {
  return lineLoad / 1e3;
}

/** Pa -> kPa */
export function toKilopascals(pressure: number): number {
  return pressure / 1e3;
}

/** m -> mm */
export function toMillimetres(length: number): number {
  return length * 1e3;
}

/** rad -> degrees */
export function toDegrees(angle: number): number {
  return (angle * 180) / Math.PI;
}

/** kg -> t */
export function toTonnes(mass: number): number {
  return mass / 1e3;
}

/** The minus sign used in text: a plain hyphen-minus, so that searching a report for "-133" works. */
const minus = '-';

function fixed(value: number, decimals: number): string {
  const text = Math.abs(value).toFixed(decimals);
  // Never print "-0.0": a value that rounds to zero is zero.
  const isZero = Number(text) === 0;
  return (value < 0 && !isZero ? minus : '') + text;
}

/**
 * A number with about four significant figures, without an exponent for the magnitudes a report
 * meets (0.001 to 10^7): 672.3, 1591, 0.5400, 26.10. Outside that range, exponent notation.
 */
export function formatNumber(value: number, significant = 4): string {
  if (!Number.isFinite(value)) {
    return String(value);
  }
  if (value === 0) {
    return '0';
  }
  const magnitude = Math.abs(value);
  if (magnitude < 1e-3 || magnitude >= 1e7) {
    return value.toExponential(significant - 1).replace('-', minus);
  }
  const integerDigits = Math.floor(Math.log10(magnitude)) + 1;
  const decimals = Math.min(6, Math.max(0, significant - integerDigits));
  return fixed(value, decimals);
}

/**
 * A force or moment already in kN, kNm or kNm², for a table cell: solver noise below 0.0005 (half a
 * newton) prints as 0 instead of as 6.527e-12.
 */
export function formatKilo(value: number): string {
  return Math.abs(value) < 5e-4 ? '0' : formatNumber(value);
}

export function formatForce(force: number): string {
  return `${formatNumber(toKilonewtons(force))} kN`;
}

export function formatMoment(moment: number): string {
  return `${formatNumber(toKilonewtonMetres(moment))} kNm`;
}

export function formatBimoment(bimoment: number): string {
  return `${formatNumber(toKilonewtonSquareMetres(bimoment))} kNm²`;
}

export function formatLineLoad(lineLoad: number): string {
  return `${formatNumber(toKilonewtonsPerMetre(lineLoad))} kN/m`;
}

export function formatPressure(pressure: number): string {
  return `${formatNumber(toKilopascals(pressure))} kPa`;
}

/** Section and plate dimensions: whole millimetres. */
export function formatLengthMm(length: number): string {
  return `${fixed(toMillimetres(length), 0)} mm`;
}

/** Member lengths, heights and radii: metres to the millimetre. */
export function formatLengthM(length: number): string {
  return `${fixed(length, 3)} m`;
}

/** Angles around the bin and slopes: degrees to a tenth. */
export function formatAngle(angle: number): string {
  return `${fixed(toDegrees(angle), 1)}°`;
}

export function formatMass(mass: number): string {
  return `${fixed(mass, 0)} kg`;
}

export function formatMassPerLength(massPerLength: number): string {
  return `${fixed(massPerLength, 1)} kg/m`;
}

export function formatTonnes(mass: number): string {
  return `${fixed(toTonnes(mass), 3)} t`;
}

/**
 * A utilisation to two decimals, rounded UP so that a printed value never understates a check
 * (1.001 prints as 1.01, not as an apparently adequate 1.00). The small tolerance keeps binary noise
 * (0.93 stored as 0.9300000000000001) from bumping an exact value.
 */
export function formatUtilisation(utilisation: number | null): string {
  if (utilisation === null) {
    // The design records no number: a check outside its scope, or no resistance left.
    return 'n/a';
  }
  if (!Number.isFinite(utilisation)) {
    return String(utilisation);
  }
  const hundredths = Math.ceil(utilisation * 100 - 1e-9);
  return fixed(hundredths / 100, 2);
}

/** Relative residuals and other small dimensionless checks: exponent notation. */
export function formatResidual(residual: number): string {
  return residual.toExponential(1);
}

/** A value in display units with its unit text, converted from the SI unit it was stored in. */
export interface DisplayQuantity {
  value: number;
  unit: string;
}

// SI unit spellings that a derivation step may carry, and what a reader sees instead. Units not
// listed (m, kg, -, ...) are shown as they are.
const displayUnits: Record<string, { unit: string; factor: number }> = {
  N: { unit: 'kN', factor: 1e-3 },
  'N/m': { unit: 'kN/m', factor: 1e-3 },
  Nm: { unit: 'kNm', factor: 1e-3 },
  'N m': { unit: 'kNm', factor: 1e-3 },
  'N·m': { unit: 'kNm', factor: 1e-3 },
  'Nm/m': { unit: 'kNm/m', factor: 1e-3 },
  Nm2: { unit: 'kNm²', factor: 1e-3 },
  'Nm^2': { unit: 'kNm²', factor: 1e-3 },
  'Nm²': { unit: 'kNm²', factor: 1e-3 },
  Pa: { unit: 'kPa', factor: 1e-3 },
  'N/m2': { unit: 'kPa', factor: 1e-3 },
  'N/m^2': { unit: 'kPa', factor: 1e-3 },
  'N/m²': { unit: 'kPa', factor: 1e-3 },
  'N/m3': { unit: 'kN/m³', factor: 1e-3 },
  'N/m^3': { unit: 'kN/m³', factor: 1e-3 },
  'N/m³': { unit: 'kN/m³', factor: 1e-3 },
  rad: { unit: '°', factor: 180 / Math.PI },
  'kg/m3': { unit: 'kg/m³', factor: 1 },
  'kg/m^3': { unit: 'kg/m³', factor: 1 },
  m2: { unit: 'm²', factor: 1 },
  'm^2': { unit: 'm²', factor: 1 },
};

export function toDisplay(value: number, siUnit: string): DisplayQuantity {
  const display = displayUnits[siUnit.trim()];
  if (display === undefined) {
    return { value, unit: siUnit };
  }
  return { value: value * display.factor, unit: display.unit };
}

/** "26.10 kPa" from (26100, 'Pa'); a dimensionless '-' unit prints the number alone. */
export function formatQuantity(value: number, siUnit: string): string {
  const display = toDisplay(value, siUnit);
  const unit = display.unit === '-' || display.unit === '' ? '' : display.unit;
  const separator = unit === '°' || unit === '' ? '' : ' ';
  return `${formatNumber(display.value)}${separator}${unit}`;
}

/**
 * Engineering unit of a check's recorded input or intermediate value, inferred from its symbol (the
 * steel checks record SI values under the symbols of EN 1993-1-1): forces in kN, moments in kNm,
 * bimoments in kNm², stresses in MPa, section constants in cm units; anything else as recorded.
 */
export interface TraceQuantity {
  unit: string;
  /** SI value divided by this gives the value in `unit`. */
  scale: number;
}

const traceUnits: Array<[RegExp, TraceQuantity]> = [
  [/^(sigma|tau|f_y|f_u|f_yw|f_yf)(\b|_|\s|$)/, { unit: 'MPa', scale: 1e6 }],
  [/^(N|Vy|Vz|N_Rd|N_pl_Rd|V_pl_Rd|V_pl_T_Rd|V_Rd|V_c_Rd|F_Rd|F_Ed)$/, { unit: 'kN', scale: 1e3 }],
  [/^(Tsv|Tw|T|My|Mz|M_y_Rd|M_z_Rd|M_c_Rd|M_Rd|M_cr|M_b_Rd)$/, { unit: 'kNm', scale: 1e3 }],
  [/^B$/, { unit: 'kNm²', scale: 1e3 }],
  [/^(A|A_v|A_vz|A_vy)$/, { unit: 'cm²', scale: 1e-4 }],
  [/^(I_t|I_y|I_z|S_w)$/, { unit: 'cm⁴', scale: 1e-8 }],
  [/^I_w$/, { unit: 'cm⁶', scale: 1e-12 }],
  [/^(W_n0)$/, { unit: 'cm²', scale: 1e-4 }],
  [/^(W_el_y|W_el_z|W_pl_y|W_pl_z|W_y|W_z)$/, { unit: 'cm³', scale: 1e-6 }],
  [/^(h|b|t_w|t_f|r|h_w|h0|webThickness|flangeThickness)$/, { unit: 'mm', scale: 1e-3 }],
];

export function traceQuantity(symbol: string): TraceQuantity {
  for (const [pattern, quantity] of traceUnits) {
    if (pattern.test(symbol)) return quantity;
  }
  return { unit: '', scale: 1 };
}

/** A recorded check value in engineering units: [formatted number, unit]. */
export function formatTraceValue(symbol: string, value: number): [string, string] {
  const { unit, scale } = traceQuantity(symbol);
  return [formatNumber(value / scale), unit];
}
