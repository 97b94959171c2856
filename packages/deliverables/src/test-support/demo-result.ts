// INVENTED TEST DATA. A DesignResult for a fictitious grain bin (client, site and people are made up)
// on a ring girder with eight columns, built so that the deliverables can be tested without running
// the design pipeline. The numbers are computed, not typed in, so that they hang together the way a
// real result would: the wall pressures follow the Janssen expressions of EN 1991-4 5.2.1, the ring
// forces the classical closed-form solution for a circular ring on equally spaced supports under a
// uniform line load, and each utilisation is evaluated from the diagram it refers to. The hopper
// pressure shape, the bimoment shape and the scenario factors are invented and cite nothing.
import type {
  AnalysisSummary,
  CombinationSummary,
  DerivationStep,
  DesignResult,
  ForceDiagram,
  GoverningCase,
  LoadCaseSummary,
  MemberResult,
  PressureProfile,
  ScenarioSummary,
  UtilisationRow,
} from '@binsupport/design';

// Bin and solid (invented).
const diameter = 6.0;
const radius = diameter / 2;
const cylinderHeight = 12.0;
const hopperHeight = 4.0;
const apexHalfAngle = (35 * Math.PI) / 180;
const unitWeight = 9000; // N/m3
const lateralPressureRatio = 0.54;
const wallFrictionCoefficient = 0.44;
const dischargeFactorPh = 1.15;
const dischargeFactorPw = 1.1;
const structureWeight = 2.6e5; // N, shell, hopper, roof and girder (invented)

// Support layout.
const columns = 8;
const spanAngle = (2 * Math.PI) / columns;
const segments = 64;
const columnHeight = 6.0;
const perimeter = 2 * Math.PI * radius;
/** Offset of the support line's line of action from the girder centroid, m (invented). */
const loadOffset = 0.05;

// HE 300 B (EN 10365 dimensions; properties as tabulated for the profile).
const ring = {
  section: 'HE 300 B',
  massPerLength: 117.0,
  A: 149.1e-4,
  Wel_y: 1678e-6,
  Iw: 1688e-9,
  h: 0.3,
  b: 0.3,
  tw: 0.011,
  tf: 0.019,
  r: 0.027,
};
// HE 200 B.
const column = { section: 'HE 200 B', massPerLength: 61.3, A: 78.1e-4, i_z: 0.0507 };
const fy = 355e6;
const E = 210e9;
const gammaM0 = 1.0;
const gammaM1 = 1.0;

const solidWeight = unitWeight * Math.PI * radius * radius * (cylinderHeight + hopperHeight / 3);
const hydraulicRadius = diameter / 4; // A/U of a circle
const z0 = hydraulicRadius / (lateralPressureRatio * wallFrictionCoefficient);
const pho = unitWeight * lateralPressureRatio * z0;
const janssen = (z: number): number => 1 - Math.exp(-z / z0);
const phTransition = pho * janssen(cylinderHeight);
const pvTransition = phTransition / lateralPressureRatio;
/** Vertical load the hopper hangs on the support line (its contents and the solid above), N. */
const hopperVertical = pvTransition * Math.PI * radius * radius + (unitWeight * Math.PI * radius * radius * hopperHeight) / 3;
const hopperRadialFilling = (hopperVertical / perimeter) * Math.tan(apexHalfAngle);

const cases: LoadCaseSummary[] = [
  {
    name: 'G',
    description: 'Self weight of shell, hopper, roof and girder',
    kind: 'permanent',
    verticalLineLoad: structureWeight / perimeter,
    radialLineLoad: 0,
    verticalResultant: structureWeight,
  },
  {
    name: 'Q_fill',
    description: 'Stored solid, filling (symmetrical)',
    kind: 'variable',
    verticalLineLoad: solidWeight / perimeter,
    radialLineLoad: hopperRadialFilling,
    verticalResultant: solidWeight,
  },
  {
    name: 'Q_disch',
    description: 'Stored solid, discharge (symmetrical)',
    kind: 'variable',
    verticalLineLoad: solidWeight / perimeter,
    radialLineLoad: hopperRadialFilling * dischargeFactorPh,
    verticalResultant: solidWeight,
  },
];

