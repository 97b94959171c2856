// Plan of the support layout, drawn as SVG by hand (a vega chart has no use for a true-scale circle):
// the ring at its radius, the columns at 2 pi j / n from +X labelled C1...Cn counter-clockwise seen
// from above, and the governing position of each member. Plan +Y is drawn up the page, so the SVG y
// coordinate is the negated plan Y.
import type { DesignResult } from '@binsupport/design';
import { SERIES_COLOURS } from './charts.js';
import { columnAngles } from './report-data.js';
import { formatLengthM, formatUtilisation } from './units.js';

/** A member's marker on the plan. */
export interface PlanMarker {
  member: string;
  angle: number;
  colour: string;
  /** Where the marker is drawn, in SVG coordinates. */
  x: number;
  y: number;
}

/** The drawing's geometry, exposed so that tests can check positions without parsing the SVG. */
export interface SupportPlan {
  svg: string;
  width: number;
  height: number;
  centre: { x: number; y: number };
  /** Drawn radius of the girder axis, SVG units. */
  ringRadius: number;
  columns: Array<{ label: string; angle: number; x: number; y: number }>;
  markers: PlanMarker[];
}

const ink = '#1b4f72';
const muted = '#5d6d7e';
const font = 'font-family="Roboto" font-size="9"';

function fixed(value: number): string {
  // Two decimals keep the SVG deterministic and small.
  return (Math.round(value * 100) / 100).toFixed(2);
}

function escapeXml(text: string): string {
  return text.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');
}

