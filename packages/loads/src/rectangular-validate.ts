import { LoadsError } from './errors.js';
import { outletLengths } from './rectangular-geometry.js';
import type { RectangularBinLoadInput } from './rectangular-types.js';
import { isNormalToWalls } from './rectangular-wind.js';
import { requireAngle, requireRange, validateStoredSolid } from './validate.js';

const DEG = Math.PI / 180;
/** Slopes of a hopper face from the vertical that EN 1991-4 6 treats as a hopper (as for the circular bin's apex half-angle). */
const FACE_SLOPE_MIN_DEG = 5;
const FACE_SLOPE_MAX_DEG = 85; // EN 1991-4 6.1(2): under 5 degrees to the horizontal is a flat bottom

/** Input checks of a rectangular bin; each error names the input path, the range and the unit. */
export function validateRectangularInput(input: RectangularBinLoadInput): void {
  const { bin, solid } = input;
  const a = bin.lengthX;
  const b = bin.lengthY;
  requireRange('bin.lengthX', a, 0, 60, 'm', { strictLower: true, strictUpper: true });
  requireRange('bin.lengthY', b, 0, 60, 'm', { strictLower: true, strictUpper: true });
  requireRange('bin.cylinderHeight', bin.cylinderHeight, 0, 100, 'm', { strictLower: true, strictUpper: true });
  requireRange('bin.fillHeight', bin.fillHeight, 0, bin.cylinderHeight, 'm (up to bin.cylinderHeight)', { strictLower: true });
  requireRange('bin.wallThickness', bin.wallThickness, 0, Math.min(a, b) / 20, 'm', { strictLower: true });
  if (bin.topSurface !== undefined && bin.topSurface !== 'level' && bin.topSurface !== 'pile') {
    throw new LoadsError('BAD_INPUT', 'bin.topSurface', `bin.topSurface must be 'level' or 'pile'; got '${String(bin.topSurface)}'`);
  }
  const hopper = bin.hopper;
  if (hopper.kind !== 'pyramid' && hopper.kind !== 'wedge') {
    throw new LoadsError('BAD_INPUT', 'bin.hopper.kind', `bin.hopper.kind must be 'pyramid' or 'wedge'; got '${String((hopper as { kind: unknown }).kind)}'`);
  }
  requireRange('bin.hopper.height', hopper.height, 0, 100, 'm', { strictLower: true });
  if (hopper.kind === 'pyramid') {
    requireRange('bin.hopper.outletLengthX', hopper.outletLengthX, 0, a, 'm (below bin.lengthX)', { strictUpper: true });
    requireRange('bin.hopper.outletLengthY', hopper.outletLengthY, 0, b, 'm (below bin.lengthY)', { strictUpper: true });
  } else {
    if (hopper.slotAlong !== 'x' && hopper.slotAlong !== 'y') {
      throw new LoadsError('BAD_INPUT', 'bin.hopper.slotAlong', `bin.hopper.slotAlong must be 'x' (the slot runs along X, the south and north faces slope) or 'y'; got '${String(hopper.slotAlong)}'`);
    }
    const across = hopper.slotAlong === 'x' ? b : a;
    requireRange('bin.hopper.outletWidth', hopper.outletWidth, 0, across, `m (below bin.${hopper.slotAlong === 'x' ? 'lengthY' : 'lengthX'}, the side across the slot)`, { strictUpper: true });
  }
  // Slope of each pair of sloping faces from the vertical, beta = atan(w / h_h).
  const outlet = outletLengths(bin);
  const pairs = [
    { faces: 'south and north faces', width: (b - outlet.y) / 2, sloping: hopper.kind === 'pyramid' || hopper.slotAlong === 'x' },
    { faces: 'east and west faces', width: (a - outlet.x) / 2, sloping: hopper.kind === 'pyramid' || hopper.slotAlong === 'y' },
  ];
  for (const pair of pairs.filter((p) => p.sloping)) {
    const slopeDeg = Math.atan(pair.width / hopper.height) / DEG;
    if (!(slopeDeg >= FACE_SLOPE_MIN_DEG - 1e-9 && slopeDeg <= FACE_SLOPE_MAX_DEG + 1e-9)) {
      const lowest = pair.width / Math.tan(FACE_SLOPE_MAX_DEG * DEG);
      const highest = pair.width / Math.tan(FACE_SLOPE_MIN_DEG * DEG);
      throw new LoadsError(
        'BAD_INPUT',
        'bin.hopper.height',
        `bin.hopper.height = ${hopper.height} m gives the ${pair.faces} a slope of ${slopeDeg.toFixed(2)} degrees from the vertical; it must be between ${FACE_SLOPE_MIN_DEG} and ${FACE_SLOPE_MAX_DEG} degrees (EN 1991-4 6.1: flatter is a flat bottom; steeper is a vertical wall, for which use a wedge hopper): use a height between ${lowest.toFixed(3)} and ${highest.toFixed(3)} m or change the outlet`,
      );
    }
  }
  requireRange('bin.hopper.thickness', hopper.thickness, 0, Math.min(a, b) / 20, 'm', { strictLower: true });
  if (hopper.bottomLoadMagnifier !== undefined) requireRange('bin.hopper.bottomLoadMagnifier', hopper.bottomLoadMagnifier, 1, 2, '(dimensionless)');
  requireRange('bin.steelDensity', bin.steelDensity, 1000, 20000, 'kg/m3');
  if (bin.actionAssessmentClass !== undefined && ![1, 2, 3].includes(bin.actionAssessmentClass)) {
    throw new LoadsError('BAD_INPUT', 'bin.actionAssessmentClass', `bin.actionAssessmentClass must be 1, 2 or 3 (EN 1991-4 2.5); got ${String(bin.actionAssessmentClass)}`);
  }

  validateStoredSolid(solid);

  if (input.roof) {
    requireRange('roof.deadLoad', input.roof.deadLoad, 0, 50e3, 'Pa');
    requireRange('roof.imposedLoad', input.roof.imposedLoad ?? 0, 0, 50e3, 'Pa');
    requireAngle('roof.pitch', input.roof.pitch ?? 0, 0, 60);
  }
  const t = bin.wallThickness;
  (input.equipment ?? []).forEach((item, i) => {
    requireRange(`equipment[${i}].x`, item.x, -t, a + t, 'm (on the roof: within the outer plan, from -t to bin.lengthX + t)');
    requireRange(`equipment[${i}].y`, item.y, -t, b + t, 'm (on the roof: within the outer plan, from -t to bin.lengthY + t)');
    requireRange(`equipment[${i}].force`, item.force, 0, 1e8, 'N');
  });
  if (input.snow) {
    requireRange('snow.groundLoad', input.snow.groundLoad, 0, 20e3, 'Pa');
    requireRange('snow.exposureCoefficient', input.snow.exposureCoefficient ?? 1, 0.8, 1.2, '(EN 1991-1-3 Table 5.1)');
    requireRange('snow.thermalCoefficient', input.snow.thermalCoefficient ?? 1, 0, 1, '(EN 1991-1-3 5.2(8))');
  }
  if (input.wind) {
    const w = input.wind;
    requireRange('wind.basicVelocity', w.basicVelocity, 0, 70, 'm/s', { strictLower: true });
    if (!['0', 'I', 'II', 'III', 'IV'].includes(w.terrainCategory)) {
      throw new LoadsError('BAD_INPUT', 'wind.terrainCategory', `wind.terrainCategory must be one of 0, I, II, III, IV (EN 1991-1-4 Table 4.1); got '${String(w.terrainCategory)}'`);
    }
    requireRange('wind.supportLevelHeight', w.supportLevelHeight, 0, 200, 'm above ground');
    requireRange('wind.orographyFactor', w.orographyFactor ?? 1, 1, 2, '(dimensionless)');
    requireRange('wind.structuralFactor', w.structuralFactor ?? 1, 0.5, 2, '(dimensionless)');
    (w.directions ?? []).forEach((direction, i) => {
      if (!Number.isFinite(direction) || !isNormalToWalls(direction)) {
        throw new LoadsError('BAD_INPUT', `wind.directions[${i}]`, `wind.directions[${i}] must be 0, 90, 180 or 270 degrees (a multiple of 90 degrees: EN 1991-1-4 7.6 gives the force coefficient for wind normal to a face); got ${Number(((direction * 180) / Math.PI).toFixed(4))}`);
      }
    });
  }
  if (input.seismic) {
    requireRange('seismic.horizontalCoefficient', input.seismic.horizontalCoefficient, 0, 2, '(times the weight)');
    requireRange('seismic.effectiveSolidMassFraction', input.seismic.effectiveSolidMassFraction ?? 0.8, 0, 1, '(dimensionless)');
    (input.seismic.directions ?? []).forEach((direction, i) => requireRange(`seismic.directions[${i}]`, direction, -4 * Math.PI, 4 * Math.PI, 'rad'));
  }
}
