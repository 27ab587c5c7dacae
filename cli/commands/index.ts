export interface CliCommand {
  summary: string;
  run(argv: string[]): Promise<number>;
}

import { screenCommand } from './screen';
import { batchCommand } from './batch';
import { analyseCommand } from './analyse';

// Each command registers itself here (one line each).
export const commands: Record<string, CliCommand> = {
  screen: screenCommand,
  batch: batchCommand,
  analyse: analyseCommand,
};