/** The plan of the girder and its columns, with the governing position of every member. */
export function supportPlan(result: DesignResult): SupportPlan {
  const width = 420;
  const height = 330;
  const centre = { x: 200, y: 165 };
  const ringRadius = 120;
  const point = (angle: number, r: number): { x: number; y: number } => ({ x: centre.x + r * Math.cos(angle), y: centre.y - r * Math.sin(angle) });
  const parts: string[] = [];
  parts.push(`<svg xmlns="http://www.w3.org/2000/svg" width="${width}" height="${height}" viewBox="0 0 ${width} ${height}">`);
  parts.push(`<rect x="0" y="0" width="${width}" height="${height}" fill="white"/>`);
  // Centre lines through the bin axis, inside the ring.
  const inside = ringRadius - 12;
  parts.push(`<line x1="${fixed(centre.x - inside)}" y1="${fixed(centre.y)}" x2="${fixed(centre.x + inside)}" y2="${fixed(centre.y)}" stroke="${muted}" stroke-width="0.5" stroke-dasharray="6 2 1 2"/>`);
  parts.push(`<line x1="${fixed(centre.x)}" y1="${fixed(centre.y + inside)}" x2="${fixed(centre.x)}" y2="${fixed(centre.y - inside)}" stroke="${muted}" stroke-width="0.5" stroke-dasharray="6 2 1 2"/>`);
  // Orientation key in the lower left corner: +X to the right, +Y up, theta counter-clockwise.
  const key = { x: 22, y: height - 22 };
  const keyLength = 42;
  parts.push(`<line x1="${key.x}" y1="${key.y}" x2="${key.x + keyLength}" y2="${key.y}" stroke="${muted}" stroke-width="0.8"/>`);
  parts.push(`<line x1="${key.x}" y1="${key.y}" x2="${key.x}" y2="${key.y - keyLength}" stroke="${muted}" stroke-width="0.8"/>`);
  parts.push(`<path d="M ${key.x + keyLength + 6} ${key.y} l -7 -3 l 0 6 z" fill="${muted}"/>`);
  parts.push(`<path d="M ${key.x} ${key.y - keyLength - 6} l -3 7 l 6 0 z" fill="${muted}"/>`);
  parts.push(`<text x="${key.x + keyLength + 9}" y="${key.y + 3}" ${font} fill="${muted}">+X (θ = 0°)</text>`);
  parts.push(`<text x="${key.x + 5}" y="${key.y - keyLength - 1}" ${font} fill="${muted}">+Y (θ = 90°)</text>`);
  // The sense of theta: an arc from +X toward +Y round the key's origin.
  const arcRadius = 22;
  const arcEnd = { x: key.x + arcRadius * Math.cos(Math.PI / 3), y: key.y - arcRadius * Math.sin(Math.PI / 3) };
  parts.push(`<path d="M ${fixed(key.x + arcRadius)} ${fixed(key.y)} A ${arcRadius} ${arcRadius} 0 0 0 ${fixed(arcEnd.x)} ${fixed(arcEnd.y)}" fill="none" stroke="${muted}" stroke-width="0.8"/>`);
  // Arrow head along the counter-clockwise tangent (-sin a, cos a) in plan, (-sin a, -cos a) on the page.
  const tangent = { x: -Math.sin(Math.PI / 3), y: -Math.cos(Math.PI / 3) };
  const back = { x: arcEnd.x - 7 * tangent.x, y: arcEnd.y - 7 * tangent.y };
  parts.push(
    `<path d="M ${fixed(arcEnd.x)} ${fixed(arcEnd.y)} L ${fixed(back.x - 3 * tangent.y)} ${fixed(back.y + 3 * tangent.x)} L ${fixed(back.x + 3 * tangent.y)} ${fixed(back.y - 3 * tangent.x)} Z" fill="${muted}"/>`,
  );
  parts.push(`<text x="${fixed(key.x + arcRadius + 3)}" y="${fixed(key.y - 9)}" ${font} fill="${muted}">θ</text>`);
  // The girder axis.
  parts.push(`<circle cx="${fixed(centre.x)}" cy="${fixed(centre.y)}" r="${ringRadius}" fill="none" stroke="${ink}" stroke-width="3.5"/>`);
  // Radius dimension, drawn at 225 degrees where no column label sits for the usual column counts.
  const dimensionAngle = (5 * Math.PI) / 4 + Math.PI / (2 * result.girder.columns);
  const dimensionEnd = point(dimensionAngle, ringRadius - 3);
  parts.push(`<line x1="${fixed(centre.x)}" y1="${fixed(centre.y)}" x2="${fixed(dimensionEnd.x)}" y2="${fixed(dimensionEnd.y)}" stroke="${muted}" stroke-width="0.6"/>`);
  const dimensionLabel = point(dimensionAngle, ringRadius * 0.55);
  parts.push(`<text x="${fixed(dimensionLabel.x - 4)}" y="${fixed(dimensionLabel.y)}" ${font} fill="${muted}" text-anchor="end">R = ${escapeXml(formatLengthM(result.girder.radius))}</text>`);
  // Columns: a square on the ring, turned to the radial direction, and its label outside.
  const columns = columnAngles(result.girder.columns).map((angle, j) => {
    const at = point(angle, ringRadius);
    return { label: `C${j + 1}`, angle, x: at.x, y: at.y };
  });
  for (const column of columns) {
    const degrees = (-column.angle * 180) / Math.PI;
    parts.push(`<rect x="-5" y="-5" width="10" height="10" fill="#d5dbe1" stroke="${ink}" stroke-width="1" transform="translate(${fixed(column.x)} ${fixed(column.y)}) rotate(${fixed(degrees)})"/>`);
    const label = point(column.angle, ringRadius + 17);
    parts.push(`<text x="${fixed(label.x)}" y="${fixed(label.y + 3)}" ${font} font-weight="bold" fill="${ink}" text-anchor="middle">${column.label}</text>`);
  }
  // Governing position of each member: a diamond inside the ring with a leader to the girder axis.
  const markers: PlanMarker[] = result.members.map((member, i) => {
    const angle = member.governing.position.angle;
    const colour = SERIES_COLOURS[(i + 1) % SERIES_COLOURS.length] ?? ink;
    const at = point(angle, ringRadius - 22 - 14 * i);
    return { member: member.id, angle, colour, x: at.x, y: at.y };
  });
  markers.forEach((marker, i) => {
    const onRing = point(marker.angle, ringRadius - 2);
    parts.push(`<line x1="${fixed(onRing.x)}" y1="${fixed(onRing.y)}" x2="${fixed(marker.x)}" y2="${fixed(marker.y)}" stroke="${marker.colour}" stroke-width="0.9"/>`);
    parts.push(`<path d="M ${fixed(marker.x)} ${fixed(marker.y - 5)} l 5 5 l -5 5 l -5 -5 z" fill="${marker.colour}" stroke="white" stroke-width="0.6"/>`);
    const member = result.members[i];
    const text = `${marker.member} ${formatUtilisation(member?.utilisation ?? null)}`;
    // The label on the side of the marker toward the bin axis, on a white ground so that no line crosses it.
    const toLeft = Math.cos(marker.angle) >= 0;
    const textWidth = 5.2 * text.length;
    const left = toLeft ? marker.x - 8 - textWidth : marker.x + 8;
    parts.push(`<rect x="${fixed(left - 2)}" y="${fixed(marker.y - 6)}" width="${fixed(textWidth + 4)}" height="12" fill="white"/>`);
    parts.push(`<text x="${fixed(left)}" y="${fixed(marker.y + 3)}" ${font} fill="${marker.colour}" font-weight="bold">${escapeXml(text)}</text>`);
  });
  parts.push('</svg>');
  return { svg: parts.join(''), width, height, centre, ringRadius, columns, markers };
}
