// `npm run bench`: runs every scripts/bench/*.ts module's exported `run(): Promise<void>` in file
// name order. Benchmarks print their own figures (medians and ratios against a baseline measured in
// the same run); nothing here asserts a speed.
import { readdirSync } from 'node:fs';
import path from 'node:path';

async function main(): Promise<void> {
  const dir = path.join(__dirname, 'bench');
  const files = readdirSync(dir)
    .filter((f) => f.endsWith('.ts') && !f.endsWith('.d.ts'))
    .sort();
  const only = process.argv.slice(2);
  for (const file of files) {
    const name = file.replace(/\.ts$/, '');
    if (only.length > 0 && !only.includes(name)) continue;
    const mod = require(path.join(dir, file)) as { run?: () => Promise<void> };
    if (typeof mod.run !== 'function') throw new Error(`scripts/bench/${file} does not export run(): Promise<void>`);
    console.log(`\n=== bench: ${name} ===`);
    await mod.run();
  }
}

main().catch((e: unknown) => {
  console.error(e instanceof Error ? (e.stack ?? e.message) : String(e));
  process.exit(1);
});
