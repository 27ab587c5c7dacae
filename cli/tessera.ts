// Tessera command line: `npm run tessera -- <command> [options]`.
// Each command lives in cli/commands/<name>.ts and exports `run(argv: string[]): Promise<number>`.
import { commands } from './commands';

async function main(): Promise<number> {
  const [name, ...rest] = process.argv.slice(2);
  if (!name || name === '--help' || name === 'help') {
    console.log('usage: npm run tessera -- <command> [options]\n\ncommands:');
    for (const [key, c] of Object.entries(commands)) console.log(`  ${key.padEnd(10)} ${c.summary}`);
    return name ? 0 : 2;
  }
  const command = commands[name];
  if (!command) {
    console.error(`unknown command "${name}"; try: ${Object.keys(commands).join(', ')}`);
    return 2;
  }
  return command.run(rest);
}

main().then(
  (code) => process.exit(code),
  (err: unknown) => {
    console.error(`error: ${err instanceof Error ? err.message : String(err)}`);
    process.exit(1);
  },
);
