import { describe, expect, it } from 'vitest';
import { loadRolledSections, parseRolledSectionTable, rolledSection } from './sections.js';
import { SteelError } from './errors.js';

describe('rolled-section table', () => {
  it('holds the full IPE 80-600 and HE 100-1000 A, B and M series of EN 10365', () => {
    const names = loadRolledSections().map((s) => s.designation);
    // EN 10365:2017 IPE series (18 sizes) and HE B series (24 sizes), from memory.
    const ipe = [80, 100, 120, 140, 160, 180, 200, 220, 240, 270, 300, 330, 360, 400, 450, 500, 550, 600].map((n) => `IPE ${n}`);
    const heb = [100, 120, 140, 160, 180, 200, 220, 240, 260, 280, 300, 320, 340, 360, 400, 450, 500, 550, 600, 650, 700, 800, 900, 1000].map(
      (n) => `HE ${n} B`,
    );
    const sizes = [100, 120, 140, 160, 180, 200, 220, 240, 260, 280, 300, 320, 340, 360, 400, 450, 500, 550, 600, 650, 700, 800, 900, 1000];
    expect(names).toEqual([...ipe, ...heb, ...sizes.map((n) => `HE ${n} A`), ...sizes.map((n) => `HE ${n} M`)]);
    expect(loadRolledSections().every((s) => s.source.length > 0)).toBe(true);
  });

  it('converts millimetres to metres', () => {
    // EN 10365 dimensions of HE 300 B (REFERENCES.md section 5): 300 x 300 x 11 x 19, r = 27 mm.
    const s = rolledSection('he300b');
    expect(s.designation).toBe('HE 300 B');
    expect(s.dimensions).toEqual({ depth: 0.3, flangeWidth: 0.3, webThickness: 0.011, flangeThickness: 0.019, rootRadius: 0.027 });
  });

  it('reports an unknown designation by code and message', () => {
    expect(() => rolledSection('IPE 310')).toThrowError(
      new SteelError('UNKNOWN_SECTION', 'Section "IPE 310" is not in the rolled-section table (IPE 80 to IPE 600; HE 100 A/B/M to HE 1000 A/B/M).', 'section'),
    );
  });

  it('rejects a table row that fails validation, naming the path', () => {
    const table = {
      schemaVersion: 1,
      title: 't',
      units: 'mm',
      sections: [
        { designation: 'IPE 300', series: 'IPE', depthMm: 300, flangeWidthMm: 150, webThicknessMm: -7.1, flangeThicknessMm: 10.7, rootRadiusMm: 15, source: 'x' },
      ],
    };
    try {
      parseRolledSectionTable(table);
      expect.unreachable('the table should have been rejected');
    } catch (error) {
      expect(error).toBeInstanceOf(SteelError);
      expect((error as SteelError).code).toBe('INVALID_SECTION_TABLE');
      expect((error as SteelError).path).toBe('sections.0.webThicknessMm');
    }
    const missingSource = { ...table, sections: [{ ...table.sections[0], webThicknessMm: 7.1, source: '' }] };
    expect(() => parseRolledSectionTable(missingSource)).toThrowError(/sections\.0\.source/);
  });

  it('returns rows that callers cannot corrupt for each other', () => {
    const first = loadRolledSections();
    first.reverse();
    expect(loadRolledSections()[0]?.designation).toBe('IPE 80');
    expect(Object.isFrozen(rolledSection('IPE 300').properties)).toBe(true);
  });
});
