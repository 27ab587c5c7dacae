import fs from 'node:fs';
import path from 'node:path';

/**
 * The repository root, found by walking up to the package.json named "tessera". The server runs
 * both from source (server/) and compiled (dist-server/server/), so a fixed "../.." would be wrong
 * in one of the two.
 */
export function repoRoot(start: string = __dirname): string {
  let dir = start;
  for (;;) {
    const pkg = path.join(dir, 'package.json');
    if (fs.existsSync(pkg)) {
      try {
        if (JSON.parse(fs.readFileSync(pkg, 'utf8')).name === 'tessera') return dir;
      } catch {
        // an unreadable package.json further down is not ours; keep walking
      }
    }
    const parent = path.dirname(dir);
    if (parent === dir) throw new Error(`cannot find the tessera repository root above ${start}`);
    dir = parent;
  }
}
