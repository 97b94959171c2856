// Charts of the report, as vega-lite specifications compiled to vega and rendered headless to SVG
// (no canvas, no browser). The SVG is embedded in the PDF as vector graphics. All values are converted
// to display units here; the specifications carry only our own colours and layout.
import { parse, View } from 'vega';
import { compile } from 'vega-lite';
import type { TopLevelSpec } from 'vega-lite';
import type { AnalysisSummary, DesignResult, PressureProfile, UtilisationRow } from '@binsupport/design';
import { toDegrees, toKilonewtonMetres, toKilonewtonSquareMetres, toKilonewtons, toKilopascals } from './units.js';
import { columnAngles, utilisationBand, UTILISATION_RED } from './report-data.js';
import type { BearingPanel, UtilisationBand } from './report-data.js';

/** Series colours: our own, chosen to stay distinct in greyscale print. */
export const SERIES_COLOURS = ['#1b4f72', '#b9770e', '#1e8449', '#7d3c98', '#a93226', '#5d6d7e'];

export const BAND_COLOURS: Record<UtilisationBand, string> = {
  adequate: '#4a7c59',
  'near limit': '#d4a017',
  exceeded: '#b03a2e',
  'not evaluated': '#9aa5b1',
};

const chartConfig = {
  font: 'Roboto',
  background: 'white',
  view: { stroke: '#9aa5b1' },
  axis: { labelFontSize: 9, titleFontSize: 9, titleFontWeight: 'normal', gridColor: '#e3e7eb', tickColor: '#9aa5b1', domainColor: '#5d6d7e' },
  legend: { labelFontSize: 9, titleFontSize: 9, titleFontWeight: 'normal', orient: 'bottom', direction: 'horizontal', labelLimit: 320 },
  header: { labelFontSize: 9, titleFontSize: 9 },
  title: { fontSize: 10, fontWeight: 'normal', anchor: 'start' },
} as const;

/** Compile and render one vega-lite specification to an SVG string. */
export async function renderChartSvg(spec: TopLevelSpec): Promise<string> {
  const vegaSpec = compile(spec).spec;
  const view = new View(parse(vegaSpec), { renderer: 'none' });
  try {
    return await view.toSVG();
  } finally {
    view.finalize();
  }
}

const dashPatterns: number[][] = [[1, 0], [6, 3], [2, 2], [8, 2, 2, 2]];

const pressureQuantities = [
  { key: 'ph', label: 'p_h horizontal' },
  { key: 'pw', label: 'p_w wall friction' },
  { key: 'pv', label: 'p_v vertical (in the solid)' },
] as const;

interface PressurePoint {
  z: number;
  pressure: number;
  quantity: string;
  loadCase: string;
  part: PressureProfile['part'];
}

/** Pressure against depth for every profile; depth grows downward as in the bin. */
export function pressureChartSpec(profiles: PressureProfile[]): TopLevelSpec {
  const values: PressurePoint[] = [];
  const loadCases: string[] = [];
  for (const profile of profiles) {
    if (!loadCases.includes(profile.case)) {
      loadCases.push(profile.case);
    }
    for (const quantity of pressureQuantities) {
      const series = profile[quantity.key];
      profile.z.forEach((z, i) => {
        const pressure = series[i];
        if (pressure !== undefined) {
          values.push({ z, pressure: toKilopascals(pressure), quantity: quantity.label, loadCase: profile.case, part: profile.part });
        }
      });
    }
  }
  return {
    $schema: 'https://vega.github.io/schema/vega-lite/v6.json',
    config: chartConfig,
    width: 330,
    height: 300,
    data: { values },
    mark: { type: 'line', strokeWidth: 1.4 },
    encoding: {
      x: { field: 'pressure', type: 'quantitative', title: 'Pressure [kPa]', axis: { orient: 'top' } },
      y: { field: 'z', type: 'quantitative', title: 'Depth below the equivalent surface z [m]', scale: { reverse: true, zero: true } },
      color: {
        field: 'quantity',
        type: 'nominal',
        title: 'Quantity',
        sort: pressureQuantities.map((q) => q.label),
        scale: { domain: pressureQuantities.map((q) => q.label), range: SERIES_COLOURS.slice(0, 3) },
        legend: { orient: 'right', direction: 'vertical', symbolStrokeWidth: 2 },
      },
      strokeDash: {
        field: 'loadCase',
        type: 'nominal',
        title: 'Load case',
        sort: loadCases,
        // The first case solid, the others dashed and dotted in turn.
        scale: { domain: loadCases, range: loadCases.map((_, i) => dashPatterns[i % dashPatterns.length] ?? [1, 0]) },
        legend: { orient: 'right', direction: 'vertical', symbolStrokeWidth: 1.5 },
      },
      detail: { field: 'part', type: 'nominal' },
      order: { field: 'z', type: 'quantitative' },
    },
  };
}

