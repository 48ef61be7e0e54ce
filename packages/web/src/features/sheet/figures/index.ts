/**
 * The sheet figures: pure, prop-driven SVG components. Numbers in SI base units (Pa, rad) plus
 * a display unit in, SVG out; no fetching and no engine import. See README.md in this folder.
 */

export { MohrCircle, type MohrCircleProps } from './MohrCircle';
export { MohrCircles3D, type MohrCircles3DProps } from './MohrCircles3D';
export { FailureEnvelope, type FailureEnvelopeProps } from './FailureEnvelope';
export type { RotatedPlaneState } from './mohrCircleLayout';
export type { EnvelopeCurve } from './failureEnvelopeLayout';
export type { DisplayUnit, ShearAxisConvention } from './figureTypes';
export { safetyStatus, type SafetyStatus } from './safetyStatus';
