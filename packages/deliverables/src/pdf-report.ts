// The calculation report (design.pdf): a document a checker can follow from the bin's inputs through
// loads, support model and analysis to the section chosen for each member and the check that governs
// it. The layout is built as a pdfmake document definition from the DesignResult alone, and the date
// comes from the result or the caller, never from the clock, so the same result gives the same bytes.
import type {
  AnalysisSummary,
  DesignResult,
  GoverningCase,
  MemberResult,
  UtilisationRow,
} from '@binsupport/design';
import { atomicWrite } from './atomic-write.js';
import {
  bearingChartSpec,
  bearingPanelTitle,
  forceDiagramSpec,
  pressureChartSpec,
  renderChartSvg,
  utilisationBars,
  utilisationChartSpec,
} from './charts.js';
import { flattenJson } from './flatten.js';
import { supportPlan } from './plan.js';
import { renderPdfDefinition, svgNode } from './pdf-engine.js';
import type { PdfContent, PdfDocumentDefinition, PdfNode, PdfTableLayout } from './pdf-engine.js';
import {
  bearingPanels,
  combinationExpression,
  equilibrium,
  issueDate,
  scenarioById,
  scenarioEnvelopes,
  scenarioTitle,
  tonnageBySection,
  utilisationBand,
} from './report-data.js';
import type { BearingPanel, ReportOptions } from './report-data.js';
import {
  formatAngle,
  formatForce,
  formatLengthM,
  formatLengthMm,
  formatMass,
  formatKilo,
  formatNumber,
  formatTraceValue,
  formatResidual,
  formatTonnes,
  formatUtilisation,
  toDisplay,
  toKilonewtonMetres,
  toKilonewtonSquareMetres,
  toKilonewtons,
  toKilonewtonsPerMetre,
} from './units.js';

/** The report's standing, printed in the cautions box when the result carries no cautions of its own. */
export const REPORT_STANDING = [
  'This is a first-pass design produced by software from the stated inputs.',
  'It must be verified by a qualified structural engineer before it is relied upon.',
  'Local codes, national annexes and licensed engineering practice govern over anything in this report.',
];

export const colours = {
  heading: '#1b4f72',
  rule: '#9aa5b1',
  headerFill: '#e6ecf1',
  cautionFill: '#fdf1e7',
  cautionBorder: '#b9770e',
  verified: '#1e6b3a',
  infeasible: '#a93226',
  nearLimitFill: '#fbeec2',
  notEvaluatedFill: '#e3e7eb',
  exceededFill: '#f5c6c0',
  muted: '#4d5a66',
};

/** A4 portrait, content width in points. */
export const pageMargins: [number, number, number, number] = [48, 58, 48, 50];
export const contentWidth = 595.28 - pageMargins[0] - pageMargins[2];

export const gridLayout: PdfTableLayout = {
  hLineWidth: () => 0.5,
  vLineWidth: () => 0.5,
  hLineColor: () => colours.rule,
  vLineColor: () => colours.rule,
  paddingLeft: () => 3,
  paddingRight: () => 3,
  paddingTop: () => 1.5,
  paddingBottom: () => 1.5,
};

const keyValueLayout: PdfTableLayout = {
  hLineWidth: () => 0.4,
  vLineWidth: () => 0,
  hLineColor: () => colours.rule,
  paddingLeft: () => 2,
  paddingRight: () => 6,
  paddingTop: () => 1.5,
  paddingBottom: () => 1.5,
};

export function heading(text: string): PdfNode {
  return { text, style: 'h1', headlineLevel: 1 };
}

export function subheading(text: string): PdfNode {
  return { text, style: 'h2', headlineLevel: 2 };
}

/** The heading of a figure, kept with it inside an unbreakable stack (so no headlineLevel). */
export function figureHeading(text: string): PdfNode {
  return { text, style: 'h2' };
}

export function paragraph(text: PdfContent): PdfNode {
  return { text, style: 'body' };
}

export function caption(text: string): PdfNode {
  return { text, style: 'caption' };
}

