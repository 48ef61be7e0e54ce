import { z } from 'zod';

/**
 * Shapes shared by every resource of the HTTP API. The server validates requests with these
 * schemas and generates its OpenAPI document from them; the web app imports the inferred types,
 * so both sides agree by type.
 */

/** The four roles a member can hold in an organization, most powerful first. */
export const ROLES = ['owner', 'engineer', 'checker', 'viewer'] as const;
export const Role = z.enum(ROLES).meta({ id: 'Role', description: 'Role of a member in an organization' });
export type Role = z.infer<typeof Role>;

/** Life cycle of a calculation sheet. */
export const SHEET_STATUSES = ['draft', 'in-check', 'approved', 'superseded'] as const;
export const SheetStatus = z.enum(SHEET_STATUSES).meta({ id: 'SheetStatus' });
export type SheetStatus = z.infer<typeof SheetStatus>;

/** Every stored record is keyed by a UUID. */
export const Id = z.uuid();

/** An ISO 8601 timestamp with time zone, as the server writes it (`Date.prototype.toISOString`). */
export const Timestamp = z.iso.datetime({ offset: true });

export const EmailAddress = z
  .email({ error: 'must be an e-mail address such as name@example.com' })
  .max(254, { error: 'must be at most 254 characters' });

export const MIN_PASSWORD_LENGTH = 10;
export const Password = z
  .string({ error: 'must be a string' })
  .min(MIN_PASSWORD_LENGTH, { error: `must be at least ${MIN_PASSWORD_LENGTH} characters` })
  .max(200, { error: 'must be at most 200 characters' });

export const DisplayName = z
  .string({ error: 'must be a string' })
  .trim()
  .min(1, { error: 'must not be empty' })
  .max(120, { error: 'must be at most 120 characters' });

/** Error codes the API answers with; the HTTP status follows from the code. */
export const ERROR_CODES = [
  'invalid-field',
  'not-signed-in',
  'forbidden',
  'csrf',
  'not-found',
  'conflict',
  'last-owner',
  'expired',
  'too-large',
  'rate-limited',
  'internal',
  'unavailable',
  'integrity',
] as const;
export const ErrorCode = z.enum(ERROR_CODES);
export type ErrorCode = z.infer<typeof ErrorCode>;

/**
 * One problem of a request that has several, e.g. a bad row of an uploaded CSV file: the row
 * (1-based, counting the header as row 1) and the column where there is one, and the message.
 */
export const ErrorDetail = z
  .object({ field: z.string(), row: z.number().int().optional(), column: z.string().optional(), message: z.string() })
  .meta({ id: 'ErrorDetail' });
export type ErrorDetail = z.infer<typeof ErrorDetail>;

/**
 * Body of every error response: `{ error: { code, message } }`; the message names the field at
 * fault. `details` lists each problem when a request has several (rows of an uploaded file).
 */
export const ErrorBody = z
  .object({ error: z.object({ code: ErrorCode, message: z.string(), details: z.array(ErrorDetail).optional() }) })
  .meta({ id: 'Error' });
export type ErrorBody = z.infer<typeof ErrorBody>;

/** Public view of a user. */
export const User = z.object({ id: Id, email: EmailAddress, name: z.string() }).meta({ id: 'User' });
export type User = z.infer<typeof User>;
