import { describe, expect, it } from 'vitest';
import {
  formatAngle,
  formatTraceValue,
  formatBimoment,
  formatForce,
  formatKilo,
  formatLengthM,
  formatLengthMm,
  formatLineLoad,
  formatMass,
  formatMoment,
  formatNumber,
  formatPressure,
  formatQuantity,
  formatTonnes,
  formatUtilisation,
  toDegrees,
  toDisplay,
} from './units.js';

describe('formatNumber', () => {
  it('keeps about four significant figures without an exponent in the working range', () => {
    expect(formatNumber(672.345)).toBe('672.3');
    expect(formatNumber(1591.4)).toBe('1591');
    expect(formatNumber(0.54)).toBe('0.5400');
    expect(formatNumber(26.0965)).toBe('26.10');
    expect(formatNumber(-133.44)).toBe('-133.4');
  });

  it('uses an exponent outside 0.001 .. 10^7 and never prints a negative zero', () => {
    expect(formatNumber(3.258e8)).toBe('3.258e+8');
    expect(formatNumber(-4e-5)).toBe('-4.000e-5');
    expect(formatNumber(0)).toBe('0');
    expect(formatNumber(-0.00001 * 0)).toBe('0');
    expect(formatNumber(-0.04, 1)).toBe('-0.04');
  });
});

describe('engineering units', () => {
  it('formats forces, moments, bimoments, line loads and pressures from SI', () => {
    expect(formatForce(680_047.5)).toBe('680.0 kN');
    expect(formatMoment(-134_920.26)).toBe('-134.9 kNm');
    expect(formatBimoment(17_894.5)).toBe('17.89 kNm²');
    expect(formatLineLoad(180_000)).toBe('180.0 kN/m');
    expect(formatPressure(26_096.45)).toBe('26.10 kPa');
  });

  it('formats lengths, angles and masses', () => {
    expect(formatLengthMm(0.2944)).toBe('294 mm');
    expect(formatLengthM(18.849556)).toBe('18.850 m');
    expect(formatAngle(Math.PI / 4)).toBe('45.0°');
    expect(toDegrees(Math.PI)).toBeCloseTo(180, 12);
    expect(formatMass(2205.398)).toBe('2205 kg');
    expect(formatTonnes(5147.798)).toBe('5.148 t');
  });

  it('converts derivation units to display units and leaves unknown units alone', () => {
    expect(toDisplay(30_681.8, 'Pa')).toEqual({ value: 30.6818, unit: 'kPa' });
    expect(toDisplay(9000, 'N/m3')).toEqual({ value: 9, unit: 'kN/m³' });
    expect(toDisplay(63_361.9, 'N/m').unit).toBe('kN/m');
    expect(toDisplay(0.6108652381980153, 'rad').value).toBeCloseTo(35, 10);
    expect(toDisplay(6.313, 'm')).toEqual({ value: 6.313, unit: 'm' });
    expect(formatQuantity(0.54, '-')).toBe('0.5400');
    expect(formatQuantity(0.6108652381980153, 'rad')).toBe('35.00°');
    expect(formatQuantity(48_326.76, 'Pa')).toBe('48.33 kPa');
  });
});

describe('formatUtilisation', () => {
  it('rounds up so that a printed utilisation never understates the check', () => {
    expect(formatUtilisation(0.9177)).toBe('0.92');
    expect(formatUtilisation(1.001)).toBe('1.01');
    expect(formatUtilisation(0.9951)).toBe('1.00');
  });

  it('does not bump a value that is exact up to binary noise', () => {
    expect(formatUtilisation(0.93)).toBe('0.93');
    expect(formatUtilisation(0.1 + 0.2)).toBe('0.30');
    expect(formatUtilisation(1)).toBe('1.00');
  });

  it('prints n/a for a check that recorded no number', () => {
    expect(formatUtilisation(null)).toBe('n/a');
  });
});

describe('formatKilo', () => {
  it('prints solver noise as zero and real values as usual', () => {
    expect(formatKilo(6.527e-12)).toBe('0');
    expect(formatKilo(-0.0004)).toBe('0');
    expect(formatKilo(0.0006)).toBe('6.000e-4');
    expect(formatKilo(122.84)).toBe('122.8');
  });
});

describe('trace values in engineering units', () => {
  it('converts by the symbol the check recorded (SI to kN, kNm, kNm2, MPa, cm4)', () => {
    expect(formatTraceValue('My', -122843)).toEqual([formatNumber(-122.843), 'kNm']);
    expect(formatTraceValue('N', 302900)).toEqual([formatNumber(302.9), 'kN']);
    expect(formatTraceValue('B', 4021)).toEqual([formatNumber(4.021), 'kNm²']);
    expect(formatTraceValue('sigma_x flange tip +y +z', 3.258e8)).toEqual([formatNumber(325.8), 'MPa']);
    expect(formatTraceValue('f_y', 355e6)).toEqual([formatNumber(355), 'MPa']);
    expect(formatTraceValue('I_t', 185e-8)).toEqual([formatNumber(185), 'cm⁴']);
    expect(formatTraceValue('gamma_M0', 1)).toEqual([formatNumber(1), '']);
  });
});
