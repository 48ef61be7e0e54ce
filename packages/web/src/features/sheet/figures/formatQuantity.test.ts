import { describe, expect, it } from 'vitest';
import {
  formatAngle,
  formatFactor,
  formatNumber,
  formatStress,
  formatStressNumber,
} from './formatQuantity';

const megapascal = { label: 'MPa', perPa: 1e-6 };

describe('formatStress', () => {
  it('prints three significant figures with the unit', () => {
    expect(formatStress(47_656_098, megapascal)).toBe('47.7 MPa');
    expect(formatStress(250e6, megapascal)).toBe('250 MPa');
    expect(formatStress(0.5e6, megapascal)).toBe('0.500 MPa');
  });

  it('uses a true minus sign', () => {
    expect(formatStress(-10_156_098, megapascal)).toBe('\u221210.2 MPa');
  });

  it('keeps three figures but no more than one decimal beyond the reference', () => {
    expect(formatStressNumber(25e6, megapascal, { reference: 80e6 })).toBe('25.0');
    expect(formatStressNumber(14.142e6, megapascal, { reference: 504e6 })).toBe('14.1');
    expect(formatStressNumber(3.04e6, megapascal, { reference: 80e6 })).toBe('3.04');
    expect(formatStressNumber(0.5e6, megapascal, { reference: 80e6 })).toBe('0.50');
    // Rounding noise beside real stresses prints as zero, without a sign.
    expect(formatStressNumber(3e-6, megapascal, { reference: 80e6 })).toBe('0.00');
    expect(formatStressNumber(-3e-6, megapascal, { reference: 80e6 })).toBe('0.00');
  });

  it('converts to other display units', () => {
    const ksi = { label: 'ksi', perPa: 1 / 6.894757e6 };
    expect(formatStress(275.8e6, ksi)).toBe('40.0 ksi');
    expect(formatStress(1.2345e3, { label: 'kPa', perPa: 1e-3 })).toBe('1.23 kPa');
  });
});

describe('formatNumber', () => {
  it('keeps large values whole instead of switching to exponents', () => {
    expect(formatNumber(1234.5)).toBe('1235');
    expect(formatNumber(-98765)).toBe('\u221298765');
  });

  it('switches to exponent form below 0.001', () => {
    expect(formatNumber(0.000123456)).toBe('1.23e\u22124');
  });

  it('prints zero and non-finite values readably', () => {
    expect(formatNumber(0)).toBe('0.00');
    expect(formatNumber(Number.POSITIVE_INFINITY)).toBe('∞');
    expect(formatNumber(Number.NEGATIVE_INFINITY)).toBe('\u2212∞');
    expect(formatNumber(Number.NaN)).toBe('—');
  });
});

describe('formatAngle', () => {
  it('shows radians as degrees with one decimal', () => {
    expect(formatAngle(0.43249)).toBe('24.8°');
    expect(formatAngle(-Math.PI / 2)).toBe('\u221290.0°');
    expect(formatAngle(0)).toBe('0.0°');
    expect(formatAngle((2.5 * Math.PI) / 180)).toBe('2.5°');
    expect(formatAngle((-0.01 * Math.PI) / 180)).toBe('0.0°');
  });
});

describe('formatFactor', () => {
  it('prints three significant figures or "unbounded"', () => {
    expect(formatFactor(2.3456)).toBe('2.35');
    expect(formatFactor(2.5)).toBe('2.50');
    expect(formatFactor(0.81234)).toBe('0.812');
    expect(formatFactor(12.34)).toBe('12.3');
    expect(formatFactor(null)).toBe('unbounded');
    expect(formatFactor(Number.POSITIVE_INFINITY)).toBe('unbounded');
  });
});