const combinations: CombinationSummary[] = [
  {
    name: 'ULS-1',
    limitState: 'ULS',
    expression: '1.35 G + 1.50 Q_fill',
    factors: { G: 1.35, Q_fill: 1.5 },
    clause: 'EN 1990 6.4.3.2 (6.10)',
  },
  {
    name: 'ULS-2',
    limitState: 'ULS',
    expression: '1.35 G + 1.50 Q_disch',
    factors: { G: 1.35, Q_disch: 1.5 },
    clause: 'EN 1990 6.4.3.2 (6.10)',
  },
  {
    name: 'SLS-1',
    limitState: 'SLS',
    expression: '1.00 G + 1.00 Q_fill',
    factors: { G: 1.0, Q_fill: 1.0 },
    clause: 'EN 1990 6.5.3 (6.14b)',
  },
];

const scenarios: ScenarioSummary[] = [
  {
    id: 'contact',
    title: 'Compression-only contact across the flange',
    description: 'Tensionless bearing points across the bottom flange width over each column cap.',
    lesson: 'Invented fixture: the realistic assumption.',
    credible: true,
  },
  {
    id: 'bonded',
    title: 'Fully bonded flange',
    description: 'The flange is tied to the column cap over its full width; bearings take tension.',
    lesson: 'Invented fixture: a simpler assumption shown for comparison.',
    credible: false,
  },
  {
    id: 'web-line',
    title: 'Line support under the web',
    description: 'A single bearing line under the web at each column; no flange contact.',
    lesson: 'Invented fixture: a simpler assumption shown for comparison.',
    credible: false,
  },
];

/** Invented factors on torsion and bimoment that make the scenarios differ as they would. */
const scenarioFactors: Record<string, { My: number; T: number; B: number; iterations: number }> = {
  contact: { My: 1.0, T: 1.0, B: 1.0, iterations: 6 },
  bonded: { My: 0.95, T: 0.7, B: 0.6, iterations: 1 },
  'web-line': { My: 1.05, T: 1.2, B: 1.4, iterations: 1 },
};

function factoredLineLoads(combination: CombinationSummary): { vertical: number; radial: number } {
  let vertical = 0;
  let radial = 0;
  for (const loadCase of cases) {
    const factor = combination.factors[loadCase.name] ?? 0;
    vertical += factor * loadCase.verticalLineLoad;
    radial += factor * loadCase.radialLineLoad;
  }
  return { vertical, radial };
}

const stationCount = 49;

/**
 * Circular ring on `columns` equally spaced supports under a uniform vertical line load q, with psi
 * measured from mid-span (-phi..phi), phi the half span angle (e.g. Young & Budynas, Roark's Formulas
 * for Stress and Strain, 7th ed., Table 9.4 for the ring on equally spaced supports):
 *   bending   M(psi) = q R^2 (phi cos(psi) / sin(phi) - 1)   (sagging positive there)
 *   torsion   T(psi) = q R^2 (phi sin(psi) / sin(phi) - psi)
 *   shear     V(psi) = q R psi
 * My here follows the result's convention (sagging is negative). The bimoment shape is invented.
 */
function ringDiagram(combination: CombinationSummary, scenarioId: string): ForceDiagram {
  const factors = scenarioFactors[scenarioId];
  if (factors === undefined) {
    throw new Error(`no scenario factors for ${scenarioId}`);
  }
  const { vertical: q, radial: p } = factoredLineLoads(combination);
  const phi = spanAngle / 2;
  const bimomentAmplitude = 0.062 * q * factors.B; // N m^2, invented
  const diagram: ForceDiagram = { angle: [], N: [], Vz: [], T: [], My: [], Mz: [], B: [] };
  for (let i = 0; i < stationCount; i++) {
    const angle = (2 * Math.PI * i) / (stationCount - 1);
    const spanIndex = Math.min(columns - 1, Math.floor(angle / spanAngle));
    const psi = angle - (spanIndex * spanAngle + phi);
    diagram.angle.push(angle);
    diagram.N.push(-p * radius);
    diagram.Vz.push(q * radius * psi);
    diagram.T.push(factors.T * (q * radius * radius * ((phi * Math.sin(psi)) / Math.sin(phi) - psi) + q * loadOffset * radius * psi));
    diagram.My.push(-factors.My * q * radius * radius * ((phi * Math.cos(psi)) / Math.sin(phi) - 1));
    diagram.Mz.push(0);
    diagram.B.push(bimomentAmplitude * (2 * (psi / phi) ** 2 - 1));
  }
  return diagram;
}

