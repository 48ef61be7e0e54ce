import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

/** The repository root (two levels above this file). */
export const ROOT = join(dirname(fileURLToPath(import.meta.url)), '..', '..');
export const TSX = join(ROOT, 'node_modules', '.bin', 'tsx');
export const SERVER_DIR = join(ROOT, 'packages', 'server');
