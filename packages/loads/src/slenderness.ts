/**
 * Slenderness classes of EN 1991-4:2006 1.5 and 5.1 (from memory): h_c/d_c >= 2 slender,
 * 1 < h_c/d_c < 2 intermediate, 0.4 < h_c/d_c <= 1 squat, <= 0.4 retaining (flat bottom).
 */
export type SlendernessClass = 'slender' | 'intermediate' | 'squat' | 'retaining';

export function slendernessClass(aspectRatio: number): SlendernessClass {
  if (aspectRatio >= 2) return 'slender';
  if (aspectRatio > 1) return 'intermediate';
  if (aspectRatio > 0.4) return 'squat';
  return 'retaining';
}
