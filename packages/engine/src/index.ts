/**
 * @sheaf/engine — the calculation engine of Sheaf, shared by the web app, the server and the CLI.
 *
 * Units: every number inside is in SI base units (Pa, m, N, rad); units are applied at the edges
 * (expressions with units in, `formatResult`/`formatQuantity` out). Sign convention: tension
 * positive; txy acts in +y on the +x face; angles counterclockwise from x.
 *
 * Results support, not replace, the judgement of a qualified engineer; verify them against the
 * governing codes.
 */

// Sheet evaluation
export { createEvaluator } from './sheet/createEvaluator';
export type { CellInput, Evaluator, EvaluatorOptions, SheetInput, UpdateReport } from './sheet/createEvaluator';
export { machineOutput } from './sheet/machineOutput';
export type { MachineCell, MachineOutput } from './sheet/machineOutput';
export { formatResult } from './sheet/formatResult';
export type { FormattedValue } from './sheet/formatResult';
export { envelopeOf, envelopesFor, mohrOf } from './sheet/plots';
export type { EnvelopePlot, MohrPlot } from './sheet/plots';

// Cells and results
export { KINDS, cellSchema, kindOf } from './kinds/registry';
export type { Cell, CellOf, NamedCell } from './kinds/registry';
export { KIND_IDS, STATE_KINDS, isKindId } from './kinds/kindIds';
export type { KindId } from './kinds/kindIds';
export { CELL_ERROR_CODES, cellFailure, isFailure } from './kinds/result';
export type { CellError, CellErrorCode, CellFailure, CellOk, CellResult, ResultValue } from './kinds/result';
export type { CellKind, EquationContext, ExpressionField, KindContext } from './kinds/types';
export { findMaterial } from './kinds/materials';
export type { Material, MaterialsLookup } from './kinds/materials';
export type { NoteCell } from './kinds/note';
export type { QuantityCell } from './kinds/quantity';
export type { StressCell } from './kinds/stress';
export type { RosetteCell } from './kinds/rosette';
export type { RotateCell } from './kinds/rotate';
export type { PrincipalCell } from './kinds/principal';
export type { CriterionCell } from './kinds/criterion';
export type { PointsetCell } from './kinds/pointset';

// File format
export { readSheet, upgradeSheet } from './format/readSheet';
export type { ReadResult } from './format/readSheet';
export { writeSheet } from './format/writeSheet';
export { SHEET_FORMAT, SHEET_VERSION, sheetSchema } from './format/sheetSchema';
export type { Sheet } from './format/sheetSchema';
export { sheetJsonSchema, sheetJsonSchemaText } from './format/jsonSchema';
export { describeIssues, jsonPath } from './format/issues';

// Units
export { UNIT_SYSTEMS, UNIT_SYSTEM_IDS, isUnitSystemId } from './units/unitSystems';
export type { DisplayUnit, UnitSystemId } from './units/unitSystems';
export { formatNumber, formatQuantity } from './units/formatQuantity';
export type { FormattedQuantity } from './units/formatQuantity';
export { DIMENSIONS, describeDimension } from './units/dimension';
export type { Dimension, DimensionName } from './units/dimension';
export type { Measure } from './units/measure';
export { checkDimension } from './units/checkDimension';
export type { ExpectedDimension } from './units/checkDimension';
export { compileExpression, evaluateExpression, isExpressionProblem, isFreeStandingSymbol } from './units/expression';
export type { CompiledExpression, ExpressionProblem, Quantity } from './units/expression';

