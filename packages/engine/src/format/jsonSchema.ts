import { z } from 'zod';
import { sheetSchema } from './sheetSchema';

/**
 * The JSON Schema (draft 2020-12) of the sheet file format, generated from the engine's zod
 * schemas. Checks that JSON Schema cannot state (unique ids, a cell name that is not a function
 * name, "strength or material") are made by the engine's reader only.
 * @public
 */
export function sheetJsonSchema(): Record<string, unknown> {
  return z.toJSONSchema(sheetSchema, { target: 'draft-2020-12', io: 'input' }) as Record<string, unknown>;
}

/** The JSON Schema as the text committed in docs/sheet-format.schema.json. @public */
export function sheetJsonSchemaText(): string {
  return `${JSON.stringify(sheetJsonSchema(), null, 2)}\n`;
}
