// @ts-nocheck
import path from 'node:path';
import { fileURLToPath } from 'node:url';

/** The project root, found from this file so it holds whether the server runs from source or a bundle. */
export const appRoot = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
export const migrationsFolder = path.join(appRoot, 'drizzle');
export const clientDistFolder = path.join(appRoot, 'dist', 'client');
