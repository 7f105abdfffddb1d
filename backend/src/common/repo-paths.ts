import { existsSync } from 'node:fs';
import { dirname, join } from 'node:path';

/** The repository root: the nearest folder above this file holding `schema.graphql`. */
export function repositoryRoot(): string {
  let dir = __dirname;
  for (;;) {
    if (existsSync(join(dir, 'schema.graphql'))) return dir;
    const parent = dirname(dir);
    if (parent === dir) throw new Error(`schema.graphql not found above ${__dirname}`);
    dir = parent;
  }
}
