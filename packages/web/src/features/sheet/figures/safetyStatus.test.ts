import { describe, expect, it } from 'vitest';
import { safetyStatus, safetyStatusWord } from './safetyStatus';

describe('safetyStatus', () => {
  it('passes at or above the required factor', () => {
    expect(safetyStatus(2.35, 1.5)).toBe('pass');
    expect(safetyStatus(1.5, 1.5)).toBe('pass');
  });

  it('warns between 1 and the required factor', () => {
    expect(safetyStatus(1.2, 1.5)).toBe('low-margin');
    expect(safetyStatus(1, 1.5)).toBe('low-margin');
  });

  it('fails below 1 whatever is required', () => {
    expect(safetyStatus(0.999, 1.5)).toBe('fail');
    expect(safetyStatus(0.9, 0.8)).toBe('fail');
    expect(safetyStatus(Number.NaN)).toBe('fail');
  });

  it('takes 1 as the required factor when none is given', () => {
    expect(safetyStatus(1)).toBe('pass');
    expect(safetyStatus(1.01)).toBe('pass');
  });

  it('passes an unbounded factor', () => {
    expect(safetyStatus(null, 3)).toBe('pass');
    expect(safetyStatus(Number.POSITIVE_INFINITY, 3)).toBe('pass');
  });

  it('has a distinct word for each verdict', () => {
    expect(Object.values(safetyStatusWord)).toEqual(['Pass', 'Low margin', 'Fail']);
  });
});
