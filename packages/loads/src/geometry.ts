/** A circular bin: a cylinder on a conical hopper with a concentric outlet (SI units). */
export interface CircularBin {
  /** Internal diameter of the cylinder d_c, m. */
  diameter: number;
  /** Height of the vertical wall above the transition, m. */
  cylinderHeight: number;
  /** Height of the level solid surface above the transition, m. */
  fillHeight: number;
  wallThickness: number;
  hopper: {
    /** Apex half-angle beta, measured from the vertical, rad. */
    apexHalfAngle: number;
    outletDiameter: number;
    thickness: number;
    /**
     * Hopper bottom load magnifier C_b (EN 1991-4 6.1.2); default 1.3 in AAC 1 or for a solid prone
     * to dynamic behaviour, else 1.0 (from memory).
     */
    bottomLoadMagnifier?: number;
  };
  /** Density of the plates, kg/m3. */
  steelDensity: number;
  /**
   * Shape of the top surface of the solid: 'level' (default) or a conical 'pile' at the angle of
   * repose. With a pile, fillHeight is the height of the equivalent surface (same volume).
   */
  topSurface?: 'level' | 'pile';
  /** Eccentricity of the filling point (apex of the pile) e_f from the bin axis, m (default 0). */
  fillingEccentricity?: number;
  /** Eccentricity of the outlet (or of the discharge channel) e_o from the bin axis, m (default 0). */
  outletEccentricity?: number;
  /** Direction of the eccentricities and of the patch loads, rad from +X counter-clockwise (default 0). */
  eccentricityAngle?: number;
  /** Action assessment class chosen by the engineer; may raise, never lower, the class of Table 2.1. */
  actionAssessmentClass?: 1 | 2 | 3;
  /**
   * How the unsymmetrical loads of the stored solid are represented: 'patch' (default) for the patch
   * loads of EN 1991-4 5.2.1.2-5.2.1.3 and 5.2.2.2-5.2.2.3, or 'uniform-increase' for the substitute
   * uniform pressure increase of 5.2.3, which the standard allows in action assessment
   * class 2 only (refused in classes 1 and 3).
   */
  patchLoadMethod?: PatchLoadMethod;
}

export type PatchLoadMethod = 'patch' | 'uniform-increase';

export interface CircularBinGeometry {
  radius: number;
  outletRadius: number;
  /** Vertical height of the hopper from the outlet to the transition, m. */
  hopperHeight: number;
  /** Slant length of the hopper wall, m. */
  hopperSlant: number;
  planArea: number;
  perimeter: number;
  /** A/U = d_c / 4 for a circle (EN 1991-4 5.2.1.1). */
  hydraulicRadius: number;
  /** Volume of the solid in the cylinder and in the hopper (frustum), m3. */
  cylinderVolume: number;
  hopperVolume: number;
  /** Mid-surface plate areas, m2. */
  wallPlateArea: number;
  hopperPlateArea: number;
}

export function circularBinGeometry(bin: CircularBin): CircularBinGeometry {
  const radius = bin.diameter / 2;
  const outletRadius = bin.hopper.outletDiameter / 2;
  const beta = bin.hopper.apexHalfAngle;
  const hopperHeight = (radius - outletRadius) / Math.tan(beta);
  const hopperSlant = (radius - outletRadius) / Math.sin(beta);
  const planArea = Math.PI * radius * radius;
  const perimeter = 2 * Math.PI * radius;
  const wallMidRadius = radius + bin.wallThickness / 2;
  return {
    radius,
    outletRadius,
    hopperHeight,
    hopperSlant,
    planArea,
    perimeter,
    hydraulicRadius: planArea / perimeter,
    cylinderVolume: planArea * bin.fillHeight,
    // Frustum of a cone: (pi h / 3)(R^2 + R r + r^2).
    hopperVolume: (Math.PI * hopperHeight / 3) * (radius * radius + radius * outletRadius + outletRadius * outletRadius),
    wallPlateArea: 2 * Math.PI * wallMidRadius * bin.cylinderHeight,
    // Lateral area of the frustum at mid-surface: pi (R + r) s.
    hopperPlateArea: Math.PI * (radius + outletRadius) * hopperSlant,
  };
}
