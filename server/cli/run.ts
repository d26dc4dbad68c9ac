/**
 * How every command ends: prints its result (JSON or text) and exits 0; bad input → message on
 * stderr naming the field, exit 2; anything else → a one-line internal error, exit 1 (the stack only
 * with LOOMLINE_DEBUG=1).
 */
import { InputError } from '../../sim/errors.js';

export const EXIT_OK = 0;
export const EXIT_INTERNAL = 1;
export const EXIT_BAD_INPUT = 2;

/** True for errors caused by the user's input (they exit with code 2). */
export function isInputError(error: unknown): boolean {
  return error instanceof InputError || error instanceof RangeError;
}

/** Writes an error the way the CLI reports it and returns the exit code. */
export function reportError(error: unknown): number {
  const message = error instanceof Error ? error.message : String(error);
  if (isInputError(error)) {
    const problems = (error as { problems?: string[] }).problems;
    process.stderr.write(`loomline: ${message}\n`);
    if (problems && problems.length > 1) for (const p of problems.slice(1)) process.stderr.write(`loomline: ${p}\n`);
    return EXIT_BAD_INPUT;
  }
  process.stderr.write(`loomline: internal error: ${message}\n`);
  if (process.env.LOOMLINE_DEBUG === '1' && error instanceof Error && error.stack) process.stderr.write(error.stack + '\n');
  return EXIT_INTERNAL;
}

/** Prints a command's result: one JSON object with --json, else the text rendering. */
export function printResult(json: boolean, result: unknown, text: () => string): void {
  if (json) process.stdout.write(JSON.stringify(result) + '\n');
  else process.stdout.write(text() + '\n');
}