/** Bearing points across the bottom flange on each column cap (inside to outside). */
const bearingPoints = 5;
/** Invented eccentricity of the column reaction toward the inner flange edge, m (more than b/6: lift-off). */
const rollEccentricity = 0.1;

/**
 * A rigid flange on `bearingPoints` equal springs: forces linear across the width, in equilibrium with
 * the column reaction R and the roll moment M = -R e (inner edge loaded). Tensionless points that
 * would pull are dropped and the rest re-solved until none pulls (the active-set idea in miniature).
 */
function bearingForces(reaction: number, tensionless: boolean): number[] {
  const x = Array.from({ length: bearingPoints }, (_, i) => -ring.b / 2 + (ring.b * i) / (bearingPoints - 1));
  const moment = -reaction * rollEccentricity;
  let active = x.map(() => true);
  for (;;) {
    const xs = x.filter((_, i) => active[i]);
    const n = xs.length;
    const sx = xs.reduce((a, b) => a + b, 0);
    const sxx = xs.reduce((a, b) => a + b * b, 0);
    // Solve [n sx; sx sxx] [a; c] = [R; M] for f_i = a + c x_i.
    const det = n * sxx - sx * sx;
    const a = (reaction * sxx - moment * sx) / det;
    const c = (n * moment - sx * reaction) / det;
    const forces = x.map((xi, i) => (active[i] ? a + c * xi : 0));
    if (!tensionless || forces.every((f) => f >= -1e-9)) return forces.map((f) => (Math.abs(f) < 1e-9 ? 0 : f));
    active = active.map((on, i) => on && (forces[i] ?? 0) > 0);
  }
}

function bearingsOf(combination: CombinationSummary, scenarioId: string): AnalysisSummary['bearings'] {
  if (scenarioId === 'web-line') return undefined;
  const { vertical } = factoredLineLoads(combination);
  const forces = bearingForces((vertical * perimeter) / columns, scenarioId === 'contact');
  return {
    contactFraction: forces.filter((f) => f > 0).length / forces.length,
    maxCompression: Math.max(0, ...forces),
    maxTension: Math.max(0, ...forces.map((f) => -f)),
    mostLoadedColumn: { group: 'C1 cap', forces },
  };
}

function peakAbs(values: number[]): number {
  return values.reduce((peak, value) => Math.max(peak, Math.abs(value)), 0);
}

function analysis(combination: CombinationSummary, scenario: ScenarioSummary, index: number): AnalysisSummary {
  const diagram = ringDiagram(combination, scenario.id);
  const { vertical } = factoredLineLoads(combination);
  const appliedFz = -vertical * perimeter; // loads act downward, Z is up
  // A deterministic, tiny closing error, as a real solve would leave.
  const closing = 1 + (index + 1) * 3e-11;
  const factors = scenarioFactors[scenario.id];
  const bearings = bearingsOf(combination, scenario.id);
  return {
    combination: combination.name,
    scenario: scenario.id,
    converged: true,
    iterations: factors?.iterations ?? 1,
    residual: (index + 2) * 1.3e-13,
    reactionSum: [0, 0, -appliedFz * closing],
    appliedSum: [0, 0, appliedFz],
    peaks: {
      N: peakAbs(diagram.N),
      Vz: peakAbs(diagram.Vz),
      T: peakAbs(diagram.T),
      My: peakAbs(diagram.My),
      Mz: peakAbs(diagram.Mz),
      B: peakAbs(diagram.B),
    },
    diagram,
    ...(bearings === undefined ? {} : { bearings }),
  };
}

const analyses: AnalysisSummary[] = combinations.flatMap((combination, c) =>
  scenarios.map((scenario, s) => analysis(combination, scenario, c * scenarios.length + s)),
);

interface CheckOutcome {
  utilisation: number;
  station: number;
  inputs: Record<string, number>;
  intermediate: Record<string, number>;
}

