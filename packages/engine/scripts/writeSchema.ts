/**
 * Regenerate docs/sheet-format.schema.json from the engine's schemas:
 * `npm run schema -w @sheaf/engine`. A test checks that the committed file equals the output.
 */
import { writeFileSync } from 'node:fs';
import { dirname, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { sheetJsonSchemaText } from '../src/format/jsonSchema';

const target = resolve(dirname(fileURLToPath(import.meta.url)), '../../../docs/sheet-format.schema.json');
writeFileSync(target, sheetJsonSchemaText());
console.log(`wrote ${target}`);