/** A header cell; a numeric column's unit goes on its own line so narrow columns stay readable. */
export function headerCell(text: string, alignment: PdfNode['alignment'] = 'left'): PdfNode {
  const shown = alignment === 'right' ? text.replace(/ \[/, '\n[') : text;
  return { text: shown, style: 'tableHeader', alignment };
}

export function numberCell(text: string): PdfNode {
  return { text, alignment: 'right', noWrap: true };
}

export function utilisationCell(utilisation: number | null, alignment: PdfNode['alignment'] = 'right'): PdfNode {
  const band = utilisationBand(utilisation);
  const cell: PdfNode = { text: formatUtilisation(utilisation), alignment, bold: band !== 'adequate', noWrap: true };
  if (band === 'near limit') {
    cell.fillColor = colours.nearLimitFill;
  } else if (band === 'exceeded') {
    cell.fillColor = colours.exceededFill;
  } else if (band === 'not evaluated') {
    cell.fillColor = colours.notEvaluatedFill;
    cell.italics = true;
  }
  return cell;
}

/** A table with a repeated header row. */
export function table(header: PdfNode[], rows: PdfContent[][], widths: Array<number | string>): PdfNode {
  return {
    table: { headerRows: 1, widths, body: [header, ...rows], dontBreakRows: true, keepWithHeaderRows: 1 },
    layout: gridLayout,
    style: 'table',
  };
}

/** Label / value pairs, two to a row when `pairsPerRow` is 2. */
export function keyValueTable(pairs: Array<[string, PdfContent]>, pairsPerRow: 1 | 2 = 1): PdfNode {
  // Short tables are kept on one page; they hold no headings (see figureHeading).
  const body: PdfContent[][] = [];
  for (let i = 0; i < pairs.length; i += pairsPerRow) {
    const row: PdfContent[] = [];
    for (let j = 0; j < pairsPerRow; j++) {
      const pair = pairs[i + j];
      row.push(pair === undefined ? '' : { text: pair[0], color: colours.muted }, pair === undefined ? '' : pair[1]);
    }
    body.push(row);
  }
  const widths = pairsPerRow === 2 ? [70, '*', 70, '*'] : [150, '*'];
  return { table: { widths, body }, layout: keyValueLayout, style: 'table', unbreakable: pairs.length <= 12 };
}

// ----------------------------------------------------------------------------------------------
// Title block and section 1

function titleBlock(result: DesignResult, date: string | undefined): PdfContent[] {
  const project = result.project;
  const statusText =
    result.status === 'verified'
      ? { text: 'VERIFIED: every check of the chosen sections is within its limit in the design envelope', color: colours.verified, bold: true }
      : { text: 'INFEASIBLE: no choice satisfied every check; the best attempt is reported', color: colours.infeasible, bold: true };
  return [
    { text: 'CALCULATION REPORT', style: 'kicker' },
    { text: 'Support girder of a steel storage bin', style: 'title' },
    { text: project.name, style: 'subtitle' },
    keyValueTable(
      [
        ['Project', project.name],
        ['Client', project.client],
        ['Site', project.site],
        ['Reference', project.reference],
        ['Designer', project.designer],
        ['Date', date ?? 'not given in the specification'],
        ['Prepared with', `${result.tool.name} ${result.tool.version} (result schema ${result.schemaVersion})`],
        ['Design status', statusText],
      ],
      1,
    ),
  ];
}

function cautionsBox(result: DesignResult): PdfNode {
  const lines = result.cautions.length > 0 ? result.cautions : REPORT_STANDING;
  const items: PdfContent[] = lines.map((line) => ({ text: line, style: 'caution' }));
  return {
    table: {
      widths: ['*'],
      body: [[{ stack: [{ text: 'CAUTIONS', bold: true, color: colours.cautionBorder, fontSize: 10, margin: [0, 0, 0, 3] }, { ul: items }], fillColor: colours.cautionFill }]],
    },
    layout: {
      hLineWidth: () => 1.2,
      vLineWidth: () => 1.2,
      hLineColor: () => colours.cautionBorder,
      vLineColor: () => colours.cautionBorder,
      paddingLeft: () => 8,
      paddingRight: () => 8,
      paddingTop: () => 6,
      paddingBottom: () => 6,
    },
    margin: [0, 10, 0, 8],
  };
}

function scopeSection(result: DesignResult): PdfContent[] {
  const credible = result.scenarios.filter((s) => s.credible).length;
  const bin = result.bin;
  const girder = result.girder;
  return [
    heading('1 Scope and cautions'),
    cautionsBox(result),
    paragraph(
      `This report documents the design of the support girder of a circular steel bin of ${formatLengthM(bin.diameter)} ` +
        `diameter storing ${bin.solid}. The girder is a ${girder.kind} of radius ${formatLengthM(girder.radius)} on ` +
        `${girder.columns} columns at ${formatAngle(girder.spanAngle)} spacing, analysed as ${girder.segments} straight beam ` +
        `elements. The loads from the stored solid and the structure (section 3) are combined into ` +
        `${result.loads.combinations.length} combinations; each is analysed under ${result.scenarios.length} support ` +
        `scenarios (section 4), of which ${credible} ${credible === 1 ? 'forms' : 'form'} the design envelope. ` +
        `Sections are chosen for least mass (section 6) and the case that governs each member is traced in section 7.`,
    ),
    paragraph(
      'All quantities are computed in SI base units and shown here in kN, kNm, kNm² (bimoment), kN/m, kPa, mm or m and degrees. ' +
        'Angles around the bin are measured from +X, counter-clockwise seen from above. Utilisations are rounded up to two decimals, ' +
        'so a printed value never understates a check. Cells shaded amber are above 0.90; cells shaded red exceed 1.00; ' +
        '"n/a" (grey) marks a check that recorded no number, being outside its scope for the section or having no resistance left.',
    ),
  ];
}

// ----------------------------------------------------------------------------------------------
// Section 2: inputs

/** Figure 2.1: plan of the ring and columns with the governing position of each member. */
function planFigure(result: DesignResult): PdfNode {
  const plan = supportPlan(result);
  const rows: PdfContent[][] = result.members.map((member, i) => {
    const marker = plan.markers[i];
    return [
      { text: member.id, bold: true, color: marker?.colour ?? colours.heading },
      member.section,
      utilisationCell(member.utilisation),
      member.governing.title,
      member.governing.combination,
      { text: member.governing.position.description },
      numberCell(formatAngle(member.governing.position.angle)),
    ];
  });
  return {
    stack: [
      svgNode(plan.svg, 300, [0, 6, 0, 2]),
      {
        table: {
          headerRows: 1,
          widths: [36, 48, 44, '*', 56, 110, 32],
          body: [
          [headerCell('Member'), headerCell('Section'), headerCell('Utilisation', 'right'), headerCell('Governing check'), headerCell('Combination'), headerCell('Position'), headerCell('θ', 'right')],
            ...rows,
          ],
          dontBreakRows: true,
        },
        layout: gridLayout,
        style: 'table',
      },
      caption(
        `Figure 2.1. Plan of the support layout seen from above: the girder axis of radius ${formatLengthM(result.girder.radius)}, ` +
          `columns C1 to C${result.girder.columns} at ${formatAngle(result.girder.spanAngle)} spacing from +X, counter-clockwise, ` +
          'and the position where each member is governed (diamond in the colour of the member, with its utilisation).',
      ),
    ],
    unbreakable: true,
  };
}

function inputsSection(result: DesignResult): PdfContent[] {
  const { bin, girder } = result;
  const segmentLength = 2 * girder.radius * Math.sin(Math.PI / girder.segments);
  const content: PdfContent[] = [
    heading('2 Inputs'),
    subheading('2.1 Bin geometry and stored solid'),
    keyValueTable([
      ['Inside diameter', formatLengthM(bin.diameter)],
      ['Height of the cylinder', formatLengthM(bin.cylinderHeight)],
      ['Height of the hopper', formatLengthM(bin.hopperHeight)],
      ['Hopper apex half angle', formatAngle(bin.apexHalfAngle)],
      ['Stored solid', bin.solid],
    ]),
    subheading('2.2 Support layout'),
    keyValueTable([
      ['Girder', girder.kind === 'ring' ? 'Ring girder under the transition' : girder.kind],
      ['Radius of the girder axis', formatLengthM(girder.radius)],
      ['Number of columns', String(girder.columns)],
      ['Angle between columns', formatAngle(girder.spanAngle)],
      ['Arc length between columns', formatLengthM(girder.radius * girder.spanAngle)],
      ['Elements in the ring model', `${girder.segments} straight segments of ${formatLengthMm(segmentLength)} chord`],
    ]),
    planFigure(result),
  ];
  const echo = flattenJson(result.input);
  content.push(subheading('2.3 Validated specification (SI base units)'));
  if (echo.length === 0) {
    content.push(paragraph('The design result carries no input echo.'));
  } else if (echo.length <= 80) {
    content.push(
      table(
        [headerCell('Input path'), headerCell('Value')],
        echo.map((entry) => [{ text: entry.path, style: 'mono' }, String(entry.value)]),
        [220, '*'],
      ),
    );
  } else {
    content.push(paragraph(`The specification has ${echo.length} entries; it is echoed in full in design.xlsx, sheet Inputs.`));
  }
  return content;
}

// ----------------------------------------------------------------------------------------------
// Section 3: loads

async function loadsSection(result: DesignResult): Promise<PdfContent[]> {
  const loads = result.loads;
  const perimeter = 2 * Math.PI * result.girder.radius;
  const content: PdfContent[] = [heading('3 Loads'), subheading('3.1 Derivation')];
  if (loads.derivation.length === 0) {
    content.push(paragraph('The design result records no derivation steps.'));
  } else {
    content.push(
      table(
        [headerCell('Symbol'), headerCell('Description'), headerCell('Expression'), headerCell('Value', 'right'), headerCell('Unit'), headerCell('Clause')],
        loads.derivation.map((step) => {
          const shown = toDisplay(step.value, step.unit);
          return [step.symbol, step.description, { text: step.expression, style: 'mono' }, numberCell(formatNumber(shown.value)), shown.unit, step.clause];
        }),
        [42, '*', 110, 42, 34, 70],
      ),
    );
  }

  content.push(subheading('3.2 Pressures from the stored solid'));
  if (loads.profiles.length === 0) {
    content.push(paragraph('The design result records no pressure profiles.'));
  } else {
    const svg = await renderChartSvg(pressureChartSpec(loads.profiles));
    content.push({
      stack: [
        svgNode(svg, Math.min(contentWidth, 380)),
        caption(
          'Figure 3.1. Pressures against depth below the equivalent surface, for each load case and part of the bin (wall, hopper). ' +
            'p_h: normal pressure on the wall; p_w: wall frictional traction; p_v: mean vertical stress in the solid.',
        ),
      ],
      unbreakable: true,
    });
  }

  content.push(subheading('3.3 Load cases on the support line'));
  content.push(
    table(
      [
        headerCell('Case'),
        headerCell('Description'),
        headerCell('Kind'),
        headerCell('Vertical [kN/m]', 'right'),
        headerCell('Radial, inward [kN/m]', 'right'),
        headerCell('Resultant [kN]', 'right'),
        headerCell('Line load × 2πR [kN]', 'right'),
      ],
      loads.cases.map((loadCase) => [
        loadCase.name,
        loadCase.description,
        loadCase.kind,
        numberCell(formatKilo(toKilonewtonsPerMetre(loadCase.verticalLineLoad))),
        numberCell(formatKilo(toKilonewtonsPerMetre(loadCase.radialLineLoad))),
        numberCell(formatKilo(toKilonewtons(loadCase.verticalResultant))),
        numberCell(formatKilo(toKilonewtons(loadCase.verticalLineLoad * perimeter))),
      ]),
      [40, '*', 48, 48, 52, 50, 58],
    ),
  );
  const total = loads.totals.solidWeight + loads.totals.structureWeight;
  content.push(
    keyValueTable([
      ['Weight of the stored solid', `${formatForce(loads.totals.solidWeight)}`],
      ['Weight of the structure on the support line', `${formatForce(loads.totals.structureWeight)}`],
      ['Total gravity load on the support line', `${formatForce(total)}`],
    ]),
  );
  content.push(
    caption(
      'Vertical line loads act downward; radial line loads act toward the bin axis and put the ring in compression. ' +
        'The last column multiplies the line load by the girder perimeter 2πR, to be compared with the resultant.',
    ),
  );

  content.push(subheading('3.4 Combinations of actions'));
  content.push(
    table(
      [headerCell('Combination'), headerCell('Limit state'), headerCell('Expression'), headerCell('Clause')],
      loads.combinations.map((c) => [c.name, c.limitState, { text: c.expression, style: 'mono' }, c.clause]),
      [70, 50, '*', 140],
    ),
  );
  return content;
}

// ----------------------------------------------------------------------------------------------
// Section 4: support model and scenarios

function supportSection(result: DesignResult): PdfContent[] {
  const girder = result.girder;
  const envelopes = scenarioEnvelopes(result);
  return [
    heading('4 Support model and scenarios'),
    paragraph(
      `The girder is modelled as a closed ${girder.kind} of ${girder.segments} straight beam elements of radius ` +
        `${formatLengthM(girder.radius)}, carried by ${girder.columns} columns. Each element has warping as a seventh ` +
        'degree of freedom at its nodes, so that the open section carries torsion partly as bimoment. The loads of section 3 ' +
        'enter at their line of action. The same girder is analysed under each support scenario below, because the bearing ' +
        'assumption drives the torsion and bimoment. Only scenarios marked as in the design envelope size the sections; the ' +
        'others are shown for comparison.',
    ),
    table(
      [headerCell('Scenario'), headerCell('Title'), headerCell('Description'), headerCell('Design envelope')],
      result.scenarios.map((s) => [
        { text: s.id, style: 'mono' },
        s.title,
        s.description,
        { text: s.credible ? 'yes' : 'comparison only', bold: s.credible },
      ]),
      [55, 110, '*', 62],
    ),
    subheading('4.1 Scenarios side by side'),
    table(
      [
        headerCell('Scenario'),
        headerCell('Max |N| [kN]', 'right'),
        headerCell('Max |Vz| [kN]', 'right'),
        headerCell('Max |T| [kNm]', 'right'),
        headerCell('Max |My| [kNm]', 'right'),
        headerCell('Max |Mz| [kNm]', 'right'),
        headerCell('Max |B| [kNm²]', 'right'),
        headerCell('Converged'),
      ],
      envelopes.map((e) => [
        `${e.scenario.title}${e.scenario.credible ? '' : ' (comparison)'}`,
        numberCell(formatKilo(toKilonewtons(e.peaks.N))),
        numberCell(formatKilo(toKilonewtons(e.peaks.Vz))),
        numberCell(formatKilo(toKilonewtonMetres(e.peaks.T))),
        numberCell(formatKilo(toKilonewtonMetres(e.peaks.My))),
        numberCell(formatKilo(toKilonewtonMetres(e.peaks.Mz))),
        numberCell(formatKilo(toKilonewtonSquareMetres(e.peaks.B))),
        e.analyses === 0 ? 'no ULS analysis' : e.allConverged ? 'all' : { text: 'NOT ALL', color: colours.infeasible, bold: true },
      ]),
      ['*', 44, 44, 44, 46, 46, 48, 46],
    ),
    caption('Largest absolute internal forces over all ultimate-limit-state combinations of each scenario.'),
    subheading('4.2 What each assumption says about the chosen section'),
    table(
      [headerCell('Scenario'), headerCell('Utilisation if used alone', 'right'), headerCell('Bearing tension'), headerCell('Lesson')],
      result.scenarios.map((s) => [
        `${s.title}${s.credible ? '' : ' (comparison)'}`,
        utilisationCell(s.utilisation ?? null),
        s.needsTension
          ? { text: `needs ${formatKilo(toKilonewtons(s.maxBearingTension ?? 0))} kN of tension a plain bearing cannot give`, color: colours.infeasible, bold: true }
          : 'none',
        s.lesson,
      ]),
      [110, 60, 90, '*'],
    ),
    caption('Utilisation of the chosen sections had each scenario alone been used to size them (ultimate limit states of resistance). A scenario that needs bearing tension is flagged: its answer rests on a force a real bearing cannot give.'),
  ];
}

// ----------------------------------------------------------------------------------------------
// Section 5: analysis

function analysisRow(result: DesignResult, analysis: AnalysisSummary): PdfContent[] {
  const balance = equilibrium(analysis);
  return [
    analysis.combination,
    scenarioTitle(result, analysis.scenario),
    analysis.converged ? 'yes' : { text: 'NO', color: colours.infeasible, bold: true },
    numberCell(String(analysis.iterations)),
    numberCell(formatResidual(analysis.residual)),
    numberCell(formatKilo(toKilonewtons(analysis.appliedSum[2]))),
    numberCell(formatKilo(toKilonewtons(analysis.reactionSum[2]))),
    numberCell(formatResidual(balance.relative)),
  ];
}

async function analysisSection(result: DesignResult): Promise<PdfContent[]> {
  const content: PdfContent[] = [
    heading('5 Analysis'),
    paragraph(
      'Each combination is solved on its own under each scenario (contact makes the response nonlinear, so results are not ' +
        'superposed). Every solve reports its relative residual |K u - f| / |f| and the equilibrium of applied loads and ' +
        'reactions; ΣFz is the vertical sum, Z up.',
    ),
    table(
      [
        headerCell('Combination'),
        headerCell('Scenario'),
        headerCell('Converged'),
        headerCell('Iterations', 'right'),
        headerCell('Residual', 'right'),
        headerCell('ΣFz applied [kN]', 'right'),
        headerCell('ΣFz reactions [kN]', 'right'),
        headerCell('Imbalance / applied', 'right'),
      ],
      result.analyses.map((analysis) => analysisRow(result, analysis)),
      [50, '*', 44, 40, 42, 52, 52, 50],
    ),
    ...guardsTable(result),
  ];
  const combinations = result.loads.combinations.filter((c) => result.analyses.some((a) => a.combination === c.name && a.diagram !== undefined));
  let figure = 1;
  for (const combination of combinations) {
    const svg = await renderChartSvg(forceDiagramSpec(result, combination.name));
    content.push({
      stack: [
        figureHeading(`5.${figure} Internal forces around the girder, ${combination.name}`),
        svgNode(svg, Math.min(contentWidth, 430)),
        caption(
          `Figure 5.${figure}. Combination ${combination.name} (${combination.expression}): bending moment My, torsion T and ` +
            'bimoment B against the position around the bin, one line per support scenario (by id, see section 4; dashed: comparison only). ' +
            'My > 0 puts the top fibre in tension (hogging); a sagging girder has My < 0. Dotted vertical rules mark the columns.',
        ),
      ],
      unbreakable: true,
    });
    figure += 1;
  }
  content.push(...(await bearingSection(result, figure)));
  return content;
}

/** What the guards measured: each would have stopped the design instead of giving this report. */
function guardsTable(result: DesignResult): PdfContent[] {
  const guards = result.guards;
  if (!guards) return [];
  const mesh = guards.meshConvergence;
  const rows: PdfContent[][] = [
    ['Equilibrium', `reactions against applied loads in ${guards.equilibrium.analyses} analyses`, numberCell(formatResidual(guards.equilibrium.largestImbalance)), numberCell(formatResidual(guards.equilibrium.tolerance))],
    [
      'Contact consistency',
      `${guards.contact.compressionOnlySprings} compression-only bearing states: none pulls, none lifted off is pressed in (relative to the largest force / elongation)`,
      numberCell(formatResidual(Math.max(guards.contact.largestTension, guards.contact.largestPenetration))),
      numberCell(formatResidual(guards.contact.tolerance)),
    ],
    [
      'Re-analysis',
      `the chosen sections analysed afresh: girder ${formatUtilisation(guards.reanalysis.freshGirderUtilisation)}${guards.reanalysis.freshColumnUtilisation === null ? '' : `, columns ${formatUtilisation(guards.reanalysis.freshColumnUtilisation)}`}, as reported`,
      numberCell(formatResidual(guards.reanalysis.relativeDifference)),
      numberCell(formatResidual(guards.reanalysis.tolerance)),
    ],
    [
      'Mesh convergence',
      `${mesh.check} in ${mesh.combination} / ${mesh.scenario}: ${mesh.utilisation === null ? "n/a" : formatNumber(mesh.utilisation)} with ${mesh.segmentsPerSpan} segments per span, ${mesh.refinedUtilisation === null ? "n/a" : formatNumber(mesh.refinedUtilisation)} with ${mesh.refinedSegmentsPerSpan}`,
      numberCell(`${(100 * mesh.relativeChange).toFixed(2)} %`),
      numberCell(`${(100 * mesh.tolerance).toFixed(0)} %`),
    ],
  ];
  return [
    subheading('Guards'),
    paragraph('Each guard would have stopped the design with its reason instead of giving this report; what each measured:'),
    table([headerCell('Guard'), headerCell('What was compared'), headerCell('Measured', 'right'), headerCell('Limit', 'right')], rows, [80, '*', 50, 40]),
  ];
}

function percent(fraction: number): string {
  return `${Math.round(fraction * 100)} %`;
}

/** The sentence under a bearing panel: contact, peak compression, lift-off, tension flagged. */
export function bearingSentence(panel: BearingPanel): string {
  const { bearings, scenario } = panel;
  const forces = bearings.mostLoadedColumn.forces;
  const lifted = forces.filter((force) => force === 0).length;
  const pulling = forces.filter((force) => force < 0).length;
  const pressing = forces.length - lifted - pulling;
  const state = [`${pressing} of ${forces.length} points press`, ...(lifted > 0 ? [`${lifted} lift${lifted === 1 ? 's' : ''} off (zero bars)`] : []), ...(pulling > 0 ? [`${pulling} pull${pulling === 1 ? 's' : ''} (bars below zero)`] : [])];
  const which = panel.role === 'governing' ? `governing combination ${panel.combination}` : `${panel.combination}, the combination with the least contact`;
  const parts = [
    `${scenario.title} (${scenario.id}), ${which}: ${percent(bearings.contactFraction)} of the bearing points are in contact; ` +
      `the largest compression in any one point (any column) is ${formatForce(bearings.maxCompression)}.`,
    `At ${bearings.mostLoadedColumn.group} ${state.length === 1 ? state[0] : `${state.slice(0, -1).join(', ')} and ${state[state.length - 1]}`}.`,
  ];
  if (bearings.maxTension > 0) {
    parts.push(`TENSION of up to ${formatForce(bearings.maxTension)} in one point: not available from a real bearing, which can only push; the scenario rests on it.`);
  } else if (panel.role === 'governing' && scenario.needsTension === true) {
    parts.push(`In another combination the scenario needs TENSION of up to ${formatForce(scenario.maxBearingTension ?? 0)} in one point: not available from a real bearing, which can only push.`);
  }
  return parts.join(' ');
}

async function bearingSection(result: DesignResult, figure: number): Promise<PdfContent[]> {
  const panels = bearingPanels(result);
  if (panels.length === 0) return [];
  const svg = await renderChartSvg(bearingChartSpec(panels));
  return [
    {
      stack: [
        figureHeading(`5.${figure} Bearing contact at the most loaded column`),
        paragraph(
          'Forces in the bearing points across the bottom flange of the most loaded column cap, from the inner flange edge to the outer, ' +
            'for the combination that governs each scenario with bearing points and, where another combination leaves fewer points in contact, ' +
            'for that one too. A zero bar is a point that has lifted off; a bar below zero is a point pulling on the flange.',
        ),
        svgNode(svg, Math.min(contentWidth, 440)),
        caption(`Figure 5.${figure}. ${panels.map(bearingPanelTitle).join('; ')}. Forces in kN, compression positive.`),
      ],
      unbreakable: true,
    },
    { ul: panels.map((panel): PdfContent => ({ text: bearingSentence(panel), style: 'body', alignment: 'left', ...(panel.bearings.maxTension > 0 || (panel.role === 'governing' && panel.scenario.needsTension === true) ? { color: colours.infeasible } : {}) })) },
  ];
}

// ----------------------------------------------------------------------------------------------
// Section 6: section choice

async function sectionChoice(result: DesignResult): Promise<PdfContent[]> {
  const totalMass = result.members.reduce((sum, member) => sum + member.mass, 0);
  const memberRows: PdfContent[][] = result.members.map((member) => [
    { text: member.id, bold: true },
    member.description,
    { text: member.section, noWrap: true },
    member.grade,
    numberCell(formatNumber(member.length)),
    numberCell(formatMass(member.mass).replace(' kg', '')),
    utilisationCell(member.utilisation),
    member.governing.title,
    member.governing.clause,
  ]);
  memberRows.push([
    { text: 'Total', bold: true, colSpan: 5 },
    '',
    '',
    '',
    '',
    numberCell(formatMass(totalMass).replace(' kg', '')),
    { text: formatTonnes(totalMass), colSpan: 3 },
    '',
    '',
  ]);
  const content: PdfContent[] = [
    heading('6 Section choice'),
    table(
      [
        headerCell('Member'),
        headerCell('Description'),
        headerCell('Section'),
        headerCell('Grade'),
        headerCell('Length [m]', 'right'),
        headerCell('Mass [kg]', 'right'),
        headerCell('Utilisation', 'right'),
        headerCell('Governing check'),
        headerCell('Clause'),
      ],
      memberRows,
      [30, '*', 46, 30, 36, 36, 44, 90, 62],
    ),
  ];
  const sections = tonnageBySection(result);
  if (sections.length > 1) {
    content.push(
      table(
        [headerCell('Section'), headerCell('Grade'), headerCell('Members'), headerCell('Length [m]', 'right'), headerCell('Mass [t]', 'right')],
        sections.map((s) => [s.section, s.grade, s.members.join(', '), numberCell(formatNumber(s.length)), numberCell(formatTonnes(s.mass).replace(' t', ''))]),
        [70, 40, '*', 60, 60],
      ),
    );
  }
  const bars = utilisationBars(result.utilisations, formatUtilisation);
  if (bars.length > 0) {
    const svg = await renderChartSvg(utilisationChartSpec(bars));
    content.push({
      stack: [
        figureHeading('6.1 Utilisations'),
        svgNode(svg, Math.min(contentWidth, 470)),
        caption('Figure 6.1. Largest utilisation of every check of every member over the design envelope; the dashed line is the limit 1.00.'),
      ],
      unbreakable: true,
    });
  }
  const optimisation = result.optimisation;
  content.push(subheading('6.2 Optimisation'));
  content.push(
    keyValueTable(
      [
        ['Status', optimisation.status],
        ['Objective', `least ${optimisation.objective}`],
        ['Candidates', String(optimisation.candidates)],
        ['Feasible', String(optimisation.feasibleCandidates)],
        ['Converged', optimisation.converged ? 'yes' : 'no'],
        ['Iterations', String(optimisation.iterations.length)],
      ],
      2,
    ),
  );
  content.push(paragraph(optimisation.message));
  if (optimisation.iterations.length > 0) {
    content.push(
      table(
        [headerCell('Iteration', 'right'), headerCell('Sections chosen'), headerCell('Mass [kg]', 'right'), headerCell('Max utilisation', 'right')],
        optimisation.iterations.map((step) => [
          numberCell(String(step.iteration)),
          Object.entries(step.choice)
            .map(([group, section]) => `${group}: ${section}`)
            .join('; '),
          numberCell(formatMass(step.mass).replace(' kg', '')),
          utilisationCell(step.maxUtilisation),
        ]),
        [44, '*', 60, 60],
      ),
    );
    content.push(caption('The forces depend on the stiffness of the chosen sections; the design re-analyses until the choice repeats.'));
  }
  return content;
}

// ----------------------------------------------------------------------------------------------
// Section 7: trace of the governing cases

function valuesTable(title: string, values: Record<string, number>): PdfNode {
  const entries = Object.entries(values);
  return {
    table: {
      headerRows: 1,
      widths: ['*', 'auto', 'auto'],
      body: [
        [headerCell(title), headerCell('Value', 'right'), headerCell('Unit')],
        ...(entries.length === 0
          ? [[{ text: 'none recorded', italics: true, colSpan: 3 }, '', '']]
          : entries.map(([name, value]) => {
              const [text, unit] = formatTraceValue(name, value);
              return [{ text: name, style: 'mono' }, numberCell(text), unit];
            })),
      ],
    },
    layout: gridLayout,
    style: 'table',
  };
}

function positionText(position: GoverningCase['position']): string {
  return `${position.description}: element ${position.element}, x = ${formatLengthM(position.x)} from its first node, θ = ${formatAngle(position.angle)}`;
}

function memberTrace(result: DesignResult, member: MemberResult, index: number): PdfContent[] {
  const governing = member.governing;
  const scenario = scenarioById(result, governing.scenario);
  const expression = combinationExpression(result, governing.combination);
  const rows: UtilisationRow[] = result.utilisations.filter((row) => row.member === member.id);
  return [
    // The heading and the member's summary are kept together on one page.
    {
      stack: [
        figureHeading(`7.${index} Member ${member.id}: ${member.section}, ${member.grade}`),
        keyValueTable([
          ['Member', `${member.id}, ${member.description}`],
          ['Section and grade', `${member.section}, ${member.grade}, ${formatNumber(member.massPerLength)} kg/m, ${formatNumber(member.length)} m`],
          ['Governing utilisation', utilisationCell(member.utilisation, 'left')],
          ['Check', `${governing.title} (${governing.check})`],
          ['Clause', governing.clause],
          ['Combination', expression === undefined ? governing.combination : `${governing.combination}: ${expression}`],
          ['Scenario', scenario === undefined ? governing.scenario : `${scenario.title}${scenario.credible ? '' : ' (comparison only)'}`],
          ['Position', positionText(governing.position)],
        ]),
      ],
      unbreakable: true,
    },
    {
      columns: [valuesTable('Formula inputs', governing.inputs), valuesTable('Intermediate values', governing.intermediate)],
      columnGap: 10,
      margin: [0, 4, 0, 4],
    },
    caption(
      'Formula inputs and intermediate values in engineering units (forces kN, moments kNm, bimoment kNm², stresses MPa, section constants in cm units); a value without a unit is a ratio, a factor or a count.',
    ),
    ...(rows.length === 0
      ? []
      : [
          table(
          [headerCell('Check'), headerCell('Clause'), headerCell('Combination'), headerCell('Scenario'), headerCell('Position'), headerCell('Utilisation', 'right')],
            rows.map((row) => [
              { text: row.check, style: 'mono' },
              row.clause,
              row.combination,
              scenarioTitle(result, row.scenario),
              row.note === undefined
                ? `${row.position.description} (θ = ${formatAngle(row.position.angle)})`
                : { text: [`${row.position.description} (θ = ${formatAngle(row.position.angle)}). `, { text: row.note, italics: true }] },
              utilisationCell(row.utilisation),
            ]),
          [80, 70, 44, '*', 110, 44],
          ),
        ]),
  ];
}

function traceSection(result: DesignResult): PdfContent[] {
  const content: PdfContent[] = [
    heading('7 Trace of the governing cases'),
    paragraph(
      'For each member: the check that governs its section, the clause, the combination and support scenario in which it ' +
        'governs, the position on the girder, and the inputs and intermediate values of the formula; then every check of the member.',
    ),
  ];
  result.members.forEach((member, i) => content.push(...memberTrace(result, member, i + 1)));
  return content;
}

// ----------------------------------------------------------------------------------------------

/** The pdfmake document definition of the report (exposed for tests and for reuse by other reports). */
/** Text styles shared by the calculation report and the comparison report. */
export const REPORT_STYLES: PdfDocumentDefinition['styles'] = {
  kicker: { fontSize: 9, color: colours.muted, margin: [0, 0, 0, 2] },
  title: { fontSize: 18, bold: true, color: colours.heading, margin: [0, 0, 0, 2] },
  subtitle: { fontSize: 11, color: colours.muted, margin: [0, 0, 0, 10] },
  h1: { fontSize: 13, bold: true, color: colours.heading, margin: [0, 14, 0, 6] },
  h2: { fontSize: 10, bold: true, color: colours.heading, margin: [0, 10, 0, 4] },
  body: { fontSize: 9, margin: [0, 0, 0, 6], alignment: 'justify' },
  caption: { fontSize: 7.5, italics: true, color: colours.muted, margin: [0, 2, 0, 8] },
  caution: { fontSize: 9.5, margin: [0, 1, 0, 1] },
  table: { fontSize: 8, margin: [0, 2, 0, 6] },
  tableHeader: { bold: true, fontSize: 7.5, fillColor: colours.headerFill },
  mono: { fontSize: 7.5 },
  pageHeader: { fontSize: 7.5, color: colours.muted },
  pageFooter: { fontSize: 7.5, color: colours.muted },
};

export async function designPdfDefinition(result: DesignResult, options: ReportOptions = {}): Promise<PdfDocumentDefinition> {
  const date = issueDate(result, options);
  const content: PdfContent[] = [
    ...titleBlock(result, date.text),
    ...scopeSection(result),
    { text: '', pageBreak: 'after' },
    ...inputsSection(result),
    ...(await loadsSection(result)),
    ...supportSection(result),
    ...(await analysisSection(result)),
    ...(await sectionChoice(result)),
    ...traceSection(result),
  ];
  const reference = result.project.reference;
  return {
    content,
    pageSize: 'A4',
    pageMargins,
    info: {
      title: `Calculation report: ${result.project.name}`,
      author: result.project.designer,
      subject: `Support girder design, ${reference}`,
      creator: `${result.tool.name} ${result.tool.version}`,
      producer: `${result.tool.name} ${result.tool.version}`,
      creationDate: date.metadata,
      modDate: date.metadata,
    },
    header: (currentPage: number) =>
      currentPage === 1
        ? ''
        : {
            columns: [
              { text: `${result.project.name}`, style: 'pageHeader' },
              { text: `${reference}${date.text === undefined ? '' : `, ${date.text}`}`, style: 'pageHeader', alignment: 'right' },
            ],
            margin: [pageMargins[0], 28, pageMargins[2], 0],
          },
    footer: (currentPage: number, pageCount: number) => ({
      columns: [
        { text: `${result.tool.name} ${result.tool.version}: first-pass design, to be verified by a qualified engineer`, style: 'pageFooter' },
        { text: `page ${currentPage} of ${pageCount}`, style: 'pageFooter', alignment: 'right' },
      ],
      margin: [pageMargins[0], 16, pageMargins[2], 0],
    }),
    // Keep a heading with what follows it: move it to the next page when nothing but headings
    // follows it on its own page.
    // Also move a heading that starts in the last eighth of a page: too little room for what it heads.
    pageBreakBefore: (node, helpers) =>
      node.headlineLevel !== undefined &&
      (helpers.getFollowingNodesOnPage().every((next) => next.headlineLevel !== undefined) || (node.startPosition.verticalRatio ?? 0) > 0.875),
    defaultStyle: { font: 'Roboto', fontSize: 8.5, lineHeight: 1.15 },
    styles: REPORT_STYLES,
  };
}

export async function renderDesignPdf(result: DesignResult, options: ReportOptions = {}): Promise<Buffer> {
  return renderPdfDefinition(await designPdfDefinition(result, options));
}

/** Render the report, then write it atomically: a failed render leaves any existing file untouched. */
export async function writeDesignPdf(result: DesignResult, path: string, options: ReportOptions = {}): Promise<void> {
  const bytes = await renderDesignPdf(result, options);
  await atomicWrite(path, bytes);
}