const diagramQuantities = [
  { key: 'My', label: 'My [kNm]', convert: toKilonewtonMetres },
  { key: 'T', label: 'T [kNm]', convert: toKilonewtonMetres },
  { key: 'B', label: 'B [kNm²]', convert: toKilonewtonSquareMetres },
] as const;

interface DiagramPoint {
  angle: number;
  value: number;
  quantity: string;
  scenario: string;
  model: string;
}

/** Column positions in degrees, for rules and axis labels: C1 at 0 degrees, counter-clockwise. */
export function columnMarks(columns: number): Array<{ angle: number; label: string }> {
  return columnAngles(columns).map((angle, j) => ({ angle: toDegrees(angle), label: `C${j + 1}` }));
}

/**
 * Bending moment My, torsion T and bimoment B around the girder for one combination, one line per
 * support scenario (credible scenarios solid, comparison-only scenarios dashed), with a vertical
 * rule at each column and the columns named on the position axis.
 */
export function forceDiagramSpec(result: DesignResult, combination: string): TopLevelSpec {
  const analyses: AnalysisSummary[] = result.analyses.filter((a) => a.combination === combination);
  const values: DiagramPoint[] = [];
  const scenarioTitles: string[] = [];
  for (const analysis of analyses) {
    const diagram = analysis.diagram;
    if (!diagram) continue;
    const scenario = result.scenarios.find((s) => s.id === analysis.scenario);
    // The short id keeps the legend on one line; section 4 of the report lists id and title together.
    const title = analysis.scenario;
    if (!scenarioTitles.includes(title)) {
      scenarioTitles.push(title);
    }
    const model = scenario?.credible === true ? 'design envelope' : 'comparison only';
    for (const quantity of diagramQuantities) {
      const series = diagram[quantity.key];
      diagram.angle.forEach((angle, i) => {
        const value = series[i];
        if (value !== undefined) {
          values.push({ angle: toDegrees(angle), value: quantity.convert(value), quantity: quantity.label, scenario: title, model });
        }
      });
    }
  }
  return {
    $schema: 'https://vega.github.io/schema/vega-lite/v6.json',
    config: chartConfig,
    data: { values },
    facet: {
      row: {
        field: 'quantity',
        type: 'nominal',
        sort: diagramQuantities.map((q) => q.label),
        title: null,
        header: { labelAngle: 0, labelAlign: 'left', labelAnchor: 'start', labelOrient: 'top', labelFontSize: 9, labelFontWeight: 'bold', labelPadding: 3 },
      },
    },
    spacing: 8,
    resolve: { scale: { y: 'independent' } },
    spec: {
      width: 420,
      height: 66,
      layer: [
        { mark: { type: 'rule', color: '#5d6d7e', strokeWidth: 0.6 }, encoding: { y: { datum: 0, type: 'quantitative' } } },
        ...columnMarks(result.girder.columns).map((column) => ({
          mark: { type: 'rule' as const, color: '#9aa5b1', strokeWidth: 0.7, strokeDash: [2, 2] },
          encoding: { x: { datum: column.angle, type: 'quantitative' as const } },
        })),
        {
          mark: { type: 'line', strokeWidth: 1.3 },
          encoding: {
            x: {
              field: 'angle',
              type: 'quantitative',
              title: 'Position around the bin θ [°] (from +X, counter-clockwise seen from above); dotted rules: columns C1...Cn',
              scale: { domain: [0, 360], nice: false },
              axis: columnAxis(result.girder.columns),
            },
            y: { field: 'value', type: 'quantitative', title: null },
            color: {
              field: 'scenario',
              type: 'nominal',
              title: 'Scenario',
              legend: { symbolStrokeWidth: 2 },
              sort: scenarioTitles,
              scale: { domain: scenarioTitles, range: SERIES_COLOURS.slice(0, Math.max(1, scenarioTitles.length)) },
            },
            strokeDash: {
              field: 'model',
              type: 'nominal',
              title: null,
              legend: null,
              scale: { domain: ['design envelope', 'comparison only'], range: [[1, 0], [5, 3]] },
            },
            order: { field: 'angle', type: 'quantitative' },
          },
        },
      ],
    },
  };
}