// Stress math
export type { PlaneStrain, PlaneStress, PrincipalTriple, StressTensor, Vector3 } from './stress/types';
export { hasPrincipalZ, isPlaneState, toTensor } from './stress/types';
export { rotatePlaneStress } from './stress/rotatePlaneStress';
export { rotateAboutZ } from './kinds/rotate';
export { foldHalfTurn, principalPlaneStresses } from './stress/principalPlane';
export type { PlanePrincipal } from './stress/principalPlane';
export { principalStresses } from './stress/principalStresses';
export type { PrincipalStresses } from './stress/principalStresses';
export { stressInvariants } from './stress/invariants';
export type { StressInvariants } from './stress/invariants';
export { vonMisesFromPrincipal, vonMisesStress } from './stress/vonMises';
export { absoluteMaxShear, trescaStress } from './stress/tresca';
export { octahedralStresses } from './stress/octahedral';
export type { OctahedralStresses } from './stress/octahedral';
export { mohrCircles3D, planeMohrCircle } from './stress/mohrCircle';
export type { Mohr3D, MohrCircle3DPart, MohrPoint, PlaneMohrCircle } from './stress/mohrCircle';
export { planeStressFromStrain, shearModulus, strainFromPlaneStress } from './stress/planeStressHooke';
export type { PlaneStressStrains } from './stress/planeStressHooke';
export { normalStrainAt, principalPlaneStrains, rotatePlaneStrain } from './stress/strainTransform';
export type { PrincipalPlaneStrains } from './stress/strainTransform';
export { reduceRosette, rosetteAngles } from './stress/rosette';
export type { RosetteLayout, RosetteReduction } from './stress/rosette';

// Failure criteria
export { THEORY_IDS } from './criteria/types';
export type {
  EnvelopeGeometry,
  EnvelopeOptions,
  FactorKernel,
  FailureTheory,
  MohrSegment,
  PrincipalPoint,
  Strength,
  StrengthKey,
  TheoryAssessment,
  TheoryId,
} from './criteria/types';
export { THEORIES, isTheoryId } from './criteria/theories';
export { checkCriterion } from './criteria/checkCriterion';
export type { CriterionCheck, CriterionProblem } from './criteria/checkCriterion';
export { planeLoadLine } from './criteria/loadLine';
export type { LoadLine } from './criteria/loadLine';
export { strengthReductionFactor } from './criteria/mohrCoulomb';
export { mohrHexagon, vonMisesEllipse } from './criteria/outlines';

// Batch evaluation
export type { PrincipalColumns, StressColumns } from './batch/columns';
export { allocatePrincipal, rowCount } from './batch/columns';
export { principalPlaneBatch, vonMisesPlaneBatch } from './batch/principalPlaneBatch';
export { principal3DBatch } from './batch/principal3DBatch';
export { criterionFactorBatch, principalAndVonMisesBatch, summarizeFactors } from './batch/factorBatch';
export type { FactorSummary } from './batch/factorBatch';
export { columnsFromRows, evaluatePointSet } from './batch/pointSet';
export type { ColumnMapping, PointSetOutcome, RowProblem } from './batch/pointSet';
export { parseStressCsv } from './batch/csv';
export type { CsvColumns } from './batch/csv';

// Revision diff (shared by the server's diff route and the web app's revisions page)
export { diffRevisions } from './diff/diffRevisions';
export { diffCells, inputChanges } from './diff/diffCells';
export type { CellDiff } from './diff/diffCells';
export { diffResults } from './diff/diffResults';
export { machineCellsById } from './diff/machineCellsById';
export type { DiffResultsOptions } from './diff/diffResults';
export type {
  ChangedCell,
  DiffCellRef,
  DiffValue,
  InputChange,
  ResultChange,
  RevisionDiff,
  RevisionSnapshot,
  Verdict,
  VerdictCrossing,
} from './diff/types';

// Materials library and template parameters
export {
  MATERIAL_BASES,
  MATERIAL_CATEGORIES,
  MATERIAL_PROPERTIES,
  MATERIAL_PROPERTY_KEYS,
  UNCONFIRMED_SOURCE_WORDS,
  checkMaterialValues,
  materialKeySchema,
  materialRecordSchema,
  materialValueSchema,
  materialsLookupOf,
  toEngineMaterial,
  unconfirmedKeys,
} from './library/materialRecord';
export type { MaterialBasis, MaterialCategory, MaterialProblem, MaterialPropertyKey, MaterialRecord, MaterialValue } from './library/materialRecord';
export {
  applyTemplateParameters,
  checkTemplateParameters,
  defaultParameterValues,
  templateParameterSchema,
  templateParametersSchema,
} from './library/templateParameters';
export type { ParameterOutcome, ParameterProblem, ParameterValues, ParameterisedSheet, TemplateParameter } from './library/templateParameters';

// HTTP API shapes shared by server and web (also importable as '@sheaf/engine/api')
export * as api from './api/index';