/** EN 1993-1-1 6.2.1(5) with the warping normal stress of EN 1993-1-1 6.2.7(6): elastic check. */
function normalStressCheck(diagram: ForceDiagram): CheckOutcome {
  const omegaMax = ((ring.h - ring.tf) * ring.b) / 4;
  let worst: CheckOutcome | undefined;
  for (let i = 0; i < diagram.angle.length; i++) {
    const N_Ed = diagram.N[i] ?? 0;
    const My_Ed = diagram.My[i] ?? 0;
    const B_Ed = diagram.B[i] ?? 0;
    const sigma_N = Math.abs(N_Ed) / ring.A;
    const sigma_My = Math.abs(My_Ed) / ring.Wel_y;
    const sigma_w = (Math.abs(B_Ed) * omegaMax) / ring.Iw;
    const sigma_x_Ed = sigma_N + sigma_My + sigma_w;
    const utilisation = sigma_x_Ed / (fy / gammaM0);
    if (worst === undefined || utilisation > worst.utilisation) {
      worst = {
        utilisation,
        station: i,
        inputs: { N_Ed, My_Ed, B_Ed, A: ring.A, W_el_y: ring.Wel_y, I_w: ring.Iw, omega_max: omegaMax, f_y: fy, gamma_M0: gammaM0 },
        intermediate: { sigma_N, sigma_My, sigma_w, sigma_x_Ed },
      };
    }
  }
  if (worst === undefined) {
    throw new Error('empty diagram');
  }
  return worst;
}

/** EN 1993-1-5 6.2 to 6.5, load type (a), no stiffeners: web resistance over a column. */
function webBearingCheck(combination: CombinationSummary): CheckOutcome {
  const { vertical } = factoredLineLoads(combination);
  const F_Ed = (vertical * perimeter) / columns;
  const s_s = 0.2;
  const h_w = ring.h - 2 * ring.tf;
  const k_F = 6;
  const F_cr = (0.9 * k_F * E * ring.tw ** 3) / h_w;
  const m_1 = (fy * ring.b) / (fy * ring.tw);
  const m_2 = 0.02 * (h_w / ring.tf) ** 2;
  const l_y = s_s + 2 * ring.tf * (1 + Math.sqrt(m_1 + m_2));
  const lambda_F = Math.sqrt((l_y * ring.tw * fy) / F_cr);
  const chi_F = Math.min(1, 0.5 / lambda_F);
  const F_Rd = (fy * chi_F * l_y * ring.tw) / gammaM1;
  return {
    utilisation: F_Ed / F_Rd,
    station: 0,
    inputs: { F_Ed, s_s, h_w, t_w: ring.tw, t_f: ring.tf, b_f: ring.b, f_y: fy, k_F, gamma_M1: gammaM1 },
    intermediate: { F_cr, m_1, m_2, l_y, lambda_F, chi_F, F_Rd },
  };
}

/** EN 1993-1-1 6.3.1, flexural buckling about z-z, buckling curve c (alpha = 0.49), pinned ends. */
function columnBucklingCheck(combination: CombinationSummary): CheckOutcome {
  const { vertical } = factoredLineLoads(combination);
  const N_Ed = (vertical * perimeter) / columns;
  const L_cr = columnHeight;
  const epsilon = Math.sqrt(235e6 / fy);
  const lambda_1 = 93.9 * epsilon;
  const lambda_bar = L_cr / column.i_z / lambda_1;
  const alpha = 0.49;
  const Phi = 0.5 * (1 + alpha * (lambda_bar - 0.2) + lambda_bar ** 2);
  const chi = Math.min(1, 1 / (Phi + Math.sqrt(Phi ** 2 - lambda_bar ** 2)));
  const N_b_Rd = (chi * column.A * fy) / gammaM1;
  return {
    utilisation: N_Ed / N_b_Rd,
    station: 0,
    inputs: { N_Ed, L_cr, A: column.A, i_z: column.i_z, f_y: fy, alpha, gamma_M1: gammaM1 },
    intermediate: { lambda_1, lambda_bar, Phi, chi, N_b_Rd },
  };
}

/** EN 1992-1-1 6.7, concentrated force on the concrete pier under the base plate. */
function concreteBearingCheck(combination: CombinationSummary): CheckOutcome {
  const { vertical } = factoredLineLoads(combination);
  const F_Ed = (vertical * perimeter) / columns;
  const A_c0 = 0.35 * 0.35;
  const A_c1 = 0.7 * 0.7;
  const f_cd = 30e6 / 1.5;
  const F_Rdu = Math.min(A_c0 * f_cd * Math.sqrt(A_c1 / A_c0), 3 * f_cd * A_c0);
  return {
    utilisation: F_Ed / F_Rdu,
    station: 0,
    inputs: { F_Ed, A_c0, A_c1, f_cd },
    intermediate: { F_Rdu },
  };
}