/**
 * The position axis: at the columns (labelled with the column and its angle) when they are few enough
 * to label, else every 30 degrees.
 */
function columnAxis(columns: number): { values: number[]; labelExpr?: string; labelFontSize?: number; labelOverlap?: boolean; labelFlush?: boolean } {
  if (columns > 12) return { values: Array.from({ length: 13 }, (_, i) => 30 * i) };
  const marks = columnMarks(columns);
  const values = [...marks.map((m) => m.angle), 360];
  // Column j+1 at 360 j / n; 360 degrees is C1 again.
  const step = 360 / columns;
  return { values, labelExpr: `'C' + (round(datum.value / ${step}) % ${columns} + 1) + ' ' + format(datum.value, '.4~') + '°'`, labelFontSize: 7.5, labelOverlap: false, labelFlush: true };
}

/** One bar of a bearing chart: the force of one bearing point, kN (compression positive). */
export interface BearingBar {
  panel: string;
  point: number;
  /** Position label across the flange: 1 (inside) ... n (outside). */
  position: string;
  force: number;
  state: 'in contact' | 'lift-off' | 'tension';
  text: string;
}

/** The title of a bearing panel: scenario and combination (the column cap is named in the sentence below). */
export function bearingPanelTitle(panel: BearingPanel): string {
  return `${panel.scenario.id}, ${panel.combination}${panel.role === 'least contact' ? ', least contact' : ''}`;
}

/** Bars of the bearing-point forces of the most loaded column of each panel, inside to outside. */
export function bearingBars(panels: BearingPanel[]): BearingBar[] {
  return panels.flatMap((panel) => {
    const forces = panel.bearings.mostLoadedColumn.forces;
    return forces.map((force, i): BearingBar => {
      const value = toKilonewtons(force);
      // Forces are compression positive: zero is a point that lifted off, below zero one that pulls.
      const state = force > 0 ? 'in contact' : force < 0 ? 'tension' : 'lift-off';
      const position = i === 0 ? `${i + 1} inside` : i === forces.length - 1 ? `${i + 1} outside` : String(i + 1);
      return { panel: bearingPanelTitle(panel), point: i + 1, position, force: value, state, text: state === 'lift-off' ? 'lift-off' : value.toFixed(1) };
    });
  });
}

export const BEARING_COLOURS: Record<BearingBar['state'], string> = { 'in contact': '#1b4f72', 'lift-off': '#9aa5b1', tension: '#a93226' };

/** Bearing-point forces across the flange, one panel per scenario; lift-off is a zero bar, tension red. */
export function bearingChartSpec(panels: BearingPanel[]): TopLevelSpec {
  const bars = bearingBars(panels);
  const states: Array<BearingBar['state']> = ['in contact', 'lift-off', 'tension'];
  const positions = [...new Set(bars.map((bar) => bar.position))];
  const titles = panels.map(bearingPanelTitle);
  // Room above the tallest bar (and below the deepest) for its value.
  const top = Math.max(0, ...bars.map((bar) => bar.force));
  const bottom = Math.min(0, ...bars.map((bar) => bar.force));
  const domain = [bottom * 1.2, Math.max(top * 1.18, 1e-3)];
  return {
    $schema: 'https://vega.github.io/schema/vega-lite/v6.json',
    config: chartConfig,
    data: { values: bars },
    facet: { field: 'panel', type: 'nominal', title: null, sort: titles, header: { labelFontSize: 8.5, labelFontWeight: 'bold', labelLimit: 0 } },
    columns: 2,
    spacing: { column: 16, row: 10 },
    resolve: { scale: { y: 'shared' } },
    spec: {
      width: 200,
      height: 110,
      layer: [
        {
          mark: { type: 'bar', width: 16 },
          encoding: {
            x: { field: 'position', type: 'ordinal', sort: positions, title: 'Bearing point across the flange, inside to outside', axis: { labelAngle: 0 } },
            y: { field: 'force', type: 'quantitative', title: 'Force, compression + [kN]', scale: { domain, nice: false } },
            color: { field: 'state', type: 'nominal', title: 'Bearing point', scale: { domain: states, range: states.map((state) => BEARING_COLOURS[state]) } },
          },
        },
        { mark: { type: 'rule', color: '#5d6d7e', strokeWidth: 0.6 }, encoding: { y: { datum: 0, type: 'quantitative' } } },
        // Values above a pressing bar, below a pulling one.
        ...[
          { filter: 'datum.force >= 0', dy: -3, baseline: 'bottom' as const },
          { filter: 'datum.force < 0', dy: 3, baseline: 'top' as const },
        ].map((side) => ({
          transform: [{ filter: side.filter }],
          mark: { type: 'text' as const, dy: side.dy, fontSize: 7.5, baseline: side.baseline },
          encoding: {
            x: { field: 'position', type: 'ordinal' as const, sort: positions },
            y: { field: 'force', type: 'quantitative' as const },
            text: { field: 'text', type: 'nominal' as const },
          },
        })),
      ],
    },
  };
}

