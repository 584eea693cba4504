import { existsSync } from 'node:fs';
import { resolve } from 'node:path';

/**
 * The published benchmark instances, in ../shared/reference beside the checkout (read-only, not in the repository):
 * server/src/route-days/bench → <checkout>/../shared/reference. Throws with that layout spelled out when the folder is
 * missing, so a clone elsewhere fails with a reason instead of ENOENT on each file.
 */
export function referenceDir(...parts: string[]): string {
  const dir = resolve(__dirname, '../../../../../shared/reference', ...parts);
  if (!existsSync(dir)) {
    throw new Error(
      `The reference instances are missing: ${dir}. They are read from shared/reference beside the checkout ` +
        `(<checkout>/../shared); clone the project next to that folder, or link it there.`,
    );
  }
  return dir;
}
