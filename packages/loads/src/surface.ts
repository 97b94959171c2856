/**
 * The top surface of the stored solid in a circular bin and its equivalent surface (EN 1991-4:2006
 * 1.5, Figure 1.1): the level surface that holds the same volume. For a conical pile of slope phi_r
 * whose apex sits at e_t from the axis, the surface height is f = H_a - tan(phi_r) |P - apex|, so the
 * equivalent surface lies tan(phi_r) * mean|P - apex| below the apex (mean over the plan).
 * h_o is taken as the depth of the highest wall contact below the equivalent surface (where the wall
 * pressures begin; never negative). Central filling gives mean|P - apex| = 2r/3 and
 * h_o = (r/3) tan(phi_r) = (d_c/6) tan(phi_r) (EN 1991-4 5.3.1.1, REFERENCES.md §1).
 */
export interface TopSurface {
  /** Depth of the highest wall contact below the equivalent surface h_o, m. */
  h0: number;
  /** Depth of the lowest wall contact below the equivalent surface, m. */
  lowestContactDepth: number;
  /** Height of the pile's apex above the equivalent surface, m. */
  apexHeight: number;
  /**
   * First moment of the solid's volume about the bin axis, m4, toward the eccentricity: the solid
   * weight's overturning moment about the axis is gamma times this.
   */
  volumeMoment: number;
}

const RADIAL_POINTS = 240;
const ANGULAR_POINTS = 240;

export function topSurface(radius: number, angleOfRepose: number, eccentricity: number, shape: 'level' | 'pile'): TopSurface {
  if (shape === 'level') return { h0: 0, lowestContactDepth: 0, apexHeight: 0, volumeMoment: 0 };
  const t = Math.tan(angleOfRepose);
  // Midpoint rule in polar coordinates about the axis; the apex lies on the +x axis at e.
  let meanDistance = 0;
  let momentOfDistance = 0;
  const dr = radius / RADIAL_POINTS;
  const dpsi = (2 * Math.PI) / ANGULAR_POINTS;
  for (let i = 0; i < RADIAL_POINTS; i++) {
    const rho = (i + 0.5) * dr;
    for (let j = 0; j < ANGULAR_POINTS; j++) {
      const psi = (j + 0.5) * dpsi;
      const x = rho * Math.cos(psi);
      const y = rho * Math.sin(psi);
      const distance = Math.hypot(x - eccentricity, y);
      const dA = rho * dr * dpsi;
      meanDistance += distance * dA;
      momentOfDistance += distance * x * dA;
    }
  }
  const area = Math.PI * radius * radius;
  meanDistance /= area;
  return {
    h0: Math.max(0, t * (radius - eccentricity - meanDistance)),
    lowestContactDepth: t * (radius + eccentricity - meanDistance),
    apexHeight: t * meanDistance,
    // integral of f x dA with f = H_a - t |P - apex|: the constant part has no moment about the axis.
    volumeMoment: -t * momentOfDistance,
  };
}
