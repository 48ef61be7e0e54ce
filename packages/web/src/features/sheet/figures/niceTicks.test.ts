import { describe, expect, it } from 'vitest';
import { niceStep, niceTicks, stepDecimals, ticksForStep } from './niceTicks';

describe('niceTicks', () => {
  it('steps by 20 across 0..100 asked for five intervals', () => {
    expect(niceTicks(0, 100, 5)).toEqual([0, 20, 40, 60, 80, 100]);
  });

  it('keeps every tick inside an off-round range and includes zero', () => {
    expect(niceTicks(-45, 85, 6)).toEqual([-40, -20, 0, 20, 40, 60, 80]);
  });

  it('rounds floating steps so they print cleanly', () => {
    expect(niceTicks(0.1, 0.7, 6)).toEqual([0.1, 0.2, 0.3, 0.4, 0.5, 0.6, 0.7]);
    expect(niceTicks(0.0012, 0.0094, 4)).toEqual([0.002, 0.004, 0.006, 0.008]);
  });

  it('uses steps of 5 times a power of ten', () => {
    expect(niceTicks(-180, 230, 4)).toEqual([-100, 0, 100, 200]);
    expect(niceTicks(12, 38, 5)).toEqual([15, 20, 25, 30, 35]);
  });

  it('accepts the bounds in either order and never returns -0', () => {
    const ticks = niceTicks(50, -50, 2);
    expect(ticks).toEqual([-50, 0, 50]);
    expect(Object.is(ticks[1], -0)).toBe(false);
  });

  it('gives one tick for a zero-width range and none for a broken one', () => {
    expect(niceTicks(7, 7, 5)).toEqual([7]);
    expect(niceTicks(Number.NaN, 1, 5)).toEqual([]);
    expect(niceTicks(0, Number.POSITIVE_INFINITY, 5)).toEqual([]);
    expect(niceTicks(0, 1, 0)).toEqual([]);
  });
});

describe('niceStep', () => {
  it('picks 1, 2 or 5 times a power of ten', () => {
    expect(niceStep(130, 6)).toBe(20); // raw 21.7 -> 20
    expect(niceStep(100, 5)).toBe(20);
    expect(niceStep(40, 5)).toBe(10); // raw 8 is nearer 10 than 5 on a log scale
    expect(niceStep(3, 10)).toBeCloseTo(0.2, 12);
    expect(niceStep(1000, 10)).toBe(100);
  });
});

describe('ticksForStep', () => {
  it('lists the multiples of a given step inside the range', () => {
    expect(ticksForStep(-45, 85, 50)).toEqual([0, 50]);
    expect(ticksForStep(-0.25, 0.3, 0.1)).toEqual([-0.2, -0.1, 0, 0.1, 0.2, 0.3]);
  });

  it('refuses a step that is not positive or absurdly small', () => {
    expect(ticksForStep(0, 1, 0)).toEqual([]);
    expect(ticksForStep(0, 1, 1e-9)).toEqual([]);
  });
});

describe('stepDecimals', () => {
  it('counts the decimals a step needs', () => {
    expect(stepDecimals(20)).toBe(0);
    expect(stepDecimals(1)).toBe(0);
    expect(stepDecimals(0.5)).toBe(1);
    expect(stepDecimals(0.02)).toBe(2);
  });
});
