import { describe, expect, it } from 'vitest';
import { RuleError } from './errors.js';
import {
  GRIT_SCALES,
  GRIT_TABLES,
  convertGrade,
  findGrade,
  formatGrade,
  gradeToMicrometres,
  gritGrades,
  isGritScale,
  nearestGrade,
  parseGrade,
} from './grit-scales.js';

describe('published grade sizes', () => {
  it('FEPA P microgrits, ISO 6344-3 / FEPA 43-2 table (median ds50)', () => {
    // ISO 6344-3 / FEPA 43-2: the four values quoted in issue 3, which match the table as remembered.
    expect(gradeToMicrometres('fepa-p', 'P240')).toBe(58.5);
    expect(gradeToMicrometres('fepa-p', 'P400')).toBe(35.0);
    expect(gradeToMicrometres('fepa-p', 'P1000')).toBe(18.3);
    expect(gradeToMicrometres('fepa-p', 'P2000')).toBe(10.3);
    // ISO 6344-3 / FEPA 43-2, from memory (no copy of the table at hand).
    expect(gradeToMicrometres('fepa-p', 'P600')).toBe(25.8);
    expect(gradeToMicrometres('fepa-p', 'P2500')).toBe(8.4);
  });

  it('FEPA P macrogrits, ISO 6344-2 / FEPA 43-1 usual averages', () => {
    // ISO 6344-2 / FEPA 43-1 grades are sieve fractions; the averages below are the usual published ones, from memory.
    expect(gradeToMicrometres('fepa-p', 180)).toBe(82);
    expect(gradeToMicrometres('fepa-p', 'P12')).toBe(1815);
  });

  it('FEPA F grades, FEPA 42-1 and FEPA 42-2 tables', () => {
    // FEPA 42-2 microgrits (median ds50), from memory.
    expect(gradeToMicrometres('fepa-f', 'F230')).toBe(53.0);
    expect(gradeToMicrometres('fepa-f', 'F400')).toBe(17.3);
    expect(gradeToMicrometres('fepa-f', 'F1200')).toBe(3.0);
    // FEPA 42-1 macrogrits (usual average), from memory.
    expect(gradeToMicrometres('fepa-f', 'F80')).toBe(185);
  });

  it('JIS R6001 microgrits (median ds50)', () => {
    // JIS R6001 table, from memory.
    expect(gradeToMicrometres('jis', '#1000')).toBe(11.5);
    expect(gradeToMicrometres('jis', '#3000')).toBe(4.0);
    expect(gradeToMicrometres('jis', '#6000')).toBe(2.0);
    expect(gradeToMicrometres('jis', 8000)).toBe(1.2);
  });

  it('lists every table coarse to fine with no repeated grade', () => {
    for (const scale of GRIT_SCALES) {
      const grades = gritGrades(scale);
      expect(grades.length).toBeGreaterThan(10);
      for (let index = 1; index < grades.length; index += 1) {
        expect(grades[index]!.grade).toBeGreaterThan(grades[index - 1]!.grade);
        expect(grades[index]!.um).toBeLessThan(grades[index - 1]!.um);
      }
      expect(gritGrades(scale)).toBe(grades);
    }
    expect(GRIT_TABLES.jis.parts[0]!.standard).toContain('JIS R6001');
    expect(findGrade('fepa-p', 240)?.standard).toContain('ISO 6344-3');
  });
});

describe('grade labels', () => {
  it('reads and writes the usual forms', () => {
    expect(parseGrade('fepa-p', 'p 240')).toBe(240);
    expect(parseGrade('jis', ' #6000 ')).toBe(6000);
    expect(parseGrade('fepa-f', '230')).toBe(230);
    expect(formatGrade('jis', 6000)).toBe('#6000');
    expect(formatGrade('fepa-p', 400)).toBe('P400');
    expect(isGritScale('jis')).toBe(true);
    expect(isGritScale('cami')).toBe(false);
  });

  it('refuses a label of another scale, a fraction, or a grade the table lacks', () => {
    expect(() => parseGrade('jis', 'P240')).toThrow('is not a JIS (Japanese stones) grade (written like #240)');
    expect(() => parseGrade('fepa-p', 24.5)).toThrow(RuleError);
    expect(() => parseGrade('fepa-p', 'fine')).toThrow(RuleError);
    expect(findGrade('fepa-p', 'P250')).toBeUndefined();
    expect(() => gradeToMicrometres('fepa-p', 'P250')).toThrow('P250 is not in the FEPA P (coated abrasives) table.');
  });
});

describe('nearest grade to a size', () => {
  it('finds the grade whose size is nearest by ratio', () => {
    // Sizes against ISO 6344-3 and JIS R6001 as tabled above.
    expect(nearestGrade('fepa-p', 35)?.label).toBe('P400');
    expect(nearestGrade('fepa-p', 60)?.label).toBe('P240');
    expect(nearestGrade('fepa-p', 30)?.label).toBe('P500');
    expect(nearestGrade('fepa-p', 15)?.label).toBe('P1200');
    expect(nearestGrade('fepa-p', 9)?.label).toBe('P2500');
    expect(nearestGrade('fepa-p', 80)?.label).toBe('P180');
    expect(nearestGrade('jis', 15)?.label).toBe('#800');
    expect(nearestGrade('jis', 9)?.label).toBe('#1200');
    expect(nearestGrade('jis', 2)?.label).toBe('#6000');
  });

  it('has no nearest grade for a size outside what the scale covers', () => {
    expect(nearestGrade('jis', 80)).toBeNull();
    expect(nearestGrade('fepa-p', 5)).toBeNull();
    expect(nearestGrade('jis', 80, { maxRatio: 1.5 })?.label).toBe('#240');
  });

  it('refuses a size that is not a size', () => {
    expect(() => nearestGrade('jis', 0)).toThrow('between 0.1 and 5000 micrometres');
    expect(() => nearestGrade('jis', Number.NaN)).toThrow(RuleError);
  });

  it('converts both ways through the size', () => {
    // FEPA F400 (17.3 µm, FEPA 42-2) is nearest JIS #700 (17.0 µm, JIS R6001); #6000 (2.0 µm) is nearest F1500 (2.0 µm).
    expect(convertGrade('fepa-f', 'F400', 'jis')?.label).toBe('#700');
    expect(convertGrade('jis', '#6000', 'fepa-f')?.label).toBe('F1500');
    expect(convertGrade('fepa-p', 'P1000', 'jis')?.label).toBe('#700');
    expect(convertGrade('jis', '#8000', 'fepa-p')).toBeNull();
    for (const grade of gritGrades('fepa-p')) expect(convertGrade('fepa-p', grade.grade, 'fepa-p')).toEqual(grade);
  });
});
