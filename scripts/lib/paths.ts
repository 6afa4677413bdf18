import { join, resolve } from 'node:path';

export const ROOT = resolve(import.meta.dirname, '..', '..');
export const DATA_DIR = join(ROOT, '.data');
export const BIN = (name: string) => join(ROOT, 'node_modules', '.bin', name);
export const FRONTEND_DIST = join(ROOT, 'frontend', 'dist');
