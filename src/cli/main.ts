import { runCoverage } from './coverage-command';
import { runCurvesCommand } from './curves-command';
import { runGapsCommand } from './gaps-command';
import { runRotate } from './rotate-command';
import { HELP } from './help';
import { TOOL_VERSION } from '../version';

/**
 * The `driftgrid` command. Returns the exit status: 0 done, 1 the input or the options were not
 * usable (the message says why). No stack traces for the user unless DRIFTGRID_DEBUG is set.
 */
export async function main(argv: readonly string[]): Promise<number> {
  const [command, ...rest] = argv;
  try {
    switch (command) {
      case 'coverage':
        return await runCoverage(rest);
      case 'curves':
        return await runCurvesCommand(rest);
      case 'gaps':
        return await runGapsCommand(rest);
      case 'rotate':
        return await runRotate(rest);
      case '--version':
      case '-v':
        process.stdout.write(`driftgrid ${TOOL_VERSION}\n`);
        return 0;
      case undefined:
      case 'help':
      case '--help':
      case '-h':
        process.stdout.write(HELP);
        return 0;
      default:
        throw new Error(`Unknown command "${command}". Commands: coverage, curves, gaps, rotate. See \`driftgrid --help\`.`);
    }
  } catch (error) {
    const message = error instanceof Error ? error.message : String(error);
    process.stderr.write(`driftgrid: ${message}\n`);
    if (process.env.DRIFTGRID_DEBUG && error instanceof Error && error.stack) process.stderr.write(`${error.stack}\n`);
    return 1;
  }
}