interface CheckDefinition {
  member: 'RG' | 'COL';
  check: string;
  title: string;
  clause: string;
  evaluate: (combination: CombinationSummary, analysis: AnalysisSummary) => CheckOutcome;
}

const checks: CheckDefinition[] = [
  {
    member: 'RG',
    check: 'normal-stress-warping',
    title: 'Cross-section normal stress with warping (N + My + B)',
    clause: 'EN 1993-1-1 6.2.1(5), 6.2.7(6)',
    evaluate: (_combination, result) => normalStressCheck(requireDiagram(result)),
  },
  {
    member: 'RG',
    check: 'web-bearing',
    title: 'Web resistance to transverse force over a column',
    clause: 'EN 1993-1-5 6.2',
    evaluate: (combination) => webBearingCheck(combination),
  },
  {
    member: 'COL',
    check: 'flexural-buckling',
    title: 'Flexural buckling of the column (z-z)',
    clause: 'EN 1993-1-1 6.3.1.1',
    evaluate: (combination) => columnBucklingCheck(combination),
  },
  {
    member: 'COL',
    check: 'concrete-bearing',
    title: 'Bearing on the concrete pier',
    clause: 'EN 1992-1-1 6.7',
    evaluate: (combination) => concreteBearingCheck(combination),
  },
];

const memberSections: Record<'RG' | 'COL', { section: string; massPerLength: number; length: number; description: string }> = {
  RG: { section: ring.section, massPerLength: ring.massPerLength, length: perimeter, description: 'Ring girder under the transition' },
  COL: { section: column.section, massPerLength: column.massPerLength, length: columns * columnHeight, description: 'Columns (8 off, pinned bases)' },
};

/** The fixture gives every analysis a diagram. */
function requireDiagram(result: AnalysisSummary): NonNullable<AnalysisSummary['diagram']> {
  if (!result.diagram) throw new Error(`fixture analysis ${result.combination}/${result.scenario} has no diagram`);
  return result.diagram;
}

function positionOf(memberId: 'RG' | 'COL', result: AnalysisSummary, station: number): UtilisationRow['position'] {
  if (memberId === 'COL') {
    return { element: 'COL-1', x: 0, angle: 0, description: 'Column C1 at 0.0°, base' };
  }
  const angle = requireDiagram(result).angle[station] ?? 0;
  const segment = Math.min(segments - 1, Math.floor((angle / (2 * Math.PI)) * segments));
  const segmentLength = 2 * radius * Math.sin(Math.PI / segments);
  const x = ((angle - (segment * 2 * Math.PI) / segments) / ((2 * Math.PI) / segments)) * segmentLength;
  const atColumn = Math.abs(angle / spanAngle - Math.round(angle / spanAngle)) < 1e-9;
  const degrees = ((angle * 180) / Math.PI).toFixed(1);
  return {
    element: `RG-${segment + 1}`,
    x,
    angle,
    description: atColumn ? `Ring girder over column at ${degrees}°` : `Ring girder at ${degrees}°`,
  };
}

const credibleScenarios = scenarios.filter((scenario) => scenario.credible);
const ultimateCombinations = combinations.filter((combination) => combination.limitState === 'ULS');

interface Evaluated {
  row: UtilisationRow;
  governing: GoverningCase;
  /** The row's utilisation; every check of the invented design evaluates to a number. */
  utilisation: number;
}

const evaluated: Evaluated[] = checks.flatMap((definition) =>
  ultimateCombinations.map((combination) => {
    let worst: { outcome: CheckOutcome; result: AnalysisSummary } | undefined;
    for (const scenario of credibleScenarios) {
      const result = analyses.find((a) => a.combination === combination.name && a.scenario === scenario.id);
      if (result === undefined) {
        throw new Error(`missing analysis ${combination.name} / ${scenario.id}`);
      }
      const outcome = definition.evaluate(combination, result);
      if (worst === undefined || outcome.utilisation > worst.outcome.utilisation) {
        worst = { outcome, result };
      }
    }
    if (worst === undefined) {
      throw new Error('no credible scenario');
    }
    const position = positionOf(definition.member, worst.result, worst.outcome.station);
    const row: UtilisationRow = {
      member: definition.member,
      section: memberSections[definition.member].section,
      check: definition.check,
      clause: definition.clause,
      combination: combination.name,
      scenario: worst.result.scenario,
      position,
      utilisation: worst.outcome.utilisation,
    };
    const governing: GoverningCase = {
      check: definition.check,
      title: definition.title,
      clause: definition.clause,
      combination: combination.name,
      scenario: worst.result.scenario,
      position,
      inputs: worst.outcome.inputs,
      intermediate: worst.outcome.intermediate,
    };
    return { row, governing, utilisation: worst.outcome.utilisation };
  }),
);

