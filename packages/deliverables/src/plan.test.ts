import { describe, expect, it } from 'vitest';
import { supportPlan } from './plan.js';
import { renderPdfDefinition, svgNode } from './pdf-engine.js';
import { demoDesignResult } from './test-support/demo-result.js';

describe('plan of the support layout', () => {
  it('puts column C(j+1) at 2 pi j / n from +X, counter-clockwise seen from above (page y down)', () => {
    const result = demoDesignResult();
    const plan = supportPlan(result);
    const { x: cx, y: cy } = plan.centre;
    const R = plan.ringRadius;
    expect(plan.columns.map((c) => c.label)).toEqual(['C1', 'C2', 'C3', 'C4', 'C5', 'C6', 'C7', 'C8']);
    // C1 on +X (right), C3 on +Y (up the page), C5 on -X, C7 on -Y.
    expect(plan.columns[0]).toMatchObject({ x: cx + R, y: cy });
    expect(plan.columns[2]?.x).toBeCloseTo(cx, 9);
    expect(plan.columns[2]?.y).toBeCloseTo(cy - R, 9);
    expect(plan.columns[4]?.x).toBeCloseTo(cx - R, 9);
    expect(plan.columns[6]?.y).toBeCloseTo(cy + R, 9);
    for (const column of plan.columns) {
      expect(plan.svg).toContain(`>${column.label}</text>`);
    }
    expect(plan.svg).toContain(`r="${R}"`);
    expect(plan.svg).toContain('R = 3.000 m');
  });

  it('marks the governing position of every member at its angle', () => {
    const result = demoDesignResult();
    const plan = supportPlan(result);
    const { x: cx, y: cy } = plan.centre;
    expect(plan.markers.map((m) => m.member)).toEqual(result.members.map((m) => m.id));
    result.members.forEach((member, i) => {
      const marker = plan.markers[i];
      if (marker === undefined) throw new Error('marker missing');
      const angle = Math.atan2(cy - marker.y, marker.x - cx);
      const expected = member.governing.position.angle;
      expect(Math.cos(angle - expected)).toBeCloseTo(1, 9);
      expect(plan.svg).toContain(`${member.id} ${member.utilisation?.toFixed(2)}`);
    });
  });

  it('follows the number of columns and renders into a PDF without a warning', async () => {
    const result = demoDesignResult();
    result.girder.columns = 5;
    result.girder.spanAngle = (2 * Math.PI) / 5;
    const plan = supportPlan(result);
    expect(plan.columns).toHaveLength(5);
    expect(Math.atan2(plan.centre.y - (plan.columns[1]?.y ?? 0), (plan.columns[1]?.x ?? 0) - plan.centre.x)).toBeCloseTo((2 * Math.PI) / 5, 9);
    // svgNode's warning callback throws on anything svg-to-pdfkit cannot draw.
    const pdf = await renderPdfDefinition({ content: [svgNode(plan.svg, 300)] });
    expect(pdf.subarray(0, 5).toString()).toBe('%PDF-');
  });
});
