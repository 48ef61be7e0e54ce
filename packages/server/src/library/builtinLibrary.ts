import { readFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import {
  checkMaterialValues,
  checkTemplateParameters,
  materialRecordSchema,
  templateParametersSchema,
  type MaterialRecord,
  type TemplateParameter,
} from '@sheaf/engine';
import type { SheetContentV1 } from '@sheaf/engine/api';
import { checkSheetContent } from '../services/sheetContent';

/**
 * The built-in materials and templates, read once from the top-level `library/` folder (shared
 * with the engine's tests, which evaluate every template). A file that does not check out is a
 * programmer error: loading throws with the file and the field, and the server does not start
 * with a broken library.
 */
export const LIBRARY_DIR = resolve(fileURLToPath(new URL('.', import.meta.url)), '../../../../library');

/** A built-in template: one version, read-only, with id `builtin:<key>`. */
export interface BuiltinTemplate {
  readonly id: string;
  readonly key: string;
  readonly version: number;
  readonly title: string;
  readonly description: string;
  readonly category: string;
  readonly parameters: readonly TemplateParameter[];
  readonly content: SheetContentV1;
}

interface Library {
  materials: readonly MaterialRecord[];
  templates: readonly BuiltinTemplate[];
}

let loaded: Library | null = null;

function readJson(path: string): unknown {
  return JSON.parse(readFileSync(path, 'utf8'));
}

function loadMaterials(dir: string): MaterialRecord[] {
  const file = join(dir, 'materials', 'builtin-materials.json');
  const raw = readJson(file) as { materials?: unknown };
  if (!Array.isArray(raw.materials)) throw new Error(`${file}: materials: must be a list`);
  return raw.materials.map((entry, index) => {
    const parsed = materialRecordSchema.safeParse(entry);
    if (!parsed.success) throw new Error(`${file}: materials[${index}]: ${parsed.error.message}`);
    const problems = checkMaterialValues(parsed.data);
    if (problems.length > 0) throw new Error(`${file}: ${parsed.data.id}: ${problems.map((p) => p.message).join('; ')}`);
    return parsed.data;
  });
}

interface ManifestEntry {
  key: string;
  file: string;
  version: number;
  title: string;
  description: string;
  category: string;
  parameters: unknown;
}

function loadTemplates(dir: string): BuiltinTemplate[] {
  const manifestPath = join(dir, 'templates', 'manifest.json');
  const manifest = readJson(manifestPath) as { templates?: ManifestEntry[] };
  if (!Array.isArray(manifest.templates)) throw new Error(`${manifestPath}: templates: must be a list`);
  return manifest.templates.map((entry) => {
    const where = `${manifestPath}: ${entry.key}`;
    if (!/^[a-z0-9-]{1,60}$/.test(entry.key)) throw new Error(`${where}: key: lowercase letters, digits and hyphens`);
    const content = checkSheetContent(readJson(join(dir, 'templates', entry.file)), entry.file);
    const parameters = templateParametersSchema.safeParse(entry.parameters);
    if (!parameters.success) throw new Error(`${where}: parameters: ${parameters.error.message}`);
    const problems = checkTemplateParameters(content, parameters.data);
    if (problems.length > 0) throw new Error(`${where}: ${problems.map((p) => p.message).join('; ')}`);
    return {
      id: `builtin:${entry.key}`,
      key: entry.key,
      version: entry.version,
      title: entry.title,
      description: entry.description,
      category: entry.category,
      parameters: parameters.data,
      content: { ...content, title: entry.title },
    };
  });
}

function library(): Library {
  loaded ??= { materials: loadMaterials(LIBRARY_DIR), templates: loadTemplates(LIBRARY_DIR) };
  return loaded;
}

/** The built-in materials, in the library's order. */
export function builtinMaterials(): readonly MaterialRecord[] {
  return library().materials;
}

/** True when `key` is the id of a built-in material (organizations cannot reuse it). */
export function isBuiltinMaterialKey(key: string): boolean {
  return library().materials.some((m) => m.id === key);
}

/** The built-in templates, in the manifest's order. */
export function builtinTemplates(): readonly BuiltinTemplate[] {
  return library().templates;
}

/** The built-in template with this id (`builtin:<key>`), or undefined. */
export function builtinTemplate(id: string): BuiltinTemplate | undefined {
  return library().templates.find((t) => t.id === id);
}