const members: MemberResult[] = (['RG', 'COL'] as const).map((id) => {
  const own = evaluated.filter((entry) => entry.row.member === id);
  const top = own.reduce((a, b) => (b.utilisation > a.utilisation ? b : a));
  const data = memberSections[id];
  return {
    id,
    description: data.description,
    section: data.section,
    grade: 'S355',
    length: data.length,
    mass: data.length * data.massPerLength,
    massPerLength: data.massPerLength,
    utilisation: top.utilisation,
    governing: top.governing,
  };
});

function derivation(): DerivationStep[] {
  const clause = 'EN 1991-4 5.2.1.1';
  return [
    { symbol: 'D', description: 'Inside diameter of the bin', expression: 'given', value: diameter, unit: 'm', clause: 'input' },
    { symbol: 'γ', description: 'Unit weight of the solid (upper value)', expression: 'given', value: unitWeight, unit: 'N/m3', clause: 'input (invented solid)' },
    { symbol: 'K', description: 'Lateral pressure ratio (characteristic, upper)', expression: 'given', value: lateralPressureRatio, unit: '-', clause: 'input (invented solid)' },
    { symbol: 'μ', description: 'Wall friction coefficient (characteristic, lower)', expression: 'given', value: wallFrictionCoefficient, unit: '-', clause: 'input (invented solid)' },
    { symbol: 'A/U', description: 'Ratio of plan area to perimeter', expression: 'D / 4', value: hydraulicRadius, unit: 'm', clause },
    { symbol: 'z_o', description: 'Janssen characteristic depth', expression: 'z_o = (1 / (K μ)) (A / U)', value: z0, unit: 'm', clause },
    { symbol: 'p_ho', description: 'Asymptotic horizontal pressure', expression: 'p_ho = γ K z_o', value: pho, unit: 'Pa', clause },
    { symbol: 'Y_J(h_c)', description: 'Janssen depth function at the transition', expression: 'Y_J = 1 - exp(-h_c / z_o)', value: janssen(cylinderHeight), unit: '-', clause },
    { symbol: 'p_hf', description: 'Horizontal filling pressure at the transition', expression: 'p_hf = p_ho Y_J', value: phTransition, unit: 'Pa', clause },
    { symbol: 'p_wf', description: 'Wall frictional traction at the transition', expression: 'p_wf = μ p_ho Y_J', value: wallFrictionCoefficient * phTransition, unit: 'Pa', clause },
    { symbol: 'p_vf', description: 'Vertical stress in the solid at the transition', expression: 'p_vf = p_ho Y_J / K', value: pvTransition, unit: 'Pa', clause },
    { symbol: 'C_h', description: 'Discharge factor on horizontal pressure', expression: 'given', value: dischargeFactorPh, unit: '-', clause: 'EN 1991-4 5.2.2' },
    { symbol: 'W_s', description: 'Weight of the stored solid', expression: 'γ π R² (h_c + h_h / 3)', value: solidWeight, unit: 'N', clause: 'geometry' },
    { symbol: 'β', description: 'Hopper apex half angle', expression: 'given', value: apexHalfAngle, unit: 'rad', clause: 'input' },
    { symbol: 'n_r', description: 'Radial pull of the hopper on the support line (filling)', expression: 'n_r = (V_h / (2 π R)) tan β', value: hopperRadialFilling, unit: 'N/m', clause: 'equilibrium at the transition' },
  ];
}

