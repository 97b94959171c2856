// pdfmake 0.3 in Node, locked down: no URL is ever fetched, and the only local files it may read are
// the Roboto fonts shipped with pdfmake. pdfmake has no type declarations of its own, so the part of
// its document model this package uses is typed here.
import { createRequire } from 'node:module';
import { realpathSync } from 'node:fs';
import { dirname, isAbsolute, join, relative, resolve } from 'node:path';

export type PdfContent = string | PdfNode | PdfContent[];

export type PdfMargin = number | [number, number] | [number, number, number, number];

export interface PdfTable {
  body: PdfContent[][];
  widths?: Array<number | string>;
  headerRows?: number;
  dontBreakRows?: boolean;
  keepWithHeaderRows?: number;
}

export interface PdfTableLayout {
  hLineWidth?: (i: number, node: { table: { body: unknown[][] } }) => number;
  vLineWidth?: (i: number, node: { table: { widths: unknown[] } }) => number;
  hLineColor?: (i: number) => string;
  vLineColor?: (i: number) => string;
  paddingLeft?: (i: number) => number;
  paddingRight?: (i: number) => number;
  paddingTop?: (i: number) => number;
  paddingBottom?: (i: number) => number;
  fillColor?: (rowIndex: number) => string | null;
}

export interface PdfSvgOptions {
  /** svg-to-pdfkit: resolves an <image> link; ours refuses anything but inline data. */
  imageCallback?: (link: string) => string;
  warningCallback?: (message: string) => void;
}

export interface PdfNode {
  text?: PdfContent;
  stack?: PdfContent[];
  columns?: PdfContent[];
  ul?: PdfContent[];
  ol?: PdfContent[];
  table?: PdfTable;
  layout?: string | PdfTableLayout;
  svg?: string;
  image?: string;
  options?: PdfSvgOptions;
  style?: string | string[];
  bold?: boolean;
  italics?: boolean;
  fontSize?: number;
  color?: string;
  fillColor?: string;
  alignment?: 'left' | 'right' | 'center' | 'justify';
  margin?: PdfMargin;
  width?: number | string;
  height?: number;
  fit?: [number, number];
  colSpan?: number;
  rowSpan?: number;
  noWrap?: boolean;
  pageBreak?: 'before' | 'after';
  unbreakable?: boolean;
  headlineLevel?: number;
  lineHeight?: number;
  characterSpacing?: number;
  preserveLeadingSpaces?: boolean;
  columnGap?: number;
  border?: [boolean, boolean, boolean, boolean];
  id?: string;
}

export interface PdfStyle {
  fontSize?: number;
  bold?: boolean;
  italics?: boolean;
  color?: string;
  fillColor?: string;
  margin?: PdfMargin;
  alignment?: 'left' | 'right' | 'center' | 'justify';
  lineHeight?: number;
}

export interface PdfDocumentDefinition {
  content: PdfContent;
  pageSize?: string;
  pageOrientation?: 'portrait' | 'landscape';
  pageMargins?: PdfMargin;
  header?: (currentPage: number, pageCount: number) => PdfContent;
  footer?: (currentPage: number, pageCount: number) => PdfContent;
  styles?: Record<string, PdfStyle>;
  defaultStyle?: PdfStyle & { font?: string };
  images?: Record<string, string>;
  info?: { title?: string; author?: string; subject?: string; keywords?: string; creator?: string; producer?: string; creationDate?: Date; modDate?: Date };
  language?: string;
  compress?: boolean;
  /**
   * Called for every node after layout; returning true moves the node to a new page and lays the
   * document out again. Never mark a node inside an `unbreakable` block with `headlineLevel`: a break
   * inside such a block moves its content to a second page that pdfmake then drops.
   */
  pageBreakBefore?: (node: PdfLaidOutNode, helpers: PdfPageBreakHelpers) => boolean;
}

