import type { PrincipalTriple } from '../stress/types';

/** Failure theories a criterion cell can use (ids stored in sheet files). @public */
export const THEORY_IDS = ['von-mises', 'tresca', 'max-normal', 'coulomb-mohr', 'modified-mohr', 'mohr-coulomb'] as const;

/** A failure theory id. @public */
export type TheoryId = (typeof THEORY_IDS)[number];

/**
 * Strength values, SI base units: Sy, Sut, Suc and c in Pa (Suc as a positive magnitude), phi
 * in radians. Each theory needs some of them (see {@link FailureTheory.needs}).
 * @public
 */
export interface Strength {
  /** Yield strength (von Mises, Tresca). */
  readonly Sy?: number;
  /** Ultimate tensile strength (brittle theories). */
  readonly Sut?: number;
  /** Ultimate compressive strength as a positive number (brittle theories). */
  readonly Suc?: number;
  /** Cohesion (Mohr-Coulomb). */
  readonly c?: number;
  /** Angle of internal friction (Mohr-Coulomb). */
  readonly phi?: number;
}

/** Name of a strength value. @public */
export type StrengthKey = keyof Strength;

/** A point of the principal-stress plane: sA horizontal, sB vertical, Pa. @public */
export interface PrincipalPoint {
  readonly sA: number;
  readonly sB: number;
}

/** A straight segment of Mohr's plane (sigma, tau), Pa. @public */
export interface MohrSegment {
  readonly from: { readonly sigma: number; readonly tau: number };
  readonly to: { readonly sigma: number; readonly tau: number };
}

/**
 * Envelope geometry of a theory for plotting.
 *
 * `principalPlane` holds closed polylines (last point equals the first) in the plane of the two
 * in-plane principal stresses of a plane state, sA horizontal and sB vertical, drawn over all
 * four quadrants (so sA < sB is allowed and the outline is symmetric about sA = sB). A point
 * (p1, p2) inside is safe. Several theories' polylines can be overlaid on one plot.
 * `mohrPlane` holds straight envelope lines in Mohr's plane where the theory is stated there
 * (Mohr-Coulomb): both branches, tau > 0 and tau < 0.
 * @public
 */
export interface EnvelopeGeometry {
  readonly theory: TheoryId;
  readonly principalPlane: readonly (readonly PrincipalPoint[])[];
  readonly mohrPlane?: readonly MohrSegment[];
  /** Why a part is empty or what the figure assumes. */
  readonly note?: string;
}

/** What a theory says about one stress state. @public */
export interface TheoryAssessment {
  /** Equivalent stress in Pa where the theory has one (von Mises, Tresca, Coulomb-Mohr), else null. */
  readonly equivalent: number | null;
  /**
   * Factor of safety, >= 0; `Infinity` where no finite factor exists (a hydrostatic state under
   * von Mises, say). Along the proportional load line except where the theory says otherwise
   * (Mohr-Coulomb: strength reduction).
   */
  readonly factor: number;
  /** Further theory-specific values, SI base units (see the theory's documentation). */
  readonly extra: Readonly<Record<string, number>>;
}

/** Factor of safety from sorted principal stresses s1 >= s2 >= s3 (Pa); Infinity when unbounded. @public */
export type FactorKernel = (s1: number, s2: number, s3: number) => number;

/** Options for envelope geometry. @public */
export interface EnvelopeOptions {
  /** Number of segments for curved outlines (von Mises ellipse). Default 120. */
  readonly segments?: number;
  /** How far (Pa) Mohr-plane lines run into compression from their apex. Default: a multiple of the strength. */
  readonly extent?: number;
}

/**
 * One failure theory: which strengths it needs, how it checks them, how it assesses a state and
 * the envelope it draws. `assess` takes the three principal stresses sorted s1 >= s2 >= s3 (for
 * a plane state the out-of-plane 0 takes its place).
 * @public
 */
export interface FailureTheory {
  readonly id: TheoryId;
  readonly label: string;
  readonly needs: readonly StrengthKey[];
  /** A message naming the strength value at fault, or null when the strengths are usable. */
  validate(strength: Strength): { readonly key: StrengthKey; readonly message: string } | null;
  assess(principal: PrincipalTriple, strength: Strength): TheoryAssessment;
  /**
   * The factor of safety as a plain-number function of the sorted principal stresses (Pa), with
   * the strengths bound once: the hot loop of batch evaluation calls it per row. `assess` uses
   * the same function, so single cells and point sets agree.
   */
  factorKernel(strength: Strength): FactorKernel;
  envelope(strength: Strength, options?: EnvelopeOptions): EnvelopeGeometry;
}
