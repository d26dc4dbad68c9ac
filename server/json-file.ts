/**
 * Reading and parsing the JSON input files (scenarios, outlook sites) with one kind of message:
 * an unreadable file names its path and the system's error code, malformed JSON names the source.
 * The caller chooses the error class and field, so each file kind keeps its own error type.
 */
import { readFile } from 'node:fs/promises';

/** Builds the caller's error for a problem with the file as a whole. */
export type FileErrorFactory = (message: string) => Error;

/** Parses JSON text; malformed text throws `fail("<source> is not valid JSON (...)")`. */
export function parseJsonText(text: string, source: string, fail: FileErrorFactory): unknown {
  try {
    return JSON.parse(text);
  } catch (error) {
    throw fail(`${source} is not valid JSON (${(error as Error).message})`);
  }
}

/** Reads a UTF-8 text file; an unreadable one throws `fail("cannot read <kind> <path>: <code>")`. */
export async function readInputFile(path: string, kind: string, fail: FileErrorFactory): Promise<string> {
  try {
    return await readFile(path, 'utf8');
  } catch (error) {
    throw fail(`cannot read ${kind} ${path}: ${(error as NodeJS.ErrnoException).code ?? (error as Error).message}`);
  }
}
