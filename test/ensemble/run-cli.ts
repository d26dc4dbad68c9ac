/** Runs the command line in this process and captures what it writes (for command tests). */
import { vi } from 'vitest';
import { main } from '../../server/cli/main.js';

/** Runs `loomline <args>`; returns the exit code and the captured stdout and stderr. */
export async function runCli(args: string[]): Promise<{ code: number; stdout: string; stderr: string }> {
  let stdout = '';
  let stderr = '';
  const out = vi.spyOn(process.stdout, 'write').mockImplementation((chunk: string | Uint8Array) => ((stdout += String(chunk)), true));
  const err = vi.spyOn(process.stderr, 'write').mockImplementation((chunk: string | Uint8Array) => ((stderr += String(chunk)), true));
  const before = process.exitCode;
  try {
    return { code: await main(args), stdout, stderr };
  } finally {
    out.mockRestore();
    err.mockRestore();
    process.exitCode = before;
  }
}