interface UtilisationBar {
  label: string;
  /** The bar's length; 0 for a check that recorded no number (band 'not evaluated'). */
  utilisation: number;
  band: UtilisationBand;
  text: string;
}

/**
 * The largest utilisation of each (member, check) over all rows, in the order they first appear. A
 * check that recorded no number in any row is kept as a 'not evaluated' bar of zero length.
 */
export function utilisationBars(rows: UtilisationRow[], format: (u: number | null) => string): UtilisationBar[] {
  const byKey = new Map<string, UtilisationBar>();
  for (const row of rows) {
    const label = `${row.member} (${row.section}): ${row.check}`;
    const previous = byKey.get(label);
    const evaluated = previous !== undefined && previous.band !== 'not evaluated';
    if (row.utilisation === null) {
      if (previous === undefined) {
        byKey.set(label, { label, utilisation: 0, band: 'not evaluated', text: format(null) });
      }
    } else if (!evaluated || previous === undefined || row.utilisation > previous.utilisation) {
      byKey.set(label, { label, utilisation: row.utilisation, band: utilisationBand(row.utilisation), text: format(row.utilisation) });
    }
  }
  return [...byKey.values()];
}

export function utilisationChartSpec(bars: UtilisationBar[]): TopLevelSpec {
  const top = bars.reduce((max, bar) => Math.max(max, bar.utilisation), 0);
  const domainMax = Math.max(1.2, Math.ceil(top * 10 + 0.5) / 10);
  const bands: UtilisationBand[] = ['adequate', 'near limit', 'exceeded', 'not evaluated'];
  return {
    $schema: 'https://vega.github.io/schema/vega-lite/v6.json',
    config: chartConfig,
    width: 300,
    height: { step: 16 },
    data: { values: bars },
    layer: [
      {
        mark: { type: 'bar', height: 11 },
        encoding: {
          y: { field: 'label', type: 'nominal', title: null, sort: bars.map((b) => b.label), axis: { labelLimit: 260 } },
          x: { field: 'utilisation', type: 'quantitative', title: 'Utilisation [-]', scale: { domain: [0, domainMax], nice: false } },
          color: { field: 'band', type: 'nominal', title: 'Band', scale: { domain: bands, range: bands.map((b) => BAND_COLOURS[b]) } },
        },
      },
      {
        mark: { type: 'rule', color: BAND_COLOURS.exceeded, strokeDash: [4, 2], strokeWidth: 1 },
        encoding: { x: { datum: UTILISATION_RED, type: 'quantitative' } },
      },
      // Drawn last, on a white halo, so a value next to the limit line stays legible.
      {
        mark: { type: 'text', align: 'left', dx: 3, fontSize: 8, stroke: 'white', strokeWidth: 3, strokeOpacity: 0.9 },
        encoding: {
          y: { field: 'label', type: 'nominal', sort: bars.map((b) => b.label) },
          x: { field: 'utilisation', type: 'quantitative' },
          text: { field: 'text', type: 'nominal' },
        },
      },
      {
        mark: { type: 'text', align: 'left', dx: 3, fontSize: 8 },
        encoding: {
          y: { field: 'label', type: 'nominal', sort: bars.map((b) => b.label) },
          x: { field: 'utilisation', type: 'quantitative' },
          text: { field: 'text', type: 'nominal' },
        },
      },
    ],
  };
}
