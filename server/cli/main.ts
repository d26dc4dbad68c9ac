/**
 * The Loomline command line: `npm run -s cli -- <command> <scenario.json> [options]`
 * (DESIGN.md §6). Each command lives in ./commands/ and registers itself here.
 */
import { Command, CommanderError } from 'commander';
import { EXIT_BAD_INPUT, reportError } from './run.js';
import { registerCommands } from './commands/index.js';

export function buildProgram(): Command {
  const program = new Command('loomline')
    .description('Trace light through layered air over a curved Earth and report what an observer can and cannot see.')
    .showHelpAfterError('(run with --help for usage)')
    .exitOverride();
  registerCommands(program);
  return program;
}

export async function main(argv: string[]): Promise<number> {
  const program = buildProgram();
  try {
    await program.parseAsync(argv, { from: 'user' });
    return process.exitCode === undefined ? 0 : Number(process.exitCode);
  } catch (error) {
    if (error instanceof CommanderError) {
      // Help and version are successful exits; everything else commander rejects is bad usage.
      if (error.code === 'commander.helpDisplayed' || error.code === 'commander.version' || error.code === 'commander.help') return 0;
      return EXIT_BAD_INPUT;
    }
    return reportError(error);
  }
}

if (import.meta.url === `file://${process.argv[1]}`) {
  main(process.argv.slice(2)).then((code) => {
    process.exitCode = code;
  });
}
