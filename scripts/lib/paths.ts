import path from 'node:path';
import { fileURLToPath } from 'node:url';

/** Absolute paths the commands use; everything they create lives under the git-ignored .data/. */
export const repoRoot = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..');

const dataRoot = path.join(repoRoot, '.data');

export const paths = {
  dataRoot,
  devPostgres: path.join(dataRoot, 'postgres'),
  testPostgres: path.join(dataRoot, 'test-postgres'),
  devApp: path.join(dataRoot, 'app'),
  testApp: path.join(dataRoot, 'test-app'),
  secrets: path.join(dataRoot, 'secrets.json'),
  clientDist: path.join(repoRoot, 'client', 'dist'),
  serverMain: path.join(repoRoot, 'server', 'dist', 'main.js'),
  artifacts: path.join(repoRoot, 'artifacts'),
} as const;

/** A path as the person at the terminal would type it from the checkout. */
export function shown(absolute: string): string {
  const relative = path.relative(repoRoot, absolute);
  return relative.startsWith('..') ? absolute : relative;
}