export interface PdfLaidOutNode {
  headlineLevel?: number;
  text?: unknown;
  pageNumbers: number[];
  /** `verticalRatio` is how far down its page the node starts (0..1). */
  startPosition: { top: number; verticalRatio?: number };
}

export interface PdfPageBreakHelpers {
  getFollowingNodesOnPage: () => PdfLaidOutNode[];
  getNodesOnNextPage: () => PdfLaidOutNode[];
  getPreviousNodesOnPage: () => PdfLaidOutNode[];
}

interface FontFiles {
  normal: string;
  bold: string;
  italics: string;
  bolditalics: string;
}

interface PdfMakeOutput {
  getBuffer(): Promise<Buffer>;
}

interface PdfMakeServer {
  setFonts(fonts: Record<string, FontFiles>): void;
  setUrlAccessPolicy(policy: (url: string) => boolean): void;
  setLocalAccessPolicy(policy: (path: string) => boolean): void;
  createPdf(definition: PdfDocumentDefinition, options?: Record<string, never>): PdfMakeOutput;
}

const requireCommonJs = createRequire(import.meta.url);

/** The folder of the Roboto TrueType files shipped with pdfmake (real path, symlinks resolved). */
export function robotoFolder(): string {
  const pdfmakeRoot = dirname(requireCommonJs.resolve('pdfmake/package.json'));
  return realpathSync(join(pdfmakeRoot, 'fonts', 'Roboto'));
}

/** True only for a path that resolves inside `folder` (after `..` and symlinks). */
export function isInsideFolder(path: string, folder: string): boolean {
  let real: string;
  try {
    real = realpathSync(resolve(path));
  } catch {
    real = resolve(path);
  }
  const rel = relative(folder, real);
  return rel !== '' && !rel.startsWith('..') && !isAbsolute(rel);
}

function fontFiles(folder: string): FontFiles {
  // Roboto ships without a Bold face; Medium is the weight pdfmake's own examples use for bold.
  return {
    normal: join(folder, 'Roboto-Regular.ttf'),
    bold: join(folder, 'Roboto-Medium.ttf'),
    italics: join(folder, 'Roboto-Italic.ttf'),
    bolditalics: join(folder, 'Roboto-MediumItalic.ttf'),
  };
}

let engine: PdfMakeServer | undefined;

function pdfmake(): PdfMakeServer {
  if (engine === undefined) {
    engine = requireCommonJs('pdfmake') as PdfMakeServer;
  }
  return engine;
}

/** svg-to-pdfkit opens <image> links itself, past pdfmake's policy; refuse all but inline data. */
export function refuseSvgImageLink(link: string): string {
  if (/^data:image\/(png|jpeg);base64,/i.test(link.trim())) {
    return link.trim();
  }
  throw new Error(`Access denied: an SVG image may not refer to "${link}"`);
}

/** An `svg` node that cannot reach files or URLs. */
export function svgNode(svg: string, width: number, margin: PdfMargin = [0, 4, 0, 8]): PdfNode {
  return {
    svg,
    width,
    margin,
    alignment: 'center',
    options: {
      imageCallback: refuseSvgImageLink,
      warningCallback: (message: string) => {
        throw new Error(`SVG not rendered as drawn: ${message}`);
      },
    },
  };
}

/**
 * Lay out and render a document definition to PDF bytes. pdfmake keeps its settings on one shared
 * instance; they are set again before every document (synchronously, right before createPdf reads
 * them), always to the same values, so concurrent renders cannot see different policies.
 */
export async function renderPdfDefinition(definition: PdfDocumentDefinition): Promise<Buffer> {
  const folder = robotoFolder();
  const printer = pdfmake();
  printer.setFonts({ Roboto: fontFiles(folder) });
  printer.setUrlAccessPolicy(() => false);
  printer.setLocalAccessPolicy((path: string) => isInsideFolder(path, folder));
  return printer.createPdf(definition).getBuffer();
}