function profiles(): PressureProfile[] {
  const wallDepths = Array.from({ length: 25 }, (_, i) => (cylinderHeight * i) / 24);
  const filling: PressureProfile = {
    case: 'Q_fill',
    part: 'wall',
    z: wallDepths,
    ph: wallDepths.map((z) => pho * janssen(z)),
    pw: wallDepths.map((z) => wallFrictionCoefficient * pho * janssen(z)),
    pv: wallDepths.map((z) => (pho * janssen(z)) / lateralPressureRatio),
  };
  const discharge: PressureProfile = {
    case: 'Q_disch',
    part: 'wall',
    z: wallDepths,
    ph: filling.ph.map((value) => value * dischargeFactorPh),
    pw: filling.pw.map((value) => value * dischargeFactorPw),
    pv: filling.pv.slice(),
  };
  // Invented hopper shape (not a code expression): mean vertical stress falling to zero at the apex.
  const hopperDepths = Array.from({ length: 9 }, (_, i) => cylinderHeight + (hopperHeight * i) / 8);
  const hopperPv = hopperDepths.map((z) => {
    const s = (z - cylinderHeight) / hopperHeight;
    return (pvTransition + 0.5 * unitWeight * hopperHeight * s) * (1 - s * s);
  });
  const hopper: PressureProfile = {
    case: 'Q_fill',
    part: 'hopper',
    z: hopperDepths,
    ph: hopperPv.map((value) => 0.8 * value),
    pw: hopperPv.map((value) => 0.8 * wallFrictionCoefficient * value),
    pv: hopperPv,
  };
  return [filling, discharge, hopper];
}

/** A fresh copy of the invented result on every call, so a test may change it freely. */
export function demoDesignResult(): DesignResult {
  const steelMass = members.reduce((sum, member) => sum + member.mass, 0);
  const maxUtilisation = Math.max(...evaluated.map((entry) => entry.utilisation));
  const result: DesignResult = {
    schemaVersion: '1.0.0',
    tool: { name: 'binsupport', version: '0.1.0' },
    project: {
      name: 'Invented test bin TB-1 (test data)',
      client: 'Example Grain Co-operative (invented)',
      site: 'Testfield Mill, plot 7 (invented)',
      reference: 'TEST-0042',
      designer: 'A. N. Engineer (invented)',
      date: '2025-03-14',
    },
    status: 'verified',
    cautions: [
      'First-pass design produced by software; it is not a construction document.',
      'To be verified by a qualified structural engineer before use.',
      'Local codes, national annexes and licensed practice govern over anything in this report.',
    ],
    input: {
      project: { name: 'Invented test bin TB-1 (test data)', reference: 'TEST-0042', date: '2025-03-14' },
      bin: { diameter, cylinderHeight, hopperHeight, apexHalfAngle },
      solid: {
        name: 'Invented grain-like solid',
        unitWeight,
        lateralPressureRatio,
        wallFrictionCoefficient,
      },
      supports: { kind: 'ring', columns, columnHeight, columnBase: 'pinned', loadOffset },
      structure: { weight: structureWeight },
      design: { grades: ['S355'], credibleScenarios: ['contact'], families: ['HE B'], notes: [] },
    },
    bin: { diameter, cylinderHeight, hopperHeight, apexHalfAngle, solid: 'Invented grain-like solid' },
    girder: { kind: 'ring',
    support: 'columns', radius, columns, segments, spanAngle },
    loads: {
      cases,
      combinations,
      profiles: profiles(),
      totals: { solidWeight, structureWeight },
      derivation: derivation(),
    },
    scenarios: scenarios.map((scenario) => {
      const tension = Math.max(0, ...analyses.filter((a) => a.scenario === scenario.id).map((a) => a.bearings?.maxTension ?? 0));
      return { ...scenario, needsTension: tension > 0, maxBearingTension: tension };
    }),
    analyses,
    members,
    utilisations: evaluated.map((entry) => entry.row),
    optimisation: {
      status: 'optimal',
      objective: 'mass',
      candidates: 36,
      feasibleCandidates: 19,
      iterations: [
        { iteration: 1, choice: { RG: 'HE 280 B', COL: 'HE 200 B' }, mass: 18.85 * 103 + 48 * 61.3, maxUtilisation: 1.08 },
        { iteration: 2, choice: { RG: 'HE 300 B', COL: 'HE 200 B' }, mass: steelMass, maxUtilisation },
        { iteration: 3, choice: { RG: 'HE 300 B', COL: 'HE 200 B' }, mass: steelMass, maxUtilisation },
      ],
      converged: true,
      message: 'Section choice repeated at iteration 3; final design re-analysed and verified.',
    },
    totals: { steelMass },
  };
  return structuredClone(result);
}
