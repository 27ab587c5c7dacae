export interface CliCommand {
  summary: string;
  run(argv: string[]): Promise<number>;
}

// Each command registers itself here (one line each).
export const commands: Record<string, CliCommand> = {};
