import { z } from 'zod';
import { isCallableFunction } from '../units/math';

/** Words the expression language reserves; they cannot name a cell. */
const RESERVED = new Set(['and', 'or', 'not', 'xor', 'mod', 'to', 'in', 'true', 'false', 'null', 'undefined', 'end', 'NaN', 'Infinity']);

/** A stable cell id (kept across edits; notes and diffs refer to it). @public */
export const cellIdSchema = z
  .string({ error: 'must be a string' })
  .min(1, { error: 'must not be empty' })
  .max(64, { error: 'must be at most 64 characters' });

/** A cell name: what other cells write to refer to it. @public */
export const cellNameSchema = z
  .string({ error: 'must be a string' })
  .max(64, { error: 'must be at most 64 characters' })
  .regex(/^[A-Za-z_][A-Za-z0-9_]*$/, { error: 'must start with a letter or _ and hold only letters, digits and _' })
  .refine((name) => !RESERVED.has(name), { error: 'is a reserved word of the expression language' })
  .refine((name) => !isCallableFunction(name), { error: 'is the name of a function; choose another name' })
  .meta({ description: 'Name other cells use to refer to this one (letters, digits, _)' });

/** An expression with units, e.g. `18 kN / (40 mm * 12 mm)`; may name other cells. @public */
export const expressionSchema = z
  .string({ error: 'must be a string (an expression such as "120 MPa")' })
  .max(2000, { error: 'must be at most 2000 characters' })
  .meta({ description: 'Expression with units; may name other cells' });

/** A reference to a cell holding a stress state. @public */
export const stateReferenceSchema = cellNameSchema.meta({
  description: 'Name of a stress, rosette, rotate or principal cell',
});

/** Strength values as expressions with units (Sy, Sut, Suc, c: pressures; phi: an angle). @public */
export const strengthSchema = z
  .strictObject({
    Sy: expressionSchema.optional(),
    Sut: expressionSchema.optional(),
    Suc: expressionSchema.optional(),
    c: expressionSchema.optional(),
    phi: expressionSchema.optional(),
  })
  .meta({ description: 'Strengths: Sy; or Sut and Suc (Suc as a positive magnitude); or c and phi' });

/** Required factor of safety: a plain-number expression. @public */
export const requiredSchema = expressionSchema.meta({ description: 'Required factor of safety (plain number); 1 when absent' });

/** A material id from the organization's materials list. @public */
export const materialIdSchema = z
  .string({ error: 'must be a string' })
  .min(1, { error: 'must not be empty' })
  .max(128)
  .meta({ description: 'Material id, looked up in the materials list given to the evaluator' });
